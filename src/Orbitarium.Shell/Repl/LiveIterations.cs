using System.Collections.Concurrent;
using System.Diagnostics;
using System.Globalization;
using Orbitarium.Correlation;
using Orbitarium.Scf;
using Spectre.Console;

namespace Orbitarium.Shell.Repl;

/// <summary>
/// Collects the SCF and correlated-method iterations reported by the running submission (through
/// <see cref="ScriptGlobals.Progress"/>) and shows the latest ones in one live table while the submission runs.
/// </summary>
internal sealed class LiveIterations : IProgress<ScfIteration>, IProgress<CorrelationProgress>
{
    private const int VisibleRows = 8;
    private readonly ConcurrentQueue<Row> _pending = new();
    private readonly List<Row> _shown = [];
    private readonly Stopwatch _clock = new();
    private TaskCompletionSource _first = NewSignal();
    private int _runs;
    private int _scfTotal;
    private int _correlationTotal;
    private string _lastMethod = "";

    /// <summary>One table row: which calculation, its iteration, energy, residual and (for SCF) DIIS size.</summary>
    private sealed record Row(string Method, int Iteration, double EnergyHartree, double Residual, int? Diis, double Seconds)
    {
        /// <summary>Which calculation of the submission this is (a new one starts at iteration 1 or a new method).</summary>
        public int Run { get; init; }
    }

    /// <summary>Completes when the first iteration of the current submission arrives.</summary>
    public Task FirstReport => _first.Task;

    /// <summary>Iterations reported during the current submission.</summary>
    public int Count => Volatile.Read(ref _scfTotal) + Volatile.Read(ref _correlationTotal);

    /// <summary>What ran, for the line after the submission: "9 SCF iteration(s), 12 correlation iteration(s)".</summary>
    public string Summary
    {
        get
        {
            int scf = Volatile.Read(ref _scfTotal), correlation = Volatile.Read(ref _correlationTotal);
            var parts = new List<string>();
            if (scf > 0) parts.Add($"{scf} SCF iteration(s)");
            if (correlation > 0) parts.Add($"{correlation} correlation iteration(s)");
            return string.Join(", ", parts);
        }
    }

    public void Report(ScfIteration value)
    {
        ArgumentNullException.ThrowIfNull(value);
        _pending.Enqueue(new Row("SCF", value.Iteration, value.EnergyHartree, value.CommutatorNorm, value.DiisSubspaceSize, value.ElapsedSeconds));
        Interlocked.Increment(ref _scfTotal);
        _first.TrySetResult();
    }

    public void Report(CorrelationProgress value)
    {
        ArgumentNullException.ThrowIfNull(value);
        _pending.Enqueue(new Row(value.Method, value.Iteration, value.EnergyHartree, value.Residual, null, _clock.Elapsed.TotalSeconds));
        Interlocked.Increment(ref _correlationTotal);
        _first.TrySetResult();
    }

    /// <summary>Forgets the previous submission's iterations.</summary>
    public void Reset()
    {
        _pending.Clear();
        _shown.Clear();
        _runs = 0;
        _lastMethod = "";
        Volatile.Write(ref _scfTotal, 0);
        Volatile.Write(ref _correlationTotal, 0);
        _first = NewSignal();
        _clock.Restart();
    }

    /// <summary>Shows a live table until <paramref name="stop"/> completes (the submission ended or was interrupted).</summary>
    public async Task ShowUntilAsync(IAnsiConsole console, Task stop)
    {
        var table = NewTable();
        await console.Live(table).AutoClear(true).Overflow(VerticalOverflow.Ellipsis).StartAsync(async context =>
        {
            while (true)
            {
                Drain(table);
                context.Refresh();
                if (stop.IsCompleted) break;
                await Task.WhenAny(stop, Task.Delay(100)).ConfigureAwait(false);
            }
        }).ConfigureAwait(false);
    }

    private void Drain(Table table)
    {
        bool changed = false;
        while (_pending.TryDequeue(out var row))
        {
            if (row.Iteration <= 1 || row.Method != _lastMethod) _runs++;
            _lastMethod = row.Method;
            _shown.Add(row with { Run = _runs });
            changed = true;
        }
        if (!changed) return;
        if (_shown.Count > VisibleRows) _shown.RemoveRange(0, _shown.Count - VisibleRows);
        table.Rows.Clear();
        Row? previous = null;
        foreach (var row in _shown)
        {
            bool sameRun = previous is not null && previous.Run == row.Run;
            table.AddRow(
                row.Run.ToString(CultureInfo.InvariantCulture),
                Markup.Escape(row.Method),
                row.Iteration.ToString(CultureInfo.InvariantCulture),
                row.EnergyHartree.ToString("F10", CultureInfo.InvariantCulture),
                sameRun ? (row.EnergyHartree - previous!.EnergyHartree).ToString("E2", CultureInfo.InvariantCulture) : "",
                row.Residual.ToString("E2", CultureInfo.InvariantCulture),
                row.Diis?.ToString(CultureInfo.InvariantCulture) ?? "",
                row.Seconds.ToString("F2", CultureInfo.InvariantCulture));
            previous = row;
        }
        table.Caption(new TableTitle(
            "SCF: total energy, residual |FDS−SDF|. CCSD: correlation energy, RMS amplitude change. Eigenvalue solvers (EOM, CI): lowest root, largest residual. Ctrl+C cancels",
            new Style(Color.Grey)));
    }

    private static Table NewTable()
    {
        var table = new Table().Border(TableBorder.Simple).BorderColor(Color.Grey).Title("Iterations");
        table.AddColumn(new TableColumn("run").RightAligned());
        table.AddColumn(new TableColumn("method"));
        table.AddColumn(new TableColumn("iter").RightAligned());
        table.AddColumn(new TableColumn("energy / Eh").RightAligned());
        table.AddColumn(new TableColumn("ΔE / Eh").RightAligned());
        table.AddColumn(new TableColumn("residual").RightAligned());
        table.AddColumn(new TableColumn("DIIS").RightAligned());
        table.AddColumn(new TableColumn("t / s").RightAligned());
        return table;
    }

    private static TaskCompletionSource NewSignal() => new(TaskCreationOptions.RunContinuationsAsynchronously);
}
