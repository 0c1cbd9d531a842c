using Orbitarium.Analysis;
using Orbitarium.Chemistry;

namespace Orbitarium.Models;

public sealed partial class TwoCentreLcaoModel
{
    /// <summary>The molecule the model describes at distance R: two hydrogen nuclei at (0, 0, ∓R/2) bohr, charge +1.</summary>
    /// <param name="distanceBohr">Internuclear distance in bohr.</param>
    public static Molecule MoleculeAt(double distanceBohr)
    {
        CheckDistance(distanceBohr);
        return Molecule.Empty
            .AddAtom("H", 0, 0, -distanceBohr / 2, LengthUnit.Bohr)
            .AddAtom("H", 0, 0, distanceBohr / 2, LengthUnit.Bohr)
            .WithCharge(1)
            .WithTitle(FormattableString.Invariant($"H2+ at R = {distanceBohr:0.###} bohr"));
    }

    /// <summary>The orbital ψ± on a grid (bohr^{−3/2}); nuclei as in <see cref="MoleculeAt"/>.</summary>
    /// <param name="distanceBohr">Internuclear distance in bohr.</param>
    /// <param name="grid">Where to evaluate.</param>
    /// <param name="combination">In-phase (default) or out-of-phase.</param>
    public GridField OrbitalField(double distanceBohr, IGrid grid, LcaoCombination combination = LcaoCombination.InPhase)
    {
        ArgumentNullException.ThrowIfNull(grid);
        double zeta = ExponentAt(distanceBohr, combination);
        double s = SlaterTwoCentreIntegrals.Overlap(distanceBohr, zeta);
        double sign = combination == LcaoCombination.InPhase ? 1 : -1;
        double norm = Math.Sqrt(2 * (1 + sign * s));
        var values = OnGrid(grid, p =>
        {
            var (a, b) = AtomicValues(distanceBohr, zeta, p);
            return (a + sign * b) / norm;
        });
        return new GridField(grid, MoleculeAt(distanceBohr), values,
            combination == LcaoCombination.InPhase ? "ψ+ (in phase)" : "ψ− (out of phase)", "bohr^-3/2", true);
    }

    /// <summary>One part of the density of ψ± on a grid (bohr⁻³).</summary>
    /// <param name="distanceBohr">Internuclear distance in bohr.</param>
    /// <param name="grid">Where to evaluate.</param>
    /// <param name="part">Which part (total, A², B², interference, or difference from the free atoms).</param>
    /// <param name="combination">In-phase (default) or out-of-phase.</param>
    public GridField DensityField(double distanceBohr, IGrid grid, TwoCentreDensityPart part = TwoCentreDensityPart.Total,
        LcaoCombination combination = LcaoCombination.InPhase)
    {
        ArgumentNullException.ThrowIfNull(grid);
        double zeta = ExponentAt(distanceBohr, combination);
        var values = OnGrid(grid, p =>
        {
            var d = DensityParts(distanceBohr, zeta, p, combination);
            return part switch
            {
                TwoCentreDensityPart.OnA => d.OnA,
                TwoCentreDensityPart.OnB => d.OnB,
                TwoCentreDensityPart.Interference => d.Interference,
                TwoCentreDensityPart.DifferenceFromAtoms => d.Total - FreeAtomsHalf(distanceBohr, p),
                _ => d.Total,
            };
        });
        string sign = combination == LcaoCombination.InPhase ? "+" : "−";
        string name = part switch
        {
            TwoCentreDensityPart.OnA => $"A² part of |ψ{sign}|²",
            TwoCentreDensityPart.OnB => $"B² part of |ψ{sign}|²",
            TwoCentreDensityPart.Interference => $"interference part of |ψ{sign}|²",
            TwoCentreDensityPart.DifferenceFromAtoms => $"|ψ{sign}|² − ½(A² + B²)",
            _ => $"|ψ{sign}|²",
        };
        bool signed = part is TwoCentreDensityPart.Interference or TwoCentreDensityPart.DifferenceFromAtoms;
        return new GridField(grid, MoleculeAt(distanceBohr), values, name, "bohr^-3", signed);
    }

    private static double FreeAtomsHalf(double distanceBohr, Vector3D p)
    {
        // Free hydrogen atoms have ζ = 1.
        var (a, b) = AtomicValues(distanceBohr, 1.0, p);
        return 0.5 * (a * a + b * b);
    }

    private static double[] OnGrid(IGrid grid, Func<Vector3D, double> f)
    {
        var values = new double[grid.PointCount];
        var points = new Vector3D[grid.PointCount];
        grid.FillPoints(0, points);
        for (int i = 0; i < points.Length; i++) values[i] = f(points[i]);
        return values;
    }
}
