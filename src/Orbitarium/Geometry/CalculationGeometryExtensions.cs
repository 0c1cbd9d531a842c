using Orbitarium.Geometry.Optimization;
using Orbitarium.Geometry.Vibrations;
using Orbitarium.Scf;

namespace Orbitarium.Geometry;

/// <summary>
/// Geometry verbs on an SCF set-up: <c>molecule.WithBasis("6-31G*").Optimize()</c>, <c>.Frequencies()</c>,
/// <c>.Gradient()</c>. The reference defaults to RHF for closed shells and UHF otherwise.
/// </summary>
public static class CalculationGeometryExtensions
{
    /// <summary>The calculation as a potential-energy surface (see <see cref="ScfSurface"/>).</summary>
    /// <param name="calculation">Molecule, basis and SCF options.</param>
    /// <param name="reference">RHF/UHF/ROHF; default RHF for singlets with an even electron count, else UHF.</param>
    public static ScfSurface AsSurface(this Calculation calculation, ScfReference? reference = null)
    {
        ArgumentNullException.ThrowIfNull(calculation);
        var m = calculation.Molecule;
        return new ScfSurface(calculation, reference ?? (m.Multiplicity == 1 && m.ElectronCount % 2 == 0 ? ScfReference.Restricted : ScfReference.Unrestricted));
    }

    /// <summary>Optimises the set-up's molecule (minimum by default; see <see cref="GeometryOptimizer"/>).</summary>
    public static OptimizationResult Optimize(this Calculation calculation, OptimizationOptions? options = null, ScfReference? reference = null,
        IProgress<OptimizationStep>? progress = null, CancellationToken cancellationToken = default) =>
        GeometryOptimizer.Run(calculation.AsSurface(reference), calculation.Molecule, options, progress, cancellationToken);

    /// <summary>Energy and analytic (RHF/UHF) or finite-difference gradient at the set-up's geometry.</summary>
    public static SurfacePoint Gradient(this Calculation calculation, ScfReference? reference = null, CancellationToken cancellationToken = default) =>
        calculation.AsSurface(reference).EvaluateWithGradient(calculation.Molecule, FiniteDifferenceGradient.DefaultStepBohr, cancellationToken);

    /// <summary>Harmonic frequencies, normal modes and IR intensities at the set-up's geometry (optimise first).</summary>
    public static VibrationalAnalysis Frequencies(this Calculation calculation, ScfReference? reference = null,
        double stepBohr = FiniteDifferenceHessian.DefaultStepBohr, IProgress<int>? progress = null, CancellationToken cancellationToken = default) =>
        calculation.AsSurface(reference).Frequencies(calculation.Molecule, stepBohr, progress, cancellationToken);
}
