namespace Orbitarium.Correlation;

/// <summary>
/// Coupled-cluster singles and doubles with DIIS-accelerated amplitude iterations, for RHF and UHF references;
/// <see cref="ComputeWithTriples"/> adds the perturbative triples (T).
/// </summary>
/// <remarks>
/// A closed-shell restricted reference runs the spin-adapted equations over spatial orbitals (T1-dressed integrals;
/// Helgaker, Jørgensen and Olsen, <i>Molecular Electronic-Structure Theory</i>, §13.7.5) and the closed-shell (T)
/// (Rendell, Lee and Komornicki 1991): memory m⁴ doubles for m orbitals, cost O(o²v⁴) per iteration in matrix
/// products. A UHF reference (or <see cref="ComputeSpinOrbital"/>) runs the spin-orbital equations and intermediates
/// of J. F. Stanton, J. Gauss, J. D. Watts and R. J. Bartlett, J. Chem. Phys. 94, 4334 (1991): memory (2m)⁴, 16
/// times more. Both rebuild the Fock matrix from the integrals (off-diagonal elements kept) and start from first-order
/// (MP2) amplitudes.
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

    /// <summary>Runs CCSD, or CCSD(T) when <paramref name="withTriples"/> is set, in the spin-orbital formulation
    /// whatever the reference: the route UHF references take, and a cross-check of the closed-shell equations.</summary>
    /// <param name="hamiltonian">MO Hamiltonian of an RHF or UHF reference.</param>
    /// <param name="withTriples">Add the (T) correction.</param>
    /// <param name="options">Thresholds, iteration limit, DIIS size, frozen core, memory budget.</param>
    /// <param name="progress">Receives (iteration, correlation energy, RMS amplitude change).</param>
    /// <param name="cancellationToken">Stops the calculation.</param>
    public static CoupledClusterResult ComputeSpinOrbital(MolecularOrbitalHamiltonian hamiltonian, bool withTriples = false,
        CorrelationOptions? options = null, IProgress<CorrelationProgress>? progress = null, CancellationToken cancellationToken = default) =>
        Run(hamiltonian, options, withTriples, progress, cancellationToken, forceSpinOrbital: true);

    /// <summary>The number of 8-byte numbers a CCSD run needs beyond the MO Hamiltonian: closed-shell (spatial)
    /// equations for a closed-shell restricted reference, with a copy of the integrals unless the solver may dress
    /// the Hamiltonian's own; spin-orbital ones otherwise.</summary>
    internal static double EstimateDoubles(bool closedShell, int orbitals, int frozenCore, int alphaOccupied, int betaOccupied, int diis,
        bool copiesIntegrals = true) =>
        closedShell
            ? (copiesIntegrals ? Math.Pow(orbitals, 4) : 0) + ClosedShellCcsdSolver.WorkingDoubles(orbitals - frozenCore, alphaOccupied - frozenCore, diis)
            : EstimateDoubles(2 * (orbitals - frozenCore), alphaOccupied + betaOccupied - 2 * frozenCore, diis);

    /// <summary>CCSD or CCSD(T) on a Hamiltonian built for this call alone: a closed-shell run dresses its integrals in
    /// place (restoring them before it returns) instead of copying them.</summary>
    internal static CoupledClusterResult ComputeOnPrivateHamiltonian(MolecularOrbitalHamiltonian hamiltonian, bool withTriples,
        CorrelationOptions? options, IProgress<CorrelationProgress>? progress, CancellationToken cancellationToken) =>
        Run(hamiltonian, options, withTriples, progress, cancellationToken, privateHamiltonian: true);

    /// <summary>The number of 8-byte numbers a spin-orbital CCSD run on the given sizes needs (spin orbitals n, occupied o).</summary>
    internal static double EstimateDoubles(int n, int o, int diis)
    {
        double v = n - o;
        double amplitudes = o * (double)o * v * v + o * v;
        return SpinOrbitalSystem.Doubles(n) + (2.0 * diis + 8) * amplitudes + (double)o * o * o * o + (double)o * o * o * v;
    }

    private static CoupledClusterResult Run(MolecularOrbitalHamiltonian hamiltonian, CorrelationOptions? options, bool withTriples,
        IProgress<CorrelationProgress>? progress, CancellationToken ct, bool forceSpinOrbital = false, bool privateHamiltonian = false)
    {
        ArgumentNullException.ThrowIfNull(hamiltonian);
        options ??= CorrelationOptions.Default;
        string method = withTriples ? "CCSD(T)" : "CCSD";
        if (hamiltonian.IsRestricted && !hamiltonian.IsClosedShell)
            throw new OrbitariumInputException(
                $"{method} needs a closed-shell RHF or a UHF reference, but this restricted reference has {hamiltonian.AlphaOccupiedCount} α and {hamiltonian.BetaOccupiedCount} β electrons: run a UHF reference (RunUhf) for an open shell.");
        int nf = Mp2.CheckFrozenCore(options.FrozenCoreOrbitals, hamiltonian.AlphaOccupiedCount, hamiltonian.BetaOccupiedCount);
        bool closedShell = hamiltonian.IsClosedShell && !forceSpinOrbital;
        MemoryEstimate.Require(method, EstimateDoubles(closedShell, hamiltonian.OrbitalCount, nf, hamiltonian.AlphaOccupiedCount,
                hamiltonian.BetaOccupiedCount, options.DiisVectors, copiesIntegrals: !privateHamiltonian), options,
            "use a smaller basis, freeze core orbitals (WithFrozenCore), or raise the budget (WithMemoryBudgetMebibytes).");
        CcsdAmplitudeSolver.Outcome r;
        double referenceEnergy = hamiltonian.ReferenceEnergyHartree;
        double? triples = null;
        if (closedShell)
        {
            var solver = new ClosedShellCcsdSolver(hamiltonian, nf, dressInPlace: privateHamiltonian, ct);
            r = solver.Solve(options, progress, ct);
            if (withTriples) triples = ClosedShellTriples.Energy(solver, ct);
        }
        else
        {
            var system = SpinOrbitalSystem.Build(hamiltonian, nf, ct);
            var solver = new CcsdAmplitudeSolver(system);
            r = solver.Solve(options, progress, ct);
            referenceEnergy = system.ReferenceEnergyHartree;
            if (withTriples) triples = PerturbativeTriples.Energy(system, solver.T1, solver.T2, ct);
        }
        string kind = hamiltonian.IsRestricted ? "RHF" : "UHF";
        return new CoupledClusterResult(kind, referenceEnergy, r.Energy, triples, r.Mp2Energy, r.Iterations, r.Converged,
            r.StopReason, [.. r.EnergyHistory], [.. r.ResidualHistory], r.T1Diagnostic, nf);
    }
}
