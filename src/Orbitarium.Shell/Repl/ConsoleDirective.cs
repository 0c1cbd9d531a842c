namespace Orbitarium.Shell.Repl;

/// <summary>A console directive: a line starting with <c>#</c> that the console handles instead of the C# compiler.</summary>
/// <param name="Name">The name typed after <c>#</c>.</param>
/// <param name="Usage">How to call it, e.g. <c>#load FILE</c>.</param>
/// <param name="Summary">One sentence saying what it does.</param>
/// <param name="Execute">Runs the command with the text after the name.</param>
public sealed record ConsoleDirective(
    string Name,
    string Usage,
    string Summary,
    Func<ReplSession, string, CancellationToken, Task<SubmissionResult>> Execute);
