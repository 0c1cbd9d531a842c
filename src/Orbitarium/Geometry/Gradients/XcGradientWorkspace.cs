using Orbitarium.BasisSets;
using Orbitarium.Chemistry;
using Orbitarium.Dft;
using Orbitarium.Dft.Functionals;
using Orbitarium.Dft.Grids;

namespace Orbitarium.Geometry.Gradients;

/// <summary>Per-thread buffers and the accumulated gradient of the exchange–correlation term
/// (see <see cref="KohnShamGradient"/>).</summary>
internal sealed class XcGradientWorkspace
{
    private const int MaxCartesian = 28;
    private readonly bool _polarized, _gga;
    private readonly double[] _phi, _grad, _hess, _dsub;
    private readonly double[][] _x, _y, _gradRho;
    private readonly XcPointBatch _points;
    private readonly int _stride;

    public XcGradientWorkspace(int atomCount, int maxBatchFunctions, bool polarized, bool gga)
    {
        _polarized = polarized;
        _gga = gga;
        int p = MolecularGrid.MaxBatchSize, m = maxBatchFunctions;
        _stride = p * m;
        _phi = new double[_stride];
        _grad = new double[3 * _stride];
        _hess = gga ? new double[6 * _stride] : [];
        _dsub = new double[m * m];
        int spins = polarized ? 2 : 1;
        _x = new double[spins][];
        _y = new double[spins][];
        _gradRho = new double[spins][];
        for (int s = 0; s < spins; s++)
        {
            _x[s] = new double[_stride];
            _y[s] = gga ? new double[3 * _stride] : [];
            _gradRho[s] = new double[3 * p];
        }
        _points = new XcPointBatch(p, polarized);
        Gradient = new double[3 * atomCount];
    }

    /// <summary>Accumulated ∂E_xc/∂X (hartree/bohr).</summary>
    public double[] Gradient { get; }

    private static int Pair(int j, int k) => j <= k ? (j == 0 ? k : j == 1 ? 2 + k : 5) : Pair(k, j);

    public void Process(MolecularGrid grid, GridBatch batch, BatchBasis bb, MolecularBasis full, ExchangeCorrelationFunctional functional,
        double[,] da, double[,] db)
    {
        int np = batch.Count, m = bb.Functions.Length;
        var pts = grid.PointsBohr.Slice(batch.Start, np);
        var w = grid.Weights.Slice(batch.Start, np);
        Evaluate(bb.Basis!, pts, m, np);
        var f = bb.Functions;
        int spins = _polarized ? 2 : 1;
        for (int s = 0; s < spins; s++)
        {
            for (int i = 0; i < m; i++)
                for (int j = 0; j < m; j++)
                    _dsub[i * m + j] = !_polarized ? da[f[i], f[j]] + db[f[i], f[j]] : s == 0 ? da[f[i], f[j]] : db[f[i], f[j]];
            var rho = s == 0 ? _points.RhoA : _points.RhoB;
            var x = _x[s];
            var gr = _gradRho[s];
            for (int p = 0; p < np; p++)
            {
                double r = 0, gx = 0, gy = 0, gz = 0;
                for (int mu = 0; mu < m; mu++)
                {
                    double sx = 0;
                    var drow = _dsub.AsSpan(mu * m, m);
                    var phiRow = _phi.AsSpan(p * m, m);
                    for (int nu = 0; nu < m; nu++) sx += drow[nu] * phiRow[nu];
                    x[p * m + mu] = sx;
                    r += sx * phiRow[mu];
                    gx += sx * _grad[p * m + mu];
                    gy += sx * _grad[_stride + p * m + mu];
                    gz += sx * _grad[2 * _stride + p * m + mu];
                    if (_gga)
                        for (int k = 0; k < 3; k++)
                        {
                            double sy = 0;
                            var gRow = _grad.AsSpan(k * _stride + p * m, m);
                            for (int nu = 0; nu < m; nu++) sy += drow[nu] * gRow[nu];
                            _y[s][k * _stride + p * m + mu] = sy;
                        }
                }
                rho[p] = Math.Max(r, 0);
                gr[3 * p] = 2 * gx; gr[3 * p + 1] = 2 * gy; gr[3 * p + 2] = 2 * gz;
            }
        }
        _points.Count = np;
        if (_gga)
            for (int p = 0; p < np; p++)
            {
                var a = _gradRho[0];
                _points.SigmaAA[p] = a[3 * p] * a[3 * p] + a[3 * p + 1] * a[3 * p + 1] + a[3 * p + 2] * a[3 * p + 2];
                if (!_polarized) continue;
                var b = _gradRho[1];
                _points.SigmaAB[p] = a[3 * p] * b[3 * p] + a[3 * p + 1] * b[3 * p + 1] + a[3 * p + 2] * b[3 * p + 2];
                _points.SigmaBB[p] = b[3 * p] * b[3 * p] + b[3 * p + 1] * b[3 * p + 1] + b[3 * p + 2] * b[3 * p + 2];
            }
        functional.Evaluate(_points);

        var atomOf = full.FunctionAtoms;
        Span<double> g = stackalloc double[3];
        for (int s = 0; s < spins; s++)
        {
            var vrho = s == 0 ? _points.VRhoA : _points.VRhoB;
            var vsSame = s == 0 ? _points.VSigmaAA : _points.VSigmaBB;
            var same = _gradRho[s];
            var other = _polarized ? _gradRho[1 - s] : same;
            var x = _x[s];
            for (int p = 0; p < np; p++)
            {
                double wp = w[p], vr = vrho[p];
                if (_gga)
                    for (int k = 0; k < 3; k++)
                        g[k] = 2 * vsSame[p] * same[3 * p + k] + (_polarized ? _points.VSigmaAB[p] * other[3 * p + k] : 0);
                for (int mu = 0; mu < m; mu++)
                {
                    int idx = p * m + mu;
                    double xm = x[idx];
                    int atom = atomOf[f[mu]];
                    for (int j = 0; j < 3; j++)
                    {
                        double dj = _grad[j * _stride + idx];
                        double c = vr * dj * xm;
                        if (_gga)
                            for (int k = 0; k < 3; k++)
                                c += g[k] * (_hess[Pair(j, k) * _stride + idx] * xm + dj * _y[s][k * _stride + idx]);
                        Gradient[3 * atom + j] -= 2 * wp * c;
                    }
                }
            }
        }
    }

    /// <summary>Values, gradients and (for a GGA) second derivatives of the batch's basis functions, point-major
    /// ([p·m + μ], component c at offset c·stride; Hessian order xx, xy, xz, yy, yz, zz).</summary>
    private void Evaluate(MolecularBasis basis, ReadOnlySpan<Vector3D> points, int m, int np)
    {
        Span<double> cv = stackalloc double[MaxCartesian];
        Span<double> cg = stackalloc double[3 * MaxCartesian];
        Span<double> ch = stackalloc double[6 * MaxCartesian];
        Span<double> pw = stackalloc double[3 * 10];
        Span<int> e = stackalloc int[3];
        Span<double> d = stackalloc double[3];
        var shells = basis.Shells;
        for (int p = 0; p < np; p++)
        {
            for (int s = 0; s < shells.Length; s++)
            {
                var sh = shells[s];
                int off = p * m + basis.ShellOffsets[s];
                int nf = sh.FunctionCount;
                d[0] = points[p].X - sh.CenterBohr.X; d[1] = points[p].Y - sh.CenterBohr.Y; d[2] = points[p].Z - sh.CenterBohr.Z;
                double r2 = d[0] * d[0] + d[1] * d[1] + d[2] * d[2];
                double r0 = 0, r1 = 0, rr2 = 0; // R, dR/d(r²)·2 = Σ −2αc e, Σ 4α²c e
                var a = sh.ExponentArray;
                var c = sh.CoefficientArray;
                for (int k = 0; k < a.Length; k++)
                {
                    double ar2 = a[k] * r2;
                    if (ar2 >= BasisFunctionEvaluator.ExponentCutoff) continue;
                    double ex = c[k] * Math.Exp(-ar2);
                    r0 += ex; r1 -= 2 * a[k] * ex; rr2 += 4 * a[k] * a[k] * ex;
                }
                int l = sh.AngularMomentum;
                for (int ax = 0; ax < 3; ax++)
                {
                    pw[ax * 10] = 1;
                    for (int q = 1; q <= l + 2; q++) pw[ax * 10 + q] = pw[ax * 10 + q - 1] * d[ax];
                }
                var comps = AngularMomentum.CartesianComponents(l);
                int nc = comps.Count;
                for (int q = 0; q < nc; q++)
                {
                    (e[0], e[1], e[2]) = comps[q];
                    cv[q] = Pw(pw, 0, e[0]) * Pw(pw, 1, e[1]) * Pw(pw, 2, e[2]) * r0;
                    for (int j = 0; j < 3; j++)
                    {
                        int k1 = (j + 1) % 3, k2 = (j + 2) % 3;
                        double rest = Pw(pw, k1, e[k1]) * Pw(pw, k2, e[k2]);
                        // ∂_j [x^i R] = i x^{i−1} R + x^{i+1} R1
                        cg[j * MaxCartesian + q] = rest * (e[j] * Pw(pw, j, e[j] - 1) * r0 + Pw(pw, j, e[j] + 1) * r1);
                        if (!_gga) continue;
                        // ∂_j∂_j [x^i R] = i(i−1) x^{i−2} R + (2i+1) x^i R1 + x^{i+2} R2
                        int i = e[j];
                        ch[Pair(j, j) * MaxCartesian + q] = rest * (i * (i - 1) * Pw(pw, j, i - 2) * r0 + (2 * i + 1) * Pw(pw, j, i) * r1 + Pw(pw, j, i + 2) * rr2);
                        for (int k = j + 1; k < 3; k++)
                        {
                            int o = 3 - j - k, jj = e[j], kk = e[k];
                            double po = Pw(pw, o, e[o]);
                            ch[Pair(j, k) * MaxCartesian + q] = po * (jj * kk * Pw(pw, j, jj - 1) * Pw(pw, k, kk - 1) * r0
                                + jj * Pw(pw, j, jj - 1) * Pw(pw, k, kk + 1) * r1 + kk * Pw(pw, j, jj + 1) * Pw(pw, k, kk - 1) * r1
                                + Pw(pw, j, jj + 1) * Pw(pw, k, kk + 1) * rr2);
                        }
                    }
                }
                var t = sh.Transform;
                Transform(t, cv, _phi.AsSpan(off, nf));
                for (int j = 0; j < 3; j++) Transform(t, cg.Slice(j * MaxCartesian, nc), _grad.AsSpan(j * _stride + off, nf));
                if (_gga)
                    for (int h = 0; h < 6; h++) Transform(t, ch.Slice(h * MaxCartesian, nc), _hess.AsSpan(h * _stride + off, nf));
            }
        }
    }

    private static double Pw(ReadOnlySpan<double> pw, int axis, int power) => power < 0 ? 0 : pw[axis * 10 + power];

    private static void Transform(double[,] t, ReadOnlySpan<double> cart, Span<double> output)
    {
        int nf = t.GetLength(0), nc = t.GetLength(1);
        for (int i = 0; i < nf; i++)
        {
            double sum = 0;
            for (int q = 0; q < nc; q++) sum += t[i, q] * cart[q];
            output[i] = sum;
        }
    }
}
