namespace Orbitarium.Correlation;

/// <summary>
/// Coupled-cluster singles and doubles in the spin-orbital formulation, with DIIS-accelerated amplitude iterations,
/// for RHF and UHF references; <see cref="ComputeWithTriples"/> adds the perturbative triples (T).
/// </summary>
/// <remarks>
/// Equations and intermediates of J. F. Stanton, J. Gauss, J. D. Watts and R. J. Bartlett, J. Chem. Phys. 94, 4334
/// (1991), with the Fock matrix rebuilt from the integrals (off-diagonal elements kept). The W_abef contraction is
/// factorised so no v⁴ intermediate is stored. Starting amplitudes are first order (MP2). Cost O(o²v⁴) per iteration,
/// memory dominated by the spin-orbital integrals (2m)⁴ doubles for m spatial orbitals.
/// </remarks>
public static class Ccsd
{
    /// <summary>Runs CCSD on the reference described by <paramref name="hamiltonian"/>.</summary>
    /// <param name="hamiltonian">MO Hamiltonian of an RHF or UHF reference.</param>
    /// <param name="options">Thresholds, iteration limit, DIIS size, frozen core, memory budget.</param>
    /// <param name="progress">Receives (iteration, correlation energy, RMS amplitude change) after each iteration.</param>
    /// <param name="cancellationToken">Stops the iterations.</param>
    public static CoupledClusterResult Compute(MolecularOrbitalHamiltonian hamiltonian, CorrelationOptions? options = null,
        IProgress<CorrelationProgress>? progress = null, CancellationToken cancellationToken = default) =>
        Run(hamiltonian, options, withTriples: false, progress, cancellationToken);

    /// <summary>Runs CCSD followed by the perturbative triples correction (T).</summary>
    /// <param name="hamiltonian">MO Hamiltonian of an RHF or UHF reference.</param>
    /// <param name="options">Thresholds, iteration limit, DIIS size, frozen core, memory budget.</param>
    /// <param name="progress">Receives (iteration, correlation energy, RMS amplitude change).</param>
    /// <param name="cancellationToken">Stops the calculation.</param>
    public static CoupledClusterResult ComputeWithTriples(MolecularOrbitalHamiltonian hamiltonian, CorrelationOptions? options = null,
        IProgress<CorrelationProgress>? progress = null, CancellationToken cancellationToken = default) =>
        Run(hamiltonian, options, withTriples: true, progress, cancellationToken);

    /// <summary>The number of 8-byte numbers a CCSD run on the given sizes needs (spin orbitals n, occupied o).</summary>
    internal static double EstimateDoubles(int n, int o, int diis)
    {
        double v = n - o;
        double amplitudes = o * (double)o * v * v + o * v;
        return SpinOrbitalSystem.Doubles(n) + (2.0 * diis + 8) * amplitudes + (double)o * o * o * o + (double)o * o * o * v;
    }

    private static CoupledClusterResult Run(MolecularOrbitalHamiltonian hamiltonian, CorrelationOptions? options, bool withTriples,
        IProgress<CorrelationProgress>? progress, CancellationToken ct)
    {
        ArgumentNullException.ThrowIfNull(hamiltonian);
        options ??= CorrelationOptions.Default;
        string method = withTriples ? "CCSD(T)" : "CCSD";
        if (hamiltonian.IsRestricted && !hamiltonian.IsClosedShell)
            throw new OrbitariumInputException(
                $"{method} needs a closed-shell RHF or a UHF reference, but this restricted reference has {hamiltonian.AlphaOccupiedCount} α and {hamiltonian.BetaOccupiedCount} β electrons: run a UHF reference (RunUhf) for an open shell.");
        int nf = Mp2.CheckFrozenCore(options.FrozenCoreOrbitals, hamiltonian.AlphaOccupiedCount, hamiltonian.BetaOccupiedCount);
        int n = 2 * (hamiltonian.OrbitalCount - nf);
        int o = hamiltonian.AlphaOccupiedCount + hamiltonian.BetaOccupiedCount - 2 * nf;
        MemoryEstimate.Require(method, EstimateDoubles(n, o, options.DiisVectors), options,
            "use a smaller basis, freeze core orbitals (WithFrozenCore), or raise the budget (WithMemoryBudgetMebibytes).");
        var system = SpinOrbitalSystem.Build(hamiltonian, nf, ct);
        var solver = new CcsdAmplitudeSolver(system);
        var r = solver.Solve(options, progress, ct);
        double? triples = null;
        if (withTriples)
            triples = PerturbativeTriples.Energy(system, solver.T1, solver.T2, ct);
        string kind = hamiltonian.IsRestricted ? "RHF" : "UHF";
        return new CoupledClusterResult(kind, system.ReferenceEnergyHartree, r.Energy, triples, r.Mp2Energy, r.Iterations, r.Converged,
            r.StopReason, [.. r.EnergyHistory], [.. r.ResidualHistory], r.T1Diagnostic, nf);
    }
}
