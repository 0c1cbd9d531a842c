using Orbitarium.BasisSets;

namespace Orbitarium.Integrals;

/// <summary>
/// Shared, read-only data for evaluating electron-repulsion shell quartets over a molecular basis: raw shells,
/// their transforms, the pair data of every shell pair P ≥ Q and the Cauchy–Schwarz factors
/// Q_PQ = max over functions of √|(μν|μν)|. Create one <see cref="Worker"/> per thread for the buffers.
/// </summary>
internal sealed class ShellQuartetEvaluator
{
    /// <summary>Prepares the evaluator (computes all diagonal quartets for the Schwarz factors, in parallel).</summary>
    public ShellQuartetEvaluator(MolecularBasis basis, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(basis);
        Basis = basis;
        int ns = basis.Shells.Length;
        ShellCount = ns;
        Raw = new RawShell[ns];
        Transforms = new ShellTransform[ns];
        Offsets = [.. basis.ShellOffsets];
        for (int s = 0; s < ns; s++)
        {
            Raw[s] = RawShell.FromShell(basis.Shells[s]);
            Transforms[s] = ShellTransform.For(basis.Shells[s]);
        }
        int maxL = basis.Shells.Length == 0 ? 0 : basis.MaxAngularMomentum;
        MaxCartesian = CartesianIndex.Count(maxL);
        PairCount = ns * (ns + 1) / 2;
        Pairs = new ShellPairData[PairCount];
        Schwarz = new double[PairCount];
        var pairs = Pairs;
        var schwarz = Schwarz;
        Parallel.For(0, ns, new ParallelOptions { CancellationToken = cancellationToken }, () => new Worker(this), (p, _, w) =>
        {
            for (int q = 0; q <= p; q++)
            {
                int pq = PairIndex(p, q);
                // The recurrences are cheapest with the higher angular momentum first.
                pairs[pq] = Raw[p].AngularMomentum >= Raw[q].AngularMomentum ? new ShellPairData(Raw[p], Raw[q]) : new ShellPairData(Raw[q], Raw[p]);
            }
            for (int q = 0; q <= p; q++)
            {
                int pq = PairIndex(p, q);
                var block = w.Compute(p, q, p, q);
                int fp = Transforms[p].Rows, fq = Transforms[q].Rows;
                double max = 0;
                for (int i = 0; i < fp; i++)
                    for (int j = 0; j < fq; j++)
                    {
                        int ij = i * fq + j;
                        max = Math.Max(max, Math.Abs(block[ij * fp * fq + ij]));
                    }
                schwarz[pq] = Math.Sqrt(max);
            }
            return w;
        }, _ => { });
    }

    /// <summary>The basis.</summary>
    public MolecularBasis Basis { get; }

    /// <summary>Number of shells.</summary>
    public int ShellCount { get; }

    /// <summary>Number of shell pairs P ≥ Q.</summary>
    public int PairCount { get; }

    /// <summary>Raw form of each shell.</summary>
    public RawShell[] Raw { get; }

    /// <summary>Transform of each shell.</summary>
    public ShellTransform[] Transforms { get; }

    /// <summary>First basis function of each shell.</summary>
    public int[] Offsets { get; }

    /// <summary>Largest Cartesian component count of any shell.</summary>
    public int MaxCartesian { get; }

    /// <summary>Pair data indexed by <see cref="PairIndex"/>; for P ≥ Q the pair is (P, Q) unless L(P) &lt; L(Q), when it is (Q, P).</summary>
    public ShellPairData[] Pairs { get; }

    /// <summary>Cauchy–Schwarz factor of each pair, indexed by <see cref="PairIndex"/>.</summary>
    public double[] Schwarz { get; }

    /// <summary>Index of the pair (P, Q) with P ≥ Q: P(P+1)/2 + Q.</summary>
    public static int PairIndex(int p, int q) => p * (p + 1) / 2 + q;

    /// <summary>Per-thread evaluation buffers.</summary>
    public sealed class Worker
    {
        private readonly ShellQuartetEvaluator _owner;
        private readonly HeadGordonPople _engine = new();
        private readonly double[] _raw;
        private readonly double[] _result;

        /// <summary>Creates buffers for the largest quartet of the basis.</summary>
        public Worker(ShellQuartetEvaluator owner)
        {
            _owner = owner;
            int n = owner.MaxCartesian;
            _raw = new double[n * n * n * n];
            _result = new double[n * n * n * n];
        }

        /// <summary>Computes (PQ|RS) over basis functions, laid out [fp][fq][fr][fs]; P ≥ Q and R ≥ S required.
        /// The returned span is overwritten by the next call.</summary>
        public ReadOnlySpan<double> Compute(int p, int q, int r, int s)
        {
            var ab = _owner.Pairs[PairIndex(p, q)];
            var cd = _owner.Pairs[PairIndex(r, s)];
            int len = HeadGordonPople.ResultLength(ab, cd);
            bool swapBra = !ReferenceEquals(ab.A, _owner.Raw[p]);
            bool swapKet = !ReferenceEquals(cd.A, _owner.Raw[r]);
            swapBra &= p != q;
            swapKet &= r != s;
            var t = _owner.Transforms;
            if (!swapBra && !swapKet)
            {
                _engine.Compute(ab, cd, _raw.AsSpan(0, len));
            }
            else
            {
                // Computed as (ab|cd) with a, b (and/or c, d) exchanged: reorder to [p][q][r][s].
                _engine.Compute(ab, cd, _result.AsSpan(0, len));
                int n0 = ab.A.CartesianCount, n1 = ab.B.CartesianCount, n2 = cd.A.CartesianCount, n3 = cd.B.CartesianCount;
                int nq = t[q].Columns, nr = t[r].Columns, ns = t[s].Columns;
                for (int i0 = 0; i0 < n0; i0++)
                    for (int i1 = 0; i1 < n1; i1++)
                        for (int i2 = 0; i2 < n2; i2++)
                            for (int i3 = 0; i3 < n3; i3++)
                            {
                                int ip = swapBra ? i1 : i0, iq = swapBra ? i0 : i1;
                                int ir = swapKet ? i3 : i2, js = swapKet ? i2 : i3;
                                _raw[((ip * nq + iq) * nr + ir) * ns + js] = _result[((i0 * n1 + i1) * n2 + i2) * n3 + i3];
                            }
            }
            ShellTransform.Apply4(t[p], t[q], t[r], t[s], _raw, _result);
            return _result.AsSpan(0, t[p].Rows * t[q].Rows * t[r].Rows * t[s].Rows);
        }
    }
}
