using MathNet.Numerics.LinearAlgebra;
using Orbitarium.BasisSets;

namespace Orbitarium.Scf;

/// <summary>
/// Unrestricted Hartree–Fock (UHF): separate α and β spatial orbitals from the Pople–Nesbet equations
/// F^α C^α = S C^α ε^α, F^β C^β = S C^β ε^β.
/// </summary>
/// <remarks>Pople &amp; Nesbet, J. Chem. Phys. 22, 571 (1954); Szabo &amp; Ostlund, <i>Modern Quantum Chemistry</i>, §3.8.
/// F^σ = H + J[D^α + D^β] − K[D^σ]. One DIIS extrapolation for both spins (their errors add).
/// The result's ⟨S²⟩ measures spin contamination. A singlet stays restricted unless
/// <see cref="ScfOptions.BreakSpinSymmetry"/> mixes the α HOMO and LUMO of the guess.</remarks>
public static class UnrestrictedHartreeFock
{
    /// <summary>Runs UHF (or unrestricted Kohn–Sham when <see cref="ScfOptions.ExchangeCorrelation"/> is set).</summary>
    /// <param name="basis">The basis placed on the molecule (any multiplicity).</param>
    /// <param name="options">Settings; <see cref="ScfOptions.Default"/> when null.</param>
    /// <param name="progress">Receives each iteration.</param>
    /// <param name="cancellationToken">Stops the run (throws <see cref="OperationCanceledException"/>).</param>
    public static ScfResult Run(MolecularBasis basis, ScfOptions? options = null, IProgress<ScfIteration>? progress = null,
        CancellationToken cancellationToken = default) =>
        SelfConsistentField.Run(basis, ScfReference.Unrestricted, options, progress, cancellationToken);
}

/// <summary>The UHF pieces of the SCF loop.</summary>
internal sealed class UnrestrictedModel : ScfModel
{
    public override ScfReference Reference => ScfReference.Unrestricted;

    public override Matrix<double>[] ConvergenceFocks(Matrix<double> fockAlpha, Matrix<double> fockBeta, ScfState state) =>
        [fockAlpha, fockBeta];

    public override Matrix<double>[] Errors(Matrix<double>[] focks, ScfState state) =>
        [Commutator(focks[0], state.DensityAlpha, state), Commutator(focks[1], state.DensityBeta, state)];

    public override void Solve(Matrix<double>[] focks, ScfState state)
    {
        var (ca, ea) = Diagonalize(focks[0], state, LevelShiftHartree, state.DensityAlpha);
        var (cb, eb) = Diagonalize(focks[1], state, LevelShiftHartree, state.DensityBeta);
        state.CoefficientsAlpha = ca;
        state.CoefficientsBeta = cb;
        state.EnergiesAlpha = ea;
        state.EnergiesBeta = eb;
    }
}
