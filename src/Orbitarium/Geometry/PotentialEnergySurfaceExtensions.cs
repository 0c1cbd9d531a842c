using Orbitarium.Chemistry;

namespace Orbitarium.Geometry;

/// <summary>Fluent helpers on <see cref="IPotentialEnergySurface"/>.</summary>
public static class PotentialEnergySurfaceExtensions
{
    /// <summary>Evaluates energy and gradient: the analytic gradient when the surface has one, otherwise central finite
    /// differences (the result's <see cref="SurfacePoint.GradientSource"/> says which).</summary>
    /// <param name="surface">The surface.</param>
    /// <param name="molecule">The geometry.</param>
    /// <param name="finiteDifferenceStepBohr">Step for the fallback, bohr (default 0.005).</param>
    /// <param name="cancellationToken">Stops the evaluation.</param>
    public static SurfacePoint EvaluateWithGradient(this IPotentialEnergySurface surface, Molecule molecule,
        double finiteDifferenceStepBohr = FiniteDifferenceGradient.DefaultStepBohr, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(surface);
        ArgumentNullException.ThrowIfNull(molecule);
        if (molecule.AtomCount == 0)
            throw new OrbitariumInputException("The molecule has no atoms; add atoms before asking for a gradient.");
        if (surface.HasAnalyticGradient)
        {
            var p = surface.Evaluate(molecule, true, cancellationToken);
            if (p.HasGradient) return p;
        }
        return FiniteDifferenceGradient.Compute(surface, molecule, finiteDifferenceStepBohr, cancellationToken: cancellationToken);
    }
}
