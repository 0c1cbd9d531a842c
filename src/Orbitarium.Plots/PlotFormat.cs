namespace Orbitarium.Plots;

/// <summary>Image formats a figure can be written in, chosen from the file extension.</summary>
public enum PlotFormat
{
    /// <summary>Portable Network Graphics (raster), ".png".</summary>
    Png,

    /// <summary>Scalable Vector Graphics, ".svg".</summary>
    Svg,
}
