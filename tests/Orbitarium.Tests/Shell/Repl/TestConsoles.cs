using System.Text.RegularExpressions;
using Orbitarium.Shell.Repl;
using Spectre.Console;

namespace Orbitarium.Tests.Shell.Repl;

/// <summary>Consoles that write to a string, so tests read what the console rendered.</summary>
internal static partial class TestConsoles
{
    /// <summary>A plain (no colour, not interactive) console 140 columns wide.</summary>
    public static IAnsiConsole Plain(StringWriter writer)
    {
        var console = AnsiConsole.Create(new AnsiConsoleSettings
        {
            Ansi = AnsiSupport.No,
            ColorSystem = ColorSystemSupport.NoColors,
            Interactive = InteractionSupport.No,
            Out = new AnsiConsoleOutput(writer),
        });
        console.Profile.Width = 140;
        return console;
    }

    /// <summary>An interactive ANSI console (as RadLine requires) whose keys come from <paramref name="keys"/>.</summary>
    public static IAnsiConsole Interactive(StringWriter writer, ScriptedKeys keys)
    {
        var inner = AnsiConsole.Create(new AnsiConsoleSettings
        {
            Ansi = AnsiSupport.Yes,
            ColorSystem = ColorSystemSupport.NoColors,
            Interactive = InteractionSupport.Yes,
            Out = new AnsiConsoleOutput(writer),
        });
        inner.Profile.Width = 140;
        inner.Profile.Height = 40;
        return new ScriptedConsole(inner, keys);
    }

    /// <summary>A session on a plain console, rooted in <paramref name="folder"/> (default: the test's output folder).</summary>
    public static ReplSession Session(StringWriter writer, string? folder = null, TimeProvider? clock = null) =>
        new(Plain(writer), new ReplSessionOptions
        {
            WorkingDirectory = folder ?? AppContext.BaseDirectory,
            Clock = clock ?? TimeProvider.System,
        });

    /// <summary>The text with ANSI escape sequences removed.</summary>
    public static string StripAnsi(string text) => AnsiEscape().Replace(text, "");

    [GeneratedRegex(@"\x1b\[[0-9;?]*[A-Za-z]|\x1b[()][A-Z0-9]|\x1b[=>]")]
    private static partial Regex AnsiEscape();

    /// <summary>The repository root (the folder holding Repl.sln).</summary>
    public static string RepositoryRoot()
    {
        for (var dir = new DirectoryInfo(AppContext.BaseDirectory); dir is not null; dir = dir.Parent)
            if (File.Exists(Path.Combine(dir.FullName, "Repl.sln"))) return dir.FullName;
        throw new InvalidOperationException("Repl.sln not found above " + AppContext.BaseDirectory);
    }

    /// <summary>A fresh temporary folder.</summary>
    public static string TempFolder()
    {
        string path = Path.Combine(Path.GetTempPath(), "orbitarium-tests-" + Guid.NewGuid().ToString("N")[..10]);
        Directory.CreateDirectory(path);
        return path;
    }
}
