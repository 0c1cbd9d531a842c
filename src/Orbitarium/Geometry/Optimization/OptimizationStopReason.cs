namespace Orbitarium.Geometry.Optimization;

/// <summary>Why an optimisation stopped.</summary>
public enum OptimizationStopReason
{
    /// <summary>All four criteria (max/RMS force, max/RMS step) were met, or the forces were 100 times below their limits.</summary>
    Converged,

    /// <summary>A single atom (or no free coordinate): there is nothing to optimise.</summary>
    NothingToOptimize,

    /// <summary>The iteration limit was reached first; the result holds the best geometry, not a stationary point.</summary>
    IterationLimit,

    /// <summary>Repeated rejected steps shrank the trust radius below its minimum.</summary>
    TrustRadiusCollapsed,
}
