using System.CommandLine;
using Orbitarium.Shell.Commands;

namespace Orbitarium.Shell;

/// <summary>Entry point of the <c>orbitarium</c> executable: the interactive console, <c>run</c> and <c>calc</c>.</summary>
public static class Program
{
    /// <summary>Parses the command line and runs the chosen command; returns the process exit code.</summary>
    public static int Main(string[] args)
    {
        // calc has its own exit-code contract (2 for bad input, including command-line errors).
        if (args.Length > 0 && args[0] == "calc") return CalcCommand.Invoke(args[1..], Console.Out, Console.Error);
        var root = new RootCommand("Orbitarium: molecular electronic-structure modelling in C#. " +
                                   "Without a command, opens the interactive console.");
        root.Subcommands.Add(CalcCommand.Create());
        root.Subcommands.Add(RunCommand.Create());
        ConsoleCommand.Attach(root);
        return root.Parse(args).Invoke();
    }
}
