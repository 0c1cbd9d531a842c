using Orbitarium.Scf;

namespace Orbitarium.Geometry;

/// <summary>Raised when an SCF inside a geometry task (optimisation, gradient, Hessian) does not converge, so no
/// meaningful energy exists at that geometry. The <c>calc</c> command turns it into exit code 3.</summary>
public sealed class ScfConvergenceException : Exception
{
    /// <summary>Creates the exception with a one-line message and the failed result.</summary>
    public ScfConvergenceException(string message, ScfResult result) : base(message)
    {
        Result = result;
    }

    /// <summary>The unconverged SCF result.</summary>
    public ScfResult Result { get; }
}
