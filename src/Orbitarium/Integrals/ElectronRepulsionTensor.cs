using Orbitarium.BasisSets;

namespace Orbitarium.Integrals;

/// <summary>
/// All electron-repulsion integrals (μν|λσ) of a basis (chemists' notation, hartree), stored once per
/// permutation class: the 8-fold symmetry (μν|λσ) = (νμ|λσ) = (μν|σλ) = (λσ|μν) leaves
/// M(M+1)/2 unique values with M = N(N+1)/2.
/// </summary>
/// <remarks>
/// Computed by the Head-Gordon–Pople scheme (J. Chem. Phys. 89, 5777 (1988)) over the Obara–Saika vertical
/// recurrence (J. Chem. Phys. 84, 3963 (1986)), in parallel over shell pairs. Shell quartets whose Cauchy–Schwarz
/// bound Q_PQ·Q_RS (Q_PQ = max √|(μν|μν)|) falls below the screening threshold are skipped and stored as zero.
/// Packed index: ij = i(i+1)/2 + j for i ≥ j, then ijkl = ij(ij+1)/2 + kl for ij ≥ kl.
/// </remarks>
public sealed class ElectronRepulsionTensor
{
    /// <summary>Default Cauchy–Schwarz screening threshold on |(μν|λσ)| in hartree.</summary>
    public const double DefaultScreeningThreshold = 1e-12;

    private readonly double[] _values;

    private ElectronRepulsionTensor(MolecularBasis basis, double[] values, long total, long screened, double threshold)
    {
        Basis = basis;
        FunctionCount = basis.FunctionCount;
        _values = values;
        ShellQuartetCount = total;
        ScreenedShellQuartetCount = screened;
        ScreeningThreshold = threshold;
    }

    /// <summary>The basis the integrals belong to.</summary>
    public MolecularBasis Basis { get; }

    /// <summary>Number of basis functions N.</summary>
    public int FunctionCount { get; }

    /// <summary>Number of unique shell quartets (P ≥ Q, R ≥ S, PQ ≥ RS).</summary>
    public long ShellQuartetCount { get; }

    /// <summary>Number of unique shell quartets skipped by Cauchy–Schwarz screening.</summary>
    public long ScreenedShellQuartetCount { get; }

    /// <summary>Number of unique shell quartets computed.</summary>
    public long ComputedShellQuartetCount => ShellQuartetCount - ScreenedShellQuartetCount;

    /// <summary>The screening threshold used, in hartree.</summary>
    public double ScreeningThreshold { get; }

    /// <summary>Number of stored (unique) integrals, M(M+1)/2 with M = N(N+1)/2.</summary>
    public long UniqueCount => _values.LongLength;

    /// <summary>The packed values (see the class remarks for the order).</summary>
    internal ReadOnlySpan<double> Packed => _values;

    /// <summary>The integral (ij|kl) in hartree (chemists' notation), any index order.</summary>
    public double this[int i, int j, int k, int l]
    {
        get
        {
            int n = FunctionCount;
            if ((uint)i >= (uint)n || (uint)j >= (uint)n || (uint)k >= (uint)n || (uint)l >= (uint)n)
                throw new ArgumentOutOfRangeException(nameof(i), $"Indices ({i},{j},{k},{l}) must lie in 0..{n - 1}.");
            return _values[PackedIndex(i, j, k, l)];
        }
    }

    /// <summary>Position of (ij|kl) in the packed storage.</summary>
    public static long PackedIndex(int i, int j, int k, int l)
    {
        long ij = i >= j ? (long)i * (i + 1) / 2 + j : (long)j * (j + 1) / 2 + i;
        long kl = k >= l ? (long)k * (k + 1) / 2 + l : (long)l * (l + 1) / 2 + k;
        return ij >= kl ? ij * (ij + 1) / 2 + kl : kl * (kl + 1) / 2 + ij;
    }

    /// <summary>Bytes the packed tensor needs for N basis functions: 8·M(M+1)/2 with M = N(N+1)/2.</summary>
    public static long EstimateBytes(int functionCount)
    {
        ArgumentOutOfRangeException.ThrowIfNegative(functionCount);
        long m = (long)functionCount * (functionCount + 1) / 2;
        return 8 * (m * (m + 1) / 2);
    }

    /// <summary>Largest basis a packed tensor can hold in one .NET array (M(M+1)/2 ≤ 2³¹ − 57 values: N = 360,
    /// about 17 GB).</summary>
    public static int MaxFunctionCount => 360;

    /// <summary>Writes (μν|λσ) for all μ and the flat indices t = (λ·N + σ)·N + ν in [start, start + count) into
    /// <paramref name="buffer"/>[(t − start)·N + μ]: the columns a transformation over μ reads, without a dense N⁴ copy.</summary>
    internal void FillColumns(long start, int count, double[] buffer)
    {
        int n = FunctionCount;
        for (int t = 0; t < count; t++)
        {
            long flat = start + t;
            int nu = (int)(flat % n), sg = (int)(flat / n % n), la = (int)(flat / ((long)n * n));
            long kl = la >= sg ? (long)la * (la + 1) / 2 + sg : (long)sg * (sg + 1) / 2 + la;
            int row = t * n;
            for (int mu = 0; mu < n; mu++)
            {
                long ij = mu >= nu ? (long)mu * (mu + 1) / 2 + nu : (long)nu * (nu + 1) / 2 + mu;
                buffer[row + mu] = _values[ij >= kl ? ij * (ij + 1) / 2 + kl : kl * (kl + 1) / 2 + ij];
            }
        }
    }

    /// <summary>A dense copy, element [((i·N + j)·N + k)·N + l] = (ij|kl). Meant for small bases (N⁴ doubles).</summary>
    /// <exception cref="InvalidOperationException">N⁴ exceeds 2^27 elements (1 GiB).</exception>
    public double[] ToDense()
    {
        int n = FunctionCount;
        long n4 = (long)n * n * n * n;
        if (n4 > 1L << 27)
            throw new InvalidOperationException($"A dense copy of {n} functions would hold {n4} values (over 1 GiB); use the indexer instead.");
        var dense = new double[n4];
        for (int i = 0; i < n; i++)
            for (int j = 0; j < n; j++)
                for (int k = 0; k < n; k++)
                    for (int l = 0; l < n; l++)
                        dense[((i * n + j) * n + k) * n + l] = _values[PackedIndex(i, j, k, l)];
        return dense;
    }

    /// <summary>Computes all unique integrals of a basis with the default screening threshold.</summary>
    /// <param name="basis">The basis (any mix of s to g shells, pure or Cartesian).</param>
    /// <param name="progress">Receives the completed fraction 0..1.</param>
    /// <param name="cancellationToken">Stops the computation (throws <see cref="OperationCanceledException"/>).</param>
    /// <exception cref="OrbitariumInputException">The basis is too large for a packed tensor (see <see cref="MaxFunctionCount"/>).</exception>
    public static ElectronRepulsionTensor Compute(MolecularBasis basis, IProgress<double>? progress = null, CancellationToken cancellationToken = default) =>
        Compute(basis, DefaultScreeningThreshold, progress, cancellationToken);

    /// <summary>Computes all unique integrals of a basis, skipping shell quartets whose Cauchy–Schwarz bound is below
    /// <paramref name="screeningThreshold"/> (hartree; 0 keeps every quartet).</summary>
    /// <param name="basis">The basis.</param>
    /// <param name="screeningThreshold">Cauchy–Schwarz threshold in hartree, ≥ 0.</param>
    /// <param name="progress">Receives the completed fraction 0..1.</param>
    /// <param name="cancellationToken">Stops the computation (throws <see cref="OperationCanceledException"/>).</param>
    public static ElectronRepulsionTensor Compute(MolecularBasis basis, double screeningThreshold, IProgress<double>? progress = null, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(basis);
        if (!(screeningThreshold >= 0) || !double.IsFinite(screeningThreshold))
            throw new OrbitariumInputException($"The screening threshold {screeningThreshold} must be a finite number ≥ 0 (hartree).");
        int n = basis.FunctionCount;
        if (n > MaxFunctionCount)
            throw new OrbitariumInputException(
                $"{n} basis functions need {EstimateBytes(n) / 1e9:F1} GB of stored integrals, more than one array holds; use the integral-direct kernel (DirectCoulombExchangeKernel) instead.");
        var eval = new ShellQuartetEvaluator(basis, cancellationToken);
        long m = (long)n * (n + 1) / 2;
        var values = new double[m * (m + 1) / 2];
        int npairs = eval.PairCount;
        var pairP = new int[npairs]; var pairQ = new int[npairs];
        for (int p = 0; p < eval.ShellCount; p++)
            for (int q = 0; q <= p; q++) { int pq = ShellQuartetEvaluator.PairIndex(p, q); pairP[pq] = p; pairQ[pq] = q; }
        long totalWork = (long)npairs * (npairs + 1) / 2, done = 0, screened = 0;
        int lastReported = -1;
        var progressLock = new object();
        var schwarz = eval.Schwarz;
        var offsets = eval.Offsets;
        var transforms = eval.Transforms;
        Parallel.For(0, npairs, new ParallelOptions { CancellationToken = cancellationToken }, () => new ShellQuartetEvaluator.Worker(eval),
            (index, _, worker) =>
            {
                int pq = npairs - 1 - index; // largest bra pairs first, for load balance
                int p = pairP[pq], q = pairQ[pq];
                double qpq = schwarz[pq];
                long localScreened = 0;
                int fp = transforms[p].Rows, fq = transforms[q].Rows, op = offsets[p], oq = offsets[q];
                for (int rs = 0; rs <= pq; rs++)
                {
                    if (qpq * schwarz[rs] < screeningThreshold) { localScreened++; continue; }
                    int r = pairP[rs], s = pairQ[rs];
                    var block = worker.Compute(p, q, r, s);
                    int fr = transforms[r].Rows, fs = transforms[s].Rows, or = offsets[r], os = offsets[s];
                    int t = 0;
                    for (int i = 0; i < fp; i++)
                        for (int j = 0; j < fq; j++)
                            for (int k = 0; k < fr; k++)
                                for (int l = 0; l < fs; l++, t++)
                                    values[PackedIndex(op + i, oq + j, or + k, os + l)] = block[t];
                }
                if (localScreened > 0) Interlocked.Add(ref screened, localScreened);
                long now = Interlocked.Add(ref done, pq + 1);
                if (progress is not null)
                {
                    int percent = (int)(100 * now / totalWork);
                    lock (progressLock)
                    {
                        if (percent > lastReported) { lastReported = percent; progress.Report(percent / 100.0); }
                    }
                }
                return worker;
            }, _ => { });
        return new ElectronRepulsionTensor(basis, values, totalWork, screened, screeningThreshold);
    }
}
