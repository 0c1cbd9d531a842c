using System.Collections.Immutable;
using RadLine;
using Spectre.Console;

namespace Orbitarium.Shell.Repl;

/// <summary>Colours the tokens RadLine hands over: C# keywords, the library's type names, numbers, strings and comments.</summary>
public sealed class CSharpHighlighter : IHighlighter
{
    private static readonly Style KeywordStyle = new(Color.DodgerBlue1);
    private static readonly Style TypeStyle = new(Color.MediumSpringGreen);
    private static readonly Style NumberStyle = new(Color.Violet);
    private static readonly Style StringStyle = new(Color.SandyBrown);
    private static readonly Style CommandStyle = new(Color.Yellow);
    private readonly ImmutableHashSet<string> _typeNames;

    /// <summary>Creates a highlighter that knows <paramref name="typeNames"/> (default: the library's public types).</summary>
    public CSharpHighlighter(ImmutableHashSet<string>? typeNames = null)
    {
        _typeNames = typeNames ?? ScriptEnvironment.LibraryTypeNames();
    }

    /// <inheritdoc />
    public Style? Highlight(string token)
    {
        if (string.IsNullOrEmpty(token)) return null;
        if (ScriptCompletion.KeywordSet.Contains(token)) return KeywordStyle;
        if (_typeNames.Contains(token)) return TypeStyle;
        if (token[0] == '"' || token[0] == '\'' || token.StartsWith("$\"", StringComparison.Ordinal)) return StringStyle;
        if (char.IsDigit(token[0]) || (token[0] == '.' && token.Length > 1 && char.IsDigit(token[1]))) return NumberStyle;
        if (token[0] == '#') return CommandStyle;
        return null;
    }
}
