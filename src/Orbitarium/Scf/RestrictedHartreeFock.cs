using MathNet.Numerics.LinearAlgebra;
using Orbitarium.BasisSets;

namespace Orbitarium.Scf;

/// <summary>
/// Restricted closed-shell Hartree–Fock (RHF): doubly occupied spatial orbitals from the Roothaan–Hall equations FC = SCε.
/// </summary>
/// <remarks>Roothaan, Rev. Mod. Phys. 23, 69 (1951); Hall, Proc. R. Soc. A 205, 541 (1951); Szabo &amp; Ostlund,
/// <i>Modern Quantum Chemistry</i>, ch. 3. F = H + 2J[D^α] − K[D^α]; DIIS on FDS − SDF.</remarks>
public static class RestrictedHartreeFock
{
    /// <summary>Runs RHF (or restricted Kohn–Sham when <see cref="ScfOptions.ExchangeCorrelation"/> is set).</summary>
    /// <param name="basis">The basis placed on the molecule (the molecule must be a closed-shell singlet).</param>
    /// <param name="options">Settings; <see cref="ScfOptions.Default"/> when null.</param>
    /// <param name="progress">Receives each iteration.</param>
    /// <param name="cancellationToken">Stops the run (throws <see cref="OperationCanceledException"/>).</param>
    /// <exception cref="OrbitariumInputException">The molecule is open-shell, or the options are invalid.</exception>
    public static ScfResult Run(MolecularBasis basis, ScfOptions? options = null, IProgress<ScfIteration>? progress = null,
        CancellationToken cancellationToken = default) =>
        SelfConsistentField.Run(basis, ScfReference.Restricted, options, progress, cancellationToken);
}

/// <summary>The RHF pieces of the SCF loop.</summary>
internal sealed class RestrictedModel : ScfModel
{
    public override ScfReference Reference => ScfReference.Restricted;

    public override bool ClosedShellFockBuild => true;

    public override Matrix<double>[] ConvergenceFocks(Matrix<double> fockAlpha, Matrix<double> fockBeta, ScfState state) => [fockAlpha];

    public override Matrix<double>[] Errors(Matrix<double>[] focks, ScfState state) =>
        [Commutator(focks[0], state.DensityAlpha, state)];

    public override void Solve(Matrix<double>[] focks, ScfState state)
    {
        var (c, e) = Diagonalize(focks[0], state, LevelShiftHartree, state.DensityAlpha);
        state.CoefficientsAlpha = c;
        state.CoefficientsBeta = c;
        state.EnergiesAlpha = e;
        state.EnergiesBeta = e;
    }
}
