using System.Collections.Concurrent;
using System.Globalization;
using Orbitarium.Scf;
using Spectre.Console;

namespace Orbitarium.Shell.Repl;

/// <summary>
/// Collects SCF iterations reported by the running submission (through <see cref="ScriptGlobals.Progress"/>)
/// and shows the latest ones in a live table while the submission runs.
/// </summary>
internal sealed class LiveIterations : IProgress<ScfIteration>
{
    private const int VisibleRows = 8;
    private readonly ConcurrentQueue<ScfIteration> _pending = new();
    private readonly List<ScfIteration> _shown = [];
    private TaskCompletionSource _first = NewSignal();
    private int _runs;
    private int _total;

    /// <summary>Completes when the first iteration of the current submission arrives.</summary>
    public Task FirstReport => _first.Task;

    /// <summary>Iterations reported during the current submission.</summary>
    public int Count => Volatile.Read(ref _total);

    public void Report(ScfIteration value)
    {
        ArgumentNullException.ThrowIfNull(value);
        _pending.Enqueue(value);
        Interlocked.Increment(ref _total);
        _first.TrySetResult();
    }

    /// <summary>Forgets the previous submission's iterations.</summary>
    public void Reset()
    {
        _pending.Clear();
        _shown.Clear();
        _runs = 0;
        Volatile.Write(ref _total, 0);
        _first = NewSignal();
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
        while (_pending.TryDequeue(out var it))
        {
            if (it.Iteration == 1) _runs++;
            _shown.Add(it);
            changed = true;
        }
        if (!changed) return;
        if (_shown.Count > VisibleRows) _shown.RemoveRange(0, _shown.Count - VisibleRows);
        table.Rows.Clear();
        foreach (var it in _shown)
            table.AddRow(
                _runs.ToString(CultureInfo.InvariantCulture),
                it.Iteration.ToString(CultureInfo.InvariantCulture),
                it.EnergyHartree.ToString("F10", CultureInfo.InvariantCulture),
                it.EnergyChangeHartree.ToString("E2", CultureInfo.InvariantCulture),
                it.CommutatorNorm.ToString("E2", CultureInfo.InvariantCulture),
                it.DiisSubspaceSize.ToString(CultureInfo.InvariantCulture),
                it.ElapsedSeconds.ToString("F2", CultureInfo.InvariantCulture));
        table.Caption(new TableTitle("Ctrl+C cancels", new Style(Color.Grey)));
    }

    private static Table NewTable()
    {
        var table = new Table().Border(TableBorder.Simple).BorderColor(Color.Grey).Title("SCF iterations");
        table.AddColumn(new TableColumn("run").RightAligned());
        table.AddColumn(new TableColumn("iter").RightAligned());
        table.AddColumn(new TableColumn("energy / Eh").RightAligned());
        table.AddColumn(new TableColumn("ΔE / Eh").RightAligned());
        table.AddColumn(new TableColumn("|FDS−SDF|").RightAligned());
        table.AddColumn(new TableColumn("DIIS").RightAligned());
        table.AddColumn(new TableColumn("t / s").RightAligned());
        return table;
    }

    private static TaskCompletionSource NewSignal() => new(TaskCreationOptions.RunContinuationsAsynchronously);
}
