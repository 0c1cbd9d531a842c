using System.Collections.Immutable;
using System.Globalization;
using System.Text;

namespace Orbitarium.Dft.Functionals;

/// <summary>
/// An exchange–correlation functional as a composition: Σ wᵢ × componentᵢ plus a fraction of exact (Hartree–Fock)
/// exchange. B3LYP is 0.08 slater + 0.72 b88 + 0.19 vwnrpa + 0.81 lyp + 0.20 hf.
/// </summary>
/// <remarks>Immutable. Define a new one in one line with <see cref="Parse(string, string?)"/>, e.g.
/// <c>ExchangeCorrelationFunctional.Parse("0.75*pbex + 0.25*hf + pbec", "my-pbe0")</c>, or look a named one up in
/// <see cref="FunctionalRegistry"/>.</remarks>
public sealed class ExchangeCorrelationFunctional
{
    private readonly WeightedComponent[] _terms;

    /// <summary>Creates a functional from weighted components and an exact-exchange fraction.</summary>
    /// <param name="name">Name shown with results.</param>
    /// <param name="components">The weighted components (at least one, unless the exact-exchange fraction is positive).</param>
    /// <param name="exactExchangeFraction">Fraction of Hartree–Fock exchange, 0–1 (0.2 for B3LYP).</param>
    /// <exception cref="OrbitariumInputException">No terms, a non-finite weight or a fraction outside 0–1.</exception>
    public ExchangeCorrelationFunctional(string name, IEnumerable<WeightedComponent> components, double exactExchangeFraction = 0)
    {
        ArgumentNullException.ThrowIfNull(name);
        ArgumentNullException.ThrowIfNull(components);
        var terms = components.ToArray();
        if (!double.IsFinite(exactExchangeFraction) || exactExchangeFraction < 0 || exactExchangeFraction > 1)
            throw new OrbitariumInputException($"The exact-exchange fraction must lie between 0 and 1; {exactExchangeFraction} was given.");
        foreach (var t in terms)
        {
            ArgumentNullException.ThrowIfNull(t);
            if (!double.IsFinite(t.Weight))
                throw new OrbitariumInputException($"The weight of {t.Component.Name} is not a finite number.");
        }
        if (terms.Length == 0 && exactExchangeFraction == 0)
            throw new OrbitariumInputException("A functional needs at least one component or a positive exact-exchange fraction.");
        Name = string.IsNullOrWhiteSpace(name) ? "custom" : name.Trim();
        _terms = terms;
        Components = [.. terms];
        ExactExchangeFraction = exactExchangeFraction;
        IsGradientCorrected = terms.Any(t => t.Component.IsGradientCorrected);
    }

    /// <summary>Name shown with results, e.g. "B3LYP".</summary>
    public string Name { get; }

    /// <summary>The weighted components.</summary>
    public ImmutableArray<WeightedComponent> Components { get; }

    /// <summary>Fraction of exact (Hartree–Fock) exchange, 0 for pure density functionals.</summary>
    public double ExactExchangeFraction { get; }

    /// <summary>Whether any component depends on the density gradient.</summary>
    public bool IsGradientCorrected { get; }

    /// <summary>A copy with another name.</summary>
    public ExchangeCorrelationFunctional WithName(string name) => new(name, _terms, ExactExchangeFraction);

    /// <summary>A copy with another exact-exchange fraction (the components keep their weights).</summary>
    public ExchangeCorrelationFunctional WithExactExchangeFraction(double fraction) => new(Name, _terms, fraction);

    /// <summary>Spin-polarised energy density (hartree·bohr⁻³) and first derivatives at one point; see
    /// <see cref="FunctionalComponent.Evaluate"/> for the inputs.</summary>
    public FunctionalPointValue Evaluate(double rhoAlpha, double rhoBeta, double sigmaAlphaAlpha = 0, double sigmaAlphaBeta = 0, double sigmaBetaBeta = 0)
    {
        double e = 0, va = 0, vb = 0, saa = 0, sab = 0, sbb = 0;
        foreach (var t in _terms)
        {
            var v = t.Component.Evaluate(rhoAlpha, rhoBeta, sigmaAlphaAlpha, sigmaAlphaBeta, sigmaBetaBeta);
            e += t.Weight * v.EnergyDensity; va += t.Weight * v.VRhoAlpha; vb += t.Weight * v.VRhoBeta;
            saa += t.Weight * v.VSigmaAlphaAlpha; sab += t.Weight * v.VSigmaAlphaBeta; sbb += t.Weight * v.VSigmaBetaBeta;
        }
        return new FunctionalPointValue(e, va, vb, saa, sab, sbb);
    }

    /// <summary>Closed-shell energy density (hartree·bohr⁻³) and first derivatives at one point.</summary>
    /// <param name="rho">Total density in bohr⁻³.</param>
    /// <param name="sigma">|∇ρ|² in bohr⁻⁸.</param>
    public UnpolarizedFunctionalPointValue EvaluateUnpolarized(double rho, double sigma = 0)
    {
        double e = 0, vr = 0, vs = 0;
        foreach (var t in _terms)
        {
            var v = t.Component.EvaluateUnpolarized(rho, sigma);
            e += t.Weight * v.EnergyDensity; vr += t.Weight * v.VRho; vs += t.Weight * v.VSigma;
        }
        return new UnpolarizedFunctionalPointValue(e, vr, vs);
    }

    internal void Evaluate(XcPointBatch batch)
    {
        batch.ClearOutputs();
        foreach (var t in _terms)
            if (t.Weight != 0) t.Component.Accumulate(batch, t.Weight);
    }

    /// <summary>
    /// Reads a functional from a one-line formula: terms joined by '+' (or '-'), each "[weight*]name", where the
    /// name is a registered component or functional (see <see cref="FunctionalRegistry"/>) or "hf" for exact exchange.
    /// </summary>
    /// <param name="formula">e.g. "0.08*slater + 0.72*b88 + 0.2*hf + 0.19*vwnrpa + 0.81*lyp", or "0.5*b3lyp + 0.5*pbe0".</param>
    /// <param name="name">Name of the result (defaults to the formula).</param>
    /// <exception cref="OrbitariumInputException">An unknown name or a malformed weight.</exception>
    public static ExchangeCorrelationFunctional Parse(string formula, string? name = null)
    {
        ArgumentNullException.ThrowIfNull(formula);
        if (string.IsNullOrWhiteSpace(formula))
            throw new OrbitariumInputException("The functional formula is empty; write e.g. \"0.75*pbex + 0.25*hf + pbec\".");
        var terms = new List<WeightedComponent>();
        double hf = 0;
        foreach (var (sign, text) in SplitTerms(formula))
        {
            double weight = sign;
            string id = text;
            int star = text.IndexOf('*');
            if (star >= 0)
            {
                string w = text[..star].Trim();
                id = text[(star + 1)..].Trim();
                if (!double.TryParse(w, NumberStyles.Float, CultureInfo.InvariantCulture, out double value))
                    throw new OrbitariumInputException($"\"{w}\" in the functional formula is not a number; write weights like 0.72*b88.");
                weight *= value;
            }
            if (id.Length == 0)
                throw new OrbitariumInputException($"A term of the functional formula \"{formula}\" has no name.");
            if (id.Equals("hf", StringComparison.OrdinalIgnoreCase) || id.Equals("exx", StringComparison.OrdinalIgnoreCase))
            {
                hf += weight;
                continue;
            }
            if (FunctionalRegistry.TryGetComponent(id, out var component))
            {
                terms.Add(new WeightedComponent(component, weight));
                continue;
            }
            if (FunctionalRegistry.TryGet(id, out var functional))
            {
                foreach (var t in functional.Components) terms.Add(t with { Weight = t.Weight * weight });
                hf += weight * functional.ExactExchangeFraction;
                continue;
            }
            throw new OrbitariumInputException($"Unknown functional component \"{id}\" in \"{formula}\"; known names: {string.Join(", ", FunctionalRegistry.ComponentNames)}, hf, and the functionals {string.Join(", ", FunctionalRegistry.Names)}.");
        }
        return new ExchangeCorrelationFunctional(name ?? formula.Trim(), Merge(terms), hf);
    }

    private static List<WeightedComponent> Merge(List<WeightedComponent> terms)
    {
        var merged = new List<WeightedComponent>();
        foreach (var t in terms)
        {
            int i = merged.FindIndex(m => ReferenceEquals(m.Component, t.Component));
            if (i < 0) merged.Add(t);
            else merged[i] = merged[i] with { Weight = merged[i].Weight + t.Weight };
        }
        return merged;
    }

    private static IEnumerable<(double Sign, string Text)> SplitTerms(string formula)
    {
        var current = new StringBuilder();
        double sign = 1;
        char previous = '+';
        foreach (char c in formula)
        {
            // A '+' or '-' right after 'e'/'E' in a number (1e-3) belongs to the number.
            bool exponentSign = (c == '+' || c == '-') && (previous == 'e' || previous == 'E') && current.Length > 1
                && char.IsDigit(current[^2]);
            if ((c == '+' || c == '-') && !exponentSign)
            {
                if (current.ToString().Trim().Length > 0) yield return (sign, current.ToString().Trim());
                current.Clear();
                sign = c == '-' ? -1 : 1;
            }
            else current.Append(c);
            if (!char.IsWhiteSpace(c)) previous = c;
        }
        if (current.ToString().Trim().Length > 0) yield return (sign, current.ToString().Trim());
    }

    /// <summary>The formula, e.g. "B3LYP = 0.08*slater + 0.72*b88 + 0.19*vwnrpa + 0.81*lyp + 0.2*hf".</summary>
    public string Formula
    {
        get
        {
            var parts = _terms.Select(t => t.ToString()).ToList();
            if (ExactExchangeFraction > 0) parts.Add(FormattableString.Invariant($"{ExactExchangeFraction:0.#####}*hf"));
            return string.Join(" + ", parts);
        }
    }

    /// <inheritdoc />
    public override string ToString() => $"{Name} = {Formula}";
}
