using Orbitarium.Chemistry;
using Orbitarium.Geometry;
using Orbitarium.Geometry.Gradients;
using Orbitarium.Scf;

namespace Orbitarium.Shell.Calc;

/// <summary>Any <c>calc</c> method as a potential-energy surface for <c>--task optimize|frequencies</c>: the method runs
/// at each geometry (its SCF started from the last converged orbitals); when the method's energy is a Hartree–Fock
/// RHF/UHF energy or a Kohn–Sham (RKS/UKS) energy the analytic gradient is used, otherwise the geometry code takes finite differences.</summary>
internal sealed class CalcMethodSurface(ICalcMethod method, CalcRequest template) : IPotentialEnergySurface
{
    private readonly object _gate = new();
    private ScfResult? _seed;

    /// <inheritdoc />
    public string MethodName => $"{method.Names[0].ToUpperInvariant()}/{template.BasisName}";

    /// <inheritdoc />
    public bool HasAnalyticGradient =>
        (method.Names[0] is "rhf" or "uhf" && template.Calculation.Options.ExchangeCorrelation is null) || method is KohnShamCalcMethod;

    /// <summary>Runs the method at <paramref name="molecule"/> and returns the request and outcome (used for the final report).</summary>
    public (CalcRequest Request, CalcOutcome Outcome) Run(Molecule molecule, CancellationToken cancellationToken)
    {
        ScfResult? seed;
        lock (_gate) seed = _seed;
        var calc = template.Calculation.WithMolecule(molecule);
        if (seed is not null) calc = calc.WithOptions(calc.Options.WithInitialOrbitals(seed));
        var request = new CalcRequest
        {
            Molecule = molecule,
            BasisName = template.BasisName,
            MethodName = template.MethodName,
            Calculation = calc,
            Timings = new CalcTimings(),
            ParseResult = template.ParseResult,
        };
        var outcome = method.Run(request, cancellationToken);
        if (!outcome.Converged)
            throw new ScfConvergenceException(outcome.FailureMessage ?? $"{MethodName} did not converge at a displaced geometry.", outcome.Scf);
        lock (_gate) _seed = outcome.Scf;
        return (request, outcome);
    }

    /// <inheritdoc />
    public SurfacePoint Evaluate(Molecule molecule, bool withGradient, CancellationToken cancellationToken = default)
    {
        var (_, outcome) = Run(molecule, cancellationToken);
        var dipole = Orbitarium.Analysis.MultipoleMoments.Compute(outcome.Scf, Vector3D.Zero).DipoleAtomicUnits;
        bool energyIsScf = outcome.TotalEnergyHartree == outcome.Scf.TotalEnergyHartree;
        if (withGradient && HasAnalyticGradient && energyIsScf && HartreeFockGradient.IsAvailable(outcome.Scf))
            return new SurfacePoint(molecule, outcome.TotalEnergyHartree, [.. HartreeFockGradient.Compute(outcome.Scf, cancellationToken)],
                GradientSource.Analytic, dipole);
        if (withGradient && HasAnalyticGradient && energyIsScf && KohnShamGradient.IsAvailable(outcome.Scf))
            return new SurfacePoint(molecule, outcome.TotalEnergyHartree, [.. KohnShamGradient.Compute(outcome.Scf, cancellationToken)],
                GradientSource.Analytic, dipole);
        return SurfacePoint.EnergyOnly(molecule, outcome.TotalEnergyHartree, dipole);
    }
}
