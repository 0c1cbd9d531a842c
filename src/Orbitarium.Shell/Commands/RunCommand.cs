using System.CommandLine;
using Orbitarium.Shell.Repl;

namespace Orbitarium.Shell.Commands;

/// <summary>The <c>run</c> command: runs a saved .csx script non-interactively (exit 0 ok, 1 error, 130 cancelled).</summary>
internal static class RunCommand
{
    public static Command Create()
    {
        var file = new Argument<FileInfo>("FILE") { Description = "The .csx script to run." };
        var args = new Argument<string[]>("args") { Description = "Arguments the script sees as Args.", Arity = ArgumentArity.ZeroOrMore };
        var cmd = new Command("run", "Run a saved .csx script non-interactively (exit code 0 ok, 1 error, 130 cancelled).");
        cmd.Arguments.Add(file);
        cmd.Arguments.Add(args);
        cmd.TreatUnmatchedTokensAsErrors = false;
        cmd.SetAction(async (parse, _) =>
        {
            using var interrupt = new CancellationTokenSource();
            void OnCancel(object? sender, ConsoleCancelEventArgs e)
            {
                e.Cancel = true;
                interrupt.Cancel();
            }
            Console.CancelKeyPress += OnCancel;
            try
            {
                var path = parse.GetValue(file)!.FullName;
                var scriptArgs = parse.GetValue(args) ?? [];
                return await ScriptRunner.RunAsync(path, scriptArgs, Console.Out, Console.Error, interrupt.Token);
            }
            finally
            {
                Console.CancelKeyPress -= OnCancel;
            }
        });
        return cmd;
    }
}
