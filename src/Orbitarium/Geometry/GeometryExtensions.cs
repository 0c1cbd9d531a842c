using Orbitarium.Chemistry;
using Orbitarium.Geometry.Optimization;
using Orbitarium.Geometry.Symmetry;
using Orbitarium.Geometry.Thermochemistry;
using Orbitarium.Geometry.Vibrations;

namespace Orbitarium.Geometry;

/// <summary>
/// Fluent geometry verbs on a potential-energy surface: <c>surface.Optimize(molecule)</c>,
/// <c>surface.Frequencies(molecule)</c>, <c>surface.Gradient(molecule)</c>, and <c>molecule.PointGroup()</c>.
/// For SCF methods start from a <c>Calculation</c> (see the SCF extension methods of this folder).
/// </summary>
public static class GeometryExtensions
{
    /// <summary>Optimises <paramref name="molecule"/> to a minimum (or, with
    /// <see cref="OptimizationOptions.ForTransitionState"/>, a transition state); see <see cref="GeometryOptimizer"/>.</summary>
    public static OptimizationResult Optimize(this IPotentialEnergySurface surface, Molecule molecule, OptimizationOptions? options = null,
        IProgress<OptimizationStep>? progress = null, CancellationToken cancellationToken = default) =>
        GeometryOptimizer.Run(surface, molecule, options, progress, cancellationToken);

    /// <summary>Energy and nuclear gradient (analytic when available, else central finite differences).</summary>
    public static SurfacePoint Gradient(this IPotentialEnergySurface surface, Molecule molecule, CancellationToken cancellationToken = default) =>
        surface.EvaluateWithGradient(molecule, FiniteDifferenceGradient.DefaultStepBohr, cancellationToken);

    /// <summary>Harmonic vibrational analysis at <paramref name="molecule"/> (which should be optimised): Hessian by finite
    /// differences of gradients (step <paramref name="stepBohr"/>, default 0.005 bohr), projected wavenumbers, normal
    /// modes and IR intensities when the surface gives dipoles.</summary>
    public static VibrationalAnalysis Frequencies(this IPotentialEnergySurface surface, Molecule molecule,
        double stepBohr = FiniteDifferenceHessian.DefaultStepBohr, IProgress<int>? progress = null, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(surface);
        var hessian = FiniteDifferenceHessian.Compute(surface, molecule, stepBohr, progress, cancellationToken);
        return VibrationalAnalysis.FromHessian(hessian, surface.MethodName);
    }

    /// <summary>Ideal-gas thermochemistry of a vibrational analysis at <paramref name="temperatureKelvin"/> (default
    /// 298.15 K) and <paramref name="pressurePascal"/> (default 1 bar); see <see cref="IdealGasThermochemistry"/>.</summary>
    public static ThermochemistryResult Thermochemistry(this VibrationalAnalysis vibrations,
        double temperatureKelvin = IdealGasThermochemistry.StandardTemperatureKelvin, double pressurePascal = PhysicalConstants.StandardPressurePascal) =>
        IdealGasThermochemistry.Compute(vibrations, temperatureKelvin, pressurePascal);

    /// <summary>The molecule's point group, detected within <paramref name="toleranceAngstrom"/> (default 0.05 Å).</summary>
    public static PointGroup PointGroup(this Molecule molecule, double toleranceAngstrom = PointGroupDetector.DefaultToleranceAngstrom) =>
        PointGroupDetector.Detect(molecule, toleranceAngstrom);

    /// <summary>A relaxed scan of a distance, angle or dihedral; see <see cref="RelaxedScan"/>.</summary>
    public static RelaxedScanResult RelaxedScan(this IPotentialEnergySurface surface, Molecule molecule, GeometryConstraint scanned,
        IReadOnlyList<double> values, OptimizationOptions? options = null, CancellationToken cancellationToken = default) =>
        Optimization.RelaxedScan.Run(surface, molecule, scanned, values, options, null, cancellationToken);
}
