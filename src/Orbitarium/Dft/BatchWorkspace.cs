using Orbitarium.BasisSets;
using Orbitarium.Chemistry;
using Orbitarium.Dft.Functionals;
using Orbitarium.Dft.Grids;

namespace Orbitarium.Dft;

/// <summary>Per-thread buffers and accumulators of the grid integration (see <see cref="GridExchangeCorrelation"/>).</summary>
internal sealed class BatchWorkspace
{
    private readonly int _n;
    private readonly bool _polarized, _gga;
    private readonly double[] _phi, _gx, _gy, _gz, _xa, _xb, _za, _zb, _dsa, _dsb, _vsa, _vsb;
    private readonly double[] _gradA, _gradB; // 3 per point
    private readonly XcPointBatch _points;

    public BatchWorkspace(int functionCount, int maxBatchFunctions, bool polarized, bool gga)
    {
        _n = functionCount;
        _polarized = polarized;
        _gga = gga;
        int m = Math.Max(maxBatchFunctions, 1), p = MolecularGrid.MaxBatchSize;
        _phi = new double[p * m];
        _gx = gga ? new double[p * m] : [];
        _gy = gga ? new double[p * m] : [];
        _gz = gga ? new double[p * m] : [];
        _xa = new double[p * m];
        _xb = polarized ? new double[p * m] : [];
        _za = new double[p * m];
        _zb = polarized ? new double[p * m] : [];
        _dsa = new double[m * m];
        _dsb = polarized ? new double[m * m] : [];
        _vsa = new double[m * m];
        _vsb = polarized ? new double[m * m] : [];
        _gradA = new double[3 * p];
        _gradB = polarized ? new double[3 * p] : [];
        _points = new XcPointBatch(p, polarized);
        PotentialA = new double[functionCount * functionCount];
        PotentialB = polarized ? new double[functionCount * functionCount] : null;
    }

    public double Energy { get; private set; }
    public double Electrons { get; private set; }
    public double[] PotentialA { get; }
    public double[]? PotentialB { get; }

    public void Process(MolecularGrid grid, GridBatch batch, BatchBasis bb, ExchangeCorrelationFunctional functional, double[,] da, double[,] db)
    {
        int np = batch.Count, m = bb.Functions.Length;
        var pts = grid.PointsBohr.Slice(batch.Start, np);
        var w = grid.Weights.Slice(batch.Start, np);
        var phi = _phi.AsSpan(0, np * m);
        if (_gga) BasisFunctionEvaluator.EvaluateWithGradients(bb.Basis!, pts, phi, _gx.AsSpan(0, np * m), _gy.AsSpan(0, np * m), _gz.AsSpan(0, np * m));
        else BasisFunctionEvaluator.EvaluateValues(bb.Basis!, pts, phi);

        var f = bb.Functions;
        for (int i = 0; i < m; i++)
            for (int j = 0; j < m; j++)
            {
                if (_polarized)
                {
                    _dsa[i * m + j] = da[f[i], f[j]];
                    _dsb[i * m + j] = db[f[i], f[j]];
                }
                else _dsa[i * m + j] = da[f[i], f[j]] + db[f[i], f[j]];
            }

        Density(np, m, _dsa, _xa, _gradA, _points.RhoA);
        if (_polarized) Density(np, m, _dsb, _xb, _gradB, _points.RhoB);
        _points.Count = np;
        if (_gga)
        {
            for (int p = 0; p < np; p++)
            {
                double ax = _gradA[3 * p], ay = _gradA[3 * p + 1], az = _gradA[3 * p + 2];
                _points.SigmaAA[p] = ax * ax + ay * ay + az * az;
                if (!_polarized) continue;
                double bx = _gradB[3 * p], by = _gradB[3 * p + 1], bz = _gradB[3 * p + 2];
                _points.SigmaAB[p] = ax * bx + ay * by + az * bz;
                _points.SigmaBB[p] = bx * bx + by * by + bz * bz;
            }
        }
        functional.Evaluate(_points);

        double e = 0, ne = 0;
        for (int p = 0; p < np; p++)
        {
            e += w[p] * _points.EnergyDensity[p];
            ne += w[p] * (_polarized ? _points.RhoA[p] + _points.RhoB[p] : _points.RhoA[p]);
        }
        Energy += e;
        Electrons += ne;

        // Z_pμ = w_p (½ v_ρ φ_pμ + g_p·∇φ_pμ), g = 2 v_σ ∇ρ (closed shell) or 2 v_σαα ∇ρα + v_σαβ ∇ρβ (α).
        BuildZ(np, m, w, _points.VRhoA, _points.VSigmaAA, _points.VSigmaAB, _gradA, _gradB, _za);
        Accumulate(np, m, _za, _vsa, PotentialA, f);
        if (_polarized)
        {
            BuildZ(np, m, w, _points.VRhoB, _points.VSigmaBB, _points.VSigmaAB, _gradB, _gradA, _zb);
            Accumulate(np, m, _zb, _vsb, PotentialB!, f);
        }
    }

    private void Density(int np, int m, double[] d, double[] x, double[] grad, double[] rho)
    {
        for (int p = 0; p < np; p++)
        {
            var phiRow = _phi.AsSpan(p * m, m);
            var xRow = x.AsSpan(p * m, m);
            xRow.Clear();
            for (int mu = 0; mu < m; mu++)
            {
                double v = phiRow[mu];
                if (v == 0) continue;
                DenseKernels.Axpy(v, d.AsSpan(mu * m, m), xRow);
            }
            rho[p] = Math.Max(DenseKernels.Dot(xRow, phiRow), 0);
            if (_gga)
            {
                grad[3 * p] = 2 * DenseKernels.Dot(xRow, _gx.AsSpan(p * m, m));
                grad[3 * p + 1] = 2 * DenseKernels.Dot(xRow, _gy.AsSpan(p * m, m));
                grad[3 * p + 2] = 2 * DenseKernels.Dot(xRow, _gz.AsSpan(p * m, m));
            }
        }
    }

    private void BuildZ(int np, int m, ReadOnlySpan<double> w, double[] vrho, double[] vsigmaSame, double[] vsigmaCross,
        double[] gradSame, double[] gradOther, double[] z)
    {
        for (int p = 0; p < np; p++)
        {
            var zRow = z.AsSpan(p * m, m);
            var phiRow = _phi.AsSpan(p * m, m);
            double a = 0.5 * w[p] * vrho[p];
            for (int mu = 0; mu < m; mu++) zRow[mu] = a * phiRow[mu];
            if (!_gga) continue;
            double gx = 2 * vsigmaSame[p] * gradSame[3 * p], gy = 2 * vsigmaSame[p] * gradSame[3 * p + 1], gz = 2 * vsigmaSame[p] * gradSame[3 * p + 2];
            if (_polarized)
            {
                gx += vsigmaCross[p] * gradOther[3 * p];
                gy += vsigmaCross[p] * gradOther[3 * p + 1];
                gz += vsigmaCross[p] * gradOther[3 * p + 2];
            }
            gx *= w[p]; gy *= w[p]; gz *= w[p];
            DenseKernels.Axpy(gx, _gx.AsSpan(p * m, m), zRow);
            DenseKernels.Axpy(gy, _gy.AsSpan(p * m, m), zRow);
            DenseKernels.Axpy(gz, _gz.AsSpan(p * m, m), zRow);
        }
    }

    private void Accumulate(int np, int m, double[] z, double[] vs, double[] potential, int[] f)
    {
        // vs = Σ_p φ_pᵀ Z_p (m × m), then V[f_i, f_j] += vs_ij + vs_ji.
        Array.Clear(vs, 0, m * m);
        for (int p = 0; p < np; p++)
        {
            var phiRow = _phi.AsSpan(p * m, m);
            var zRow = z.AsSpan(p * m, m);
            for (int mu = 0; mu < m; mu++)
            {
                double v = phiRow[mu];
                if (v == 0) continue;
                DenseKernels.Axpy(v, zRow, vs.AsSpan(mu * m, m));
            }
        }
        for (int i = 0; i < m; i++)
        {
            int row = f[i] * _n;
            for (int j = 0; j < m; j++) potential[row + f[j]] += vs[i * m + j] + vs[j * m + i];
        }
    }
}
