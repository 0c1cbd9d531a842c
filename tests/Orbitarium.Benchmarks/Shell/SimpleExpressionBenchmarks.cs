using BenchmarkDotNet.Attributes;
using Orbitarium.Shell.Repl;
using Spectre.Console;

namespace Orbitarium.Benchmarks.Shell;

/// <summary>One simple expression at a warm prompt: parse, compile against the session, run, render.</summary>
[Config(typeof(ConsoleBenchmarkConfigs.ShortInProcess))]
public class SimpleExpressionBenchmarks
{
    private ReplSession _session = null!;

    [GlobalSetup]
    public void StartSession()
    {
        var console = AnsiConsole.Create(new AnsiConsoleSettings
        {
            Ansi = AnsiSupport.No,
            ColorSystem = ColorSystemSupport.NoColors,
            Interactive = InteractionSupport.No,
            Out = new AnsiConsoleOutput(TextWriter.Null),
        });
        _session = new ReplSession(console);
        _session.SubmitAsync("var x = 20;").GetAwaiter().GetResult();
    }

    [Benchmark(Description = "x * 2 + 1 at a warm prompt")]
    public object? SimpleExpression() => _session.SubmitAsync("x * 2 + 1").GetAwaiter().GetResult().Value;
}
