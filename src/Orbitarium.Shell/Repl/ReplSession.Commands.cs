using System.Collections.Immutable;
using System.Globalization;
using System.Text;
using Spectre.Console;

namespace Orbitarium.Shell.Repl;

public sealed partial class ReplSession
{
    /// <summary>Directives the C# compiler itself understands; they are passed through as code.</summary>
    private static readonly ImmutableHashSet<string> CompilerDirectives =
        ["r", "if", "elif", "else", "endif", "region", "endregion", "pragma", "nullable", "line", "error", "warning", "define", "undef"];

    /// <summary>The console commands, in the order <c>#help</c> lists them.</summary>
    public static ImmutableArray<ConsoleDirective> Commands { get; } =
    [
        new("help", "#help [NAME]", "Lists the commands, or shows the documentation of a type or member (e.g. #help Molecule.WithCharge).", (s, a, c) => s.HelpAsync(a)),
        new("load", "#load FILE", "Runs a .csx file into the session (relative to the session folder; inside a file, relative to that file).", (s, a, c) => s.LoadAsync(a, c)),
        new("vars", "#vars", "Lists the session's variables with their types and values.", (s, a, c) => s.VarsAsync()),
        new("save", "#save FILE", "Writes the accepted submissions as a .csx script that `orbitarium run` replays.", (s, a, c) => Task.FromResult(s.Save(a))),
        new("time", "#time", "Times the next submission.", (s, a, c) => Task.FromResult(s.TimeNext())),
        new("cd", "#cd [DIR]", "Shows or changes the session folder.", (s, a, c) => Task.FromResult(s.ChangeDirectory(a))),
        new("trace", "#trace", "Shows the full trace of the last error.", (s, a, c) => Task.FromResult(s.Trace())),
        new("reset", "#reset", "Forgets all variables and submissions and starts a fresh session.", (s, a, c) => Task.FromResult(s.Reset())),
        new("quit", "#quit", "Leaves the console (so does Ctrl+C twice at an idle prompt).", (s, a, c) => Task.FromResult(s.Quit())),
    ];

    private static readonly ConsoleDirective UnknownCommand =
        new("?", "", "", (s, a, c) => Task.FromResult(s.Unknown(a)));

    private bool TryParseCommand(string text, out ConsoleDirective command, out string argument)
    {
        command = UnknownCommand;
        argument = "";
        string trimmed = text.Trim();
        if (trimmed.Length < 2 || trimmed[0] != '#' || trimmed.Contains('\n', StringComparison.Ordinal)) return false;
        int end = 1;
        while (end < trimmed.Length && char.IsLetter(trimmed[end])) end++;
        string name = trimmed[1..end];
        if (CompilerDirectives.Contains(name)) return false;
        argument = trimmed[end..].Trim();
        foreach (var c in Commands)
            if (c.Name == name) { command = c; return true; }
        if (name is "exit") { command = Commands.First(c => c.Name == "quit"); return true; }
        argument = name;
        return true;
    }

    private SubmissionResult Done(string? message = null) =>
        new(SubmissionStatus.Command, null, false, TimeSpan.Zero, message);

    private SubmissionResult Failed(string message)
    {
        _console.MarkupLine($"[red]{Markup.Escape(message)}[/]");
        return new SubmissionResult(SubmissionStatus.CompileError, null, false, TimeSpan.Zero, message);
    }

    private SubmissionResult Unknown(string name) =>
        Failed($"Unknown command #{name}. #help lists the commands.");

    private string ResolvePath(string path)
    {
        string p = path.Trim();
        if (p.Length >= 2 && p[0] == '"' && p[^1] == '"') p = p[1..^1];
        if (p.StartsWith("~/", StringComparison.Ordinal))
            p = Path.Combine(Environment.GetFolderPath(Environment.SpecialFolder.UserProfile), p[2..]);
        return Path.GetFullPath(Path.Combine(WorkingDirectory, p));
    }

    private async Task<SubmissionResult> LoadAsync(string argument, CancellationToken cancellationToken)
    {
        if (argument.Length == 0) return Failed("#load needs a file, e.g. #load scripts/water.csx");
        string path = ResolvePath(argument);
        if (!File.Exists(path)) return Failed($"No file {path}; check the name (relative paths start at {WorkingDirectory}).");
        string code = $"#load \"{path.Replace("\\", "\\\\", StringComparison.Ordinal).Replace("\"", "\\\"", StringComparison.Ordinal)}\"";
        return await RunCodeAsync(code, cancellationToken).ConfigureAwait(false);
    }

    private async Task<SubmissionResult> VarsAsync()
    {
        var variables = await GetVariablesAsync().ConfigureAwait(false);
        if (variables.Count == 0)
        {
            _console.MarkupLine("[grey]No variables yet.[/]");
            return Done();
        }
        var table = new Table().Border(TableBorder.Rounded).BorderColor(Color.Grey);
        table.AddColumn("name");
        table.AddColumn("type");
        table.AddColumn("value");
        foreach (var v in variables)
        {
            string value = Rendering.ValueRendererRegistry.PlainText(v.Value);
            int newline = value.IndexOf('\n', StringComparison.Ordinal);
            if (newline >= 0) value = value[..newline] + " …";
            if (value.Length > 60) value = value[..59] + "…";
            table.AddRow(Markup.Escape(v.Name), Markup.Escape(TypeName(v.Type)), Markup.Escape(value));
        }
        _console.Write(table);
        return Done();
    }

    /// <summary>A C#-style type name: <c>Matrix&lt;double&gt;</c> rather than <c>Matrix`1</c>.</summary>
    internal static string TypeName(Type type)
    {
        if (type == typeof(int)) return "int";
        if (type == typeof(double)) return "double";
        if (type == typeof(string)) return "string";
        if (type == typeof(bool)) return "bool";
        if (type == typeof(object)) return "object";
        if (type.IsArray) return TypeName(type.GetElementType()!) + "[]";
        if (!type.IsGenericType) return type.Name;
        string name = type.Name[..type.Name.IndexOf('`', StringComparison.Ordinal)];
        return $"{name}<{string.Join(", ", type.GetGenericArguments().Select(TypeName))}>";
    }

    private SubmissionResult Save(string argument)
    {
        if (argument.Length == 0) return Failed("#save needs a file, e.g. #save water-session.csx");
        string path = ResolvePath(argument);
        if (!path.EndsWith(".csx", StringComparison.OrdinalIgnoreCase)) path += ".csx";
        var submissions = AcceptedSubmissions;
        var text = new StringBuilder();
        text.Append(CultureInfo.InvariantCulture, $"// Orbitarium session saved {_options.Clock.GetUtcNow():yyyy-MM-dd HH:mm} UTC; replay with: orbitarium run {Path.GetFileName(path)}\n");
        foreach (string s in submissions) text.Append(s).Append('\n');
        try
        {
            AtomicFile.WriteAllText(path, text.ToString());
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            return Failed($"Could not write {path}: {e.Message}");
        }
        _console.MarkupLine($"[green]Saved {submissions.Count} submission(s) to {Markup.Escape(path)}[/]");
        return Done();
    }

    /// <summary>
    /// The form of an accepted submission that replays in a file: a trailing bare expression (shown at the prompt)
    /// becomes <c>Print(expression);</c>, a trailing call without a semicolon gets one.
    /// </summary>
    internal static string ToReplayable(string code, bool hasValue)
    {
        var tree = Microsoft.CodeAnalysis.CSharp.SyntaxFactory.ParseSyntaxTree(code, ParseOptions);
        var root = (Microsoft.CodeAnalysis.CSharp.Syntax.CompilationUnitSyntax)tree.GetRoot();
        if (root.Members.LastOrDefault() is not Microsoft.CodeAnalysis.CSharp.Syntax.GlobalStatementSyntax
            {
                Statement: Microsoft.CodeAnalysis.CSharp.Syntax.ExpressionStatementSyntax { SemicolonToken.IsMissing: true } statement
            })
            return code;
        var expression = statement.Expression.Span;
        string before = code[..expression.Start], inner = code[expression.Start..expression.End], after = code[expression.End..];
        return hasValue ? $"{before}Print({inner});{after}" : $"{before}{inner};{after}";
    }

    private SubmissionResult TimeNext()
    {
        _timeNext = true;
        _console.MarkupLine("[grey]The next submission will be timed.[/]");
        return Done();
    }

    private SubmissionResult ChangeDirectory(string argument)
    {
        if (argument.Length > 0)
        {
            string path = ResolvePath(argument);
            if (!Directory.Exists(path)) return Failed($"No folder {path}.");
            WorkingDirectory = path;
            if (_options.FollowProcessDirectory) Directory.SetCurrentDirectory(path);
            lock (_gate) _scriptOptions = ScriptEnvironment.CreateOptions(null, WorkingDirectory);
        }
        _console.MarkupLine($"[grey]{Markup.Escape(WorkingDirectory)}[/]");
        return Done();
    }

    private SubmissionResult Trace()
    {
        if (LastException is null) _console.MarkupLine("[grey]No error so far.[/]");
        else _console.WriteLine(LastException.ToString());
        return Done();
    }

    private SubmissionResult Reset()
    {
        ResetState();
        _console.MarkupLine("[grey]Session reset: no variables, no submissions.[/]");
        return Done();
    }

    private SubmissionResult Quit()
    {
        ExitRequested = true;
        return Done();
    }
}
