using Orbitarium.Scf;

namespace Orbitarium.Analysis;

/// <summary>
/// Orbitals and densities of an SCF result on a grid: the entry points a user calls with a result in hand.
/// Values are in atomic units (bohr^{−3/2} for orbitals, bohr⁻³ for densities).
/// </summary>
public static class ScfFields
{
    /// <summary>Molecular orbital <paramref name="orbitalIndex"/> (0-based, ascending energy) on a grid.</summary>
    /// <param name="result">The SCF result.</param>
    /// <param name="orbitalIndex">Orbital index 0..OrbitalCount−1.</param>
    /// <param name="grid">Where to evaluate.</param>
    /// <param name="spin">α (default) or β orbitals for an unrestricted result.</param>
    /// <param name="cancellationToken">Stops the evaluation.</param>
    /// <exception cref="OrbitariumInputException">The orbital index is unknown.</exception>
    public static GridField Orbital(ScfResult result, int orbitalIndex, IGrid grid, OrbitalSpin spin = OrbitalSpin.Alpha,
        CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(result);
        var c = spin == OrbitalSpin.Alpha ? result.CoefficientsAlpha : result.CoefficientsBeta;
        return FieldEvaluator.Orbital(result.Basis, c, orbitalIndex, grid, $"MO {orbitalIndex + 1}{SpinSuffix(result, spin)}", cancellationToken);
    }

    /// <summary>The total electron density ρ = ρ^α + ρ^β on a grid.</summary>
    /// <param name="result">The SCF result.</param>
    /// <param name="grid">Where to evaluate.</param>
    /// <param name="cancellationToken">Stops the evaluation.</param>
    public static GridField Density(ScfResult result, IGrid grid, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(result);
        return FieldEvaluator.Density(result.Basis, result.DensityTotal, grid, "electron density", false, cancellationToken);
    }

    /// <summary>The spin density ρ^α − ρ^β on a grid (zero for a restricted closed shell).</summary>
    /// <param name="result">The SCF result.</param>
    /// <param name="grid">Where to evaluate.</param>
    /// <param name="cancellationToken">Stops the evaluation.</param>
    public static GridField SpinDensity(ScfResult result, IGrid grid, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(result);
        return FieldEvaluator.Density(result.Basis, result.DensitySpin, grid, "spin density", true, cancellationToken);
    }

    /// <summary>The interference part 2 ψ_A ψ_B × occupation of an orbital's density between two atoms (see
    /// <see cref="FieldEvaluator.OrbitalInterference"/>); the occupation is taken from the result.</summary>
    /// <param name="result">The SCF result.</param>
    /// <param name="orbitalIndex">Orbital index (0-based).</param>
    /// <param name="atomA">First atom (0-based).</param>
    /// <param name="atomB">Second atom (0-based).</param>
    /// <param name="grid">Where to evaluate.</param>
    /// <param name="spin">α (default) or β orbitals for an unrestricted result.</param>
    /// <param name="cancellationToken">Stops the evaluation.</param>
    public static GridField OrbitalInterference(ScfResult result, int orbitalIndex, int atomA, int atomB, IGrid grid,
        OrbitalSpin spin = OrbitalSpin.Alpha, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(result);
        var (c, occ) = Orbitals(result, spin);
        if (orbitalIndex < 0 || orbitalIndex >= c.ColumnCount)
            throw new OrbitariumInputException($"There is no orbital {orbitalIndex}: orbitals are numbered 0..{c.ColumnCount - 1}.");
        double n = occ[orbitalIndex];
        return FieldEvaluator.OrbitalInterference(result.Basis, c, orbitalIndex, atomA, atomB, grid, n > 0 ? n : 1.0, cancellationToken);
    }

    /// <summary>The deformation density: the molecule's density minus the sum of spherically averaged free atoms
    /// computed with the same basis and method (see <see cref="DeformationDensity"/>).</summary>
    /// <param name="result">The molecule's SCF result.</param>
    /// <param name="grid">Where to evaluate.</param>
    /// <param name="cancellationToken">Stops the atom calculations and the evaluation.</param>
    public static GridField DeformationDensity(ScfResult result, IGrid grid, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(result);
        var delta = Analysis.DeformationDensity.Matrix(result, cancellationToken);
        return FieldEvaluator.Density(result.Basis, delta, grid, "deformation density", true, cancellationToken);
    }

    internal static (MathNet.Numerics.LinearAlgebra.Matrix<double> Coefficients, IReadOnlyList<double> Occupations) Orbitals(ScfResult result, OrbitalSpin spin) =>
        result.Reference == ScfReference.Unrestricted
            ? (spin == OrbitalSpin.Alpha ? (result.CoefficientsAlpha, result.OccupationsAlpha) : (result.CoefficientsBeta, result.OccupationsBeta))
            : (result.CoefficientsAlpha, result.Occupations);

    private static string SpinSuffix(ScfResult result, OrbitalSpin spin) =>
        result.Reference == ScfReference.Unrestricted ? (spin == OrbitalSpin.Alpha ? " (α)" : " (β)") : "";
}
