using Orbitarium.Plots;
using Spectre.Console;
using Spectre.Console.Rendering;

namespace Orbitarium.Shell.Repl.Rendering;

/// <summary>Shows a written figure as its coarse text preview (braille curves, block maps) in a panel, with the file
/// path, size and description below, so a user sees the result without leaving the prompt.</summary>
public static class PlotFileRenderer
{
    /// <summary>Renders <paramref name="plot"/>.</summary>
    public static IRenderable Render(PlotFile plot, ConsoleSettings settings)
    {
        ArgumentNullException.ThrowIfNull(plot);
        ArgumentNullException.ThrowIfNull(settings);
        var path = new Text(plot.Path, new Style(Color.Aqua, decoration: Decoration.Bold));
        var caption = new Text($"{plot.Description} · {plot.WidthPixels} × {plot.HeightPixels} px", new Style(Color.Grey));
        if (plot.TerminalPreview.Length == 0) return new Rows(path, caption);
        var panel = new Panel(new Text(plot.TerminalPreview)).Border(BoxBorder.Rounded).BorderColor(Color.Grey);
        return new Rows(panel, path, caption);
    }
}
