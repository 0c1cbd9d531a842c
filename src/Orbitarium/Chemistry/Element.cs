namespace Orbitarium.Chemistry;

/// <summary>A chemical element: symbol, atomic number and the data Orbitarium needs from it.</summary>
/// <remarks>The table of values is <see cref="PeriodicTable"/>, where each column's source is named.</remarks>
public sealed class Element : IEquatable<Element>
{
    internal Element(int atomicNumber, string symbol, string name, double standardAtomicWeight,
        double mostAbundantIsotopeMassDalton, int mostAbundantIsotopeMassNumber, double covalentRadiusAngstrom)
    {
        AtomicNumber = atomicNumber;
        Symbol = symbol;
        Name = name;
        StandardAtomicWeight = standardAtomicWeight;
        MostAbundantIsotopeMassDalton = mostAbundantIsotopeMassDalton;
        MostAbundantIsotopeMassNumber = mostAbundantIsotopeMassNumber;
        CovalentRadiusAngstrom = covalentRadiusAngstrom;
    }

    /// <summary>Atomic number Z (nuclear charge in units of e).</summary>
    public int AtomicNumber { get; }

    /// <summary>Element symbol with the usual capitalisation, e.g. "Cl".</summary>
    public string Symbol { get; }

    /// <summary>English element name, e.g. "chlorine".</summary>
    public string Name { get; }

    /// <summary>Standard atomic weight (dimensionless, relative to m_u), IUPAC conventional value.</summary>
    public double StandardAtomicWeight { get; }

    /// <summary>Mass of the most abundant isotope in dalton (u), used for vibrational analysis.</summary>
    public double MostAbundantIsotopeMassDalton { get; }

    /// <summary>Mass number of the most abundant isotope, e.g. 35 for chlorine.</summary>
    public int MostAbundantIsotopeMassNumber { get; }

    /// <summary>Single-bond covalent radius in ångström, used to perceive bonds.</summary>
    public double CovalentRadiusAngstrom { get; }

    /// <summary>
    /// Orbitals of the preceding noble-gas shell, the ones a frozen-core correlated calculation leaves uncorrelated
    /// by common practice: 0 for H–He, 1 ([He]) for Li–Ne, 5 ([Ne]) for Na–Ar, 9 ([Ar]) for K–Kr, 18 ([Kr]) for
    /// Rb–Xe, 27 ([Xe]) for Cs–Rn.
    /// </summary>
    public int NobleGasCoreOrbitals => AtomicNumber switch
    {
        <= 2 => 0,
        <= 10 => 1,
        <= 18 => 5,
        <= 36 => 9,
        <= 54 => 18,
        <= 86 => 27,
        _ => 43,
    };

    /// <summary>Looks an element up by symbol (case-insensitive); see <see cref="PeriodicTable.BySymbol"/>.</summary>
    public static Element FromSymbol(string symbol) => PeriodicTable.BySymbol(symbol);

    /// <summary>Looks an element up by atomic number; see <see cref="PeriodicTable.ByAtomicNumber"/>.</summary>
    public static Element FromAtomicNumber(int atomicNumber) => PeriodicTable.ByAtomicNumber(atomicNumber);

    /// <inheritdoc />
    public bool Equals(Element? other) => other is not null && other.AtomicNumber == AtomicNumber;

    /// <inheritdoc />
    public override bool Equals(object? obj) => Equals(obj as Element);

    /// <inheritdoc />
    public override int GetHashCode() => AtomicNumber;

    /// <inheritdoc />
    public override string ToString() => Symbol;
}
