namespace Orbitarium.Geometry.Optimization;

/// <summary>What kind of stationary point to look for.</summary>
public enum OptimizationTarget
{
    /// <summary>A minimum (quasi-Newton RFO steps with BFGS updates).</summary>
    Minimum,

    /// <summary>A first-order saddle point (transition state) by eigenvector following with Bofill updates.</summary>
    TransitionState,
}
