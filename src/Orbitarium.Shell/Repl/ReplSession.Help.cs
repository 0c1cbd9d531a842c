using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.CSharp.Syntax;
using Spectre.Console;

namespace Orbitarium.Shell.Repl;

public sealed partial class ReplSession
{
    private static readonly SymbolDisplayFormat SignatureFormat = SymbolDisplayFormat.MinimallyQualifiedFormat
        .WithMemberOptions(SymbolDisplayMemberOptions.IncludeParameters | SymbolDisplayMemberOptions.IncludeType |
                           SymbolDisplayMemberOptions.IncludeContainingType | SymbolDisplayMemberOptions.IncludeRef)
        .WithParameterOptions(SymbolDisplayParameterOptions.IncludeType | SymbolDisplayParameterOptions.IncludeName |
                              SymbolDisplayParameterOptions.IncludeDefaultValue | SymbolDisplayParameterOptions.IncludeParamsRefOut);

    /// <summary>The completions for the identifier at the end of <paramref name="text"/> (empty while the engine warms up).</summary>
    public CompletionResult Complete(string text)
    {
        ArgumentNullException.ThrowIfNull(text);
        var start = _start;
        if (!start.IsCompletedSuccessfully) return new CompletionResult(text.Length, "", []);
        try
        {
            return ScriptCompletion.Complete(start.Result.Script, _scriptOptions, text);
        }
        catch (Exception e) when (e is not OutOfMemoryException)
        {
            return new CompletionResult(text.Length, "", []);
        }
    }

    /// <summary>The symbols a name such as <c>Molecule</c>, <c>Molecule.WithCharge</c> or <c>water.Formula</c> refers to in the session.</summary>
    public async Task<IReadOnlyList<ISymbol>> ResolveSymbolsAsync(string name)
    {
        ArgumentNullException.ThrowIfNull(name);
        var state = await _start.ConfigureAwait(false);
        var compilation = state.Script.ContinueWith(name.Trim(), _scriptOptions).GetCompilation();
        var tree = compilation.SyntaxTrees.Last();
        var model = compilation.GetSemanticModel(tree);
        var expression = tree.GetRoot().DescendantNodes().OfType<ExpressionSyntax>().FirstOrDefault();
        if (expression is null) return [];
        var info = model.GetSymbolInfo(expression);
        if (info.Symbol is { } symbol)
        {
            if (symbol is ILocalSymbol or IFieldSymbol { ContainingType.IsScriptClass: true } && model.GetTypeInfo(expression).Type is { } t)
                return [symbol, t];
            return [symbol];
        }
        return [.. info.CandidateSymbols];
    }

    private async Task<SubmissionResult> HelpAsync(string argument)
    {
        if (argument.Length == 0)
        {
            var table = new Table().Border(TableBorder.Rounded).BorderColor(Color.Grey);
            table.AddColumn("command");
            table.AddColumn("what it does");
            foreach (var c in Commands) table.AddRow(Markup.Escape(c.Usage), Markup.Escape(c.Summary));
            _console.Write(table);
            _console.MarkupLine("[grey]Type C# to evaluate it; an expression without ';' shows its value. Tab completes names; " +
                                "incomplete code continues on the next line; Ctrl+C cancels a running submission. Script globals: Print, Args, Token, Progress, Settings, Renderers, PlotFolder.[/]");
            return Done();
        }
        var symbols = await ResolveSymbolsAsync(argument).ConfigureAwait(false);
        if (symbols.Count == 0) return Failed($"Nothing named {argument} here; try a type (#help Molecule) or a member (#help Molecule.FromXyz).");
        foreach (var symbol in symbols.Take(8)) ShowHelp(symbol);
        return Done();
    }

    private void ShowHelp(ISymbol symbol)
    {
        if (symbol is ILocalSymbol or IFieldSymbol { ContainingType.IsScriptClass: true })
        {
            _console.MarkupLine($"[aqua]{Markup.Escape(symbol.Name)}[/] is a session variable of type [green]{Markup.Escape(((symbol as ILocalSymbol)?.Type ?? ((IFieldSymbol)symbol).Type).ToDisplayString(SymbolDisplayFormat.MinimallyQualifiedFormat))}[/]:");
            return;
        }
        _console.MarkupLine($"[bold aqua]{Markup.Escape(symbol.ToDisplayString(SignatureFormat))}[/]  [grey]{symbol.Kind.ToString().ToLowerInvariant()}[/]");
        var doc = XmlDocumentation.Find(symbol.OriginalDefinition.GetDocumentationCommentId());
        if (doc is null)
        {
            _console.MarkupLine("  [grey](no documentation)[/]");
        }
        else
        {
            WriteSection(null, doc.Summary);
            WriteSection("value", doc.Value);
            foreach (var (name, text) in doc.Parameters) WriteSection(name, text);
            WriteSection("returns", doc.Returns);
            WriteSection("remarks", doc.Remarks);
            foreach (var (name, text) in doc.Exceptions) WriteSection("throws " + name, text);
        }
        if (symbol is INamedTypeSymbol type) ShowMembers(type);
    }

    private void WriteSection(string? label, string text)
    {
        if (text.Length == 0) return;
        string prefix = label is null ? "" : $"[yellow]{Markup.Escape(label)}[/]: ";
        _console.MarkupLine("  " + prefix + Markup.Escape(text).Replace("\n", "\n  ", StringComparison.Ordinal));
    }

    private void ShowMembers(INamedTypeSymbol type)
    {
        var members = type.GetMembers()
            .Where(m => m.DeclaredAccessibility == Accessibility.Public && m.CanBeReferencedByName && !m.IsImplicitlyDeclared
                        && m is not IMethodSymbol { MethodKind: MethodKind.PropertyGet or MethodKind.PropertySet })
            .GroupBy(m => m.Name).OrderBy(g => g.Key, StringComparer.Ordinal).ToList();
        if (members.Count == 0) return;
        var table = new Table().Border(TableBorder.Simple).BorderColor(Color.Grey);
        table.AddColumn("member");
        table.AddColumn("summary");
        foreach (var group in members)
        {
            var first = group.First();
            string summary = XmlDocumentation.Find(first.OriginalDefinition.GetDocumentationCommentId())?.Summary ?? "";
            int stop = summary.IndexOf(". ", StringComparison.Ordinal);
            if (stop > 0) summary = summary[..(stop + 1)];
            string name = first.Name + (first is IMethodSymbol ? "(…)" : "") + (group.Count() > 1 ? $" ×{group.Count()}" : "");
            table.AddRow(Markup.Escape(name), Markup.Escape(summary.Replace('\n', ' ')));
        }
        _console.Write(table);
    }
}
