using System.Collections.Frozen;
using Orbitarium.Chemistry;

namespace Orbitarium.BasisSets;

/// <summary>
/// The standard molecular Slater exponents ζ (bohr⁻¹) of the STO-nG basis sets, per element and shell.
/// </summary>
/// <remarks>
/// H–Ne: W. J. Hehre, R. F. Stewart and J. A. Pople, J. Chem. Phys. 51, 2657 (1969);
/// Na–Ar: W. J. Hehre, R. Ditchfield, R. F. Stewart and J. A. Pople, J. Chem. Phys. 52, 2769 (1970).
/// Values from memory of those papers; the tests check them against published STO-3G exponents
/// (α = α(ζ=1)·ζ²). Shells labelled "1s" use the 1s fit, "2sp" the shared 2s/2p fit, "3sp" the shared 3s/3p fit.
/// Elements beyond Ar are not covered.
/// </remarks>
public static class StandardSlaterExponents
{
    private static readonly FrozenDictionary<int, (string Shell, double Zeta)[]> Table = new Dictionary<int, (string, double)[]>
    {
        [1] = [("1s", 1.24)],
        [2] = [("1s", 1.69)],
        [3] = [("1s", 2.69), ("2sp", 0.80)],
        [4] = [("1s", 3.68), ("2sp", 1.15)],
        [5] = [("1s", 4.68), ("2sp", 1.50)],
        [6] = [("1s", 5.67), ("2sp", 1.72)],
        [7] = [("1s", 6.67), ("2sp", 1.95)],
        [8] = [("1s", 7.66), ("2sp", 2.25)],
        [9] = [("1s", 8.65), ("2sp", 2.55)],
        [10] = [("1s", 9.64), ("2sp", 2.88)],
        [11] = [("1s", 10.61), ("2sp", 3.48), ("3sp", 1.75)],
        [12] = [("1s", 11.59), ("2sp", 3.90), ("3sp", 1.70)],
        [13] = [("1s", 12.56), ("2sp", 4.36), ("3sp", 1.70)],
        [14] = [("1s", 13.53), ("2sp", 4.83), ("3sp", 1.75)],
        [15] = [("1s", 14.50), ("2sp", 5.31), ("3sp", 1.90)],
        [16] = [("1s", 15.47), ("2sp", 5.79), ("3sp", 2.05)],
        [17] = [("1s", 16.43), ("2sp", 6.26), ("3sp", 2.10)],
        [18] = [("1s", 17.40), ("2sp", 6.74), ("3sp", 2.33)],
    }.ToFrozenDictionary();

    /// <summary>Atomic numbers covered (1–18).</summary>
    public static IReadOnlyList<int> AtomicNumbers => [.. Table.Keys.Order()];

    /// <summary>The shells ("1s", "2sp", "3sp") and their ζ in bohr⁻¹ for an element.</summary>
    /// <exception cref="OrbitariumInputException">The element has no standard STO-nG exponents here.</exception>
    public static IReadOnlyList<(string Shell, double Zeta)> For(Element element)
    {
        ArgumentNullException.ThrowIfNull(element);
        if (Table.TryGetValue(element.AtomicNumber, out var v)) return v;
        throw new OrbitariumInputException(
            $"No standard STO-nG Slater exponents for {element.Symbol}; Orbitarium has them for H–Ar. Give ζ yourself with StoNGBasis.ShellsFor.");
    }
}
