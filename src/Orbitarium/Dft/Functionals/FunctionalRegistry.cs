using System.Collections.Concurrent;
using System.Diagnostics.CodeAnalysis;

namespace Orbitarium.Dft.Functionals;

/// <summary>
/// Names of the built-in components and functionals, case-insensitive. Components: slater, vwn5, vwnrpa, pw92,
/// pw92mod, b88, lyp, pbex, pbec. Functionals: svwn5 (alias lda), svwnrpa, spw92, blyp, pbe, b3lyp, b3lyp5, pbe0
/// (alias pbeh), bhandhlyp; plus any added with <see cref="Register"/>.
/// </summary>
/// <remarks>
/// B3LYP follows its common definition with the RPA-fitted VWN correlation:
/// 0.08 Slater + 0.72 B88 + 0.20 HF exchange, 0.19 VWN-RPA + 0.81 LYP correlation (Becke, J. Chem. Phys. 98, 5648 (1993);
/// Stephens, Devlin, Chabalowski &amp; Frisch, J. Phys. Chem. 98, 11623 (1994)). "b3lyp5" is the same with VWN5.
/// PBE0 = 0.75 PBE exchange + 0.25 HF + PBE correlation (Adamo &amp; Barone, J. Chem. Phys. 110, 6158 (1999)).
/// </remarks>
public static class FunctionalRegistry
{
    private static readonly Dictionary<string, FunctionalComponent> s_components = new(StringComparer.OrdinalIgnoreCase)
    {
        ["slater"] = SlaterExchange.Instance,
        ["vwn5"] = Vwn5Correlation.Instance,
        ["vwnrpa"] = VwnRpaCorrelation.Instance,
        ["pw92"] = Pw92Correlation.Instance,
        ["pw92mod"] = Pw92Correlation.Modified,
        ["b88"] = Becke88Exchange.Instance,
        ["lyp"] = LeeYangParrCorrelation.Instance,
        ["pbex"] = PbeExchange.Instance,
        ["pbec"] = PbeCorrelation.Instance,
    };

    private static readonly ConcurrentDictionary<string, ExchangeCorrelationFunctional> s_functionals = new(StringComparer.OrdinalIgnoreCase);

    static FunctionalRegistry()
    {
        Add("SVWN5", [new(SlaterExchange.Instance, 1), new(Vwn5Correlation.Instance, 1)], 0, "svwn5", "lda");
        Add("SVWN-RPA", [new(SlaterExchange.Instance, 1), new(VwnRpaCorrelation.Instance, 1)], 0, "svwnrpa");
        Add("SPW92", [new(SlaterExchange.Instance, 1), new(Pw92Correlation.Modified, 1)], 0, "spw92");
        Add("BLYP", [new(Becke88Exchange.Instance, 1), new(LeeYangParrCorrelation.Instance, 1)], 0, "blyp");
        Add("PBE", [new(PbeExchange.Instance, 1), new(PbeCorrelation.Instance, 1)], 0, "pbe");
        Add("B3LYP", [new(SlaterExchange.Instance, 0.08), new(Becke88Exchange.Instance, 0.72),
            new(VwnRpaCorrelation.Instance, 0.19), new(LeeYangParrCorrelation.Instance, 0.81)], 0.2, "b3lyp");
        Add("B3LYP5", [new(SlaterExchange.Instance, 0.08), new(Becke88Exchange.Instance, 0.72),
            new(Vwn5Correlation.Instance, 0.19), new(LeeYangParrCorrelation.Instance, 0.81)], 0.2, "b3lyp5");
        Add("PBE0", [new(PbeExchange.Instance, 0.75), new(PbeCorrelation.Instance, 1)], 0.25, "pbe0", "pbeh");
        Add("BHandHLYP", [new(Becke88Exchange.Instance, 0.5), new(LeeYangParrCorrelation.Instance, 1)], 0.5, "bhandhlyp");
    }

    private static void Add(string display, WeightedComponent[] terms, double hf, params string[] names)
    {
        var f = new ExchangeCorrelationFunctional(display, terms, hf);
        foreach (var n in names) s_functionals[n] = f;
    }

    /// <summary>Names of the registered functionals, sorted.</summary>
    public static IReadOnlyList<string> Names => [.. s_functionals.Keys.Order(StringComparer.OrdinalIgnoreCase)];

    /// <summary>Names of the built-in components, sorted.</summary>
    public static IReadOnlyList<string> ComponentNames => [.. s_components.Keys.Order(StringComparer.OrdinalIgnoreCase)];

    /// <summary>Whether <paramref name="name"/> is a registered functional.</summary>
    public static bool Contains(string name) => name is not null && s_functionals.ContainsKey(name);

    /// <summary>Looks up a registered functional, or reads a formula such as "0.75*pbex + 0.25*hf + pbec".</summary>
    /// <exception cref="OrbitariumInputException">Neither a known name nor a valid formula.</exception>
    public static ExchangeCorrelationFunctional Get(string nameOrFormula)
    {
        ArgumentNullException.ThrowIfNull(nameOrFormula);
        if (TryGet(nameOrFormula.Trim(), out var f)) return f;
        if (nameOrFormula.Contains('*') || nameOrFormula.Contains('+') || TryGetComponent(nameOrFormula.Trim(), out _))
            return ExchangeCorrelationFunctional.Parse(nameOrFormula);
        throw new OrbitariumInputException($"Unknown functional \"{nameOrFormula}\"; choose one of {string.Join(", ", Names)}, or write a formula such as \"0.75*pbex + 0.25*hf + pbec\".");
    }

    /// <summary>Looks up a registered functional by name.</summary>
    public static bool TryGet(string name, [NotNullWhen(true)] out ExchangeCorrelationFunctional? functional)
    {
        functional = null;
        return name is not null && s_functionals.TryGetValue(name, out functional);
    }

    /// <summary>Looks up a built-in component by name.</summary>
    public static bool TryGetComponent(string name, [NotNullWhen(true)] out FunctionalComponent? component)
    {
        component = null;
        return name is not null && s_components.TryGetValue(name, out component);
    }

    /// <summary>Registers a functional under a name (replacing any earlier one of that name) so that it can be used
    /// by name, e.g. in <c>calc --method</c> from a script.</summary>
    /// <exception cref="OrbitariumInputException">The name is empty, "hf", or a component name.</exception>
    public static void Register(string name, ExchangeCorrelationFunctional functional)
    {
        ArgumentNullException.ThrowIfNull(functional);
        if (string.IsNullOrWhiteSpace(name) || name.Equals("hf", StringComparison.OrdinalIgnoreCase) || s_components.ContainsKey(name))
            throw new OrbitariumInputException($"\"{name}\" cannot name a functional: it is empty, \"hf\" or a component name.");
        s_functionals[name.Trim()] = functional;
    }
}
