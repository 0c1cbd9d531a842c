using System.Diagnostics;

namespace Orbitarium.Shell.Calc;

/// <summary>Wall-clock seconds by phase, in the order they were recorded.</summary>
internal sealed class CalcTimings
{
    private readonly List<KeyValuePair<string, double>> _phases = [];
    private readonly Stopwatch _total = Stopwatch.StartNew();

    /// <summary>Records (or adds to) a phase.</summary>
    public void Add(string phase, double seconds)
    {
        for (int i = 0; i < _phases.Count; i++)
            if (_phases[i].Key == phase) { _phases[i] = new(phase, _phases[i].Value + seconds); return; }
        _phases.Add(new(phase, seconds));
    }

    /// <summary>Runs <paramref name="work"/> and records its time under <paramref name="phase"/>.</summary>
    public T Measure<T>(string phase, Func<T> work)
    {
        var clock = Stopwatch.StartNew();
        try { return work(); }
        finally { Add(phase, clock.Elapsed.TotalSeconds); }
    }

    /// <summary>The phases recorded so far.</summary>
    public IReadOnlyList<KeyValuePair<string, double>> Phases => _phases;

    /// <summary>Seconds since the command started.</summary>
    public double TotalSeconds => _total.Elapsed.TotalSeconds;
}
