namespace Orbitarium.Shell.Repl;

/// <summary>What became of one submission at the prompt.</summary>
public enum SubmissionStatus
{
    /// <summary>Nothing was typed.</summary>
    Empty,

    /// <summary>C# code compiled and ran; the session moved on to the new state.</summary>
    Accepted,

    /// <summary>A console command (<c>#vars</c>, <c>#help</c>, …) ran.</summary>
    Command,

    /// <summary>The code did not compile; the session state is unchanged.</summary>
    CompileError,

    /// <summary>The code threw; the session state is as before the submission.</summary>
    RuntimeError,

    /// <summary>Ctrl+C stopped the code cooperatively; the session state is as before the submission.</summary>
    Cancelled,

    /// <summary>Ctrl+C was ignored by the code, which was left running in the background; the session state is as before.</summary>
    Abandoned,
}

/// <summary>The outcome of <see cref="ReplSession.SubmitAsync"/>.</summary>
/// <param name="Status">What happened.</param>
/// <param name="Value">The value of a trailing expression (null when there is none or it is null).</param>
/// <param name="HasValue">Whether the submission ended in an expression whose value was shown.</param>
/// <param name="Elapsed">Wall time of compiling and running the submission.</param>
/// <param name="Message">The error or cancellation message shown, if any.</param>
public sealed record SubmissionResult(SubmissionStatus Status, object? Value, bool HasValue, TimeSpan Elapsed, string? Message)
{
    /// <summary>An empty submission.</summary>
    public static SubmissionResult Empty { get; } = new(SubmissionStatus.Empty, null, false, TimeSpan.Zero, null);
}
