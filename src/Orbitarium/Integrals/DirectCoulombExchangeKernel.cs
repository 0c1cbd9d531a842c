using MathNet.Numerics.LinearAlgebra;
using Orbitarium.BasisSets;

using Orbitarium.Parallelism;

namespace Orbitarium.Integrals;

/// <summary>
/// Builds Coulomb and exchange matrices integral-direct: every call recomputes the electron-repulsion shell quartets
/// (Head-Gordon–Pople scheme), skipping those whose Cauchy–Schwarz bound times the largest density element they
/// touch is below the threshold; parallel over shell pairs.
/// </summary>
/// <remarks>
/// Screening (J. Almlöf, K. Faegri, K. Korsell, J. Comput. Chem. 3, 385 (1982); common practice): a quartet (PQ|RS) is
/// skipped when Q_PQ·Q_RS·max(4|D_PQ|, 4|D_RS|, |D_PR|, |D_PS|, |D_QR|, |D_QS|) &lt; threshold, with |D_XY| the largest
/// density element between shells X and Y over all densities given.
/// </remarks>
public sealed class DirectCoulombExchangeKernel : ICoulombExchangeKernel
{
    private readonly ShellQuartetEvaluator _evaluator;
    private readonly double _threshold;

    /// <summary>Prepares the kernel (computes the Cauchy–Schwarz factors once).</summary>
    /// <param name="basis">The basis.</param>
    /// <param name="screeningThreshold">Threshold in hartree on the density-weighted Schwarz bound (default 1e-12).</param>
    /// <exception cref="OrbitariumInputException">The threshold is negative or not finite.</exception>
    public DirectCoulombExchangeKernel(MolecularBasis basis, double screeningThreshold = 1e-12)
    {
        ArgumentNullException.ThrowIfNull(basis);
        if (!(screeningThreshold >= 0) || !double.IsFinite(screeningThreshold))
            throw new OrbitariumInputException($"The screening threshold {screeningThreshold} must be a finite number ≥ 0 (hartree).");
        _evaluator = new ShellQuartetEvaluator(basis);
        _threshold = screeningThreshold;
    }

    /// <inheritdoc />
    public MolecularBasis Basis => _evaluator.Basis;

    /// <inheritdoc />
    public string Mode => FormattableString.Invariant($"integral-direct (screening {_threshold:G2})");

    /// <summary>Number of shell quartets skipped by screening in the last <see cref="Build"/>.</summary>
    public long LastScreenedShellQuartetCount { get; private set; }

    /// <summary>Number of shell quartets computed in the last <see cref="Build"/>.</summary>
    public long LastComputedShellQuartetCount { get; private set; }

    /// <inheritdoc />
    public CoulombExchangeMatrices Build(IReadOnlyList<Matrix<double>> densities, bool withExchange = true, CancellationToken cancellationToken = default)
    {
        var eval = _evaluator;
        int n = eval.Basis.FunctionCount;
        var dens = CoulombExchangeAccumulator.DensityArrays(densities, n);
        int ns = eval.ShellCount;
        var offsets = eval.Offsets;
        var transforms = eval.Transforms;
        // Largest |D| per shell block over all densities.
        var dmax = new double[ns * ns];
        for (int p = 0; p < ns; p++)
            for (int q = 0; q < ns; q++)
            {
                double mx = 0;
                foreach (var d in dens)
                    for (int i = offsets[p]; i < offsets[p] + transforms[p].Rows; i++)
                        for (int j = offsets[q]; j < offsets[q] + transforms[q].Rows; j++)
                            mx = Math.Max(mx, Math.Abs(d[i * n + j]));
                dmax[p * ns + q] = mx;
            }
        int npairs = eval.PairCount;
        var pairP = new int[npairs]; var pairQ = new int[npairs];
        for (int p = 0; p < ns; p++)
            for (int q = 0; q <= p; q++) { int pq = ShellQuartetEvaluator.PairIndex(p, q); pairP[pq] = p; pairQ[pq] = q; }
        var schwarz = eval.Schwarz;
        double thr = _threshold;
        var jTotal = CoulombExchangeAccumulator.Zeros(dens.Length, n);
        var kTotal = withExchange ? CoulombExchangeAccumulator.Zeros(dens.Length, n) : null;
        long screened = 0, computed = 0;
        long bytesPerSet = (withExchange ? 16L : 8L) * dens.Length * n * n;
        var partials = FixedOrderParallel.For(npairs, FixedOrderParallel.SetCount(bytesPerSet),
            () => (new ShellQuartetEvaluator.Worker(eval), CoulombExchangeAccumulator.Zeros(dens.Length, n),
                   withExchange ? CoulombExchangeAccumulator.Zeros(dens.Length, n) : null, new long[2]),
            (index, acc) =>
            {
                int pq = npairs - 1 - index;
                int p = pairP[pq], q = pairQ[pq];
                double qpq = schwarz[pq];
                int fp = transforms[p].Rows, fq = transforms[q].Rows, op = offsets[p], oq = offsets[q];
                for (int rs = 0; rs <= pq; rs++)
                {
                    int r = pairP[rs], s = pairQ[rs];
                    double bound = qpq * schwarz[rs];
                    double dm = 4 * Math.Max(dmax[p * ns + q], dmax[r * ns + s]);
                    if (withExchange)
                        dm = Math.Max(dm, Math.Max(Math.Max(dmax[p * ns + r], dmax[p * ns + s]), Math.Max(dmax[q * ns + r], dmax[q * ns + s])));
                    if (bound * dm < thr) { acc.Item4[0]++; continue; }
                    acc.Item4[1]++;
                    var block = acc.Item1.Compute(p, q, r, s);
                    double scale = (p == q ? 0.5 : 1.0) * (r == s ? 0.5 : 1.0) * (pq == rs ? 0.5 : 1.0);
                    int fr = transforms[r].Rows, fs = transforms[s].Rows, or = offsets[r], os = offsets[s];
                    int t = 0;
                    for (int i = 0; i < fp; i++)
                        for (int j = 0; j < fq; j++)
                            for (int k = 0; k < fr; k++)
                                for (int l = 0; l < fs; l++, t++)
                                {
                                    double v = block[t];
                                    if (v == 0) continue;
                                    CoulombExchangeAccumulator.Scatter(scale * v, op + i, oq + j, or + k, os + l, n, dens, acc.Item2, acc.Item3);
                                }
                }
            }, cancellationToken);
        foreach (var acc in partials)
        {
            CoulombExchangeAccumulator.AddInto(jTotal, acc.Item2);
            if (kTotal is not null && acc.Item3 is not null) CoulombExchangeAccumulator.AddInto(kTotal, acc.Item3);
            screened += acc.Item4[0];
            computed += acc.Item4[1];
        }
        LastScreenedShellQuartetCount = screened;
        LastComputedShellQuartetCount = computed;
        return new CoulombExchangeMatrices(
            CoulombExchangeAccumulator.Symmetrised(jTotal, n),
            kTotal is null ? null : CoulombExchangeAccumulator.Symmetrised(kTotal, n));
    }
}
