using System.Reflection;
using RadLine;
using Spectre.Console;

namespace Orbitarium.Shell.Repl;

/// <summary>
/// The prompt loop: reads submissions with RadLine (highlighting, Tab completion, history), continues
/// incomplete C# on the next line, hands each submission to the <see cref="ReplSession"/>, and routes Ctrl+C
/// to the running submission — or, at an idle prompt, clears the line and asks before leaving on the second one.
/// </summary>
public sealed class InteractiveConsole
{
    private readonly ReplSession _session;
    private readonly IAnsiConsole _console;
    private readonly IInputSource? _input;
    private readonly PersistentHistory? _history;
    private readonly IInterruptSource _interrupts;
    private readonly Lock _gate = new();
    private CancellationTokenSource? _current;
    private bool _lastWasIdleInterrupt;

    /// <summary>Creates the loop.</summary>
    /// <param name="session">The engine that runs submissions.</param>
    /// <param name="console">Where the prompt and output go.</param>
    /// <param name="input">Key source for RadLine (null: the process console).</param>
    /// <param name="history">History kept across sessions (null: none).</param>
    /// <param name="interrupts">Source of Ctrl+C.</param>
    public InteractiveConsole(ReplSession session, IAnsiConsole console, IInputSource? input, PersistentHistory? history, IInterruptSource interrupts)
    {
        ArgumentNullException.ThrowIfNull(session);
        ArgumentNullException.ThrowIfNull(console);
        ArgumentNullException.ThrowIfNull(interrupts);
        _session = session;
        _console = console;
        _input = input;
        _history = history;
        _interrupts = interrupts;
    }

    /// <summary>Raised when the first prompt is shown (the start-up benchmark waits for it).</summary>
    public event EventHandler? PromptShown;

    /// <summary>Runs until <c>#quit</c>, end of input, or a confirmed second Ctrl+C; returns the exit code (0).</summary>
    public async Task<int> RunAsync(CancellationToken cancellationToken = default)
    {
        _interrupts.Interrupted += OnInterrupted;
        try
        {
            WriteBanner();
            // An injected key source makes the editor usable whatever the process's own console is.
            if (_input is not null || LineEditor.IsSupported(_console)) await RunWithEditorAsync(cancellationToken).ConfigureAwait(false);
            else await RunPlainAsync(cancellationToken).ConfigureAwait(false);
            return 0;
        }
        finally
        {
            _interrupts.Interrupted -= OnInterrupted;
        }
    }

    private void WriteBanner()
    {
        string version = typeof(InteractiveConsole).Assembly.GetCustomAttribute<AssemblyInformationalVersionAttribute>()?.InformationalVersion ?? "";
        int plus = version.IndexOf('+', StringComparison.Ordinal);
        if (plus > 0) version = version[..plus];
        _console.MarkupLine($"[bold aqua]Orbitarium[/] [grey]{Markup.Escape(version)} · C# console for electronic-structure modelling[/]");
        _console.MarkupLine("[grey]Type C# (e.g. [/][white]var water = Molecule.FromXyzFile(\"examples/tg1-water.xyz\");[/][grey]); " +
                            "Tab completes, #help lists commands, Ctrl+C cancels, #quit leaves.[/]");
    }

    private async Task RunWithEditorAsync(CancellationToken cancellationToken)
    {
        var completion = new RadLineCompletion(_session);
        var prompt = new SessionPrompt();
        var editor = new LineEditor(_console, _input)
        {
            Prompt = prompt,
            // Enter always submits; incomplete C# continues on the next line (see ReadSubmissionAsync). RadLine's own
            // multi-line mode would turn an Enter typed ahead during a long submission into a newline.
            MultiLine = false,
            Completion = completion,
            Highlighter = new CSharpHighlighter(),
        };
        if (_history is not null)
            foreach (string entry in _history.Entries)
                foreach (string line in entry.Split('\n'))
                    editor.History.Add(line);

        bool first = true;
        while (!_session.ExitRequested && !cancellationToken.IsCancellationRequested)
        {
            string? text = await ReadSubmissionAsync(editor, prompt, completion, () =>
            {
                if (!first) return;
                first = false;
                PromptShown?.Invoke(this, EventArgs.Empty);
            }).ConfigureAwait(false);
            if (text is null)
            {
                if (await OnIdleInterruptAsync().ConfigureAwait(false)) break;
                continue;
            }
            await SubmitAsync(text).ConfigureAwait(false);
        }
    }

    private async Task<string?> ReadSubmissionAsync(LineEditor editor, SessionPrompt prompt, RadLineCompletion completion, Action onPrompt)
    {
        string buffer = "";
        while (true)
        {
            prompt.Continuing = buffer.Length > 0;
            completion.PendingText = buffer;
            using var lineCancellation = new CancellationTokenSource();
            lock (_gate) _current = lineCancellation;
            onPrompt();
            string? line;
            try
            {
                line = await editor.ReadLine(lineCancellation.Token).ConfigureAwait(false);
            }
            catch (OperationCanceledException)
            {
                line = null;
            }
            finally
            {
                lock (_gate) _current = null;
            }
            if (line is null || lineCancellation.IsCancellationRequested) return null;
            buffer = buffer.Length == 0 ? line : buffer + "\n" + line;
            if (_session.IsCompleteSubmission(buffer)) return buffer;
        }
    }

    private async Task RunPlainAsync(CancellationToken cancellationToken)
    {
        PromptShown?.Invoke(this, EventArgs.Empty);
        string buffer = "";
        while (!_session.ExitRequested && !cancellationToken.IsCancellationRequested)
        {
            string? line = await Console.In.ReadLineAsync(cancellationToken).ConfigureAwait(false);
            if (line is null) break;
            buffer = buffer.Length == 0 ? line : buffer + "\n" + line;
            if (!_session.IsCompleteSubmission(buffer)) continue;
            string text = buffer;
            buffer = "";
            await SubmitAsync(text).ConfigureAwait(false);
        }
    }

    private async Task SubmitAsync(string text)
    {
        _lastWasIdleInterrupt = false;
        _history?.Add(text);
        using var submission = new CancellationTokenSource();
        lock (_gate) _current = submission;
        try
        {
            await _session.SubmitAsync(text, submission.Token).ConfigureAwait(false);
        }
        finally
        {
            lock (_gate) _current = null;
        }
    }

    /// <summary>Ctrl+C at an idle prompt: the first clears the line; the second in a row asks before leaving.</summary>
    /// <returns>True to leave.</returns>
    private Task<bool> OnIdleInterruptAsync()
    {
        if (!_lastWasIdleInterrupt)
        {
            _lastWasIdleInterrupt = true;
            _console.MarkupLine("[grey](Ctrl+C again to leave; #quit also leaves)[/]");
            return Task.FromResult(false);
        }
        _lastWasIdleInterrupt = false;
        bool leave = _console.Confirm("Leave Orbitarium?", defaultValue: false);
        return Task.FromResult(leave);
    }

    private void OnInterrupted(object? sender, EventArgs e)
    {
        CancellationTokenSource? current;
        lock (_gate) current = _current;
        try
        {
            current?.Cancel();
        }
        catch (ObjectDisposedException)
        {
            // The submission ended between the key press and now.
        }
    }
}
