using BenchmarkDotNet.Attributes;
using BenchmarkDotNet.Configs;
using BenchmarkDotNet.Engines;
using BenchmarkDotNet.Jobs;
using BenchmarkDotNet.Toolchains.InProcess.Emit;
using Orbitarium.Chemistry;
using Orbitarium.Scf;

namespace Orbitarium.Benchmarks.Scf;

/// <summary>Converged RHF from scratch (integrals, guess, iterations) on the TIDEGLASS water probe and
/// aromatic spacer: in-core cc-pVDZ, and integral-direct 6-31G* with and without incremental Fock builds. Long single-shot runs, so the monitoring strategy with one warm-up and two measured runs,
/// in process (rebuilding a separate benchmark executable timed out on the shared build machine).</summary>
[Config(typeof(ScfBenchmarkConfig))]
[MemoryDiagnoser]
public class ScfBenchmarks
{
    private sealed class ScfBenchmarkConfig : ManualConfig
    {
        public ScfBenchmarkConfig() =>
            AddJob(Job.Default.WithStrategy(RunStrategy.Monitoring).WithLaunchCount(1).WithWarmupCount(1).WithIterationCount(2)
                .WithToolchain(InProcessEmitToolchain.Instance));
    }

    private Molecule _water = null!;
    private Molecule _benzene = null!;

    [GlobalSetup]
    public void Setup()
    {
        _water = Molecule.FromXyzFile(Example("tg1-water.xyz"));
        _benzene = Molecule.FromXyzFile(Example("tgb-benzene.xyz"));
    }

    [Benchmark(Description = "water RHF/cc-pVDZ")]
    public double WaterRhfCcPvdz() => Converged(_water.WithBasis("cc-pVDZ").RunRhf());

    [Benchmark(Description = "benzene RHF/cc-pVDZ")]
    public double BenzeneRhfCcPvdz() => Converged(_benzene.WithBasis("cc-pVDZ").RunRhf());

    [Benchmark(Description = "benzene RHF/6-31G*, integral-direct, incremental Fock builds")]
    public double BenzeneDirectIncremental() =>
        Converged(_benzene.WithBasis("6-31G*").WithOptions(o => o with { ForceDirect = true }).RunRhf());

    [Benchmark(Description = "benzene RHF/6-31G*, integral-direct, full Fock builds")]
    public double BenzeneDirectFull() =>
        Converged(_benzene.WithBasis("6-31G*").WithOptions(o => o with { ForceDirect = true, IncrementalDirectFock = false }).RunRhf());

    private static double Converged(ScfResult r) =>
        r.Converged ? r.TotalEnergyHartree : throw new InvalidOperationException($"not converged: {r.StopReason}");

    private static string Example(string name)
    {
        var dir = new DirectoryInfo(AppContext.BaseDirectory);
        while (dir is not null && !File.Exists(Path.Combine(dir.FullName, "Repl.sln"))) dir = dir.Parent;
        return Path.Combine(dir?.FullName ?? throw new InvalidOperationException("Repl.sln not found."), "examples", name);
    }
}
