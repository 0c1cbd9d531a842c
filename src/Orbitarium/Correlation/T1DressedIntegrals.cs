using Orbitarium.LinearAlgebra;

namespace Orbitarium.Correlation;

/// <summary>
/// The MO repulsion integrals of a closed-shell reference in the T1-transformed frame,
/// g̃_pqrs = Σ X_tp Y_uq X_vr Y_ws (tu|vw) with X = 1 − t1ᵀ, Y = 1 + t1 (Koch, Christiansen, Kobayashi, Jørgensen and
/// Helgaker, Chem. Phys. Lett. 228, 233 (1994)), held in place in one array and re-dressed by the change of t1, and
/// the dressed Fock matrix built from them.
/// </summary>
/// <remarks>
/// X(t)·X(Δ) = X(t + Δ) and Y(t)·Y(Δ) = Y(t + Δ) because t1ᵀt1ᵀ = 0 and t1t1 = 0, so dressing with t and then Δ equals
/// dressing with t + Δ, and dressing back to zero undoes it to round-off. The (ia|jb) block is unchanged by any
/// dressing. Indices are active (occupied first, then virtual, frozen core skipped); the array itself spans all
/// orbitals, and the transformations carry the frozen rows and columns along.
/// </remarks>
internal sealed class T1DressedIntegrals
{
    private readonly double[] _g;
    private readonly int _stride, _frozen, _m, _o, _v;
    private readonly double[] _frozenCoreOperator;
    private readonly double[] _dressedWith;

    /// <summary>Wraps <paramref name="integrals"/> (all orbitals, undressed) for dressing in place.</summary>
    /// <param name="integrals">(pq|rs) over all <paramref name="stride"/> orbitals, row-major.</param>
    /// <param name="stride">All orbitals.</param>
    /// <param name="frozen">Frozen core orbitals (first).</param>
    /// <param name="occupied">Active occupied orbitals.</param>
    /// <param name="referenceFock">Reference Fock matrix over the active orbitals (frozen core included in it).</param>
    public T1DressedIntegrals(double[] integrals, int stride, int frozen, int occupied, double[] referenceFock)
    {
        _g = integrals;
        _stride = stride;
        _frozen = frozen;
        _m = stride - frozen;
        _o = occupied;
        _v = _m - occupied;
        int m = _m, o = _o;
        // h_fc = F − Σ_k∈active [2(pq|kk) − (pk|kq)]: the one-electron operator with the frozen core folded in.
        _frozenCoreOperator = new double[m * m];
        for (int p = 0; p < m; p++)
            for (int q = 0; q < m; q++)
            {
                double active = 0;
                for (int k = 0; k < o; k++) active += 2 * G(p, q, k, k) - G(p, k, k, q);
                _frozenCoreOperator[p * m + q] = referenceFock[p * m + q] - active;
            }
        _dressedWith = new double[o * _v];
    }

    /// <summary>Position of (pq|rs), active indices, in the array.</summary>
    public long Index(int p, int q, int r, int s) =>
        (((long)(p + _frozen) * _stride + q + _frozen) * _stride + r + _frozen) * _stride + s + _frozen;

    private double G(int p, int q, int r, int s) => _g[Index(p, q, r, s)];

    /// <summary>Re-dresses the integrals from the singles they carry to <paramref name="t1"/>, in place: only the
    /// change Δ = t1 − (current singles) is applied.</summary>
    public void DressWith(double[] t1)
    {
        int o = _o, v = _v;
        var delta = new double[o * v];
        bool any = false;
        for (int x = 0; x < delta.Length; x++)
        {
            delta[x] = t1[x] - _dressedWith[x];
            any |= delta[x] != 0;
        }
        if (!any) return;
        // The transformations act on the full array (frozen rows and columns are carried along unchanged in
        // meaning: they are never read with a dressed index by the equations). Each is a product
        // (TransposedProduct) of Δ with the occupied or virtual rows it reads, which are never the rows it writes.
        int n = _stride, f = _frozen, occ = f, vir = f + o;
        long n3 = (long)n * n * n, n2 = (long)n * n;
        var negDeltaT = new double[v * o];   // [a][k] = −Δ_k^a
        for (int k = 0; k < o; k++)
            for (int a = 0; a < v; a++) negDeltaT[a * o + k] = -delta[k * v + a];
        const int chunk = 2048;
        // Index 1 (X = 1 − Δᵀ): row a −= Σ_k Δ_k^a row k, over the n³ columns in chunks.
        long chunks1 = (n3 + chunk - 1) / chunk;
        Parallel.For(0L, chunks1, () => new double[chunk * o], (ci, _, columns) =>
        {
            long start = ci * chunk;
            int count = (int)Math.Min(chunk, n3 - start);
            for (int k = 0; k < o; k++)
            {
                long row = (occ + k) * n3 + start;
                for (int t = 0; t < count; t++) columns[t * o + k] = _g[row + t];
            }
            TransposedProduct.Multiply(negDeltaT, columns, _g, v, count, o, accumulate: true, parallel: false,
                cOffset: vir * n3 + start, cRowStride: n3);
            return columns;
        }, _ => { });
        // Index 2 (Y = 1 + Δ): in each block p, row i += Σ_c Δ_i^c row c, over the n² columns in chunks.
        Parallel.For(0, n, () => new double[chunk * v], (p, _, columns) =>
        {
            long block = p * n3;
            for (long start = 0; start < n2; start += chunk)
            {
                int count = (int)Math.Min(chunk, n2 - start);
                for (int c = 0; c < v; c++)
                {
                    long row = block + (vir + c) * n2 + start;
                    for (int t = 0; t < count; t++) columns[t * v + c] = _g[row + t];
                }
                TransposedProduct.Multiply(delta, columns, _g, o, count, v, accumulate: true, parallel: false,
                    cOffset: block + occ * n2 + start, cRowStride: n2);
            }
            return columns;
        }, _ => { });
        // Indices 3 and 4, within each (p, q) block of n×n: rows a −= Σ_k Δ_k^a rows k; columns i += Σ_c Δ_i^c columns c.
        Parallel.For(0, n, () => new double[n * o], (p, _, columns) =>
        {
            for (int q = 0; q < n; q++)
            {
                long block = p * n3 + q * n2;
                for (int k = 0; k < o; k++)
                {
                    long row = block + (long)(occ + k) * n;
                    for (int sIndex = 0; sIndex < n; sIndex++) columns[sIndex * o + k] = _g[row + sIndex];
                }
                TransposedProduct.Multiply(negDeltaT, columns, _g, v, n, o, accumulate: true, parallel: false,
                    cOffset: block + (long)vir * n, cRowStride: n);
                TransposedProduct.Multiply(_g, delta, _g, n, o, v, accumulate: true, parallel: false,
                    aOffset: block + vir, aRowStride: n, cOffset: block + occ, cRowStride: n);
            }
            return columns;
        }, _ => { });
        Array.Copy(t1, _dressedWith, t1.Length);
    }

    /// <summary>The dressed Fock matrix F̃ = Xᵀ h_fc Y + Σ_k [2 g̃_pqkk − g̃_pkkq] over the active orbitals.</summary>
    public double[] Fock()
    {
        int m = _m, o = _o, v = _v;
        var t1 = _dressedWith;
        var hy = new double[m * m];
        for (int t = 0; t < m; t++)
            for (int q = 0; q < m; q++)
            {
                double s = _frozenCoreOperator[t * m + q];
                if (q < o)
                    for (int c = 0; c < v; c++) s += _frozenCoreOperator[t * m + o + c] * t1[q * v + c];
                hy[t * m + q] = s;
            }
        var f = new double[m * m];
        for (int p = 0; p < m; p++)
            for (int q = 0; q < m; q++)
            {
                double s = hy[p * m + q];
                if (p >= o)
                    for (int k = 0; k < o; k++) s -= t1[k * v + p - o] * hy[k * m + q];
                for (int k = 0; k < o; k++) s += 2 * G(p, q, k, k) - G(p, k, k, q);
                f[p * m + q] = s;
            }
        return f;
    }

}
