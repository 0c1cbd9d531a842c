using Orbitarium.Chemistry;

namespace Orbitarium.Geometry;

/// <summary>
/// Nuclear gradients by central finite differences of energies, for methods without an analytic gradient:
/// ∂E/∂xᵢ ≈ [E(x + h eᵢ) − E(x − h eᵢ)] / 2h, with error O(h²). The 6·N displaced energies run in parallel.
/// </summary>
/// <remarks>Common practice. The truncation error is h²/6 · ∂³E/∂xᵢ³ (about 10⁻⁶ Eₕ/bohr for h = 0.005 bohr);
/// the energy's own convergence error ε adds ε/h, so converge the energy tightly (≤ 10⁻⁹ Eₕ).</remarks>
public static class FiniteDifferenceGradient
{
    /// <summary>Default displacement h: 0.005 bohr.</summary>
    public const double DefaultStepBohr = 0.005;

    /// <summary>Computes the gradient of <paramref name="surface"/> at <paramref name="molecule"/> from energies only.</summary>
    /// <param name="surface">The surface (must be thread-safe).</param>
    /// <param name="molecule">The geometry.</param>
    /// <param name="stepBohr">Displacement h in bohr (default <see cref="DefaultStepBohr"/>); 10⁻⁴ to 0.1.</param>
    /// <param name="maxDegreeOfParallelism">Parallel evaluations (default: processor count).</param>
    /// <param name="cancellationToken">Stops the evaluations.</param>
    /// <returns>The central energy and the gradient (3·N values, hartree/bohr), marked <see cref="GradientSource.FiniteDifference"/>.</returns>
    /// <exception cref="OrbitariumInputException">The step is outside 10⁻⁴..0.1 bohr.</exception>
    public static SurfacePoint Compute(IPotentialEnergySurface surface, Molecule molecule, double stepBohr = DefaultStepBohr,
        int maxDegreeOfParallelism = -1, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(surface);
        ArgumentNullException.ThrowIfNull(molecule);
        CheckStep(stepBohr);
        int n = 3 * molecule.AtomCount;
        var x0 = molecule.PositionsBohr();
        var energies = new double[2 * n + 1];
        var dipoles = new Vector3D?[2 * n + 1];
        var options = new ParallelOptions
        {
            CancellationToken = cancellationToken,
            MaxDegreeOfParallelism = maxDegreeOfParallelism > 0 ? maxDegreeOfParallelism : Environment.ProcessorCount,
        };
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
                var p = surface.Evaluate(m, false, cancellationToken);
                energies[k] = p.EnergyHartree;
                dipoles[k] = p.DipoleAtomicUnits;
            });
        }
        catch (AggregateException e) when (e.InnerExceptions.Count > 0)
        {
            // Surface the first real failure (e.g. an SCF that did not converge) rather than the wrapper.
            System.Runtime.ExceptionServices.ExceptionDispatchInfo.Capture(e.InnerExceptions[0]).Throw();
            throw;
        }
        var g = new double[n];
        for (int i = 0; i < n; i++) g[i] = (energies[2 * i] - energies[2 * i + 1]) / (2 * stepBohr);
        return new SurfacePoint(molecule, energies[2 * n], [.. g], GradientSource.FiniteDifference, dipoles[2 * n]);
    }

    internal static void CheckStep(double stepBohr)
    {
        if (!(stepBohr >= 1e-4 && stepBohr <= 0.1))
            throw new OrbitariumInputException(FormattableString.Invariant(
                $"The finite-difference step {stepBohr} bohr is outside 0.0001..0.1 bohr; 0.005 bohr is a good default."));
    }
}
