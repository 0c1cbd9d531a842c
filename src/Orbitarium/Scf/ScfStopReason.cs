namespace Orbitarium.Scf;

/// <summary>Why the self-consistent-field iterations stopped.</summary>
public enum ScfStopReason
{
    /// <summary>Both the energy change and the largest element of the orbital gradient (FDS − SDF) fell below their thresholds.</summary>
    Converged,

    /// <summary>Kohn–Sham only: the energy changed by less than <see cref="ScfOptions.GridLimitedEnergyChangeHartree"/> in
    /// each of the last <see cref="ScfOptions.QuietIterationsForGridLimit"/> iterations, the orbital gradient stopped falling while the orbital gradient stayed between
    /// <see cref="ScfOptions.CommutatorThreshold"/> and <see cref="ScfOptions.GridLimitedCommutatorThreshold"/>. The
    /// residual gradient lies along orbital rotations that only the quadrature grid tells apart (for instance the
    /// orientation of the half-filled p shell of an open-shell atom), which the SCF cannot resolve; the energy is
    /// converged and <see cref="ScfResult.Converged"/> is true.</summary>
    ConvergedGridLimited,

    /// <summary>The iteration limit was reached before convergence; the result holds the last energy and is flagged not converged.</summary>
    MaximumIterationsReached,

    /// <summary>The energy became NaN or infinite (numerical breakdown); the result is flagged not converged.</summary>
    NumericalBreakdown,
}
