using BenchmarkDotNet.Running;

namespace Orbitarium.Benchmarks;

/// <summary>Runs the benchmarks chosen on the command line, e.g. <c>--filter *Eri*</c>.</summary>
public static class Program
{
    public static void Main(string[] args) => BenchmarkSwitcher.FromAssembly(typeof(Program).Assembly).Run(args);
}
