namespace Orbitarium.Scf;

/// <summary>
/// Settings of a self-consistent-field run. Immutable: change a value with a <c>with</c> expression,
/// e.g. <c>ScfOptions.Default with { MaxIterations = 200, Damping = 0.3 }</c>.
/// </summary>
/// <remarks>The defaults follow common practice: Pulay DIIS on the commutator FDS − SDF with 8 vectors,
/// convergence when |ΔE| &lt; 1e-10 Eh and max|FDS − SDF| &lt; 1e-8, a superposition-of-atomic-densities guess,
/// symmetric orthogonalisation with a switch to canonical below an overlap eigenvalue of 1e-7.</remarks>
public sealed record ScfOptions
{
    /// <summary>The defaults described on the type.</summary>
    public static ScfOptions Default { get; } = new();

    /// <summary>Largest number of iterations before giving up (the result is then flagged not converged). Default 128.</summary>
    public int MaxIterations { get; init; } = 128;

    /// <summary>Convergence threshold on the energy change between iterations, hartree. Default 1e-10 Eh.</summary>
    public double EnergyThresholdHartree { get; init; } = 1e-10;

    /// <summary>Convergence threshold on the largest element of FDS − SDF in the orthonormal basis, hartree. Default 1e-8.</summary>
    public double CommutatorThreshold { get; init; } = 1e-8;

    /// <summary>Kohn–Sham only: an orbital gradient below this (hartree) is accepted once the energy has changed by less
    /// than <see cref="GridLimitedEnergyChangeHartree"/> in each of <see cref="QuietIterationsForGridLimit"/> iterations in a row
    /// and the gradient is no smaller than a tenth of what it was that many iterations before
    /// (<see cref="ScfStopReason.ConvergedGridLimited"/>). A finite grid breaks the symmetry of degenerate open shells
    /// slightly, leaving orbital rotations whose gradient (1e-7–1e-6 Eh for open-shell atoms at the default grid)
    /// relaxes far too slowly to converge; the energy then depends on the direction of the shell only at the grid's
    /// angular resolution (up to ~1e-6 Eh for the O atom at the default grid; use a finer grid for less). Default 1e-5;
    /// 0 turns the rule off.</summary>
    public double GridLimitedCommutatorThreshold { get; init; } = 1e-5;

    /// <summary>Kohn–Sham only: the energy change per iteration (hartree) below which an iteration counts as quiet for
    /// <see cref="GridLimitedCommutatorThreshold"/>. DIIS keeps turning a grid-limited open shell by tiny amounts, so
    /// the energy wanders at the grid's resolution (1e-8–1e-7 Eh for an open-shell atom at the default grid) rather
    /// than settling below <see cref="EnergyThresholdHartree"/>; with the gradient below 1e-5 the hard directions are
    /// converged to ~1e-9 Eh. Default 1e-7.</summary>
    public double GridLimitedEnergyChangeHartree { get; init; } = 1e-7;

    /// <summary>Kohn–Sham only: consecutive iterations with |ΔE| below <see cref="EnergyThresholdHartree"/> needed before a
    /// grid-limited gradient is accepted (<see cref="GridLimitedCommutatorThreshold"/>,
    /// <see cref="GridLimitedEnergyChangeHartree"/>). Default 8.</summary>
    public int QuietIterationsForGridLimit { get; init; } = 8;

    /// <summary>Number of Fock/error pairs kept by Pulay DIIS; 0 turns DIIS off. Default 8.</summary>
    public int DiisSubspaceSize { get; init; } = 8;

    /// <summary>Density damping factor d in [0, 1): the next density is (1 − d)·D_new + d·D_old. Helps oscillating
    /// cases at the price of slower convergence. Default 0 (off).</summary>
    public double Damping { get; init; }

    /// <summary>Level shift in hartree added to virtual orbital energies (half of it to singly occupied ROHF orbitals);
    /// stabilises difficult cases (Saunders &amp; Hillier, Int. J. Quantum Chem. 7, 699 (1973)). Default 0 (off).</summary>
    public double LevelShiftHartree { get; init; }

    /// <summary>A level shift (hartree) switched on automatically when the orbital gradient is still above 1e-3 after
    /// <see cref="AutomaticLevelShiftAfterIterations"/> iterations — the usual sign of an oscillating open shell (e.g. NO
    /// in SVWN5). A level shift changes the path, not the solution: the converged energy is the same. Used only when
    /// larger than <see cref="LevelShiftHartree"/>; the result records the iteration it started
    /// (<see cref="ScfResult.AutomaticLevelShiftIteration"/>). Default 0.2; 0 turns it off.</summary>
    public double AutomaticLevelShiftHartree { get; init; } = 0.2;

    /// <summary>Iterations after which <see cref="AutomaticLevelShiftHartree"/> may switch on. Default 30.</summary>
    public int AutomaticLevelShiftAfterIterations { get; init; } = 30;

    /// <summary>The starting guess. Default <see cref="ScfGuess.AtomicDensities"/>; becomes
    /// <see cref="ScfGuess.PreviousOrbitals"/> through <see cref="WithInitialOrbitals"/>.</summary>
    public ScfGuess Guess { get; init; } = ScfGuess.AtomicDensities;

    /// <summary>Orbitals to start from when <see cref="Guess"/> is <see cref="ScfGuess.PreviousOrbitals"/>.</summary>
    public ScfResult? InitialOrbitals { get; init; }

    /// <summary>UHF only: mix the α HOMO and LUMO of the guess by 45° so that a singlet can break spin symmetry
    /// (common practice). Default false.</summary>
    public bool BreakSpinSymmetry { get; init; }

    /// <summary>How the AO basis is orthogonalised. Default <see cref="OrthogonalizationKind.Symmetric"/>.</summary>
    public OrthogonalizationKind Orthogonalization { get; init; } = OrthogonalizationKind.Symmetric;

    /// <summary>Overlap eigenvalues below this are treated as linear dependencies and dropped (canonical
    /// orthogonalisation). Default 1e-7 (common practice).</summary>
    public double LinearDependencyThreshold { get; init; } = 1e-7;

    /// <summary>Memory the two-electron integrals may occupy in core, bytes; larger problems run integral-direct.
    /// Default 2 GiB.</summary>
    public long MemoryBudgetBytes { get; init; } = 2L * 1024 * 1024 * 1024;

    /// <summary>Always recompute the two-electron integrals each iteration (integral-direct), whatever the memory budget. Default false.</summary>
    public bool ForceDirect { get; init; }

    /// <summary>Integral-direct runs only: build J and K from the density change of each iteration and add them to the
    /// previous matrices (Almlöf, Faegri &amp; Korsell, J. Comput. Chem. 3, 385 (1982)), with a full build every 8
    /// iterations and before convergence is accepted. Faster as the density settles; off when
    /// <see cref="Damping"/> is used. Default true.</summary>
    public bool IncrementalDirectFock { get; init; } = true;

    /// <summary>The exchange–correlation functional for Kohn–Sham DFT, or null for Hartree–Fock (the default).
    /// The driver adds V_xc and E_xc and scales exact exchange by the functional's
    /// <see cref="IExchangeCorrelationPotential.ExactExchangeFraction"/>.</summary>
    public IExchangeCorrelationPotential? ExchangeCorrelation { get; init; }

    /// <summary>Returns options that start from <paramref name="previous"/>'s orbitals (for scans and restarts).</summary>
    public ScfOptions WithInitialOrbitals(ScfResult previous)
    {
        ArgumentNullException.ThrowIfNull(previous);
        return this with { Guess = ScfGuess.PreviousOrbitals, InitialOrbitals = previous };
    }

    /// <summary>Checks every value and throws a clear message for the first bad one.</summary>
    /// <exception cref="OrbitariumInputException">A value is out of its range.</exception>
    public void Validate()
    {
        if (MaxIterations < 1)
            throw new OrbitariumInputException($"MaxIterations is {MaxIterations}; give at least 1.");
        if (!(EnergyThresholdHartree > 0) || !double.IsFinite(EnergyThresholdHartree))
            throw new OrbitariumInputException($"EnergyThresholdHartree is {EnergyThresholdHartree}; give a positive number of hartree (default 1e-10).");
        if (!(CommutatorThreshold > 0) || !double.IsFinite(CommutatorThreshold))
            throw new OrbitariumInputException($"CommutatorThreshold is {CommutatorThreshold}; give a positive number (default 1e-8).");
        if (DiisSubspaceSize < 0 || DiisSubspaceSize > 64)
            throw new OrbitariumInputException($"DiisSubspaceSize is {DiisSubspaceSize}; give 0 (off) to 64 (default 8).");
        if (!(Damping >= 0 && Damping < 1))
            throw new OrbitariumInputException($"Damping is {Damping}; give a factor in [0, 1) (0 is off).");
        if (!(LevelShiftHartree >= 0) || !double.IsFinite(LevelShiftHartree))
            throw new OrbitariumInputException($"LevelShiftHartree is {LevelShiftHartree}; give a non-negative number of hartree (0 is off).");
        if (!(GridLimitedCommutatorThreshold >= 0) || !double.IsFinite(GridLimitedCommutatorThreshold))
            throw new OrbitariumInputException($"GridLimitedCommutatorThreshold is {GridLimitedCommutatorThreshold}; give a non-negative number (0 is off, default 1e-5).");
        if (!(GridLimitedEnergyChangeHartree > 0) || !double.IsFinite(GridLimitedEnergyChangeHartree))
            throw new OrbitariumInputException($"GridLimitedEnergyChangeHartree is {GridLimitedEnergyChangeHartree}; give a positive number of hartree (default 1e-7).");
        if (QuietIterationsForGridLimit < 1)
            throw new OrbitariumInputException($"QuietIterationsForGridLimit is {QuietIterationsForGridLimit}; give at least 1 (default 8).");
        if (!(AutomaticLevelShiftHartree >= 0) || !double.IsFinite(AutomaticLevelShiftHartree))
            throw new OrbitariumInputException($"AutomaticLevelShiftHartree is {AutomaticLevelShiftHartree}; give a non-negative number of hartree (0 is off).");
        if (AutomaticLevelShiftAfterIterations < 1)
            throw new OrbitariumInputException($"AutomaticLevelShiftAfterIterations is {AutomaticLevelShiftAfterIterations}; give at least 1 (default 30).");
        if (!(LinearDependencyThreshold > 0 && LinearDependencyThreshold < 1))
            throw new OrbitariumInputException($"LinearDependencyThreshold is {LinearDependencyThreshold}; give an overlap eigenvalue in (0, 1) (default 1e-7).");
        if (MemoryBudgetBytes < 0)
            throw new OrbitariumInputException($"MemoryBudgetBytes is {MemoryBudgetBytes}; give a non-negative number of bytes.");
        if (Guess == ScfGuess.PreviousOrbitals && InitialOrbitals is null)
            throw new OrbitariumInputException("Guess is PreviousOrbitals but no InitialOrbitals were given; use options.WithInitialOrbitals(previousResult).");
    }
}
