using Orbitarium.Analysis;
using ScottPlot;

namespace Orbitarium.Plots;

/// <summary>Writes ScottPlot figures as PNG or SVG atomically (temporary file, then rename).</summary>
internal static class PlotSaver
{
    public static PlotFormat FormatOf(string path)
    {
        if (string.IsNullOrWhiteSpace(path))
            throw new OrbitariumInputException("The output path is empty; give a file name ending in .png or .svg.");
        string ext = System.IO.Path.GetExtension(path).ToLowerInvariant();
        return ext switch
        {
            ".png" => PlotFormat.Png,
            ".svg" => PlotFormat.Svg,
            _ => throw new OrbitariumInputException($"Cannot tell the image format from \"{path}\"; end the file name in .png or .svg."),
        };
    }

    public static PlotFile Save(Plot plot, string path, int width, int height, string description, string preview)
    {
        CheckSize(width, height);
        var format = FormatOf(path);
        string full = format == PlotFormat.Png
            ? AtomicFile.WriteAllBytes(path, plot.GetImageBytes(width, height, ImageFormat.Png))
            : AtomicFile.WriteAllText(path, plot.GetSvgXml(width, height));
        return new PlotFile(full, description) { TerminalPreview = preview, WidthPixels = width, HeightPixels = height };
    }

    public static void CheckSize(int width, int height)
    {
        if (width < 100 || height < 100 || width > 20000 || height > 20000)
            throw new OrbitariumInputException($"A figure of {width} × {height} pixels is outside 100..20000 per side; give a sensible size such as 800 × 600.");
    }
}
