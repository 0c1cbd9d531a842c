using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.CSharp;
using Microsoft.CodeAnalysis.CSharp.Scripting;
using Microsoft.CodeAnalysis.Scripting;
using Orbitarium.Shell.Repl.Rendering;
using Spectre.Console;

namespace Orbitarium.Shell.Repl;

/// <summary>
/// The console's engine: one Roslyn script state per session, fed one submission at a time. Variables, types and
/// methods persist between submissions; a submission that fails to compile, throws, or is cancelled leaves the
/// state as it was. All output goes to the injected <see cref="IAnsiConsole"/>, so tests drive it in-process.
/// </summary>
public sealed partial class ReplSession
{
    private readonly IAnsiConsole _console;
    private readonly ReplSessionOptions _options;
    private readonly List<string> _accepted = [];
    private readonly Lock _gate = new();
    private Task<ScriptState<object>> _start;
    private ScriptOptions _scriptOptions;
    private readonly LiveIterations _live = new();
    private bool _timeNext;

    /// <summary>Creates a session writing to <paramref name="console"/>; compilation warms up in the background at once.</summary>
    public ReplSession(IAnsiConsole console, ReplSessionOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(console);
        _console = console;
        _options = options ?? new ReplSessionOptions();
        WorkingDirectory = Path.GetFullPath(_options.WorkingDirectory);
        Settings = _options.Settings ?? new ConsoleSettings();
        Renderers = _options.Renderers ?? ValueRendererRegistry.CreateDefault();
        Globals = new ScriptGlobals(Show, _options.Args, Settings, Renderers, Path.Combine(WorkingDirectory, "plots"), new SessionProgress(_live, _live));
        Globals.ScriptDirectory = WorkingDirectory;
        _scriptOptions = ScriptEnvironment.CreateOptions(null, WorkingDirectory);
        _start = Task.Run(StartAsync);
    }

    /// <summary>The globals object scripts see (<c>Print</c>, <c>Args</c>, <c>Token</c>, <c>Settings</c>, …).</summary>
    public ScriptGlobals Globals { get; }

    /// <summary>Display settings of the session.</summary>
    public ConsoleSettings Settings { get; }

    /// <summary>How values are shown; register renderers for new types here.</summary>
    public ValueRendererRegistry Renderers { get; }

    /// <summary>The session's folder: relative paths of console commands resolve against it.</summary>
    public string WorkingDirectory { get; private set; }

    /// <summary>The C# submissions accepted so far, in order, in the form <c>#save</c> writes (a trailing
    /// expression shown at the prompt becomes <c>Print(…);</c>).</summary>
    public IReadOnlyList<string> AcceptedSubmissions
    {
        get
        {
            lock (_gate) return [.. _accepted];
        }
    }

    /// <summary>The last exception thrown by a submission (its full trace is what <c>#trace</c> shows).</summary>
    public Exception? LastException { get; private set; }

    /// <summary>True once <c>#quit</c> was given.</summary>
    public bool ExitRequested { get; private set; }

    /// <summary>Waits until the scripting engine is warm (the first prompt does not wait for this).</summary>
    public Task WarmUpAsync() => _start;

    /// <summary>Whether <paramref name="text"/> is complete: a console command, or C# that
    /// <see cref="SyntaxFactory.IsCompleteSubmission"/> accepts. Incomplete text should be continued on the next line.</summary>
    public bool IsCompleteSubmission(string text)
    {
        ArgumentNullException.ThrowIfNull(text);
        if (text.Trim().Length == 0) return true;
        if (TryParseCommand(text, out _, out _)) return true;
        var tree = SyntaxFactory.ParseSyntaxTree(text, ParseOptions);
        return SyntaxFactory.IsCompleteSubmission(tree);
    }

    /// <summary>The variables of the session (latest declaration of each name), with their types and values.</summary>
    public async Task<IReadOnlyList<ScriptVariable>> GetVariablesAsync()
    {
        var state = await _start.ConfigureAwait(false);
        var latest = new Dictionary<string, ScriptVariable>(StringComparer.Ordinal);
        foreach (var v in state.Variables) latest[v.Name] = v;
        return [.. latest.Values];
    }

    /// <summary>
    /// Compiles and runs one submission (C# or a console command) and renders its outcome. Cancelling
    /// <paramref name="cancellationToken"/> (Ctrl+C) cancels the submission's <see cref="ScriptGlobals.Token"/>;
    /// if the code does not stop within <see cref="ReplSessionOptions.CancellationGrace"/> it is abandoned.
    /// Either way this returns promptly with the previous state kept.
    /// </summary>
    public async Task<SubmissionResult> SubmitAsync(string text, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(text);
        if (text.Trim().Length == 0) return SubmissionResult.Empty;
        long started = _options.Clock.GetTimestamp();
        bool timed = _timeNext;
        if (TryParseCommand(text, out var command, out string argument))
        {
            if (command.Name != "load" && command.Name != "time") _timeNext = false;
            var commandResult = await command.Execute(this, argument, cancellationToken).ConfigureAwait(false);
            if (command.Name == "load") ReportTime(timed, started);
            return commandResult;
        }
        _timeNext = false;
        var result = await RunCodeAsync(text.TrimEnd(), cancellationToken).ConfigureAwait(false);
        ReportTime(timed, started);
        return result with { Elapsed = _options.Clock.GetElapsedTime(started) };
    }

    private void ReportTime(bool timed, long started)
    {
        if (!timed) return;
        var elapsed = _options.Clock.GetElapsedTime(started);
        _console.MarkupLine($"[grey]elapsed {FormatDuration(elapsed)}[/]");
    }

    internal static string FormatDuration(TimeSpan t) =>
        t.TotalSeconds >= 1 ? FormattableString.Invariant($"{t.TotalSeconds:F2} s") : FormattableString.Invariant($"{t.TotalMilliseconds:F1} ms");

    private static CSharpParseOptions ParseOptions { get; } =
        new(LanguageVersion.Latest, DocumentationMode.None, SourceCodeKind.Script);

    private async Task<ScriptState<object>> StartAsync()
    {
        var state = await CSharpScript.RunAsync("", _scriptOptions, Globals, typeof(ScriptGlobals)).ConfigureAwait(false);
        // Warm the compiler and the completion path once, on a throw-away continuation, so the first real
        // submission is quick.
        var warm = state.Script.ContinueWith("var __warm = 1 + 1; __warm", _scriptOptions);
        warm.Compile();
        await warm.RunFromAsync(state).ConfigureAwait(false);
        _ = ScriptCompletion.Complete(state.Script, _scriptOptions, "Math.");
        return state;
    }

    private async Task<SubmissionResult> RunCodeAsync(string code, CancellationToken cancellationToken)
    {
        var state = await _start.ConfigureAwait(false);
        long started = _options.Clock.GetTimestamp();
        var script = state.Script.ContinueWith(code, _scriptOptions);
        System.Collections.Immutable.ImmutableArray<Diagnostic> diagnostics;
        try
        {
            diagnostics = await Task.Run(() => script.Compile(cancellationToken), CancellationToken.None).ConfigureAwait(false);
        }
        catch (OperationCanceledException)
        {
            const string message = "Cancelled while compiling; the session is as before.";
            _console.MarkupLine($"[yellow]{message}[/]");
            return new SubmissionResult(SubmissionStatus.Cancelled, null, false, _options.Clock.GetElapsedTime(started), message);
        }
        if (diagnostics.Any(d => d.Severity == DiagnosticSeverity.Error))
        {
            var formatted = DiagnosticFormatter.Format(diagnostics, null);
            foreach (var d in formatted)
            {
                _console.MarkupLine($"[red]{Markup.Escape(d.Header)}[/]");
                if (d.SourceLine is not null)
                {
                    _console.MarkupLine($"  [grey]{Markup.Escape(d.SourceLine)}[/]");
                    _console.MarkupLine($"  [red]{Markup.Escape(d.Marker ?? "")}[/]");
                }
            }
            return new SubmissionResult(SubmissionStatus.CompileError, null, false, _options.Clock.GetElapsedTime(started), formatted.FirstOrDefault()?.Header);
        }

        bool hasValue = HasTrailingValue(script);
        _live.Reset();
        using var submissionCancellation = new CancellationTokenSource();
        Globals.SetToken(submissionCancellation.Token);
        var run = Task.Run(() => script.RunFromAsync(state, _ => true, submissionCancellation.Token), CancellationToken.None);
        var outcome = await WaitAsync(run, submissionCancellation, cancellationToken).ConfigureAwait(false);
        Globals.SetToken(CancellationToken.None);
        var elapsed = _options.Clock.GetElapsedTime(started);

        if (outcome == WaitOutcome.Abandoned)
        {
            const string message = "Cancelled. The code did not stop (it ignores Token), so it was left running in the background; the session is as before.";
            _console.MarkupLine($"[yellow]{message}[/]");
            _ = run.ContinueWith(t => _ = t.Exception, TaskScheduler.Default);
            return new SubmissionResult(SubmissionStatus.Abandoned, null, false, elapsed, message);
        }

        Exception? error = run.IsFaulted ? run.Exception!.GetBaseException() : run.IsCanceled ? new OperationCanceledException() : run.Result.Exception;
        if (error is not null)
        {
            if (error is OperationCanceledException && (outcome == WaitOutcome.Cancelled || submissionCancellation.IsCancellationRequested))
            {
                const string message = "Cancelled; the session is as before.";
                _console.MarkupLine($"[yellow]{message}[/]");
                return new SubmissionResult(SubmissionStatus.Cancelled, null, false, elapsed, message);
            }
            LastException = error;
            string text = DiagnosticFormatter.ExceptionMessage(error);
            _console.MarkupLine($"[red]{Markup.Escape(text)}[/] [grey](#trace shows where)[/]");
            return new SubmissionResult(SubmissionStatus.RuntimeError, null, false, elapsed, text);
        }
        if (outcome == WaitOutcome.Cancelled)
        {
            const string message = "Cancelled; the session is as before.";
            _console.MarkupLine($"[yellow]{message}[/]");
            return new SubmissionResult(SubmissionStatus.Cancelled, null, false, elapsed, message);
        }

        if (_live.Count > 0) _console.MarkupLine($"[grey]{_live.Summary}[/]");
        var newState = run.Result;
        lock (_gate)
        {
            _start = Task.FromResult(newState);
            _accepted.Add(ToReplayable(code, hasValue));
        }
        if (hasValue) Show(newState.ReturnValue);
        return new SubmissionResult(SubmissionStatus.Accepted, newState.ReturnValue, hasValue, elapsed, null);
    }

    private enum WaitOutcome { Completed, Cancelled, Abandoned }

    private async Task<WaitOutcome> WaitAsync(Task run, CancellationTokenSource submission, CancellationToken interrupt)
    {
        var interrupted = new TaskCompletionSource(TaskCreationOptions.RunContinuationsAsynchronously);
        using (interrupt.Register(() => interrupted.TrySetResult()))
        {
            var first = await Task.WhenAny(run, interrupted.Task, _live.FirstReport).ConfigureAwait(false);
            if (first == _live.FirstReport)
            {
                // The submission runs an SCF with Progress: show its iterations live until it ends or Ctrl+C.
                await _live.ShowUntilAsync(_console, Task.WhenAny(run, interrupted.Task)).ConfigureAwait(false);
                first = run.IsCompleted ? run : interrupted.Task;
            }
            if (first == run) return WaitOutcome.Completed;
        }
        await submission.CancelAsync().ConfigureAwait(false);
        var grace = Task.Delay(_options.CancellationGrace, _options.Clock);
        var next = await Task.WhenAny(run, grace).ConfigureAwait(false);
        return next == run ? WaitOutcome.Cancelled : WaitOutcome.Abandoned;
    }

    private static bool HasTrailingValue(Script script)
    {
        var compilation = script.GetCompilation();
        var tree = compilation.SyntaxTrees.Last();
        if (tree.GetRoot() is not Microsoft.CodeAnalysis.CSharp.Syntax.CompilationUnitSyntax root ||
            root.Members.LastOrDefault() is not Microsoft.CodeAnalysis.CSharp.Syntax.GlobalStatementSyntax
            {
                Statement: Microsoft.CodeAnalysis.CSharp.Syntax.ExpressionStatementSyntax { SemicolonToken.IsMissing: true } statement
            })
            return false;
        var type = compilation.GetSemanticModel(tree).GetTypeInfo(statement.Expression).Type;
        return type is not null && type.SpecialType != SpecialType.System_Void;
    }

    /// <summary>Renders a value on the console with the registered renderer for its type.</summary>
    private void Show(object? value)
    {
        var renderable = Renderers.Render(value, Settings);
        _console.Write(renderable);
        if (renderable is Text or Markup) _console.WriteLine();
    }

    private void ResetState()
    {
        lock (_gate)
        {
            _accepted.Clear();
            _scriptOptions = ScriptEnvironment.CreateOptions(null, WorkingDirectory);
            _start = Task.Run(() => CSharpScript.RunAsync("", _scriptOptions, Globals, typeof(ScriptGlobals)));
        }
        LastException = null;
    }
}
