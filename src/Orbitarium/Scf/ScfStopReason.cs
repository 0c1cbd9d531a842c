namespace Orbitarium.Scf;

/// <summary>Why the self-consistent-field iterations stopped.</summary>
public enum ScfStopReason
{
    /// <summary>Both the energy change and the largest element of the orbital gradient (FDS − SDF) fell below their thresholds.</summary>
    Converged,

    /// <summary>The iteration limit was reached before convergence; the result holds the last energy and is flagged not converged.</summary>
    MaximumIterationsReached,

    /// <summary>The energy became NaN or infinite (numerical breakdown); the result is flagged not converged.</summary>
    NumericalBreakdown,
}
