using System.CommandLine;
using Orbitarium.Shell.Repl;
using Spectre.Console;

namespace Orbitarium.Shell.Commands;

/// <summary>The interactive console, started when no command is given.</summary>
internal static class ConsoleCommand
{
    public static void Attach(RootCommand root)
    {
        var noHistory = new Option<bool>("--no-history") { Description = "Do not read or write the history file." };
        root.Options.Add(noHistory);
        root.SetAction((parse, cancellationToken) =>
        {
            var console = AnsiConsole.Console;
            var session = new ReplSession(console, new ReplSessionOptions { FollowProcessDirectory = true });
            var history = parse.GetValue(noHistory) ? null : new PersistentHistory(PersistentHistory.DefaultPath);
            using var interrupts = new ConsoleInterruptSource();
            var loop = new InteractiveConsole(session, console, null, history, interrupts);
            return loop.RunAsync(CancellationToken.None);
        });
    }
}
