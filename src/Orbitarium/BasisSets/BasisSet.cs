using System.Collections.Immutable;
using Orbitarium.Chemistry;

namespace Orbitarium.BasisSets;

/// <summary>
/// A named Gaussian basis set: the contracted shells for each element it covers, and whether its
/// d, f and g shells are pure (spherical harmonics) or Cartesian by default.
/// </summary>
/// <remarks>Immutable; <c>With…</c> methods return new sets. Place it on a molecule with
/// <see cref="MolecularBasis.Create(Molecule, BasisSet, bool?)"/>.</remarks>
public sealed partial class BasisSet
{
    private readonly ImmutableDictionary<int, ImmutableArray<ShellDefinition>> _shells;

    private BasisSet(string name, bool defaultPure, string description, ImmutableDictionary<int, ImmutableArray<ShellDefinition>> shells)
    {
        Name = name;
        DefaultPure = defaultPure;
        Description = description;
        _shells = shells;
    }

    /// <summary>Creates an empty basis set to fill with <see cref="WithElement(string, IEnumerable{ShellDefinition})"/>.</summary>
    /// <param name="name">Name shown in results.</param>
    /// <param name="defaultPure">Whether d and higher shells are pure by default.</param>
    /// <param name="description">Where the set comes from (paper) or how it was made.</param>
    public static BasisSet Create(string name, bool defaultPure = true, string description = "")
    {
        ArgumentException.ThrowIfNullOrWhiteSpace(name);
        return new BasisSet(name, defaultPure, description, ImmutableDictionary<int, ImmutableArray<ShellDefinition>>.Empty);
    }

    /// <summary>The set's name, e.g. "cc-pVDZ".</summary>
    public string Name { get; }

    /// <summary>Whether shells with L ≥ 2 are pure (spherical) unless the user overrides it.</summary>
    public bool DefaultPure { get; }

    /// <summary>The set's source (publication) or how it was generated.</summary>
    public string Description { get; }

    /// <summary>Atomic numbers of the elements the set covers, ascending.</summary>
    public IReadOnlyList<int> AtomicNumbers => [.. _shells.Keys.Order()];

    /// <summary>Whether the set has functions for <paramref name="element"/>.</summary>
    public bool Covers(Element element) => _shells.ContainsKey(element.AtomicNumber);

    /// <summary>The shells for an element.</summary>
    /// <exception cref="OrbitariumInputException">The set does not cover the element.</exception>
    public ImmutableArray<ShellDefinition> ShellsFor(Element element)
    {
        ArgumentNullException.ThrowIfNull(element);
        if (_shells.TryGetValue(element.AtomicNumber, out var shells)) return shells;
        var covered = string.Join(" ", AtomicNumbers.Select(z => PeriodicTable.ByAtomicNumber(z).Symbol));
        throw new OrbitariumInputException(
            $"Basis set '{Name}' has no functions for {element.Name} ({element.Symbol}); it covers: {covered}. Pick a basis that covers {element.Symbol}.");
    }

    /// <summary>Returns a copy with the shells of one element set (replacing any it had).</summary>
    public BasisSet WithElement(Element element, IEnumerable<ShellDefinition> shells)
    {
        ArgumentNullException.ThrowIfNull(element);
        ArgumentNullException.ThrowIfNull(shells);
        ImmutableArray<ShellDefinition> list = [.. shells];
        if (list.Length == 0) throw new OrbitariumInputException($"Give at least one shell for {element.Symbol}.");
        return new BasisSet(Name, DefaultPure, Description, _shells.SetItem(element.AtomicNumber, list));
    }

    /// <summary>Returns a copy with the shells of one element (by symbol) set.</summary>
    public BasisSet WithElement(string symbol, IEnumerable<ShellDefinition> shells) =>
        WithElement(PeriodicTable.BySymbol(symbol), shells);

    /// <summary>Returns a copy with the shells of one element (by symbol) set.</summary>
    public BasisSet WithElement(string symbol, params ShellDefinition[] shells) =>
        WithElement(PeriodicTable.BySymbol(symbol), shells);

    /// <summary>Returns a copy whose d and higher shells are pure (true) or Cartesian (false) by default.</summary>
    public BasisSet WithDefaultPure(bool pure) => new(Name, pure, Description, _shells);

    /// <summary>Returns a copy with a new name.</summary>
    public BasisSet WithName(string name) => new(name, DefaultPure, Description, _shells);

    /// <summary>Returns a copy with a new description.</summary>
    public BasisSet WithDescription(string description) => new(Name, DefaultPure, description, _shells);

    /// <inheritdoc />
    public override string ToString() =>
        $"{Name} ({(DefaultPure ? "pure" : "Cartesian")} d/f/g; {_shells.Count} element(s))";
}
