using Orbitarium.Shell.Repl.Rendering;

namespace Orbitarium.Shell.Repl;

/// <summary>How a <see cref="ReplSession"/> is set up; tests inject the clock and folders here.</summary>
public sealed record ReplSessionOptions
{
    /// <summary>Starting folder for relative paths (<c>#load</c>, <c>#save</c>, <c>#cd</c>); default: the process's current folder.</summary>
    public string WorkingDirectory { get; init; } = Environment.CurrentDirectory;

    /// <summary>Whether <c>#cd</c> also changes the process's current folder (true in the real console, so file
    /// calls in user code follow it; false in tests).</summary>
    public bool FollowProcessDirectory { get; init; }

    /// <summary>The clock used for <c>#time</c> and the cancellation grace period; default: the system clock.</summary>
    public TimeProvider Clock { get; init; } = TimeProvider.System;

    /// <summary>How long a cancelled submission may take to stop on its own before it is abandoned (default 0.5 s).</summary>
    public TimeSpan CancellationGrace { get; init; } = TimeSpan.FromMilliseconds(500);

    /// <summary>Renderers for values shown at the prompt; default: <see cref="ValueRendererRegistry.CreateDefault"/>.</summary>
    public ValueRendererRegistry? Renderers { get; init; }

    /// <summary>Display settings; default: a new <see cref="ConsoleSettings"/>.</summary>
    public ConsoleSettings? Settings { get; init; }

    /// <summary>Arguments exposed to scripts as <c>Args</c>.</summary>
    public IReadOnlyList<string> Args { get; init; } = [];
}
