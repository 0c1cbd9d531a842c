using MathNet.Numerics.LinearAlgebra;

namespace Orbitarium.Scf;

/// <summary>What distinguishes RHF, UHF and ROHF inside the shared SCF loop: which Fock matrices DIIS
/// extrapolates, their error vectors, and how new orbitals come from them.</summary>
internal abstract class ScfModel
{
    public abstract ScfReference Reference { get; }

    /// <summary>Level shift applied when solving for new orbitals, hartree (0 for the final diagonalisation).</summary>
    public double LevelShiftHartree { get; set; }

    /// <summary>True when one J/K build on the α density serves both spins (closed-shell RHF).</summary>
    public virtual bool ClosedShellFockBuild => false;

    /// <summary>The matrices DIIS works on, given the spin Fock matrices built from the current orbitals' densities.</summary>
    public abstract Matrix<double>[] ConvergenceFocks(Matrix<double> fockAlpha, Matrix<double> fockBeta, ScfState state);

    /// <summary>Error matrices Xᵀ(FDS − SDF)X in the orthonormal basis, one per convergence Fock.</summary>
    public abstract Matrix<double>[] Errors(Matrix<double>[] focks, ScfState state);

    /// <summary>New orbitals (and densities) from the (extrapolated) convergence Fock matrices.</summary>
    public abstract void Solve(Matrix<double>[] focks, ScfState state);

    /// <summary>First orbitals from guess Fock matrices: β from <paramref name="fockBeta"/> only for UHF.</summary>
    public void SolveGuess(Matrix<double> fockAlpha, Matrix<double> fockBeta, ScfState state)
    {
        var (ca, ea) = Diagonalize(fockAlpha, state);
        state.CoefficientsAlpha = ca;
        state.EnergiesAlpha = ea;
        if (Reference == ScfReference.Unrestricted)
        {
            var (cb, eb) = Diagonalize(fockBeta, state);
            state.CoefficientsBeta = cb;
            state.EnergiesBeta = eb;
        }
        else
        {
            state.CoefficientsBeta = ca;
            state.EnergiesBeta = ea;
        }
    }

    /// <summary>Commutator error of one Fock/density pair in the orthonormal basis.</summary>
    protected static Matrix<double> Commutator(Matrix<double> fock, Matrix<double> density, ScfState state)
    {
        var fds = fock * density * state.Overlap;
        var e = fds - fds.Transpose();
        return state.X.TransposeThisAndMultiply(e) * state.X;
    }

    /// <summary>Diagonalises F in the orthonormal basis (optionally level-shifting the complement of the occupied
    /// space given by <paramref name="occupiedDensity"/>); returns the AO coefficients and ascending eigenvalues.</summary>
    protected static (Matrix<double> C, double[] Energies) Diagonalize(Matrix<double> fock, ScfState state,
        double levelShiftHartree = 0, Matrix<double>? occupiedDensity = null)
    {
        var fo = state.X.TransposeThisAndMultiply(fock) * state.X;
        if (levelShiftHartree != 0 && occupiedDensity is not null)
        {
            // Shift b(1 − P) in the orthonormal basis, P = XᵀSDSX the projector onto the occupied space.
            var p = state.X.TransposeThisAndMultiply(state.Overlap * occupiedDensity * state.Overlap) * state.X;
            fo = fo - p.Multiply(levelShiftHartree);
            for (int i = 0; i < fo.RowCount; i++) fo[i, i] += levelShiftHartree;
        }
        return DiagonalizeOrthonormal(fo, state);
    }

    /// <summary>Diagonalises a Fock matrix already in the orthonormal basis; returns AO coefficients and ascending eigenvalues.</summary>
    protected static (Matrix<double> C, double[] Energies) DiagonalizeOrthonormal(Matrix<double> fo, ScfState state)
    {
        // Symmetrise against round-off before the symmetric eigensolver.
        fo = (fo + fo.Transpose()).Multiply(0.5);
        var evd = fo.Evd(Symmetricity.Symmetric);
        int m = fo.RowCount;
        var order = new int[m];
        var values = new double[m];
        for (int i = 0; i < m; i++) { order[i] = i; values[i] = evd.EigenValues[i].Real; }
        Array.Sort((double[])values.Clone(), order);
        var energies = new double[m];
        var cOrth = Matrix<double>.Build.Dense(m, m);
        for (int k = 0; k < m; k++)
        {
            energies[k] = values[order[k]];
            cOrth.SetColumn(k, evd.EigenVectors.Column(order[k]));
        }
        return (state.X * cOrth, energies);
    }
}
