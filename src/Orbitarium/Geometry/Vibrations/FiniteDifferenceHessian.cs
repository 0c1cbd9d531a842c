using MathNet.Numerics.LinearAlgebra;
using Orbitarium.Chemistry;

namespace Orbitarium.Geometry.Vibrations;

/// <summary>
/// The Cartesian Hessian by central finite differences of gradients, Hᵢⱼ = [gⱼ(x + h eᵢ) − gⱼ(x − h eᵢ)] / 2h,
/// symmetrised; dipole derivatives come from the same displaced points. The 6·N displacements run in parallel.
/// </summary>
/// <remarks>Common practice. Gradients are analytic when the surface has them, else themselves finite differences
/// (then 36·N² energies are needed: use small molecules).</remarks>
public static class FiniteDifferenceHessian
{
    /// <summary>Default displacement: 0.005 bohr.</summary>
    public const double DefaultStepBohr = 0.005;

    /// <summary>Computes the Hessian of <paramref name="surface"/> at <paramref name="molecule"/>.</summary>
    /// <param name="surface">The surface (thread-safe).</param>
    /// <param name="molecule">The geometry, normally an optimised one.</param>
    /// <param name="stepBohr">Displacement in bohr (default 0.005).</param>
    /// <param name="progress">Receives the number of displaced gradients finished.</param>
    /// <param name="cancellationToken">Stops the work.</param>
    public static CartesianHessian Compute(IPotentialEnergySurface surface, Molecule molecule, double stepBohr = DefaultStepBohr,
        IProgress<int>? progress = null, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(surface);
        ArgumentNullException.ThrowIfNull(molecule);
        if (molecule.AtomCount == 0) throw new OrbitariumInputException("The molecule has no atoms; a Hessian needs at least one atom.");
        FiniteDifferenceGradient.CheckStep(stepBohr);
        int n = 3 * molecule.AtomCount;
        var x0 = molecule.PositionsBohr();
        var points = new SurfacePoint[2 * n + 1];
        int done = 0;
        var options = new ParallelOptions { CancellationToken = cancellationToken, MaxDegreeOfParallelism = Environment.ProcessorCount };
        try
        {
            Parallel.For(0, 2 * n + 1, options, k =>
            {
                var m = molecule;
                if (k < 2 * n)
                {
                    var x = (double[])x0.Clone();
                    x[k / 2] += (k % 2 == 0 ? 1 : -1) * stepBohr;
                    m = molecule.WithPositionsBohr(x);
                }
                points[k] = surface.EvaluateWithGradient(m, stepBohr, cancellationToken);
                progress?.Report(Interlocked.Increment(ref done));
            });
        }
        catch (AggregateException e) when (e.InnerExceptions.Count > 0)
        {
            // Surface the first real failure (e.g. an SCF that did not converge) rather than the wrapper.
            System.Runtime.ExceptionServices.ExceptionDispatchInfo.Capture(e.InnerExceptions[0]).Throw();
            throw;
        }
        var h = Matrix<double>.Build.Dense(n, n);
        for (int i = 0; i < n; i++)
            for (int j = 0; j < n; j++)
                h[i, j] = (points[2 * i].GradientHartreePerBohr[j] - points[2 * i + 1].GradientHartreePerBohr[j]) / (2 * stepBohr);
        h = 0.5 * (h + h.Transpose());
        Matrix<double>? dmu = null;
        bool allDipoles = true;
        foreach (var p in points) allDipoles &= p.DipoleAtomicUnits.HasValue;
        if (allDipoles)
        {
            dmu = Matrix<double>.Build.Dense(3, n);
            for (int i = 0; i < n; i++)
            {
                var d = (points[2 * i].DipoleAtomicUnits!.Value - points[2 * i + 1].DipoleAtomicUnits!.Value) / (2 * stepBohr);
                dmu[0, i] = d.X; dmu[1, i] = d.Y; dmu[2, i] = d.Z;
            }
        }
        var centre = points[2 * n];
        return new CartesianHessian(molecule, centre.EnergyHartree, centre.GradientHartreePerBohr, h, dmu, centre.GradientSource, stepBohr);
    }
}
