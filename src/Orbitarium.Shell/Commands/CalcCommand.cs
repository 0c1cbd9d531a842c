using System.CommandLine;

namespace Orbitarium.Shell.Commands;

/// <summary>The non-interactive <c>calc</c> command (filled by the Hartree–Fock work).</summary>
internal static class CalcCommand
{
    public static Command Create()
    {
        var cmd = new Command("calc", "Run one calculation on a geometry file and print a summary or JSON.");
        cmd.SetAction(_ => { Console.Error.WriteLine("calc: not built yet."); return 2; });
        return cmd;
    }
}
