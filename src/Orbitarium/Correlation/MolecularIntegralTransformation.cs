using MathNet.Numerics.LinearAlgebra;
using Orbitarium.Integrals;

namespace Orbitarium.Correlation;

/// <summary>
/// Transformation of atomic-orbital integrals to molecular orbitals. Two-electron integrals go through four
/// quarter-transformations, each O(N⁵), never the O(N⁸) direct sum.
/// </summary>
/// <remarks>
/// (pq|rs) = Σ_μ C_μp Σ_ν C_νq Σ_λ C_λr Σ_σ C_σs (μν|λσ), done one index at a time (the standard scheme, e.g.
/// A. Szabo and N. S. Ostlund, <i>Modern Quantum Chemistry</i>, Dover 1996, §3.4 and ch. 6). Coefficient matrices are
/// N×k (AO × MO, columns are orbitals); each index may use a different block of orbitals, so an MP2 calculation asks
/// only for (ia|jb). The AO tensor is dense N⁴, row-major, chemists' notation.
/// </remarks>
public static class MolecularIntegralTransformation
{
    /// <summary>
    /// Transforms dense AO repulsion integrals (μν|λσ) to (pq|rs) with orbitals p ∈ c1, q ∈ c2, r ∈ c3, s ∈ c4.
    /// </summary>
    /// <param name="aoRepulsion">N⁴ AO integrals, hartree, row-major.</param>
    /// <param name="c1">N×k₁ coefficients of the first index.</param>
    /// <param name="c2">N×k₂ coefficients of the second index.</param>
    /// <param name="c3">N×k₃ coefficients of the third index.</param>
    /// <param name="c4">N×k₄ coefficients of the fourth index.</param>
    /// <param name="cancellationToken">Stops the transformation.</param>
    /// <returns>k₁·k₂·k₃·k₄ integrals, row-major, hartree.</returns>
    public static double[] TransformRepulsion(ReadOnlySpan<double> aoRepulsion, Matrix<double> c1, Matrix<double> c2,
        Matrix<double> c3, Matrix<double> c4, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(c1);
        ArgumentNullException.ThrowIfNull(c2);
        ArgumentNullException.ThrowIfNull(c3);
        ArgumentNullException.ThrowIfNull(c4);
        int n = c1.RowCount;
        if (c2.RowCount != n || c3.RowCount != n || c4.RowCount != n)
            throw new OrbitariumInputException($"Coefficient matrices must all have {n} rows (basis functions), got {c1.RowCount}, {c2.RowCount}, {c3.RowCount}, {c4.RowCount}.");
        if (aoRepulsion.Length != (long)n * n * n * n)
            throw new OrbitariumInputException($"Expected N⁴ = {(long)n * n * n * n} AO repulsion integrals for {n} basis functions, got {aoRepulsion.Length}.");
        return TransformRepulsion(DenseSource(aoRepulsion.ToArray(), n), n, c1, c2, c3, c4, cancellationToken);
    }

    /// <summary>
    /// Transforms AO repulsion integrals held packed (8-fold symmetry) to (pq|rs) with orbitals p ∈ c1, q ∈ c2, r ∈ c3,
    /// s ∈ c4, reading one μ slab at a time: memory k₁N³ + k₁k₂N² + k₁k₂k₃k₄ beside the packed tensor, never a dense N⁴
    /// copy of the AO integrals.
    /// </summary>
    /// <param name="aoRepulsion">The packed AO integrals.</param>
    /// <param name="c1">N×k₁ coefficients of the first index.</param>
    /// <param name="c2">N×k₂ coefficients of the second index.</param>
    /// <param name="c3">N×k₃ coefficients of the third index.</param>
    /// <param name="c4">N×k₄ coefficients of the fourth index.</param>
    /// <param name="cancellationToken">Stops the transformation.</param>
    /// <returns>k₁·k₂·k₃·k₄ integrals, row-major, hartree.</returns>
    public static double[] TransformRepulsion(ElectronRepulsionTensor aoRepulsion, Matrix<double> c1, Matrix<double> c2,
        Matrix<double> c3, Matrix<double> c4, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(aoRepulsion);
        ArgumentNullException.ThrowIfNull(c1);
        ArgumentNullException.ThrowIfNull(c2);
        ArgumentNullException.ThrowIfNull(c3);
        ArgumentNullException.ThrowIfNull(c4);
        int n = aoRepulsion.FunctionCount;
        if (c1.RowCount != n || c2.RowCount != n || c3.RowCount != n || c4.RowCount != n)
            throw new OrbitariumInputException($"Coefficient matrices must all have {n} rows (basis functions), got {c1.RowCount}, {c2.RowCount}, {c3.RowCount}, {c4.RowCount}.");
        return TransformRepulsion(PackedSource(aoRepulsion), n, c1, c2, c3, c4, cancellationToken);
    }

    private static double[] TransformRepulsion(ColumnSource source, int n, Matrix<double> c1, Matrix<double> c2, Matrix<double> c3,
        Matrix<double> c4, CancellationToken cancellationToken) =>
        Transform(source, n, ToRowMajor(c1), c1.ColumnCount, ToRowMajor(c2), c2.ColumnCount, ToRowMajor(c3), c3.ColumnCount,
            ToRowMajor(c4), c4.ColumnCount, cancellationToken, firstPairSymmetric: ReferenceEquals(c1, c2) || c1.Equals(c2));

    private static ColumnSource DenseSource(double[] dense, int n)
    {
        long n3 = (long)n * n * n;
        return (start, count, buffer) =>
        {
            for (int t = 0; t < count; t++)
            {
                long flat = start + t;
                long nu = flat % n, la = flat / ((long)n * n), sg = flat / n % n;
                for (int mu = 0; mu < n; mu++) buffer[t * n + mu] = dense[mu * n3 + (nu * n + la) * n + sg];
            }
        };
    }

    private static ColumnSource PackedSource(ElectronRepulsionTensor tensor) => tensor.FillColumns;

    /// <summary>Bytes <see cref="TransformRepulsion(ElectronRepulsionTensor, Matrix{double}, Matrix{double}, Matrix{double}, Matrix{double}, CancellationToken)"/>
    /// needs at its peak beside the packed tensor, for N functions and k₁…k₄ orbitals.</summary>
    internal static double TransformDoubles(int n, int k1, int k2, int k3, int k4)
    {
        // X1 and X2 side by side, then X2 and the result (per-thread chunk buffers are small).
        double n2 = (double)n * n, n3 = n2 * n;
        double half = (double)k1 * k2 * n2;
        return Math.Max(k1 * n3 + half, half + (double)k1 * k2 * k3 * k4);
    }

    /// <summary>Fills <c>buffer</c>[(t − start)·N + μ] = (μν|λσ) for the flat indices t = (λ·N + σ)·N + ν in
    /// [start, start + count).</summary>
    internal delegate void ColumnSource(long start, int count, double[] buffer);

    /// <summary>Transforms an AO one-electron matrix: Σ_μν C1_μp A_μν C2_νq, returned k₁×k₂ row-major.</summary>
    /// <param name="ao">N×N AO matrix.</param>
    /// <param name="c1">N×k₁ coefficients of the bra.</param>
    /// <param name="c2">N×k₂ coefficients of the ket.</param>
    public static double[] TransformOneElectron(Matrix<double> ao, Matrix<double> c1, Matrix<double> c2)
    {
        ArgumentNullException.ThrowIfNull(ao);
        ArgumentNullException.ThrowIfNull(c1);
        ArgumentNullException.ThrowIfNull(c2);
        var m = c1.TransposeThisAndMultiply(ao * c2);
        return ToRowMajor(m);
    }

    /// <summary>
    /// Builds the MO Hamiltonian of a restricted reference from AO integrals and one set of MO coefficients.
    /// </summary>
    /// <param name="aoCoreHamiltonian">N×N kinetic + nuclear-attraction matrix, hartree.</param>
    /// <param name="aoRepulsion">N⁴ AO repulsion integrals, hartree.</param>
    /// <param name="coefficients">N×m MO coefficients (columns are orbitals, occupied first).</param>
    /// <param name="orbitalEnergiesHartree">m orbital energies, hartree.</param>
    /// <param name="alphaOccupiedCount">Occupied α orbitals.</param>
    /// <param name="betaOccupiedCount">Occupied β orbitals.</param>
    /// <param name="nuclearRepulsionEnergyHartree">Nuclear repulsion, hartree.</param>
    /// <param name="aoDipole">Optional AO dipole matrices (x, y, z), bohr, about any fixed origin.</param>
    /// <param name="cancellationToken">Stops the transformation.</param>
    public static MolecularOrbitalHamiltonian RestrictedHamiltonian(Matrix<double> aoCoreHamiltonian, ReadOnlySpan<double> aoRepulsion,
        Matrix<double> coefficients, ReadOnlySpan<double> orbitalEnergiesHartree, int alphaOccupiedCount, int betaOccupiedCount,
        double nuclearRepulsionEnergyHartree, IReadOnlyList<Matrix<double>>? aoDipole = null, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(coefficients);
        int n = coefficients.RowCount;
        CheckDenseLength(aoRepulsion.Length, n);
        return RestrictedHamiltonian(aoCoreHamiltonian, DenseSource(aoRepulsion.ToArray(), n), coefficients, orbitalEnergiesHartree,
            alphaOccupiedCount, betaOccupiedCount, nuclearRepulsionEnergyHartree, aoDipole, cancellationToken);
    }

    /// <summary>The restricted MO Hamiltonian from packed AO integrals (no dense AO copy).</summary>
    internal static MolecularOrbitalHamiltonian RestrictedHamiltonian(Matrix<double> aoCoreHamiltonian, ElectronRepulsionTensor aoRepulsion,
        Matrix<double> coefficients, ReadOnlySpan<double> orbitalEnergiesHartree, int alphaOccupiedCount, int betaOccupiedCount,
        double nuclearRepulsionEnergyHartree, IReadOnlyList<Matrix<double>>? aoDipole, CancellationToken cancellationToken) =>
        RestrictedHamiltonian(aoCoreHamiltonian, PackedSource(aoRepulsion), coefficients, orbitalEnergiesHartree, alphaOccupiedCount,
            betaOccupiedCount, nuclearRepulsionEnergyHartree, aoDipole, cancellationToken);

    private static MolecularOrbitalHamiltonian RestrictedHamiltonian(Matrix<double> aoCoreHamiltonian, ColumnSource aoRepulsion,
        Matrix<double> coefficients, ReadOnlySpan<double> orbitalEnergiesHartree, int alphaOccupiedCount, int betaOccupiedCount,
        double nuclearRepulsionEnergyHartree, IReadOnlyList<Matrix<double>>? aoDipole, CancellationToken cancellationToken)
    {
        ArgumentNullException.ThrowIfNull(coefficients);
        var h = TransformOneElectron(aoCoreHamiltonian, coefficients, coefficients);
        int n = coefficients.RowCount;
        var g = TransformRepulsion(aoRepulsion, n, coefficients, coefficients, coefficients, coefficients, cancellationToken);
        var d = aoDipole is null ? null : TransformDipole(aoDipole, coefficients);
        return MolecularOrbitalHamiltonian.Restricted(coefficients.ColumnCount, alphaOccupiedCount, betaOccupiedCount,
            orbitalEnergiesHartree, h, g, nuclearRepulsionEnergyHartree, d);
    }

    private static void CheckDenseLength(int length, int n)
    {
        if (length != (long)n * n * n * n)
            throw new OrbitariumInputException($"Expected N⁴ = {(long)n * n * n * n} AO repulsion integrals for {n} basis functions, got {length}.");
    }

    /// <summary>
    /// Builds the MO Hamiltonian of an unrestricted reference from AO integrals and α and β MO coefficients.
    /// </summary>
    /// <param name="aoCoreHamiltonian">N×N kinetic + nuclear-attraction matrix, hartree.</param>
    /// <param name="aoRepulsion">N⁴ AO repulsion integrals, hartree.</param>
    /// <param name="coefficientsAlpha">N×m α MO coefficients.</param>
    /// <param name="coefficientsBeta">N×m β MO coefficients.</param>
    /// <param name="orbitalEnergiesAlphaHartree">α orbital energies, hartree.</param>
    /// <param name="orbitalEnergiesBetaHartree">β orbital energies, hartree.</param>
    /// <param name="alphaOccupiedCount">Occupied α orbitals.</param>
    /// <param name="betaOccupiedCount">Occupied β orbitals.</param>
    /// <param name="nuclearRepulsionEnergyHartree">Nuclear repulsion, hartree.</param>
    /// <param name="aoDipole">Optional AO dipole matrices (x, y, z), bohr.</param>
    /// <param name="cancellationToken">Stops the transformation.</param>
    public static MolecularOrbitalHamiltonian UnrestrictedHamiltonian(Matrix<double> aoCoreHamiltonian, ReadOnlySpan<double> aoRepulsion,
        Matrix<double> coefficientsAlpha, Matrix<double> coefficientsBeta,
        ReadOnlySpan<double> orbitalEnergiesAlphaHartree, ReadOnlySpan<double> orbitalEnergiesBetaHartree,
        int alphaOccupiedCount, int betaOccupiedCount, double nuclearRepulsionEnergyHartree,
        IReadOnlyList<Matrix<double>>? aoDipole = null, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(coefficientsAlpha);
        int n = coefficientsAlpha.RowCount;
        CheckDenseLength(aoRepulsion.Length, n);
        return UnrestrictedHamiltonian(aoCoreHamiltonian, DenseSource(aoRepulsion.ToArray(), n), coefficientsAlpha, coefficientsBeta,
            orbitalEnergiesAlphaHartree, orbitalEnergiesBetaHartree, alphaOccupiedCount, betaOccupiedCount, nuclearRepulsionEnergyHartree,
            aoDipole, cancellationToken);
    }

    /// <summary>The unrestricted MO Hamiltonian from packed AO integrals (no dense AO copy).</summary>
    internal static MolecularOrbitalHamiltonian UnrestrictedHamiltonian(Matrix<double> aoCoreHamiltonian, ElectronRepulsionTensor aoRepulsion,
        Matrix<double> coefficientsAlpha, Matrix<double> coefficientsBeta,
        ReadOnlySpan<double> orbitalEnergiesAlphaHartree, ReadOnlySpan<double> orbitalEnergiesBetaHartree,
        int alphaOccupiedCount, int betaOccupiedCount, double nuclearRepulsionEnergyHartree,
        IReadOnlyList<Matrix<double>>? aoDipole, CancellationToken cancellationToken) =>
        UnrestrictedHamiltonian(aoCoreHamiltonian, PackedSource(aoRepulsion), coefficientsAlpha, coefficientsBeta, orbitalEnergiesAlphaHartree,
            orbitalEnergiesBetaHartree, alphaOccupiedCount, betaOccupiedCount, nuclearRepulsionEnergyHartree, aoDipole, cancellationToken);

    private static MolecularOrbitalHamiltonian UnrestrictedHamiltonian(Matrix<double> aoCoreHamiltonian, ColumnSource aoRepulsion,
        Matrix<double> coefficientsAlpha, Matrix<double> coefficientsBeta,
        ReadOnlySpan<double> orbitalEnergiesAlphaHartree, ReadOnlySpan<double> orbitalEnergiesBetaHartree,
        int alphaOccupiedCount, int betaOccupiedCount, double nuclearRepulsionEnergyHartree,
        IReadOnlyList<Matrix<double>>? aoDipole, CancellationToken cancellationToken)
    {
        ArgumentNullException.ThrowIfNull(coefficientsAlpha);
        ArgumentNullException.ThrowIfNull(coefficientsBeta);
        var ha = TransformOneElectron(aoCoreHamiltonian, coefficientsAlpha, coefficientsAlpha);
        var hb = TransformOneElectron(aoCoreHamiltonian, coefficientsBeta, coefficientsBeta);
        var ca = coefficientsAlpha;
        var cb = coefficientsBeta;
        int n = ca.RowCount;
        var gaa = TransformRepulsion(aoRepulsion, n, ca, ca, ca, ca, cancellationToken);
        var gab = TransformRepulsion(aoRepulsion, n, ca, ca, cb, cb, cancellationToken);
        var gbb = TransformRepulsion(aoRepulsion, n, cb, cb, cb, cb, cancellationToken);
        return MolecularOrbitalHamiltonian.Unrestricted(ca.ColumnCount, alphaOccupiedCount, betaOccupiedCount,
            orbitalEnergiesAlphaHartree, orbitalEnergiesBetaHartree, ha, hb, gaa, gab, gbb, nuclearRepulsionEnergyHartree,
            aoDipole is null ? null : TransformDipole(aoDipole, ca), aoDipole is null ? null : TransformDipole(aoDipole, cb));
    }

    private static double[][] TransformDipole(IReadOnlyList<Matrix<double>> aoDipole, Matrix<double> c)
    {
        if (aoDipole.Count != 3)
            throw new OrbitariumInputException($"Dipole integrals must be three matrices (x, y, z), got {aoDipole.Count}.");
        return [TransformOneElectron(aoDipole[0], c, c), TransformOneElectron(aoDipole[1], c, c), TransformOneElectron(aoDipole[2], c, c)];
    }

    internal static double[] ToRowMajor(Matrix<double> m)
    {
        var a = new double[m.RowCount * m.ColumnCount];
        for (int i = 0; i < m.RowCount; i++)
            for (int j = 0; j < m.ColumnCount; j++)
                a[i * m.ColumnCount + j] = m[i, j];
        return a;
    }

    /// <summary>The four quarter-transformations on row-major arrays (c_k is N×k_k).</summary>
    internal static double[] Transform(ColumnSource ao, int n, double[] c1, int k1, double[] c2, int k2, double[] c3, int k3,
        double[] c4, int k4, CancellationToken cancellationToken, bool firstPairSymmetric = false)
    {
        long n2 = (long)n * n, n3 = n2 * n;
        long largest = Math.Max(Math.Max((long)k1 * n3, (long)k1 * k2 * n2), (long)k1 * k2 * k3 * k4);
        if (largest > Array.MaxLength)
            throw new OrbitariumInputException(
                $"The integral transformation for {n} basis functions would need an array of {largest} numbers, more than .NET allows in one array ({Array.MaxLength}): use a smaller basis.");
        // Quarter 1: X1[p, λσν] = Σ_μ C1[μ,p] (μν|λσ)                         O(k₁ N⁴)
        // As products C1ᵀ·AO over chunks of the flat index λσν (ν fastest, the index quarter 2 sums over), so each
        // AO column is read once and X1 written once.
        var c1t = Transposed(c1, n, k1);
        // Every element of X1, X2 and the result is written by a product that starts from zero, so the arrays need
        // no clearing on allocation.
        var x1 = GC.AllocateUninitializedArray<double>((int)(k1 * n3));
        const int chunk = 512;
        long chunks = (n3 + chunk - 1) / chunk;
        Parallel.For(0L, chunks, new ParallelOptions { CancellationToken = cancellationToken },
            () => new double[chunk * n], (ci, _, columns) =>
            {
                long start = ci * chunk;
                int count = (int)Math.Min(chunk, n3 - start);
                ao(start, count, columns);
                LinearAlgebra.TransposedProduct.Multiply(c1t, columns, x1, k1, count, n, parallel: false, cOffset: start, cRowStride: n3);
                return columns;
            }, _ => { });
        // Quarter 2: X2[pq, λσ] = Σ_ν C2[ν,q] X1[p, λσν]                       O(k₁ k₂ N³), one product per p.
        // With the same orbitals on both indices (pq|rs) = (qp|rs): only q ≤ p is built, in triangular order, and
        // mirrored at the end, which halves quarters 2 to 4 and the X2 array.
        bool half = firstPairSymmetric && k1 == k2;
        var c2t = Transposed(c2, n, k2);
        int pairCount = half ? k1 * (k1 + 1) / 2 : k1 * k2;
        var pairP = new int[pairCount];
        var pairQ = new int[pairCount];
        for (int p = 0, at = 0; p < k1; p++)
            for (int q = 0; q < (half ? p + 1 : k2); q++, at++)
            {
                pairP[at] = p;
                pairQ[at] = q;
            }
        var x2 = GC.AllocateUninitializedArray<double>((int)(pairCount * n2));
        Parallel.For(0, k1, new ParallelOptions { CancellationToken = cancellationToken }, p =>
        {
            long firstPair = half ? (long)p * (p + 1) / 2 : (long)p * k2;
            LinearAlgebra.TransposedProduct.Multiply(c2t, x1, x2, half ? p + 1 : k2, (int)n2, n, parallel: false, bOffset: p * n3,
                cOffset: firstPair * n2);
        });
        // X1 is done with; when the result has its size (all orbitals), its pages are reused instead of fresh ones,
        // which on a virtual machine cost more to fault in than the arithmetic that fills them.
        long resultLength = (long)k1 * k2 * k3 * k4;
        var result = resultLength == x1.LongLength ? x1 : GC.AllocateUninitializedArray<double>((int)resultLength);
        x1 = null!;
        // Quarter 4 then 3, per pq: Z[λ, s] = Σ_σ X2[pq, λσ] C4[σ,s];  (pq|rs) = Σ_λ C3[λ,r] Z[λ, s]
        //                                                                       O(k₁ k₂ k₄ N² + k₁ k₂ k₃ k₄ N)
        var c3t = Transposed(c3, n, k3);
        var c4t = Transposed(c4, n, k4);
        int block = k3 * k4;
        Parallel.For(0, pairCount, new ParallelOptions { CancellationToken = cancellationToken },
            () => (Z: new double[n * k4], Zt: new double[k4 * n]), (pair, _, buffers) =>
            {
                int p = pairP[pair], q = pairQ[pair];
                LinearAlgebra.TransposedProduct.Multiply(x2, c4t, buffers.Z, n, k4, n, parallel: false, aOffset: pair * n2);
                for (int la = 0; la < n; la++)
                    for (int sIndex = 0; sIndex < k4; sIndex++) buffers.Zt[sIndex * n + la] = buffers.Z[la * k4 + sIndex];
                long target = ((long)p * k2 + q) * block;
                LinearAlgebra.TransposedProduct.Multiply(c3t, buffers.Zt, result, k3, k4, n, parallel: false, cOffset: target);
                if (half && p != q) Array.Copy(result, target, result, ((long)q * k2 + p) * block, block);
                return buffers;
            }, _ => { });
        return result;
    }

    /// <summary>The k×N transpose of an N×k row-major matrix.</summary>
    private static double[] Transposed(double[] c, int n, int k)
    {
        var t = new double[k * n];
        for (int mu = 0; mu < n; mu++)
            for (int p = 0; p < k; p++) t[p * n + mu] = c[mu * k + p];
        return t;
    }

    internal static void Axpy(double a, ReadOnlySpan<double> x, Span<double> y)
    {
        int i = 0;
        if (System.Numerics.Vector.IsHardwareAccelerated && x.Length >= System.Numerics.Vector<double>.Count)
        {
            int w = System.Numerics.Vector<double>.Count;
            var va = new System.Numerics.Vector<double>(a);
            for (; i <= x.Length - w; i += w)
            {
                var vy = new System.Numerics.Vector<double>(y.Slice(i, w));
                var vx = new System.Numerics.Vector<double>(x.Slice(i, w));
                (vy + va * vx).CopyTo(y.Slice(i, w));
            }
        }
        for (; i < x.Length; i++) y[i] += a * x[i];
    }

    internal static double Dot(ReadOnlySpan<double> x, ReadOnlySpan<double> y)
    {
        int i = 0;
        double s = 0;
        if (System.Numerics.Vector.IsHardwareAccelerated && x.Length >= System.Numerics.Vector<double>.Count)
        {
            int w = System.Numerics.Vector<double>.Count;
            var acc = System.Numerics.Vector<double>.Zero;
            for (; i <= x.Length - w; i += w)
                acc += new System.Numerics.Vector<double>(x.Slice(i, w)) * new System.Numerics.Vector<double>(y.Slice(i, w));
            s = System.Numerics.Vector.Sum(acc);
        }
        for (; i < x.Length; i++) s += x[i] * y[i];
        return s;
    }
}
