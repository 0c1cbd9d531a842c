using System.Diagnostics;

namespace Orbitarium.Tests.Shell.Repl;

/// <summary>Runs the real <c>orbitarium</c> executable in a tmux pseudo-terminal, types into it and reads the screen.</summary>
public class EndToEndTests
{
    /// <summary>A fact that is skipped, with the reason shown, when tmux is not installed.</summary>
    public sealed class TmuxFactAttribute : FactAttribute
    {
        public TmuxFactAttribute()
        {
            if (Tmux() is null) Skip = "tmux is not installed (.ci/run installs it); the end-to-end console test needs a pseudo-terminal.";
        }
    }

    internal static string? Tmux()
    {
        foreach (string dir in (Environment.GetEnvironmentVariable("PATH") ?? "").Split(':'))
            if (dir.Length > 0 && File.Exists(Path.Combine(dir, "tmux"))) return Path.Combine(dir, "tmux");
        return null;
    }

    private static string Executable()
    {
        // The shell's own build output of the same configuration as this test assembly.
        string config = AppContext.BaseDirectory.Contains("/Debug/", StringComparison.Ordinal) ? "Debug" : "Release";
        string path = Path.Combine(TestConsoles.RepositoryRoot(), "src", "Orbitarium.Shell", "bin", config, "net10.0", "orbitarium.dll");
        return File.Exists(path) ? path : Path.Combine(AppContext.BaseDirectory, "orbitarium.dll");
    }

    private static async Task<string> RunTmux(string tmux, params string[] args)
    {
        var info = new ProcessStartInfo(tmux) { RedirectStandardOutput = true, RedirectStandardError = true };
        foreach (string a in args) info.ArgumentList.Add(a);
        using var process = Process.Start(info)!;
        string text = await process.StandardOutput.ReadToEndAsync();
        await process.WaitForExitAsync();
        return text;
    }

    [TmuxFact]
    public async Task The_executable_evaluates_typed_lines_and_renders_a_molecule_on_the_terminal()
    {
        string tmux = Tmux()!;
        string session = "orbitarium-e2e-" + Guid.NewGuid().ToString("N")[..8];
        string config = TestConsoles.TempFolder();
        string root = TestConsoles.RepositoryRoot();
        string socket = Path.Combine(config, "tmux.sock");
        async Task<string> Screen() => await RunTmux(tmux, "-S", socket, "capture-pane", "-p", "-t", session);
        async Task WaitFor(string text, string what)
        {
            for (int i = 0; i < 240; i++)
            {
                if ((await Screen()).Contains(text, StringComparison.Ordinal)) return;
                await Task.Delay(250);
            }
            Assert.Fail($"timed out waiting for {what}; screen:\n{await Screen()}");
        }
        async Task Type(string line)
        {
            // A trailing ';' would end a tmux command: escape it.
            await RunTmux(tmux, "-S", socket, "send-keys", "-t", session, "-l", line.EndsWith(';') ? line[..^1] + "\\;" : line);
            await Task.Delay(300);
            await RunTmux(tmux, "-S", socket, "send-keys", "-t", session, "Enter");
        }

        try
        {
            await RunTmux(tmux, "-S", socket, "new-session", "-d", "-s", session, "-x", "120", "-y", "45", "-c", root,
                "-e", "XDG_CONFIG_HOME=" + config, "-e", "DOTNET_CLI_TELEMETRY_OPTOUT=1",
                $"dotnet \"{Executable()}\"; sleep 30");
            await WaitFor("orb>", "the first prompt");

            await Type("var water = Molecule.FromXyzFile(\"examples/tg1-water.xyz\");");
            await WaitFor("orb> var water", "the echo");
            await Type("water.NuclearRepulsionEnergyHartree * 0 + 1234.5");
            await WaitFor("1234.5", "the value");
            await Type("water");
            await WaitFor("10 electrons", "the atom table");
            await Type("#quit");
            for (int i = 0; i < 40 && File.Exists(Path.Combine(config, "orbitarium", "history.jsonl")) is false; i++) await Task.Delay(250);

            // History was written to the config folder of this run.
            string history = await File.ReadAllTextAsync(Path.Combine(config, "orbitarium", "history.jsonl"));
            Assert.Contains("1234.5", history);
        }
        finally
        {
            await RunTmux(tmux, "-S", socket, "kill-server");
        }
    }
}
