using MathNet.Numerics.LinearAlgebra;

namespace Orbitarium.Integrals;

/// <summary>
/// Shared pieces of the J/K kernels: density validation, the 8-fold scatter of one unique integral into J and K,
/// and the final symmetrisation.
/// </summary>
/// <remarks>
/// For a unique integral v = (ij|kl) (i ≥ j, k ≥ l, ij ≥ kl) scaled by ½ for each of i = j, k = l, ij = kl, the eight
/// permutations contribute (after J ← (J + Jᵀ)/2 and K ← (K + Kᵀ)/2): J_ij += 4vD_kl, J_kl += 4vD_ij,
/// K_ik += 2vD_jl, K_jk += 2vD_il, K_il += 2vD_jk, K_jl += 2vD_ik (common practice for symmetric densities).
/// </remarks>
internal static class CoulombExchangeAccumulator
{
    /// <summary>Copies the densities into row-major arrays after checking their shapes and symmetry.</summary>
    public static double[][] DensityArrays(IReadOnlyList<Matrix<double>> densities, int n)
    {
        ArgumentNullException.ThrowIfNull(densities);
        if (densities.Count == 0) throw new ArgumentException("Give at least one density matrix.", nameof(densities));
        var result = new double[densities.Count][];
        for (int d = 0; d < densities.Count; d++)
        {
            var m = densities[d] ?? throw new ArgumentNullException(nameof(densities), $"Density {d + 1} is null.");
            if (m.RowCount != n || m.ColumnCount != n)
                throw new ArgumentException($"Density {d + 1} is {m.RowCount}x{m.ColumnCount}; the basis has {n} functions, so it must be {n}x{n}.", nameof(densities));
            var a = new double[n * n];
            for (int i = 0; i < n; i++)
                for (int j = 0; j < n; j++) a[i * n + j] = 0.5 * (m[i, j] + m[j, i]);
            result[d] = a;
        }
        return result;
    }

    /// <summary>Adds the contributions of one scaled unique integral to J (and K) for each density.</summary>
    public static void Scatter(double v, int i, int j, int k, int l, int n, double[][] densities, double[][] coulomb, double[][]? exchange)
    {
        int ij = i * n + j, kl = k * n + l;
        for (int d = 0; d < densities.Length; d++)
        {
            var dm = densities[d];
            var jm = coulomb[d];
            jm[ij] += 4 * v * dm[kl];
            jm[kl] += 4 * v * dm[ij];
            if (exchange is not null)
            {
                var km = exchange[d];
                double v2 = 2 * v;
                km[i * n + k] += v2 * dm[j * n + l];
                km[j * n + k] += v2 * dm[i * n + l];
                km[i * n + l] += v2 * dm[j * n + k];
                km[j * n + l] += v2 * dm[i * n + k];
            }
        }
    }

    /// <summary>Symmetrises accumulated arrays into matrices: M = (A + Aᵀ)/2.</summary>
    public static IReadOnlyList<Matrix<double>> Symmetrised(double[][] arrays, int n)
    {
        var list = new Matrix<double>[arrays.Length];
        for (int d = 0; d < arrays.Length; d++)
        {
            var a = arrays[d];
            list[d] = Matrix<double>.Build.Dense(n, n, (i, j) => 0.5 * (a[i * n + j] + a[j * n + i]));
        }
        return list;
    }

    /// <summary>Allocates zeroed accumulators: count arrays of n·n.</summary>
    public static double[][] Zeros(int count, int n)
    {
        var r = new double[count][];
        for (int d = 0; d < count; d++) r[d] = new double[n * n];
        return r;
    }

    /// <summary>Adds <paramref name="source"/> into <paramref name="target"/> element-wise.</summary>
    public static void AddInto(double[][] target, double[][] source)
    {
        for (int d = 0; d < target.Length; d++)
        {
            var t = target[d]; var s = source[d];
            for (int x = 0; x < t.Length; x++) t[x] += s[x];
        }
    }
}
