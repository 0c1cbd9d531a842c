using Orbitarium.Chemistry;

namespace Orbitarium.Geometry;

/// <summary>
/// A potential-energy surface: the energy (and, when the method has one, the analytic nuclear gradient) of a
/// molecule at any geometry. Optimisation, frequencies and scans work against this contract, so any method that
/// returns an energy can be optimised (the gradient is then taken by finite differences and reported as such).
/// </summary>
/// <remarks>Implementations must be safe to call from several threads at once: finite-difference gradients and
/// Hessians evaluate displaced geometries in parallel.</remarks>
public interface IPotentialEnergySurface
{
    /// <summary>A short name of the method, e.g. "RHF/STO-3G"; shown in results.</summary>
    string MethodName { get; }

    /// <summary>Whether <see cref="Evaluate"/> can return an analytic gradient. When false, callers fall back to
    /// <see cref="FiniteDifferenceGradient"/>.</summary>
    bool HasAnalyticGradient { get; }

    /// <summary>Evaluates the surface at a geometry.</summary>
    /// <param name="molecule">The geometry (same atoms in the same order at every call).</param>
    /// <param name="withGradient">Whether the analytic gradient is wanted (ignored when
    /// <see cref="HasAnalyticGradient"/> is false).</param>
    /// <param name="cancellationToken">Stops the evaluation.</param>
    /// <returns>The energy in hartree, the gradient when asked for and available, and the dipole when known.</returns>
    SurfacePoint Evaluate(Molecule molecule, bool withGradient, CancellationToken cancellationToken = default);
}
