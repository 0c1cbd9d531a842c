namespace Orbitarium.Plots;

/// <summary>A figure written to disk: where it is, what it shows, and a coarse text rendering for the terminal.</summary>
/// <param name="Path">Full path of the written file.</param>
/// <param name="Description">One line saying what the figure shows.</param>
public sealed record PlotFile(string Path, string Description)
{
    /// <summary>A coarse rendering of the figure in Unicode block or braille characters (several lines), shown by the
    /// console right after the plot is written. Empty when the figure has none.</summary>
    public string TerminalPreview { get; init; } = "";

    /// <summary>Width of the image in pixels.</summary>
    public int WidthPixels { get; init; }

    /// <summary>Height of the image in pixels.</summary>
    public int HeightPixels { get; init; }

    /// <summary>The coarse text rendering (<see cref="TerminalPreview"/>) followed by the file path.</summary>
    public string ToTerminalPreview() => TerminalPreview.Length == 0 ? ToString() : $"{TerminalPreview}\n{this}";

    /// <inheritdoc />
    public override string ToString() => $"{Description} → {Path}";
}
