using System.Collections.Immutable;
using System.Globalization;
using System.Text;
using Orbitarium.Chemistry;

namespace Orbitarium.Geometry.Optimization;

/// <summary>The outcome of a geometry optimisation: the final (or, when not converged, the best) geometry, its energy
/// and gradient, whether and why it stopped, and every accepted point as a trajectory.</summary>
public sealed class OptimizationResult
{
    internal OptimizationResult(string methodName, OptimizationTarget target, SurfacePoint final, bool converged,
        OptimizationStopReason stopReason, ImmutableArray<OptimizationStep> trajectory, int gradientEvaluations,
        string coordinatesDescription, ImmutableArray<GeometryConstraint> constraints)
    {
        MethodName = methodName;
        Target = target;
        Molecule = final.Molecule;
        EnergyHartree = final.EnergyHartree;
        GradientHartreePerBohr = final.GradientHartreePerBohr;
        GradientSource = final.GradientSource;
        Converged = converged;
        StopReason = stopReason;
        Trajectory = trajectory;
        GradientEvaluations = gradientEvaluations;
        CoordinatesDescription = coordinatesDescription;
        Constraints = constraints;
    }

    /// <summary>The method optimised with, e.g. "RHF/STO-3G".</summary>
    public string MethodName { get; }

    /// <summary>Minimum or transition state.</summary>
    public OptimizationTarget Target { get; }

    /// <summary>The optimised geometry; when not converged, the best one seen (lowest energy for a minimum search,
    /// the last for a transition-state search).</summary>
    public Molecule Molecule { get; }

    /// <summary>Energy at <see cref="Molecule"/> in hartree.</summary>
    public double EnergyHartree { get; }

    /// <summary>Cartesian gradient at <see cref="Molecule"/> (3·N, hartree/bohr).</summary>
    public ImmutableArray<double> GradientHartreePerBohr { get; }

    /// <summary>Analytic or finite-difference gradients.</summary>
    public GradientSource GradientSource { get; }

    /// <summary>Whether the convergence criteria were met. When false, <see cref="Molecule"/> is not a stationary point.</summary>
    public bool Converged { get; }

    /// <summary>Why the optimisation stopped.</summary>
    public OptimizationStopReason StopReason { get; }

    /// <summary>Every accepted point, starting geometry first.</summary>
    public ImmutableArray<OptimizationStep> Trajectory { get; }

    /// <summary>Number of accepted points (gradient evaluations of accepted geometries).</summary>
    public int Iterations => Trajectory.Length;

    /// <summary>Number of gradient evaluations including rejected steps (and, for transition states, not the Hessian).</summary>
    public int GradientEvaluations { get; }

    /// <summary>The coordinates used, e.g. "redundant internal: 9 coordinates (3 bonds, …)".</summary>
    public string CoordinatesDescription { get; }

    /// <summary>The constraints that were held.</summary>
    public ImmutableArray<GeometryConstraint> Constraints { get; }

    /// <summary>The trajectory as multi-frame XYZ text (Å), one frame per point, each titled with step and energy.</summary>
    public string TrajectoryXyz() => XyzFormat.WriteFrames(Trajectory.Select(s =>
        s.Molecule.WithTitle(string.Create(CultureInfo.InvariantCulture, $"step {s.Iteration} E = {s.EnergyHartree:F10} Eh"))));

    /// <summary>Writes <see cref="TrajectoryXyz"/> to a file atomically.</summary>
    /// <exception cref="OrbitariumInputException">The file cannot be written.</exception>
    public void WriteTrajectory(string path) => AtomicFile.WriteAllText(path, TrajectoryXyz());

    /// <summary>Writes the final geometry as XYZ (Å) to a file atomically.</summary>
    /// <exception cref="OrbitariumInputException">The file cannot be written.</exception>
    public void WriteGeometry(string path) => AtomicFile.WriteAllText(path, Molecule.WithTitle(string.Create(CultureInfo.InvariantCulture,
        $"{MethodName} {(Converged ? "optimised" : "NOT CONVERGED")} E = {EnergyHartree:F10} Eh")).ToXyz());

    /// <inheritdoc />
    public override string ToString()
    {
        var sb = new StringBuilder();
        sb.Append(CultureInfo.InvariantCulture,
            $"{(Target == OptimizationTarget.Minimum ? "Minimisation" : "Transition-state search")} ({MethodName}, {CoordinatesDescription}): ");
        sb.Append(Converged ? "converged" : $"NOT converged ({StopReason})");
        sb.Append(CultureInfo.InvariantCulture, $" after {Iterations} points, E = {EnergyHartree:F10} Eh, {GradientSource} gradients");
        return sb.ToString();
    }
}
