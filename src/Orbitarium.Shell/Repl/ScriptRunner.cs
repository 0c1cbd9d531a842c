using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.CSharp.Scripting;
using Microsoft.CodeAnalysis.Scripting;
using Orbitarium.Shell.Repl.Rendering;

namespace Orbitarium.Shell.Repl;

/// <summary>
/// Runs a saved .csx script non-interactively with the console's imports and globals (<c>orbitarium run</c>).
/// <c>Print</c> writes each value's plain text to the output; errors go to the error writer with the script line.
/// </summary>
public static class ScriptRunner
{
    /// <summary>Exit code of a script that ran to the end.</summary>
    public const int Success = 0;

    /// <summary>Exit code of a script that failed to compile or threw.</summary>
    public const int Failure = 1;

    /// <summary>Exit code of a script stopped by Ctrl+C (128 + SIGINT, common practice for shells).</summary>
    public const int Cancelled = 130;

    /// <summary>How long a cancelled script may take to stop on its own before the runner gives up on it.</summary>
    public static readonly TimeSpan CancellationGrace = TimeSpan.FromMilliseconds(500);

    /// <summary>Runs the script at <paramref name="path"/> and returns the exit code (0, 1 or 130).</summary>
    /// <param name="path">The .csx file; <c>#load</c> inside it resolves relative to its folder.</param>
    /// <param name="args">Arguments the script sees as <c>Args</c>.</param>
    /// <param name="output">Where <c>Print</c> writes.</param>
    /// <param name="error">Where compile and runtime errors are written.</param>
    /// <param name="cancellationToken">Cancels the script (Ctrl+C); the script sees it as <c>Token</c>.</param>
    public static async Task<int> RunAsync(string path, IReadOnlyList<string> args, TextWriter output, TextWriter error,
        CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(path);
        ArgumentNullException.ThrowIfNull(args);
        ArgumentNullException.ThrowIfNull(output);
        ArgumentNullException.ThrowIfNull(error);
        string fullPath = Path.GetFullPath(path);
        if (!File.Exists(fullPath))
        {
            await error.WriteLineAsync($"No script {fullPath}; check the path.").ConfigureAwait(false);
            return Failure;
        }
        // A stream (not a string) so the source has an encoding: debug information, and with it the script
        // line of a runtime error, needs one.
        var code = new MemoryStream(await File.ReadAllBytesAsync(fullPath, CancellationToken.None).ConfigureAwait(false));
        var options = ScriptEnvironment.CreateOptions(fullPath, Path.GetDirectoryName(fullPath)!);
        var settings = new ConsoleSettings();
        var globals = new ScriptGlobals(v =>
            {
                lock (output) output.WriteLine(v is string s ? s : v?.ToString() ?? "null");
            },
            args, settings, ValueRendererRegistry.CreateDefault(), Path.Combine(Path.GetDirectoryName(fullPath)!, "plots"));
        var script = CSharpScript.Create(code, options, typeof(ScriptGlobals));
        System.Collections.Immutable.ImmutableArray<Diagnostic> diagnostics;
        try
        {
            diagnostics = await Task.Run(() => script.Compile(cancellationToken), CancellationToken.None).ConfigureAwait(false);
        }
        catch (OperationCanceledException)
        {
            await error.WriteLineAsync($"{fullPath}: cancelled while compiling.").ConfigureAwait(false);
            return Cancelled;
        }
        if (diagnostics.Any(d => d.Severity == DiagnosticSeverity.Error))
        {
            foreach (var d in DiagnosticFormatter.Format(diagnostics, fullPath))
            {
                await error.WriteLineAsync(d.Header).ConfigureAwait(false);
                if (d.SourceLine is not null)
                {
                    await error.WriteLineAsync("  " + d.SourceLine).ConfigureAwait(false);
                    await error.WriteLineAsync("  " + d.Marker).ConfigureAwait(false);
                }
            }
            return Failure;
        }

        using var scriptCancellation = new CancellationTokenSource();
        globals.SetToken(scriptCancellation.Token);
        var run = Task.Run(() => script.RunAsync(globals, _ => true, scriptCancellation.Token), CancellationToken.None);
        var interrupted = new TaskCompletionSource(TaskCreationOptions.RunContinuationsAsynchronously);
        using (cancellationToken.Register(() => interrupted.TrySetResult()))
        {
            if (await Task.WhenAny(run, interrupted.Task).ConfigureAwait(false) != run)
            {
                await scriptCancellation.CancelAsync().ConfigureAwait(false);
                await Task.WhenAny(run, Task.Delay(CancellationGrace, CancellationToken.None)).ConfigureAwait(false);
                await error.WriteLineAsync($"{fullPath}: cancelled.").ConfigureAwait(false);
                return Cancelled;
            }
        }
        Exception? exception = run.IsFaulted ? run.Exception!.GetBaseException() : run.IsCanceled ? new OperationCanceledException() : run.Result.Exception;
        if (exception is null) return Success;
        if (exception is OperationCanceledException && scriptCancellation.IsCancellationRequested) return Cancelled;
        int? line = DiagnosticFormatter.ScriptLineOf(exception, fullPath);
        string where = line is null ? fullPath : $"{fullPath}({line})";
        await error.WriteLineAsync($"{where}: {DiagnosticFormatter.ExceptionMessage(exception)}").ConfigureAwait(false);
        return Failure;
    }
}
