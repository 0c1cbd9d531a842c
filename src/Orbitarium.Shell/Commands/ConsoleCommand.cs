using System.CommandLine;

namespace Orbitarium.Shell.Commands;

/// <summary>The interactive console, started when no command is given (filled by the console work).</summary>
internal static class ConsoleCommand
{
    public static void Attach(RootCommand root)
    {
        root.SetAction(_ => { Console.WriteLine("Orbitarium console: not built yet."); return 0; });
    }
}
