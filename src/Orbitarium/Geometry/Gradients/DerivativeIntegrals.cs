using MathNet.Numerics.LinearAlgebra;
using Orbitarium.BasisSets;
using Orbitarium.Chemistry;
using Orbitarium.Integrals;
using Orbitarium.Parallelism;

namespace Orbitarium.Geometry.Gradients;

/// <summary>
/// Contractions of first-derivative integrals with fixed AO matrices: the building blocks of analytic SCF gradients.
/// Each returns 3·N values (x₁ y₁ z₁ x₂ …) in hartree/bohr.
/// </summary>
/// <remarks>
/// Derivatives of Gaussians: ∂/∂Aₓ [(x−Aₓ)^l e^{−α(x−Aₓ)²}] = 2α (x−Aₓ)^{l+1} e^{…} − l (x−Aₓ)^{l−1} e^{…}, so each
/// derivative block is assembled from the engine's raw integrals over shells of L+1 and L−1
/// (Helgaker, Jørgensen and Olsen, <i>Molecular Electronic-Structure Theory</i> (Wiley, 2000), §9.2.3 and §9.9).
/// Centre derivatives of the nuclear-attraction operator and of the fourth ERI centre follow from translational
/// invariance, Σ_centres ∂/∂R = 0. AO matrices are contracted in the Cartesian-component basis, M_c = Tᵀ M T.
/// </remarks>
public static class DerivativeIntegrals
{
    /// <summary>Σ_μν M_μν ∂S_μν/∂X (e.g. with the energy-weighted density W).</summary>
    public static double[] Overlap(MolecularBasis basis, Matrix<double> matrix) => OneElectron(basis, matrix, Kind.Overlap, default);

    /// <summary>Σ_μν M_μν ∂T_μν/∂X (kinetic energy).</summary>
    public static double[] Kinetic(MolecularBasis basis, Matrix<double> matrix) => OneElectron(basis, matrix, Kind.Kinetic, default);

    /// <summary>Σ_μν M_μν ∂V_μν/∂X for the nuclear attraction V = Σ_C −Z_C/|r − R_C|, including the derivative with
    /// respect to each nucleus' position in the operator.</summary>
    public static double[] NuclearAttraction(MolecularBasis basis, Matrix<double> matrix, CancellationToken cancellationToken = default) =>
        OneElectron(basis, matrix, Kind.Potential, cancellationToken);

    /// <summary>∂V_nn/∂X of the nuclear repulsion Σ Z_A Z_B/R_AB.</summary>
    public static double[] NuclearRepulsion(Molecule molecule)
    {
        ArgumentNullException.ThrowIfNull(molecule);
        var g = new double[3 * molecule.AtomCount];
        for (int a = 0; a < molecule.AtomCount; a++)
            for (int b = 0; b < molecule.AtomCount; b++)
            {
                if (a == b) continue;
                var d = molecule.Atoms[a].PositionBohr - molecule.Atoms[b].PositionBohr;
                double r = d.Length;
                double f = -molecule.Atoms[a].NuclearCharge * molecule.Atoms[b].NuclearCharge / (r * r * r);
                g[3 * a] += f * d.X; g[3 * a + 1] += f * d.Y; g[3 * a + 2] += f * d.Z;
            }
        return g;
    }

    /// <summary>
    /// ½ Σ Γ_μνλσ ∂(μν|λσ)/∂X with Γ = D_μν D_λσ − ½x Σ_σ (D^σ_μλ D^σ_νσ + D^σ_μσ D^σ_νλ), D = D^α + D^β:
    /// the derivative of the Coulomb energy minus <paramref name="exchangeFraction"/> times the exchange energy.
    /// </summary>
    /// <param name="basis">The basis.</param>
    /// <param name="densityAlpha">α AO density.</param>
    /// <param name="densityBeta">β AO density.</param>
    /// <param name="exchangeFraction">x: 1 for Hartree–Fock, the functional's share for hybrids, 0 for pure DFT.</param>
    /// <param name="cancellationToken">Stops the work.</param>
    public static double[] TwoElectron(MolecularBasis basis, Matrix<double> densityAlpha, Matrix<double> densityBeta,
        double exchangeFraction = 1.0, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(basis);
        var t = TransformMatrix(basis);
        var da = Cartesian(t, densityAlpha);
        var db = Cartesian(t, densityBeta);
        var dt = new double[da.Length];
        for (int i = 0; i < dt.Length; i++) dt[i] = da[i] + db[i];
        int nc = basis.CartesianFunctionCount;
        var shells = ShellData.For(basis);
        int ns = shells.Length;
        int natoms = basis.Molecule.AtomCount;
        var pairs = new List<(int A, int B)>();
        for (int a = 0; a < ns; a++)
            for (int b = 0; b <= a; b++) pairs.Add((a, b));
        var total = new double[3 * natoms];
        var partials = FixedOrderParallel.For(pairs.Count, FixedOrderParallel.MaxSets, () => new QuartetWorkspace(3 * natoms), (p, ws) =>
        {
            var (a, b) = pairs[p];
            for (int q = 0; q <= p; q++)
            {
                var (c, d) = pairs[q];
                double deg = (a == b ? 1 : 2) * (c == d ? 1 : 2) * (p == q ? 1 : 2);
                ws.Quartet(shells, a, b, c, d, dt, da, db, nc, exchangeFraction, 0.5 * deg);
            }
        }, cancellationToken);
        foreach (var ws in partials)
            for (int i = 0; i < total.Length; i++) total[i] += ws.Gradient[i];
        return total;
    }

    private enum Kind { Overlap, Kinetic, Potential }

    private static double[] OneElectron(MolecularBasis basis, Matrix<double> matrix, Kind kind, CancellationToken ct)
    {
        ArgumentNullException.ThrowIfNull(basis);
        ArgumentNullException.ThrowIfNull(matrix);
        var t = TransformMatrix(basis);
        var m = Cartesian(t, matrix);
        int nc = basis.CartesianFunctionCount;
        var shells = ShellData.For(basis);
        var mol = basis.Molecule;
        int natoms = mol.AtomCount;
        var g = new double[3 * natoms];
        var plus = new double[21 * 21];
        var minus = new double[21 * 21];
        Span<double> sum = stackalloc double[3];
        foreach (var sa in shells)
        {
            ct.ThrowIfCancellationRequested();
            if (sa.Atom < 0 && kind != Kind.Potential) continue;
            foreach (var sb in shells)
            {
                if (kind == Kind.Potential)
                {
                    for (int c = 0; c < natoms; c++)
                    {
                        var centre = mol.Atoms[c].PositionBohr;
                        double q = -mol.Atoms[c].NuclearCharge;
                        RawIntegrals.Potential(sa.Plus, sb.Raw, centre, q, plus);
                        if (sa.Minus is not null) RawIntegrals.Potential(sa.Minus, sb.Raw, centre, q, minus);
                        BraContract(sa, sb, plus, minus, m, nc, sum);
                        for (int k = 0; k < 3; k++)
                        {
                            if (sa.Atom >= 0) g[3 * sa.Atom + k] += 2 * sum[k];
                            g[3 * c + k] -= 2 * sum[k];
                        }
                    }
                }
                else
                {
                    if (kind == Kind.Overlap)
                    {
                        RawIntegrals.Overlap(sa.Plus, sb.Raw, plus);
                        if (sa.Minus is not null) RawIntegrals.Overlap(sa.Minus, sb.Raw, minus);
                    }
                    else
                    {
                        RawIntegrals.Kinetic(sa.Plus, sb.Raw, plus);
                        if (sa.Minus is not null) RawIntegrals.Kinetic(sa.Minus, sb.Raw, minus);
                    }
                    BraContract(sa, sb, plus, minus, m, nc, sum);
                    for (int k = 0; k < 3; k++) g[3 * sa.Atom + k] += 2 * sum[k];
                }
            }
        }
        return g;
    }

    /// <summary>sum[k] = Σ_{ia,ib} M[a+ia, b+ib] · (∂_k a_ia | b_ib) from the L+1 and L−1 blocks.</summary>
    private static void BraContract(ShellData sa, ShellData sb, double[] plus, double[] minus, double[] m, int nc, Span<double> sum)
    {
        sum.Clear();
        int la = sa.L, na = sa.Count, nb = sb.Count;
        int[] pw = CartesianIndex.Power[la], up = CartesianIndex.Plus[la], down = CartesianIndex.Minus[la];
        for (int ia = 0; ia < na; ia++)
        {
            int row = (sa.Offset + ia) * nc + sb.Offset;
            for (int k = 0; k < 3; k++)
            {
                int ip = up[3 * ia + k];
                int l = pw[3 * ia + k];
                int im = down[3 * ia + k];
                double s = 0;
                for (int ib = 0; ib < nb; ib++)
                {
                    double v = plus[ip * nb + ib];
                    if (l > 0) v -= l * minus[im * nb + ib];
                    s += m[row + ib] * v;
                }
                sum[k] += s;
            }
        }
    }

    internal static Matrix<double> TransformMatrix(MolecularBasis basis)
    {
        var t = Matrix<double>.Build.Dense(basis.FunctionCount, basis.CartesianFunctionCount);
        int f = 0, c = 0;
        foreach (var sh in basis.Shells)
        {
            var tr = sh.Transform;
            for (int i = 0; i < sh.FunctionCount; i++)
                for (int j = 0; j < sh.CartesianCount; j++) t[f + i, c + j] = tr[i, j];
            f += sh.FunctionCount;
            c += sh.CartesianCount;
        }
        return t;
    }

    private static double[] Cartesian(Matrix<double> t, Matrix<double> m)
    {
        if (m.RowCount != t.RowCount || m.ColumnCount != t.RowCount)
            throw new ArgumentException($"The AO matrix must be {t.RowCount}x{t.RowCount} (the basis size), got {m.RowCount}x{m.ColumnCount}.");
        var mc = t.Transpose() * m * t;
        int n = mc.RowCount;
        var a = new double[n * n];
        for (int i = 0; i < n; i++)
            for (int j = 0; j < n; j++) a[i * n + j] = mc[i, j];
        return a;
    }

    /// <summary>Raw forms of a shell and of its L+1 (coefficients 2αc) and L−1 (coefficients c) derivative shells.</summary>
    private sealed class ShellData
    {
        public required RawShell Raw { get; init; }
        public required RawShell Plus { get; init; }
        public RawShell? Minus { get; init; }
        public required int L { get; init; }
        public required int Count { get; init; }
        public required int Offset { get; init; }
        public required int Atom { get; init; }

        public static ShellData[] For(MolecularBasis basis)
        {
            var list = new ShellData[basis.Shells.Length];
            int offset = 0;
            for (int s = 0; s < list.Length; s++)
            {
                var sh = basis.Shells[s];
                var raw = RawShell.FromShell(sh);
                var alpha = raw.Exponents;
                var twoAlphaC = new double[alpha.Length];
                for (int i = 0; i < alpha.Length; i++) twoAlphaC[i] = 2 * alpha[i] * raw.Coefficients[i];
                list[s] = new ShellData
                {
                    Raw = raw,
                    Plus = new RawShell(sh.AngularMomentum + 1, sh.CenterBohr, alpha, twoAlphaC),
                    Minus = sh.AngularMomentum > 0 ? new RawShell(sh.AngularMomentum - 1, sh.CenterBohr, alpha, raw.Coefficients) : null,
                    L = sh.AngularMomentum,
                    Count = sh.CartesianCount,
                    Offset = offset,
                    Atom = sh.AtomIndex,
                };
                offset += sh.CartesianCount;
            }
            return list;
        }
    }

    /// <summary>Per-thread buffers and gradient accumulator for ERI derivative quartets.</summary>
    private sealed class QuartetWorkspace(int gradientLength)
    {
        private const int MaxBlock = 21 * 15 * 15 * 15;
        private readonly double[] _gamma = new double[15 * 15 * 15 * 15];
        private readonly double[] _plus = new double[MaxBlock];
        private readonly double[] _minus = new double[MaxBlock];
        private readonly ShellData[] _s = new ShellData[4];
        public readonly double[] Gradient = new double[gradientLength];

        public void Quartet(ShellData[] shells, int a, int b, int c, int d, double[] dt, double[] da, double[] db, int nc,
            double x, double factor)
        {
            var s = _s;
            s[0] = shells[a]; s[1] = shells[b]; s[2] = shells[c]; s[3] = shells[d];
            int n0 = s[0].Count, n1 = s[1].Count, n2 = s[2].Count, n3 = s[3].Count;
            double maxGamma = 0;
            for (int i = 0; i < n0; i++)
            {
                int gi = s[0].Offset + i;
                for (int j = 0; j < n1; j++)
                {
                    int gj = s[1].Offset + j;
                    for (int k = 0; k < n2; k++)
                    {
                        int gk = s[2].Offset + k;
                        for (int l = 0; l < n3; l++)
                        {
                            int gl = s[3].Offset + l;
                            double v = dt[gi * nc + gj] * dt[gk * nc + gl]
                                       - 0.5 * x * (da[gi * nc + gk] * da[gj * nc + gl] + da[gi * nc + gl] * da[gj * nc + gk]
                                                  + db[gi * nc + gk] * db[gj * nc + gl] + db[gi * nc + gl] * db[gj * nc + gk]);
                            _gamma[((i * n1 + j) * n2 + k) * n3 + l] = v;
                            maxGamma = Math.Max(maxGamma, Math.Abs(v));
                        }
                    }
                }
            }
            if (maxGamma < 1e-14) return;
            Span<double> centreSum = stackalloc double[9];
            centreSum.Clear();
            for (int pos = 0; pos < 3; pos++)
            {
                var sh = s[pos];
                RawShell P(int p) => p == pos ? sh.Plus : s[p].Raw;
                RawIntegrals.ElectronRepulsion(P(0), P(1), P(2), P(3), _plus);
                if (sh.Minus is not null)
                {
                    RawShell M(int p) => p == pos ? sh.Minus : s[p].Raw;
                    RawIntegrals.ElectronRepulsion(M(0), M(1), M(2), M(3), _minus);
                }
                Contract(pos, sh.L, n0, n1, n2, n3, centreSum.Slice(3 * pos, 3));
            }
            for (int pos = 0; pos < 4; pos++)
            {
                int atom = s[pos].Atom;
                if (atom < 0) continue;
                for (int k = 0; k < 3; k++)
                {
                    double v = pos < 3 ? centreSum[3 * pos + k] : -(centreSum[k] + centreSum[3 + k] + centreSum[6 + k]);
                    Gradient[3 * atom + k] += factor * v;
                }
            }
        }

        /// <summary>Σ Γ · (derivative block at index position <paramref name="pos"/>) for the three axes.</summary>
        private void Contract(int pos, int l, int n0, int n1, int n2, int n3, Span<double> sum)
        {
            int[] pw = CartesianIndex.Power[l], up = CartesianIndex.Plus[l], down = CartesianIndex.Minus[l];
            int nPlus = CartesianIndex.Count(l + 1), nMinus = l > 0 ? CartesianIndex.Count(l - 1) : 0;

            Span<int> dp = [n0, n1, n2, n3];
            Span<int> dm = [n0, n1, n2, n3];
            dp[pos] = nPlus; dm[pos] = nMinus;
            Span<int> idx = stackalloc int[4];
            for (int i = 0; i < n0; i++)
                for (int j = 0; j < n1; j++)
                    for (int k = 0; k < n2; k++)
                        for (int m = 0; m < n3; m++)
                        {
                            double g = _gamma[((i * n1 + j) * n2 + k) * n3 + m];
                            if (g == 0) continue;
                            idx[0] = i; idx[1] = j; idx[2] = k; idx[3] = m;
                            int c = idx[pos];
                            for (int axis = 0; axis < 3; axis++)
                            {
                                idx[pos] = up[3 * c + axis];
                                double v = _plus[((idx[0] * dp[1] + idx[1]) * dp[2] + idx[2]) * dp[3] + idx[3]];
                                int power = pw[3 * c + axis];
                                if (power > 0)
                                {
                                    idx[pos] = down[3 * c + axis];
                                    v -= power * _minus[((idx[0] * dm[1] + idx[1]) * dm[2] + idx[2]) * dm[3] + idx[3]];
                                }
                                idx[pos] = c;
                                sum[axis] += g * v;
                            }
                        }
        }
    }
}
