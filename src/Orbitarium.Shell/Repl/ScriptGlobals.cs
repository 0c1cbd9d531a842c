using Orbitarium.Scf;
using Orbitarium.Shell.Repl.Rendering;

namespace Orbitarium.Shell.Repl;

/// <summary>
/// The script's window to the host: every member here is visible unqualified at the prompt and in
/// <c>orbitarium run</c> scripts (<c>Print(x)</c>, <c>Args</c>, <c>Token</c>, …).
/// </summary>
public sealed class ScriptGlobals
{
    private readonly Action<object?> _print;
    private CancellationToken _token;

    /// <summary>Creates the globals of one session or script run.</summary>
    /// <param name="print">Where <see cref="Print"/> sends values (rendered richly at the prompt, as text in scripts).</param>
    /// <param name="args">Command-line arguments after the script name (empty at the prompt).</param>
    /// <param name="settings">Display settings of the session.</param>
    /// <param name="renderers">The renderer registry used for values shown at the prompt.</param>
    /// <param name="plotFolder">Folder where figures are written.</param>
    /// <param name="progress">Receives SCF and correlation iterations (a live table at the prompt); null discards them.</param>
    public ScriptGlobals(Action<object?> print, IReadOnlyList<string> args, ConsoleSettings settings,
        ValueRendererRegistry renderers, string plotFolder, SessionProgress? progress = null)
    {
        ArgumentNullException.ThrowIfNull(print);
        ArgumentNullException.ThrowIfNull(args);
        ArgumentNullException.ThrowIfNull(settings);
        ArgumentNullException.ThrowIfNull(renderers);
        ArgumentNullException.ThrowIfNull(plotFolder);
        _print = print;
        Args = args;
        Settings = settings;
        Renderers = renderers;
        PlotFolder = plotFolder;
        Progress = progress ?? SessionProgress.Discard;
    }

    /// <summary>
    /// Pass to SCF runs and correlated methods to watch their iterations live at the prompt:
    /// <c>water.WithBasis(basis).RunRhf(Progress, Token)</c>, <c>rhf.CcsdT(null, Progress, Token)</c>. In
    /// <c>orbitarium run</c> scripts the iterations are not shown.
    /// </summary>
    public SessionProgress Progress { get; }

    /// <summary>Arguments given after the script file to <c>orbitarium run FILE.csx [args…]</c>; empty at the prompt.</summary>
    public IReadOnlyList<string> Args { get; }

    /// <summary>
    /// Cancellation token of the submission (or script) that is running now; Ctrl+C cancels it.
    /// Pass it as the last argument of long library calls, and check it in your own loops
    /// (<c>Token.ThrowIfCancellationRequested()</c>) so that Ctrl+C stops them cleanly.
    /// </summary>
    public CancellationToken Token => _token;

    /// <summary>Display settings of this session (matrix truncation, decimals).</summary>
    public ConsoleSettings Settings { get; }

    /// <summary>
    /// How values are shown at the prompt, by type. Register your own with
    /// <c>Renderers.Register&lt;MyType&gt;(x =&gt; new Spectre.Console.Text(...))</c>.
    /// </summary>
    public ValueRendererRegistry Renderers { get; }

    /// <summary>Folder where figures are written (default: <c>plots</c> under the starting folder).</summary>
    public string PlotFolder { get; set; }

    /// <summary>Shows a value: rendered (tables, grids, panels) at the prompt, as its <c>ToString()</c> in scripts.</summary>
    /// <param name="value">Any value; null prints <c>null</c>.</param>
    public void Print(object? value) => _print(value);

    /// <summary>
    /// Folder of the script being run by <c>orbitarium run</c> (so a script finds files beside it:
    /// <c>Path.Combine(ScriptDirectory, "../examples/tg1-water.xyz")</c>); at the prompt, the session folder (<c>#cd</c>).
    /// </summary>
    public string ScriptDirectory { get; internal set; } = Environment.CurrentDirectory;

    internal void SetToken(CancellationToken token) => _token = token;
}
