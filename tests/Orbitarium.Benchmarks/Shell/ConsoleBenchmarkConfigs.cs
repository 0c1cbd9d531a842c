using BenchmarkDotNet.Configs;
using BenchmarkDotNet.Engines;
using BenchmarkDotNet.Jobs;
using BenchmarkDotNet.Toolchains.InProcess.Emit;

namespace Orbitarium.Benchmarks.Shell;

/// <summary>Short in-process jobs: the machine is shared, and rebuilding a boilerplate project per run is slow there.</summary>
public static class ConsoleBenchmarkConfigs
{
    /// <summary>Five timed process launches after one warm-up (each launch is itself a cold start).</summary>
    public sealed class ProcessLaunches : ManualConfig
    {
        public ProcessLaunches() => AddJob(Job.Default.WithToolchain(InProcessEmitToolchain.Instance)
            .WithStrategy(RunStrategy.Monitoring).WithLaunchCount(1).WithWarmupCount(1).WithIterationCount(5));
    }

    /// <summary>The short-run job, in process.</summary>
    public sealed class ShortInProcess : ManualConfig
    {
        public ShortInProcess() => AddJob(Job.ShortRun.WithToolchain(InProcessEmitToolchain.Instance));
    }
}
