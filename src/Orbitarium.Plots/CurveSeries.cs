namespace Orbitarium.Plots;

/// <summary>One curve of a line chart.</summary>
/// <param name="Label">Legend text.</param>
/// <param name="X">Abscissae.</param>
/// <param name="Y">Ordinates (NaN for a gap).</param>
/// <param name="ShowMarkers">Draw a marker at each point (computed points) or not (smooth fitted curves).</param>
public sealed record CurveSeries(string Label, double[] X, double[] Y, bool ShowMarkers = true);
