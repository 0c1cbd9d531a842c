namespace Orbitarium.Correlation;

/// <summary>
/// Equation-of-motion CCSD excitation energies (EOM-EE-CCSD): singlets of a closed-shell RHF reference in the
/// spin-adapted equations (<see cref="Singlets"/>), triplets of a closed shell and the states of a UHF reference in
/// the spin-orbital ones (<see cref="Triplets"/>, <see cref="Unrestricted"/>). Each is the set of lowest eigenvalues
/// of the CCSD Jacobian, found by Davidson iterations on its right eigenvectors.
/// </summary>
/// <remarks>
/// J. F. Stanton and R. J. Bartlett, J. Chem. Phys. 98, 7029 (1993); the eigenvalues equal those of CCSD linear
/// response (H. Koch and P. Jørgensen, J. Chem. Phys. 93, 3333 (1990)). The Jacobian products come from the
/// closed-shell CCSD residual along the trial vector (<see cref="ClosedShellCcsdSolver.JacobianTimes"/>: an exact
/// stencil, since the residual is a polynomial of degree four), each costing four CCSD residual evaluations. Because
/// the spin-adapted residual is the αβ block of the spin-orbital one, the Jacobian restricted to the symmetric
/// amplitudes x_ij^ab = x_ji^ba is the spin-orbital Jacobian on the singlet space, and its eigenvalues are the singlet
/// EOM-CCSD excitation energies. Oscillator strengths need the left eigenvectors and are not computed.
/// </remarks>
public static class EomCcsd
{
    /// <summary>Runs CCSD, then finds the lowest <paramref name="states"/> singlet excitation energies.</summary>
    /// <param name="hamiltonian">MO Hamiltonian of a closed-shell RHF reference.</param>
    /// <param name="states">Number of excited states (default 5).</param>
    /// <param name="options">Thresholds (CCSD and Davidson), iterations, DIIS, frozen core, memory budget.</param>
    /// <param name="progress">Receives the CCSD iterations, then (iteration, lowest excitation energy, largest residual).</param>
    /// <param name="cancellationToken">Stops the calculation.</param>
    public static ExcitedStatesResult Singlets(MolecularOrbitalHamiltonian hamiltonian, int states = 5, CorrelationOptions? options = null,
        IProgress<CorrelationProgress>? progress = null, CancellationToken cancellationToken = default) =>
        Run(hamiltonian, states, options, progress, cancellationToken, privateHamiltonian: false);

    /// <summary>Runs CCSD, then finds the lowest <paramref name="states"/> triplet excitation energies of a closed
    /// shell (spin-orbital equations, memory (2m)⁴).</summary>
    /// <param name="hamiltonian">MO Hamiltonian of a closed-shell RHF reference.</param>
    /// <param name="states">Number of excited states (default 5).</param>
    /// <param name="options">Thresholds, iterations, DIIS, frozen core, memory budget.</param>
    /// <param name="progress">Receives the CCSD iterations, then the eigenvalue iterations.</param>
    /// <param name="cancellationToken">Stops the calculation.</param>
    public static ExcitedStatesResult Triplets(MolecularOrbitalHamiltonian hamiltonian, int states = 5, CorrelationOptions? options = null,
        IProgress<CorrelationProgress>? progress = null, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(hamiltonian);
        if (hamiltonian.AlphaOccupiedCount != hamiltonian.BetaOccupiedCount || hamiltonian.IsRestricted != true)
            throw new OrbitariumInputException("EOM-CCSD triplets are defined here for a closed-shell RHF reference; for an open shell run a UHF reference and EomCcsd.Unrestricted.");
        CheckStates(states);
        return SpinOrbitalEom.Run(hamiltonian, states, tripletsOfClosedShell: true, options ?? CorrelationOptions.Default, progress, cancellationToken);
    }

    /// <summary>Runs CCSD, then finds the lowest <paramref name="states"/> S_z-conserving excitation energies of a UHF
    /// (or any) reference in the spin-orbital equations: for an open shell, its excited doublets, quartets, … together.</summary>
    /// <param name="hamiltonian">MO Hamiltonian of a UHF (or RHF) reference.</param>
    /// <param name="states">Number of excited states (default 5).</param>
    /// <param name="options">Thresholds, iterations, DIIS, frozen core, memory budget.</param>
    /// <param name="progress">Receives the CCSD iterations, then the eigenvalue iterations.</param>
    /// <param name="cancellationToken">Stops the calculation.</param>
    public static ExcitedStatesResult Unrestricted(MolecularOrbitalHamiltonian hamiltonian, int states = 5, CorrelationOptions? options = null,
        IProgress<CorrelationProgress>? progress = null, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(hamiltonian);
        CheckStates(states);
        return SpinOrbitalEom.Run(hamiltonian, states, tripletsOfClosedShell: false, options ?? CorrelationOptions.Default, progress, cancellationToken);
    }

    private static void CheckStates(int states)
    {
        if (states < 1) throw new OrbitariumInputException($"Ask for at least one excited state, got {states}.");
    }

    /// <summary>Numbers the Davidson subspace keeps for <paramref name="states"/> roots of a problem of the given
    /// size: up to max(8·states, 24) vectors and as many products, plus a few work vectors.</summary>
    internal static double SubspaceDoubles(int states, double dimension) => (2.0 * Math.Max(8 * states, 24) + 6) * dimension;

    /// <summary>Refuses a problem with nothing to excite.</summary>
    internal static void RequireExcitations(int occupied, int virtuals)
    {
        if (occupied == 0 || virtuals == 0)
            throw new OrbitariumInputException("EOM-CCSD needs occupied and virtual orbitals to excite between; this system has none to excite.");
    }

    /// <summary>Refuses unconverged CCSD amplitudes: the Jacobian is only meaningful at the CCSD solution.</summary>
    internal static void RequireConverged(CcsdAmplitudeSolver.Outcome ground)
    {
        if (!ground.Converged)
            throw new OrbitariumInputException($"EOM-CCSD needs converged CCSD amplitudes, but CCSD stopped: {ground.StopReason}. Give CCSD more iterations (WithMaxIterations).");
    }

    /// <summary>The Davidson iterations on a Jacobian: residual threshold no tighter than 1e-6 (the eigenvalue
    /// converges quadratically in it), refused when not converged.</summary>
    internal static DavidsonResult Diagonalise(int dimension, double[] diagonal, Action<double[], double[]> multiply, int states,
        Action<double[]> project, CorrelationOptions options, IProgress<CorrelationProgress>? progress, CancellationToken ct)
    {
        var davidson = DavidsonSolver.SolveNonSymmetric(dimension, diagonal, multiply, states, project,
            options.WithThresholds(options.EnergyThresholdHartree, Math.Max(options.ResidualThreshold, 1e-6)), progress, ct, "EOM-CCSD");
        if (!davidson.Converged)
            throw new OrbitariumInputException($"The EOM-CCSD eigenvalue iterations did not converge ({davidson.StopReason}): ask for fewer states or more iterations (WithMaxIterations).");
        return davidson;
    }

    internal static ExcitedStatesResult Run(MolecularOrbitalHamiltonian hamiltonian, int states, CorrelationOptions? options,
        IProgress<CorrelationProgress>? progress, CancellationToken ct, bool privateHamiltonian)
    {
        ArgumentNullException.ThrowIfNull(hamiltonian);
        options ??= CorrelationOptions.Default;
        if (!hamiltonian.IsClosedShell)
            throw new OrbitariumInputException(
                "EOM-CCSD here computes singlet states of a closed-shell RHF reference; this reference is open-shell or unrestricted: use a closed-shell molecule and RunRhf.");
        CheckStates(states);
        int nf = Mp2.CheckFrozenCore(options.FrozenCoreOrbitals, hamiltonian.AlphaOccupiedCount, hamiltonian.BetaOccupiedCount);
        int m = hamiltonian.OrbitalCount - nf, o = hamiltonian.AlphaOccupiedCount - nf, v = m - o;
        double work = ClosedShellCcsdSolver.WorkingDoubles(m, o, options.DiisVectors)
            + SubspaceDoubles(states, o * (double)v + (double)o * o * v * v);
        MemoryEstimate.Require("EOM-CCSD", (privateHamiltonian ? 0 : Math.Pow(hamiltonian.OrbitalCount, 4)) + work, options,
            "use a smaller basis, freeze core orbitals (WithFrozenCore), ask for fewer states, or raise the budget (WithMemoryBudgetMebibytes).");
        int dimension = o * v + o * o * v * v;
        RequireExcitations(o, v);
        // The singlet space: o·v singles and one double per unordered pair of (ia) and (jb).
        int singletDimension = o * v + o * v * (o * v + 1) / 2;
        if (states > singletDimension)
            throw new OrbitariumInputException(
                $"This system has only {singletDimension} singly and doubly excited singlet configurations; ask for at most {singletDimension} states.");

        var solver = new ClosedShellCcsdSolver(hamiltonian, nf, dressInPlace: privateHamiltonian, ct);
        var ground = solver.Solve(options, progress, ct);
        RequireConverged(ground);
        try
        {
            var diagonal = solver.OrbitalEnergyDifferences();
            var davidson = Diagonalise(dimension, diagonal, (x, sigma) => solver.JacobianTimes(x, sigma, ct), states,
                x => SymmetrizeDoubles(x, o, v), options, progress, ct);
            double reference = hamiltonian.ReferenceEnergyHartree + ground.Energy;
            return new ExcitedStatesResult("EOM-CCSD", "singlet", reference, [.. davidson.Eigenvalues], [], [], nf);
        }
        finally
        {
            solver.Dress(new double[o * v]);
        }
    }

    /// <summary>Replaces the doubles part by its (ia)↔(jb)-symmetric part, the space the closed-shell amplitudes live in.</summary>
    private static void SymmetrizeDoubles(double[] x, int o, int v)
    {
        int offset = o * v;
        for (int i = 0; i < o; i++)
            for (int j = 0; j < o; j++)
                for (int a = 0; a < v; a++)
                    for (int b = 0; b < v; b++)
                    {
                        int p = offset + ((i * o + j) * v + a) * v + b, q = offset + ((j * o + i) * v + b) * v + a;
                        if (p >= q) continue;
                        double mean = 0.5 * (x[p] + x[q]);
                        x[p] = mean;
                        x[q] = mean;
                    }
    }
}
