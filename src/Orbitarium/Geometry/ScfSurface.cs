using Orbitarium.Analysis;
using Orbitarium.Chemistry;
using Orbitarium.Geometry.Gradients;
using Orbitarium.Scf;

namespace Orbitarium.Geometry;

/// <summary>
/// A Hartree–Fock or Kohn–Sham calculation as a potential-energy surface: each geometry runs an SCF (started from the
/// orbitals of the last converged point), returns its energy, its dipole (about the origin), and for RHF/UHF the
/// analytic gradient (<see cref="HartreeFockGradient"/>), for RKS/UKS with a grid functional the analytic gradient of
/// <see cref="KohnShamGradient"/> (grid-weight derivatives neglected; see there for the measured error); ROHF reports
/// finite-difference gradients.
/// </summary>
public sealed class ScfSurface : IPotentialEnergySurface
{
    private readonly Calculation _calculation;
    private readonly object _gate = new();
    private ScfResult? _seed;

    /// <summary>The surface of <paramref name="calculation"/> (basis set and SCF options) with reference <paramref name="reference"/>.</summary>
    public ScfSurface(Calculation calculation, ScfReference reference)
    {
        ArgumentNullException.ThrowIfNull(calculation);
        _calculation = calculation;
        Reference = reference;
        string prefix = reference switch { ScfReference.Restricted => "R", ScfReference.Unrestricted => "U", _ => "RO" };
        string method = calculation.Options.ExchangeCorrelation is { } xc ? $"{prefix}KS/{xc.Name}" : $"{prefix}HF";
        MethodName = $"{method}/{calculation.Basis.Name}";
    }

    /// <summary>The reference determinant (restricted, unrestricted, restricted open-shell).</summary>
    public ScfReference Reference { get; }

    /// <inheritdoc />
    public string MethodName { get; }

    /// <inheritdoc />
    public bool HasAnalyticGradient =>
        _calculation.Options.ExchangeCorrelation is null or Dft.GridExchangeCorrelation && Reference is ScfReference.Restricted or ScfReference.Unrestricted;

    /// <summary>The SCF result of the most recent geometry evaluated with a gradient (null before the first).</summary>
    public ScfResult? LastResult { get; private set; }

    /// <inheritdoc />
    /// <exception cref="ScfConvergenceException">The SCF did not converge at this geometry.</exception>
    public SurfacePoint Evaluate(Molecule molecule, bool withGradient, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(molecule);
        ScfResult? seed;
        lock (_gate) seed = _seed;
        var calc = _calculation.WithMolecule(molecule);
        if (seed is not null) calc = calc.WithOptions(calc.Options.WithInitialOrbitals(seed));
        var result = calc.Run(Reference, null, cancellationToken);
        if (!result.Converged && seed is not null)
            result = _calculation.WithMolecule(molecule).Run(Reference, null, cancellationToken); // retry from the default guess
        if (!result.Converged)
            throw new ScfConvergenceException($"The {MethodName} SCF did not converge in {result.Iterations} iterations at a geometry of the " +
                                              "optimisation; raise the SCF iteration limit or start from a more sensible geometry.", result);
        var dipole = MultipoleMoments.Compute(result, Vector3D.Zero).DipoleAtomicUnits;
        if (withGradient && HasAnalyticGradient)
        {
            var g = KohnShamGradient.IsAvailable(result) ? KohnShamGradient.Compute(result, cancellationToken) : HartreeFockGradient.Compute(result, cancellationToken);
            lock (_gate) { _seed = result; LastResult = result; }
            return new SurfacePoint(molecule, result.TotalEnergyHartree, [.. g], GradientSource.Analytic, dipole);
        }
        lock (_gate) _seed ??= result;
        return SurfacePoint.EnergyOnly(molecule, result.TotalEnergyHartree, dipole);
    }
}
