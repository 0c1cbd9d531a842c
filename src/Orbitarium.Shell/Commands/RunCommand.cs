using System.CommandLine;

namespace Orbitarium.Shell.Commands;

/// <summary>The <c>run</c> command: runs a saved .csx script (filled by the console work).</summary>
internal static class RunCommand
{
    public static Command Create()
    {
        var cmd = new Command("run", "Run a saved .csx script non-interactively.");
        cmd.SetAction(_ => { Console.Error.WriteLine("run: not built yet."); return 1; });
        return cmd;
    }
}
