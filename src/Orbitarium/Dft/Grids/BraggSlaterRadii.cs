using Orbitarium.Chemistry;

namespace Orbitarium.Dft.Grids;

/// <summary>
/// Bragg–Slater atomic radii used for Becke's atomic size adjustment and for grid pruning.
/// </summary>
/// <remarks>J. C. Slater, J. Chem. Phys. 41, 3199 (1964), table I (from memory), with hydrogen 0.35 Å as Becke
/// recommends (J. Chem. Phys. 88, 2547 (1988)); the noble gases, absent from Slater's table, take the value of
/// their neighbouring halogen (common practice). Elements beyond krypton fall back to the covalent radius.</remarks>
public static class BraggSlaterRadii
{
    private static readonly double[] s_angstrom =
    [
        0.35, 0.35,
        1.45, 1.05, 0.85, 0.70, 0.65, 0.60, 0.50, 0.50,
        1.80, 1.50, 1.25, 1.10, 1.00, 1.00, 1.00, 1.00,
        2.20, 1.80, 1.60, 1.40, 1.35, 1.40, 1.40, 1.40, 1.35, 1.35, 1.35, 1.35, 1.30, 1.25, 1.15, 1.15, 1.15, 1.15,
    ];

    /// <summary>The radius in bohr for an element.</summary>
    public static double RadiusBohr(Element element)
    {
        ArgumentNullException.ThrowIfNull(element);
        int z = element.AtomicNumber;
        double a = z >= 1 && z <= s_angstrom.Length ? s_angstrom[z - 1] : element.CovalentRadiusAngstrom;
        return a * PhysicalConstants.BohrPerAngstrom;
    }
}
