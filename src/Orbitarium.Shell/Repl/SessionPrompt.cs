using RadLine;
using Spectre.Console;

namespace Orbitarium.Shell.Repl;

/// <summary>The prompt: <c>orb&gt;</c> on a new submission, a grey ellipsis on lines that continue an incomplete one.</summary>
public sealed class SessionPrompt : ILineEditorPrompt
{
    private static readonly LineEditorPrompt Fresh = new("[aqua]orb>[/]", "[grey]  …[/]");
    private static readonly LineEditorPrompt More = new("[grey]  …[/]", "[grey]  …[/]");

    /// <summary>Whether the next line continues an incomplete submission.</summary>
    public bool Continuing { get; set; }

    /// <inheritdoc />
    public (Markup Markup, int Margin) GetPrompt(ILineEditorState state, int line) =>
        (Continuing ? More : Fresh).GetPrompt(state, line);
}
