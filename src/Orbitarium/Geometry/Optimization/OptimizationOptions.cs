using System.Collections.Immutable;

namespace Orbitarium.Geometry.Optimization;

/// <summary>
/// Settings of a geometry optimisation. Immutable; the <c>With…</c> methods return changed copies.
/// </summary>
/// <remarks>The default thresholds (max force 4.5×10⁻⁴, RMS force 3×10⁻⁴ Eₕ/bohr or Eₕ/rad; max step 1.8×10⁻³,
/// RMS step 1.2×10⁻³ bohr or rad) are common practice for "normal" convergence.</remarks>
public sealed record OptimizationOptions
{
    /// <summary>Default settings.</summary>
    public static OptimizationOptions Default { get; } = new();

    /// <summary>Tight settings (forces 1.5×10⁻⁵ / 1×10⁻⁵, steps 6×10⁻⁵ / 4×10⁻⁵; common practice) for frequencies and
    /// reference comparisons.</summary>
    public static OptimizationOptions Tight { get; } = new()
    {
        MaxForce = 1.5e-5, RmsForce = 1.0e-5, MaxStep = 6.0e-5, RmsStep = 4.0e-5,
    };

    /// <summary>Largest number of gradient evaluations (default 100).</summary>
    public int MaxIterations { get; init; } = 100;

    /// <summary>Convergence limit on the largest force component (default 4.5×10⁻⁴ Eₕ/bohr or Eₕ/rad).</summary>
    public double MaxForce { get; init; } = 4.5e-4;

    /// <summary>Convergence limit on the RMS force (default 3.0×10⁻⁴).</summary>
    public double RmsForce { get; init; } = 3.0e-4;

    /// <summary>Convergence limit on the largest step component (default 1.8×10⁻³ bohr or rad).</summary>
    public double MaxStep { get; init; } = 1.8e-3;

    /// <summary>Convergence limit on the RMS step (default 1.2×10⁻³).</summary>
    public double RmsStep { get; init; } = 1.2e-3;

    /// <summary>Starting trust radius (default 0.3 bohr/rad).</summary>
    public double InitialTrustRadius { get; init; } = 0.3;

    /// <summary>Largest trust radius (default 1.0).</summary>
    public double MaxTrustRadius { get; init; } = 1.0;

    /// <summary>Smallest trust radius before giving up (default 10⁻⁵).</summary>
    public double MinTrustRadius { get; init; } = 1e-5;

    /// <summary>Coordinates to step in (default redundant internal).</summary>
    public OptimizationCoordinates Coordinates { get; init; } = OptimizationCoordinates.RedundantInternal;

    /// <summary>Minimum (default) or transition state.</summary>
    public OptimizationTarget Target { get; init; } = OptimizationTarget.Minimum;

    /// <summary>Constraints held during the optimisation (default none).</summary>
    public ImmutableArray<GeometryConstraint> Constraints { get; init; } = [];

    /// <summary>Finite-difference step (bohr) for gradients of methods without analytic ones and for the starting
    /// Hessian of a transition-state search (default 0.005).</summary>
    public double FiniteDifferenceStepBohr { get; init; } = FiniteDifferenceGradient.DefaultStepBohr;

    /// <summary>Copy with another iteration limit.</summary>
    public OptimizationOptions WithMaxIterations(int maxIterations) => this with { MaxIterations = maxIterations };

    /// <summary>Copy with other force and step limits.</summary>
    public OptimizationOptions WithThresholds(double maxForce, double rmsForce, double maxStep, double rmsStep) =>
        this with { MaxForce = maxForce, RmsForce = rmsForce, MaxStep = maxStep, RmsStep = rmsStep };

    /// <summary>Copy stepping in other coordinates.</summary>
    public OptimizationOptions WithCoordinates(OptimizationCoordinates coordinates) => this with { Coordinates = coordinates };

    /// <summary>Copy searching for a transition state (eigenvector following) instead of a minimum.</summary>
    public OptimizationOptions ForTransitionState() => this with { Target = OptimizationTarget.TransitionState };

    /// <summary>Copy with one more constraint.</summary>
    public OptimizationOptions WithConstraint(GeometryConstraint constraint)
    {
        ArgumentNullException.ThrowIfNull(constraint);
        return this with { Constraints = Constraints.Add(constraint) };
    }

    /// <summary>Copy with another starting trust radius.</summary>
    public OptimizationOptions WithTrustRadius(double initialTrustRadius) => this with { InitialTrustRadius = initialTrustRadius };

    internal void Validate()
    {
        if (MaxIterations < 1)
            throw new OrbitariumInputException($"The iteration limit must be at least 1, got {MaxIterations}.");
        if (!(MaxForce > 0 && RmsForce > 0 && MaxStep > 0 && RmsStep > 0))
            throw new OrbitariumInputException("Convergence thresholds must be positive numbers (hartree/bohr for forces, bohr for steps).");
        if (!(InitialTrustRadius > 0 && MaxTrustRadius >= InitialTrustRadius && MinTrustRadius > 0 && MinTrustRadius < InitialTrustRadius))
            throw new OrbitariumInputException("Trust radii must satisfy 0 < minimum < initial ≤ maximum (bohr or rad); the defaults are 1e-5, 0.3 and 1.0.");
        FiniteDifferenceGradient.CheckStep(FiniteDifferenceStepBohr);
    }
}
