using System.Diagnostics;
using BenchmarkDotNet.Attributes;

namespace Orbitarium.Benchmarks.Shell;

/// <summary>
/// Time from starting the <c>orbitarium</c> process to its first prompt. Standard input is closed at once, so the
/// console prints its banner and prompt, reads end-of-input and leaves: the measured time is process start,
/// runtime start-up, banner and first prompt, plus the exit.
/// </summary>
[Config(typeof(ConsoleBenchmarkConfigs.ProcessLaunches))]
public class ConsoleStartupBenchmarks
{
    private string _executable = "";

    [GlobalSetup]
    public void FindExecutable()
    {
        string dir = AppContext.BaseDirectory;
        _executable = Path.Combine(dir, "orbitarium.dll");
        if (!File.Exists(_executable)) throw new FileNotFoundException("orbitarium.dll is not beside the benchmarks", _executable);
    }

    [Benchmark(Description = "start to first prompt")]
    public int StartToFirstPrompt()
    {
        var info = new ProcessStartInfo("dotnet")
        {
            RedirectStandardInput = true,
            RedirectStandardOutput = true,
            UseShellExecute = false,
        };
        info.ArgumentList.Add(_executable);
        info.ArgumentList.Add("--no-history");
        using var process = Process.Start(info)!;
        process.StandardInput.Close();
        string output = process.StandardOutput.ReadToEnd();
        process.WaitForExit();
        if (!output.Contains("Orbitarium", StringComparison.Ordinal)) throw new InvalidOperationException("no banner: " + output);
        return process.ExitCode;
    }
}
