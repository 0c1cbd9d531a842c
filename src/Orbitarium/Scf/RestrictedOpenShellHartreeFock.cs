using MathNet.Numerics.LinearAlgebra;
using Orbitarium.BasisSets;

namespace Orbitarium.Scf;

/// <summary>
/// Restricted open-shell Hartree–Fock (ROHF): one set of spatial orbitals, N_β doubly and N_α − N_β singly occupied;
/// the determinant is an eigenfunction of S².
/// </summary>
/// <remarks>Roothaan, Rev. Mod. Phys. 32, 179 (1960). The orbitals diagonalise an effective Fock matrix built in the
/// current MO basis from F^α, F^β and F^c = (F^α + F^β)/2: closed–open block F^β, open–virtual block F^α, every other
/// block F^c (Guest &amp; Saunders, Mol. Phys. 28, 819 (1974), one common choice). Its off-diagonal blocks vanish at
/// convergence, when the total energy is stationary; the orbital energies depend on the choice of diagonal blocks.
/// DIIS works on the effective Fock matrix with the error F(D^α + D^β)S − S(D^α + D^β)F.</remarks>
public static class RestrictedOpenShellHartreeFock
{
    /// <summary>Runs ROHF (restricted open-shell Kohn–Sham when <see cref="ScfOptions.ExchangeCorrelation"/> is set).</summary>
    /// <param name="basis">The basis placed on the molecule (any multiplicity; a singlet gives RHF).</param>
    /// <param name="options">Settings; <see cref="ScfOptions.Default"/> when null.</param>
    /// <param name="progress">Receives each iteration.</param>
    /// <param name="cancellationToken">Stops the run (throws <see cref="OperationCanceledException"/>).</param>
    public static ScfResult Run(MolecularBasis basis, ScfOptions? options = null, IProgress<ScfIteration>? progress = null,
        CancellationToken cancellationToken = default) =>
        SelfConsistentField.Run(basis, ScfReference.RestrictedOpenShell, options, progress, cancellationToken);
}

/// <summary>The ROHF pieces of the SCF loop.</summary>
internal sealed class RestrictedOpenShellModel : ScfModel
{
    public override ScfReference Reference => ScfReference.RestrictedOpenShell;

    public override Matrix<double>[] ConvergenceFocks(Matrix<double> fockAlpha, Matrix<double> fockBeta, ScfState state)
    {
        var c = state.CoefficientsAlpha;
        var fa = c.TransposeThisAndMultiply(fockAlpha) * c;
        var fb = c.TransposeThisAndMultiply(fockBeta) * c;
        int m = c.ColumnCount, nc = state.BetaCount, no = state.AlphaCount;
        var r = Matrix<double>.Build.Dense(m, m);
        for (int i = 0; i < m; i++)
            for (int j = 0; j < m; j++)
            {
                int bi = Block(i, nc, no), bj = Block(j, nc, no);
                double v;
                if (bi == bj || (bi == 0 && bj == 2) || (bi == 2 && bj == 0)) v = 0.5 * (fa[i, j] + fb[i, j]);
                else if ((bi == 0 && bj == 1) || (bi == 1 && bj == 0)) v = fb[i, j];
                else v = fa[i, j];
                r[i, j] = v;
            }
        if (LevelShiftHartree != 0)
            for (int i = nc; i < m; i++) r[i, i] += i < no ? 0.5 * LevelShiftHartree : LevelShiftHartree;
        // Back to the AO basis: F_eff = S C R Cᵀ S (C spans the orthonormalised basis, CᵀSC = 1).
        var sc = state.Overlap * c;
        return [sc * r.TransposeAndMultiply(sc)];
    }

    public override Matrix<double>[] Errors(Matrix<double>[] focks, ScfState state) =>
        [Commutator(focks[0], state.DensityAlpha + state.DensityBeta, state)];

    public override void Solve(Matrix<double>[] focks, ScfState state)
    {
        var (c, e) = Diagonalize(focks[0], state);
        state.CoefficientsAlpha = c;
        state.CoefficientsBeta = c;
        state.EnergiesAlpha = e;
        state.EnergiesBeta = e;
    }

    /// <summary>0 closed, 1 open, 2 virtual.</summary>
    private static int Block(int i, int closed, int occupied) => i < closed ? 0 : i < occupied ? 1 : 2;
}
