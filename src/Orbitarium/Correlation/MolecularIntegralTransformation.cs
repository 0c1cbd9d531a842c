using MathNet.Numerics.LinearAlgebra;

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
        return Transform(aoRepulsion.ToArray(), n, ToRowMajor(c1), c1.ColumnCount, ToRowMajor(c2), c2.ColumnCount,
            ToRowMajor(c3), c3.ColumnCount, ToRowMajor(c4), c4.ColumnCount, cancellationToken);
    }

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
        var h = TransformOneElectron(aoCoreHamiltonian, coefficients, coefficients);
        var g = TransformRepulsion(aoRepulsion, coefficients, coefficients, coefficients, coefficients, cancellationToken);
        var d = aoDipole is null ? null : TransformDipole(aoDipole, coefficients);
        return MolecularOrbitalHamiltonian.Restricted(coefficients.ColumnCount, alphaOccupiedCount, betaOccupiedCount,
            orbitalEnergiesHartree, h, g, nuclearRepulsionEnergyHartree, d);
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
        ArgumentNullException.ThrowIfNull(coefficientsBeta);
        var ha = TransformOneElectron(aoCoreHamiltonian, coefficientsAlpha, coefficientsAlpha);
        var hb = TransformOneElectron(aoCoreHamiltonian, coefficientsBeta, coefficientsBeta);
        var ca = coefficientsAlpha;
        var cb = coefficientsBeta;
        var gaa = TransformRepulsion(aoRepulsion, ca, ca, ca, ca, cancellationToken);
        var gab = TransformRepulsion(aoRepulsion, ca, ca, cb, cb, cancellationToken);
        var gbb = TransformRepulsion(aoRepulsion, cb, cb, cb, cb, cancellationToken);
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
    internal static double[] Transform(double[] ao, int n, double[] c1, int k1, double[] c2, int k2, double[] c3, int k3,
        double[] c4, int k4, CancellationToken cancellationToken)
    {
        long n2 = (long)n * n, n3 = n2 * n;
        // Quarter 1: X1[p, νλσ] = Σ_μ C1[μ,p] (μν|λσ)                         O(k₁ N⁴)
        var x1 = new double[k1 * n3];
        Parallel.For(0, k1, new ParallelOptions { CancellationToken = cancellationToken }, p =>
        {
            var dst = x1.AsSpan((int)(p * n3), (int)n3);
            for (int mu = 0; mu < n; mu++)
            {
                double c = c1[mu * k1 + p];
                if (c == 0) continue;
                Axpy(c, ao.AsSpan((int)(mu * n3), (int)n3), dst);
            }
        });
        // Quarter 2: X2[pq, λσ] = Σ_ν C2[ν,q] X1[p, νλσ]                       O(k₁ k₂ N³)
        var x2 = new double[(long)k1 * k2 * n2];
        Parallel.For(0, k1, new ParallelOptions { CancellationToken = cancellationToken }, p =>
        {
            for (int q = 0; q < k2; q++)
            {
                var dst = x2.AsSpan((int)((p * k2 + q) * n2), (int)n2);
                for (int nu = 0; nu < n; nu++)
                {
                    double c = c2[nu * k2 + q];
                    if (c == 0) continue;
                    Axpy(c, x1.AsSpan((int)(p * n3 + nu * n2), (int)n2), dst);
                }
            }
        });
        x1 = null!;
        // Quarter 3: X3[pqr, σ] = Σ_λ C3[λ,r] X2[pq, λσ]                       O(k₁ k₂ k₃ N²)
        // Quarter 4: (pq|rs) = Σ_σ C4[σ,s] X3[pqr, σ]                          O(k₁ k₂ k₃ k₄ N)
        var result = new double[(long)k1 * k2 * k3 * k4];
        Parallel.For(0, k1 * k2, new ParallelOptions { CancellationToken = cancellationToken }, pq =>
        {
            var x3 = new double[k3 * n];
            var src = x2.AsSpan((int)(pq * n2), (int)n2);
            for (int r = 0; r < k3; r++)
            {
                var row = x3.AsSpan(r * n, n);
                for (int la = 0; la < n; la++)
                {
                    double c = c3[la * k3 + r];
                    if (c == 0) continue;
                    Axpy(c, src.Slice(la * n, n), row);
                }
            }
            var dst = result.AsSpan(pq * k3 * k4, k3 * k4);
            for (int r = 0; r < k3; r++)
            {
                var row = x3.AsSpan(r * n, n);
                for (int s = 0; s < k4; s++)
                {
                    double v = 0;
                    for (int sg = 0; sg < n; sg++) v += row[sg] * c4[sg * k4 + s];
                    dst[r * k4 + s] = v;
                }
            }
        });
        return result;
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
