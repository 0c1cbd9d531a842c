using BenchmarkDotNet.Attributes;
using Orbitarium.LinearAlgebra;

namespace Orbitarium.Benchmarks.LinearAlgebra;

/// <summary>
/// The dense kernel under every correlated contraction, C = A·Bᵀ, on square shapes and on the tall-skinny shape of
/// the first quarter-transformation (K = N basis functions). Rate = 2·M·N·K / time. Run with
/// <c>--filter *TransposedProductBenchmarks* --job short</c>.
/// </summary>
[MemoryDiagnoser]
public class TransposedProductBenchmarks
{
    private double[] _a = null!, _b = null!, _c = null!;

    /// <summary>(M, N, K): square 512, square 1024, and 102 × 512 × 102 (one quarter-transformation chunk).</summary>
    [Params("512x512x512", "1024x1024x1024", "102x512x102")]
    public string Shape { get; set; } = "512x512x512";

    private (int M, int N, int K) Dims => Shape.Split('x') is [var m, var n, var k] ? (int.Parse(m), int.Parse(n), int.Parse(k)) : (0, 0, 0);

    [GlobalSetup]
    public void Setup()
    {
        var (m, n, k) = Dims;
        var rng = new Random(1);
        _a = new double[m * k];
        _b = new double[n * k];
        _c = new double[m * n];
        for (int i = 0; i < _a.Length; i++) _a[i] = rng.NextDouble();
        for (int i = 0; i < _b.Length; i++) _b[i] = rng.NextDouble();
    }

    [Benchmark(Description = "C = A·Bᵀ (parallel)")]
    public double Parallel()
    {
        var (m, n, k) = Dims;
        TransposedProduct.Multiply(_a, _b, _c, m, n, k);
        return _c[0];
    }

    [Benchmark(Description = "C = A·Bᵀ (one thread)")]
    public double Serial()
    {
        var (m, n, k) = Dims;
        TransposedProduct.Multiply(_a, _b, _c, m, n, k, parallel: false);
        return _c[0];
    }
}
