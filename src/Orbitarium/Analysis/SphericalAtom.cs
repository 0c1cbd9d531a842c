using MathNet.Numerics.LinearAlgebra;
using Orbitarium.BasisSets;

namespace Orbitarium.Analysis;

/// <summary>
/// Spherical averaging of an atom's density matrix: the average over all rotations of the atom about its nucleus.
/// </summary>
/// <remarks>
/// Within the functions of one angular momentum L the rotation group acts irreducibly (real solid harmonics, or
/// Cartesian p), so by Schur's lemma the averaged block between two shells of equal L is (tr D_block / (2L+1))·1 and
/// blocks between different L vanish (common practice in group theory). Shells with Cartesian d or higher functions
/// mix several L and are refused.
/// </remarks>
public static class SphericalAtom
{
    /// <summary>Averages a one-atom density matrix over rotations.</summary>
    /// <param name="basis">The basis of the single atom (or any basis: each atom is averaged about its own nucleus).</param>
    /// <param name="density">AO density matrix in that basis.</param>
    /// <exception cref="OrbitariumInputException">A shell is Cartesian with L ≥ 2.</exception>
    public static Matrix<double> Average(MolecularBasis basis, Matrix<double> density)
    {
        ArgumentNullException.ThrowIfNull(basis);
        ArgumentNullException.ThrowIfNull(density);
        int n = basis.FunctionCount;
        if (density.RowCount != n || density.ColumnCount != n)
            throw new OrbitariumInputException($"The density matrix is {density.RowCount}x{density.ColumnCount} but the basis has {n} functions.");
        foreach (var sh in basis.Shells)
            if (!sh.IsPure && sh.AngularMomentum >= 2)
                throw new OrbitariumInputException("Spherical averaging needs pure (solid-harmonic) d and higher functions; build the basis with pure: true.");
        var result = Matrix<double>.Build.Dense(n, n);
        var shells = basis.Shells;
        for (int s = 0; s < shells.Length; s++)
            for (int t = 0; t < shells.Length; t++)
            {
                if (shells[s].AngularMomentum != shells[t].AngularMomentum || shells[s].AtomIndex != shells[t].AtomIndex) continue;
                int l = shells[s].AngularMomentum, dim = 2 * l + 1;
                int os = basis.ShellOffsets[s], ot = basis.ShellOffsets[t];
                double trace = 0;
                for (int m = 0; m < dim; m++) trace += density[os + m, ot + m];
                for (int m = 0; m < dim; m++) result[os + m, ot + m] = trace / dim;
            }
        return result;
    }
}
