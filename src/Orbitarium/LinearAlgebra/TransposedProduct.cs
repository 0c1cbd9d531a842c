using System.Numerics;
using System.Runtime.CompilerServices;
using System.Runtime.InteropServices;

namespace Orbitarium.LinearAlgebra;

/// <summary>
/// The dense product C = α·A·Bᵀ (+ C) on row-major arrays, the shape every tensor contraction of the correlated
/// methods is reshaped into: A is M×K, B is N×K, both contiguous along K, C is M×N.
/// </summary>
/// <remarks>
/// Register tiles of 2 rows of A × 4 rows of B with SIMD accumulators, over K panels that stay in the first-level
/// cache. Each element of C is summed by one thread in a fixed order, so results repeat to the last bit whatever
/// the thread count. No allocation.
/// </remarks>
internal static class TransposedProduct
{
    private const int PanelLength = 256;

    /// <summary>C[i·N + j] = α Σ_k A[i·K + k] B[j·K + k] (+ C[i·N + j] when <paramref name="accumulate"/>).</summary>
    /// <param name="a">M×K, row-major.</param>
    /// <param name="b">N×K, row-major.</param>
    /// <param name="c">M×N, row-major; overwritten or added to.</param>
    /// <param name="m">Rows of A and C.</param>
    /// <param name="n">Rows of B, columns of C.</param>
    /// <param name="k">Contracted length.</param>
    /// <param name="alpha">Scale of the product.</param>
    /// <param name="accumulate">Add to C instead of overwriting it.</param>
    /// <param name="parallel">Spread row blocks of C over the thread pool (false inside an outer parallel loop).</param>
    /// <param name="aOffset">Where A starts in <paramref name="a"/>.</param>
    /// <param name="bOffset">Where B starts in <paramref name="b"/>.</param>
    /// <param name="cOffset">Where C starts in <paramref name="c"/>.</param>
    /// <param name="cRowStride">Distance between rows of C in <paramref name="c"/> (default N: C contiguous).</param>
    /// <param name="aRowStride">Distance between rows of A (default K).</param>
    /// <param name="bRowStride">Distance between rows of B (default K).</param>
    public static void Multiply(double[] a, double[] b, double[] c, int m, int n, int k, double alpha = 1.0,
        bool accumulate = false, bool parallel = true, long aOffset = 0, long bOffset = 0, long cOffset = 0, long cRowStride = 0,
        long aRowStride = 0, long bRowStride = 0)
    {
        long ldc = cRowStride == 0 ? n : cRowStride;
        long lda = aRowStride == 0 ? k : aRowStride;
        long ldb = bRowStride == 0 ? k : bRowStride;
        if (aOffset < 0 || bOffset < 0 || cOffset < 0 || ldc < n || lda < k || ldb < k
            || (m > 0 && aOffset + (m - 1) * lda + k > a.Length) || (n > 0 && bOffset + (n - 1) * ldb + k > b.Length)
            || (m > 0 && cOffset + (m - 1) * ldc + n > c.Length))
            throw new ArgumentException($"Arrays too short for a {m}×{k} by ({n}×{k})ᵀ product.");
        if (!accumulate)
            for (int i = 0; i < m; i++) Array.Clear(c, (int)(cOffset + i * ldc), n);
        if (m == 0 || n == 0 || k == 0) return;
        const int rowsPerBlock = 16;
        int blocks = (m + rowsPerBlock - 1) / rowsPerBlock;
        if (parallel && blocks > 1 && (double)m * n * k > 2e5)
            Parallel.For(0, blocks, blk => RowBlock(a, aOffset, lda, b, bOffset, ldb, c, cOffset, ldc, blk * rowsPerBlock, Math.Min(m, (blk + 1) * rowsPerBlock), n, k, alpha));
        else
            RowBlock(a, aOffset, lda, b, bOffset, ldb, c, cOffset, ldc, 0, m, n, k, alpha);
    }

    private static void RowBlock(double[] a, long aOffset, long lda, double[] b, long bOffset, long ldb, double[] c, long cOffset, long ldc,
        int rowStart, int rowEnd, int n, int k, double alpha)
    {
        for (int k0 = 0; k0 < k; k0 += PanelLength)
        {
            int len = Math.Min(PanelLength, k - k0);
            int j = 0;
            for (; j + 4 <= n; j += 4)
            {
                int i = rowStart;
                for (; i + 2 <= rowEnd; i += 2) Tile2x4(a, aOffset + i * lda + k0, lda, b, bOffset + j * ldb + k0, ldb, c, cOffset + i * ldc + j, ldc, len, alpha);
                for (; i < rowEnd; i++)
                    for (int jj = j; jj < j + 4; jj++) c[cOffset + i * ldc + jj] += alpha * Dot(a, aOffset + i * lda + k0, b, bOffset + jj * ldb + k0, len);
            }
            for (; j < n; j++)
                for (int i = rowStart; i < rowEnd; i++)
                    c[cOffset + i * ldc + j] += alpha * Dot(a, aOffset + i * lda + k0, b, bOffset + j * ldb + k0, len);
        }
    }

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private static void Tile2x4(double[] a, long aStart, long lda, double[] b, long bStart, long ldb, double[] c, long cStart, long ldc, int len, double alpha)
    {
        ref double a0 = ref Unsafe.Add(ref MemoryMarshal.GetArrayDataReference(a), (nint)aStart);
        ref double a1 = ref Unsafe.Add(ref a0, (nint)lda);
        ref double b0 = ref Unsafe.Add(ref MemoryMarshal.GetArrayDataReference(b), (nint)bStart);
        ref double b1 = ref Unsafe.Add(ref b0, (nint)ldb);
        ref double b2 = ref Unsafe.Add(ref b1, (nint)ldb);
        ref double b3 = ref Unsafe.Add(ref b2, (nint)ldb);
        int w = Vector<double>.Count;
        var s00 = Vector<double>.Zero; var s01 = Vector<double>.Zero; var s02 = Vector<double>.Zero; var s03 = Vector<double>.Zero;
        var s10 = Vector<double>.Zero; var s11 = Vector<double>.Zero; var s12 = Vector<double>.Zero; var s13 = Vector<double>.Zero;
        int p = 0;
        if (Vector.IsHardwareAccelerated)
        {
            for (; p + w <= len; p += w)
            {
                var x0 = Vector.LoadUnsafe(ref a0, (nuint)p);
                var x1 = Vector.LoadUnsafe(ref a1, (nuint)p);
                var y = Vector.LoadUnsafe(ref b0, (nuint)p);
                s00 = Vector.FusedMultiplyAdd(x0, y, s00); s10 = Vector.FusedMultiplyAdd(x1, y, s10);
                y = Vector.LoadUnsafe(ref b1, (nuint)p);
                s01 = Vector.FusedMultiplyAdd(x0, y, s01); s11 = Vector.FusedMultiplyAdd(x1, y, s11);
                y = Vector.LoadUnsafe(ref b2, (nuint)p);
                s02 = Vector.FusedMultiplyAdd(x0, y, s02); s12 = Vector.FusedMultiplyAdd(x1, y, s12);
                y = Vector.LoadUnsafe(ref b3, (nuint)p);
                s03 = Vector.FusedMultiplyAdd(x0, y, s03); s13 = Vector.FusedMultiplyAdd(x1, y, s13);
            }
        }
        double r00 = Vector.Sum(s00), r01 = Vector.Sum(s01), r02 = Vector.Sum(s02), r03 = Vector.Sum(s03);
        double r10 = Vector.Sum(s10), r11 = Vector.Sum(s11), r12 = Vector.Sum(s12), r13 = Vector.Sum(s13);
        for (; p < len; p++)
        {
            double x0 = Unsafe.Add(ref a0, p), x1 = Unsafe.Add(ref a1, p);
            double y0 = Unsafe.Add(ref b0, p), y1 = Unsafe.Add(ref b1, p), y2 = Unsafe.Add(ref b2, p), y3 = Unsafe.Add(ref b3, p);
            r00 += x0 * y0; r01 += x0 * y1; r02 += x0 * y2; r03 += x0 * y3;
            r10 += x1 * y0; r11 += x1 * y1; r12 += x1 * y2; r13 += x1 * y3;
        }
        long c0 = cStart, c1 = c0 + ldc;
        c[c0] += alpha * r00; c[c0 + 1] += alpha * r01; c[c0 + 2] += alpha * r02; c[c0 + 3] += alpha * r03;
        c[c1] += alpha * r10; c[c1 + 1] += alpha * r11; c[c1 + 2] += alpha * r12; c[c1 + 3] += alpha * r13;
    }

    private static double Dot(double[] x, long xOffset, double[] y, long yOffset, int len)
    {
        double s = 0;
        for (int p = 0; p < len; p++) s += x[xOffset + p] * y[yOffset + p];
        return s;
    }
}
