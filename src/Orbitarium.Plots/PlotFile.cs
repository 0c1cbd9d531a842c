namespace Orbitarium.Plots;

/// <summary>A figure written to disk: where it is and what it shows.</summary>
/// <param name="Path">Full path of the written file.</param>
/// <param name="Description">One line saying what the figure shows.</param>
public sealed record PlotFile(string Path, string Description);
