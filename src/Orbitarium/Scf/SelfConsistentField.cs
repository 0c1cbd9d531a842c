using System.Collections.Immutable;
using System.Diagnostics;
using MathNet.Numerics.LinearAlgebra;
using Orbitarium.BasisSets;
using Orbitarium.Integrals;

namespace Orbitarium.Scf;

/// <summary>
/// The self-consistent-field driver shared by Hartree–Fock and Kohn–Sham DFT, for restricted, unrestricted and
/// restricted open-shell references.
/// </summary>
/// <remarks>
/// Each iteration: densities from the current orbitals (aufbau), Fock matrices from the J/K kernel (plus V_xc),
/// the energy and the orbital gradient FDS − SDF, Pulay DIIS extrapolation, and new orbitals from the
/// extrapolated Fock matrix in the orthonormalised basis (Szabo &amp; Ostlund, <i>Modern Quantum Chemistry</i>, §3.4.6;
/// Pulay, Chem. Phys. Lett. 73, 393 (1980)). Converged when |ΔE| and max|FDS − SDF| are both below their thresholds.
/// A run that stops early returns a result flagged not converged, with the reason.
/// </remarks>
public static class SelfConsistentField
{
    // Orbital gradient above which a run that has used AutomaticLevelShiftAfterIterations iterations counts as far from
    // converged (a converging SCF is orders of magnitude below it by then).
    private const double AutomaticLevelShiftGradient = 1e-3;

    /// <summary>Runs an SCF calculation.</summary>
    /// <param name="basis">The basis placed on the molecule; the molecule's charge and multiplicity set the electron counts.</param>
    /// <param name="reference">Restricted, unrestricted or restricted open-shell.</param>
    /// <param name="options">Settings; <see cref="ScfOptions.Default"/> when null.</param>
    /// <param name="progress">Receives each iteration (energy, ΔE, commutator norm, DIIS size).</param>
    /// <param name="cancellationToken">Stops the run between (and inside) Fock builds with <see cref="OperationCanceledException"/>.</param>
    /// <exception cref="OrbitariumInputException">RHF asked for an open shell, the basis has too few functions,
    /// or the options are invalid.</exception>
    public static ScfResult Run(MolecularBasis basis, ScfReference reference, ScfOptions? options = null,
        IProgress<ScfIteration>? progress = null, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(basis);
        options ??= ScfOptions.Default;
        options.Validate();
        var molecule = basis.Molecule;
        if (molecule.AtomCount == 0)
            throw new OrbitariumInputException("The molecule has no atoms; add atoms before running an SCF calculation.");
        if (reference == ScfReference.Restricted && molecule.AlphaElectronCount != molecule.BetaElectronCount)
            throw new OrbitariumInputException(
                $"RHF needs a closed-shell singlet, but {molecule.Formula} with charge {molecule.Charge} has {molecule.ElectronCount} electrons and multiplicity {molecule.Multiplicity}; use UHF or ROHF.");
        if (basis.FunctionCount == 0)
            throw new OrbitariumInputException("The basis has no functions; pick a basis set that covers the molecule.");
        cancellationToken.ThrowIfCancellationRequested();
        var integrals = ScfIntegrals.Compute(basis, options.MemoryBudgetBytes, options.ForceDirect, cancellationToken);
        return Run(basis, reference, options, integrals, progress, cancellationToken);
    }

    internal static ScfResult Run(MolecularBasis basis, ScfReference reference, ScfOptions options, ScfIntegrals integrals,
        IProgress<ScfIteration>? progress, CancellationToken cancellationToken)
    {
        var molecule = basis.Molecule;
        int na = molecule.AlphaElectronCount, nb = molecule.BetaElectronCount;
        ScfModel model = reference switch
        {
            ScfReference.Restricted => new RestrictedModel(),
            ScfReference.Unrestricted => new UnrestrictedModel(),
            _ => new RestrictedOpenShellModel(),
        };
        var s = integrals.Overlap;
        var orth = Orthogonalizer.Create(s, options.Orthogonalization, options.LinearDependencyThreshold);
        if (na > orth.OrbitalCount)
            throw new OrbitariumInputException(
                $"The basis gives only {orth.OrbitalCount} orbitals, too few for {na} α electrons; use a larger basis set.");
        var state = new ScfState(s, orth.Transform, na, nb);
        bool incremental = options.IncrementalDirectFock && options.Damping == 0 && integrals.Kernel is DirectCoulombExchangeKernel;
        var fockBuilder = new FockBuilder(basis, integrals, options.ExchangeCorrelation,
            model.ClosedShellFockBuild, reference != ScfReference.Restricted, incremental);

        // ---- starting guess: a Fock matrix pair whose eigenvectors are the first orbitals
        var clock = Stopwatch.StartNew();
        var (guessAlpha, guessBeta) = GuessFocks(basis, options, integrals, fockBuilder, cancellationToken);
        model.SolveGuess(guessAlpha, guessBeta, state);
        if (options.BreakSpinSymmetry && reference == ScfReference.Unrestricted && na >= 1 && na < state.OrbitalCount)
            MixHomoLumo(state);
        double guessSeconds = clock.Elapsed.TotalSeconds;

        // ---- iterations
        clock.Restart();
        var diis = options.DiisSubspaceSize > 0 ? new Diis(options.DiisSubspaceSize) : null;
        var history = ImmutableArray.CreateBuilder<ScfIteration>();
        double enuc = molecule.NuclearRepulsionEnergyHartree;
        double previousEnergy = 0;
        int quietIterations = 0;
        double quietChange = Math.Max(options.EnergyThresholdHartree, options.GridLimitedEnergyChangeHartree);
        double levelShift = options.LevelShiftHartree;
        int? automaticShiftIteration = null;
        bool gridBased = options.ExchangeCorrelation is not null && options.GridLimitedCommutatorThreshold > 0;
        Matrix<double>? previousAlpha = null, previousBeta = null;
        ScfStopReason stop;
        FockMatrices fock;
        for (int iteration = 1; ; iteration++)
        {
            cancellationToken.ThrowIfCancellationRequested();
            state.UpdateDensities();
            if (options.Damping > 0 && previousAlpha is not null && previousBeta is not null)
            {
                bool shared = ReferenceEquals(state.DensityAlpha, state.DensityBeta);
                double d = options.Damping;
                state.DensityAlpha = state.DensityAlpha.Multiply(1 - d) + previousAlpha.Multiply(d);
                state.DensityBeta = shared ? state.DensityAlpha : state.DensityBeta.Multiply(1 - d) + previousBeta.Multiply(d);
            }
            fock = fockBuilder.Build(state.DensityAlpha, state.DensityBeta, cancellationToken);
            double energy = enuc + fock.OneElectronEnergy + fock.TwoElectronEnergy + fock.ExchangeCorrelationEnergy;
            model.LevelShiftHartree = levelShift;
            var focks = model.ConvergenceFocks(fock.Alpha, fock.Beta, state);
            var errors = model.Errors(focks, state);
            double norm = 0;
            foreach (var e in errors) norm = Math.Max(norm, MaxAbs(e));
            double change = iteration == 1 ? energy : energy - previousEnergy;
            diis?.Add(focks, errors);
            var record = new ScfIteration(iteration, energy, change, norm, diis?.Count ?? 0, clock.Elapsed.TotalSeconds);
            history.Add(record);
            progress?.Report(record);
            previousEnergy = energy;

            if (!double.IsFinite(energy) || !double.IsFinite(norm)) { stop = ScfStopReason.NumericalBreakdown; break; }
            quietIterations = iteration > 1 && Math.Abs(change) < quietChange ? quietIterations + 1 : 0;
            // Grid-limited: quiet energy, small gradient, and a gradient that has stopped falling (a converging run cuts it
            // by orders of magnitude over the same iterations).
            if (gridBased && quietIterations >= options.QuietIterationsForGridLimit && norm >= options.CommutatorThreshold
                && norm < options.GridLimitedCommutatorThreshold
                && norm >= 0.1 * history[iteration - 1 - options.QuietIterationsForGridLimit].CommutatorNorm
                && !fockBuilder.LastBuildWasIncremental)
            { stop = ScfStopReason.ConvergedGridLimited; break; }
            if (iteration > 1 && Math.Abs(change) < options.EnergyThresholdHartree && norm < options.CommutatorThreshold)
            {
                if (!fockBuilder.LastBuildWasIncremental) { stop = ScfStopReason.Converged; break; }
                // Increments carry screening errors: confirm on a full build of the same density before accepting.
                fockBuilder.RequestFullBuild();
                continue;
            }
            if (iteration >= options.MaxIterations) { stop = ScfStopReason.MaximumIterationsReached; break; }

            if (automaticShiftIteration is null && options.AutomaticLevelShiftHartree > levelShift
                && iteration >= options.AutomaticLevelShiftAfterIterations && norm > AutomaticLevelShiftGradient)
            {
                // Still far from converged: most often an oscillating open shell. Shift the virtual levels and restart DIIS.
                automaticShiftIteration = iteration;
                levelShift = options.AutomaticLevelShiftHartree;
                model.LevelShiftHartree = levelShift;
                diis?.Clear();
            }
            previousAlpha = state.DensityAlpha;
            previousBeta = state.DensityBeta;
            var next = diis is { Count: > 0 } ? diis.Extrapolate() : focks;
            model.Solve(next, state);
        }

        // ---- final orbitals: eigenvectors of the unshifted, unextrapolated Fock matrix of the last density
        var finalAlpha = state.DensityAlpha;
        var finalBeta = state.DensityBeta;
        if (stop != ScfStopReason.NumericalBreakdown)
        {
            model.LevelShiftHartree = 0;
            model.Solve(model.ConvergenceFocks(fock.Alpha, fock.Beta, state), state);
        }
        double iterationSeconds = clock.Elapsed.TotalSeconds;

        var occA = ImmutableArray.CreateBuilder<double>(state.OrbitalCount);
        var occB = ImmutableArray.CreateBuilder<double>(state.OrbitalCount);
        for (int i = 0; i < state.OrbitalCount; i++)
        {
            occA.Add(i < na ? 1 : 0);
            occB.Add(i < nb ? 1 : 0);
        }
        return new ScfResult
        {
            Molecule = molecule,
            Basis = basis,
            Reference = reference,
            Options = options,
            StopReason = stop,
            History = history.ToImmutable(),
            NuclearRepulsionHartree = enuc,
            OneElectronEnergyHartree = fock.OneElectronEnergy,
            TwoElectronEnergyHartree = fock.TwoElectronEnergy,
            ExchangeCorrelationEnergyHartree = fock.ExchangeCorrelationEnergy,
            ExchangeCorrelationDescription = fock.ExchangeCorrelationDescription,
            OrbitalEnergiesAlphaHartree = [.. state.EnergiesAlpha],
            OrbitalEnergiesBetaHartree = [.. state.EnergiesBeta],
            CoefficientsAlpha = state.CoefficientsAlpha,
            CoefficientsBeta = state.CoefficientsBeta,
            OccupationsAlpha = occA.MoveToImmutable(),
            OccupationsBeta = occB.MoveToImmutable(),
            DensityAlpha = finalAlpha,
            DensityBeta = finalBeta,
            DensityTotal = finalAlpha + finalBeta,
            FockAlpha = fock.Alpha,
            FockBeta = fock.Beta,
            Overlap = s,
            CoreHamiltonian = integrals.CoreHamiltonian,
            SpinSquared = Math.Max(0, SpinSquared(state.CoefficientsAlpha, state.CoefficientsBeta, s, na, nb)),
            IntegralMode = incremental ? integrals.Kernel.Mode + ", incremental Fock builds" : integrals.Kernel.Mode,
            OrthogonalizationUsed = orth.KindUsed,
            DroppedLinearDependencies = orth.DroppedCount,
            AutomaticLevelShiftIteration = automaticShiftIteration,
            IntegralSeconds = integrals.Seconds,
            GuessSeconds = guessSeconds,
            IterationSeconds = iterationSeconds,
        };
    }

    private static (Matrix<double> Alpha, Matrix<double> Beta) GuessFocks(MolecularBasis basis, ScfOptions options,
        ScfIntegrals integrals, FockBuilder fockBuilder, CancellationToken cancellationToken)
    {
        switch (options.Guess)
        {
            case ScfGuess.CoreHamiltonian:
                return (integrals.CoreHamiltonian, integrals.CoreHamiltonian);
            case ScfGuess.AtomicDensities:
            {
                var total = SuperpositionOfAtomicDensities.Build(basis, cancellationToken);
                var half = total.Multiply(0.5);
                var f = fockBuilder.Build(half, half, cancellationToken);
                return (f.Alpha, f.Beta);
            }
            default:
            {
                var (da, db) = PreviousOrbitalsGuess.Densities(basis, options.InitialOrbitals!);
                var f = fockBuilder.Build(da, db, cancellationToken);
                return (f.Alpha, f.Beta);
            }
        }
    }

    /// <summary>Rotates the α HOMO and LUMO by 45° (common practice for breaking the spin symmetry of a UHF singlet).</summary>
    private static void MixHomoLumo(ScfState state)
    {
        var c = state.CoefficientsAlpha.Clone();
        int h = state.AlphaCount - 1, l = state.AlphaCount;
        double r = Math.Sqrt(0.5);
        for (int mu = 0; mu < c.RowCount; mu++)
        {
            double a = c[mu, h], b = c[mu, l];
            c[mu, h] = r * (a + b);
            c[mu, l] = r * (b - a);
        }
        state.CoefficientsAlpha = c;
    }

    /// <summary>⟨S²⟩ = S_z(S_z + 1) + N_β − Σ_ij |(C^αᵀ S C^β)_ij|² over occupied orbitals (Szabo &amp; Ostlund eq. 2.271).</summary>
    internal static double SpinSquared(Matrix<double> ca, Matrix<double> cb, Matrix<double> s, int na, int nb)
    {
        double sz = 0.5 * (na - nb);
        double value = sz * (sz + 1) + nb;
        if (na == 0 || nb == 0) return value;
        var overlap = ca.SubMatrix(0, ca.RowCount, 0, na).TransposeThisAndMultiply(s) * cb.SubMatrix(0, cb.RowCount, 0, nb);
        double sum = 0;
        for (int i = 0; i < na; i++)
            for (int j = 0; j < nb; j++) sum += overlap[i, j] * overlap[i, j];
        return value - sum;
    }

    private static double MaxAbs(Matrix<double> m)
    {
        var a = m.AsColumnMajorArray() ?? m.ToColumnMajorArray();
        double x = 0;
        foreach (double v in a) x = Math.Max(x, Math.Abs(v));
        return x;
    }
}
