using Orbitarium.Chemistry;

namespace Orbitarium.BasisSets;

public sealed partial class BasisSet
{
    /// <summary>The built-in set called <paramref name="name"/> (see <see cref="BasisSetLibrary.Get"/>).</summary>
    /// <exception cref="OrbitariumInputException">Unknown name; the message lists the built-in sets.</exception>
    public static BasisSet FromLibrary(string name) => BasisSetLibrary.Get(name);

    /// <summary>Reads a set from text in Orbitarium's basis format (see <see cref="BasisSetText"/>).</summary>
    /// <exception cref="OrbitariumInputException">The text is malformed; the message names the line.</exception>
    public static BasisSet Parse(string text) => BasisSetText.Parse(text);

    /// <summary>Reads a set from a <c>.basis</c> file in Orbitarium's basis format.</summary>
    /// <exception cref="OrbitariumInputException">The file is missing or malformed.</exception>
    public static BasisSet FromFile(string path) => BasisSetText.ReadFile(path);

    /// <summary>The set as text in Orbitarium's basis format.</summary>
    public string ToText() => BasisSetText.Write(this);

    /// <summary>Saves the set to a file in Orbitarium's basis format (written atomically).</summary>
    public void Save(string path) => BasisSetText.WriteFile(this, path);

    /// <summary>Returns a copy with shells appended to an element's shells (the element is added if absent).</summary>
    public BasisSet WithShellsAdded(string symbol, IEnumerable<ShellDefinition> shells)
    {
        ArgumentNullException.ThrowIfNull(shells);
        var element = PeriodicTable.BySymbol(symbol);
        var all = Covers(element) ? ShellsFor(element).Concat(shells) : shells;
        return WithElement(element, all);
    }

    /// <summary>Returns a copy with one contracted shell appended to an element, written in code, e.g.
    /// <c>set.WithShell("H", 's', (13.01, 0.019685), (1.962, 0.137977))</c>.</summary>
    /// <param name="symbol">Element symbol.</param>
    /// <param name="letter">Shell letter s, p, d, f or g.</param>
    /// <param name="primitives">(exponent in bohr⁻², coefficient of the normalised primitive) pairs.</param>
    public BasisSet WithShell(string symbol, char letter, params (double Exponent, double Coefficient)[] primitives)
    {
        ArgumentNullException.ThrowIfNull(primitives);
        var def = new ShellDefinition(AngularMomentum.FromLetter(letter), primitives.Select(p => p.Exponent), primitives.Select(p => p.Coefficient));
        return WithShellsAdded(symbol, [def]);
    }

    /// <summary>Returns a copy in which every element of <paramref name="other"/> takes <paramref name="other"/>'s shells
    /// (e.g. a larger set on some elements); name and form stay this set's.</summary>
    public BasisSet WithElementsFrom(BasisSet other)
    {
        ArgumentNullException.ThrowIfNull(other);
        var set = this;
        foreach (int z in other.AtomicNumbers)
        {
            var el = PeriodicTable.ByAtomicNumber(z);
            set = set.WithElement(el, other.ShellsFor(el));
        }
        return set;
    }
}
