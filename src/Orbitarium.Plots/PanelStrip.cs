using System.Globalization;
using System.Text;
using System.Text.RegularExpressions;
using Orbitarium.Analysis;
using ScottPlot;
using SkiaSharp;

namespace Orbitarium.Plots;

/// <summary>
/// A strip of maps side by side with one shared colour scale and one shared length scale (the same axis limits and
/// data-area size in every panel, equal units on both axes) — typically the same quantity at several bond lengths,
/// so the build-up or depletion of bond density, and the nuclei moving apart, are seen at a glance.
/// </summary>
public static partial class PanelStrip
{
    /// <summary>Writes the strip as PNG or SVG.</summary>
    /// <param name="fields">Fields on plane grids, one per panel, left to right.</param>
    /// <param name="titles">One title per panel (e.g. "R = 1.0 Å").</param>
    /// <param name="path">Output path ending in .png or .svg.</param>
    /// <param name="options">Map options; <see cref="FieldMapOptions.WidthPixels"/> is the width of one panel (default 800 → use e.g. 450).</param>
    /// <exception cref="OrbitariumInputException">No fields, a count mismatch, a field not on a plane, or an unusable path.</exception>
    public static PlotFile Save(IReadOnlyList<GridField> fields, IReadOnlyList<string> titles, string path, FieldMapOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(fields);
        ArgumentNullException.ThrowIfNull(titles);
        if (fields.Count == 0) throw new OrbitariumInputException("Give at least one field for a panel strip.");
        if (titles.Count != fields.Count) throw new OrbitariumInputException($"Give one title per panel: {fields.Count} fields but {titles.Count} titles.");
        var format = PlotSaver.FormatOf(path);
        options ??= FieldMapOptions.Default with { WidthPixels = 450 };
        double limit = options.ColorLimit ?? 0;
        if (options.ColorLimit is null)
            foreach (var f in fields)
                foreach (double v in f.Values) limit = Math.Max(limit, Math.Abs(v));
        if (limit <= 0) limit = 1;
        int w = options.WidthPixels;
        var plane0 = fields[0].Grid as PlaneGrid ?? throw new OrbitariumInputException("A panel strip needs fields on plane grids.");
        int h = options.HeightPixels ?? FieldMap.FittingHeight(plane0, w, 110);
        int totalWidth = w * fields.Count + ColourBarPixels;
        PlotSaver.CheckSize(totalWidth, h);
        if (w <= PaddingLeft + PaddingRight + 20 || h <= PaddingBottom + PaddingTop + 20)
            throw new OrbitariumInputException($"Panels of {w} × {h} pixels leave no room for the maps; use at least {PaddingLeft + PaddingRight + 100} × {PaddingBottom + PaddingTop + 100}.");
        var plots = new List<Plot>();
        double left = double.MaxValue, right = double.MinValue, bottom = double.MaxValue, top = double.MinValue;
        for (int i = 0; i < fields.Count; i++)
        {
            var plot = new Plot();
            bool last = i == fields.Count - 1;
            FieldMap.Draw(plot, fields[i], options with { Title = titles[i] }, limit, colorBar: last);
            // Same data-area size in every panel (the last one is wider by its colour bar) ...
            plot.Layout.Fixed(new PixelPadding(PaddingLeft, PaddingRight + (last ? ColourBarPixels : 0), PaddingBottom, PaddingTop));
            var limits = plot.Axes.GetLimits();
            left = Math.Min(left, limits.Left); right = Math.Max(right, limits.Right);
            bottom = Math.Min(bottom, limits.Bottom); top = Math.Max(top, limits.Top);
            plots.Add(plot);
        }
        // ... and the same limits, so one ångström is the same length in every panel.
        foreach (var plot in plots) plot.Axes.SetLimits(left, right, bottom, top);
        string full = format == PlotFormat.Png ? SavePng(plots, path, w, h) : SaveSvg(plots, path, w, h);
        var preview = new StringBuilder();
        for (int i = 0; i < fields.Count; i++)
        {
            preview.Append(titles[i]).Append('\n');
            preview.Append(TerminalPreview.Map(fields[i].ToPlaneArray(), fields[i].IsSigned, 40, 10)).Append('\n');
        }
        return new PlotFile(full, $"panel strip of {fields[0].Quantity}: {string.Join(", ", titles)}")
        {
            TerminalPreview = preview.ToString().TrimEnd('\n'),
            WidthPixels = totalWidth,
            HeightPixels = h,
        };
    }

    // Fixed margins around every panel's data area (pixels); the last panel is wider by the colour bar.
    private const int PaddingLeft = 80, PaddingRight = 20, PaddingBottom = 55, PaddingTop = 40, ColourBarPixels = 120;

    private static int PanelWidth(int i, int count, int w) => i == count - 1 ? w + ColourBarPixels : w;

    private static string SavePng(List<Plot> plots, string path, int w, int h)
    {
        using var surface = SKSurface.Create(new SKImageInfo(w * plots.Count + ColourBarPixels, h));
        var canvas = surface.Canvas;
        canvas.Clear(SKColors.White);
        for (int i = 0; i < plots.Count; i++)
        {
            using var panel = SKBitmap.Decode(plots[i].GetImageBytes(PanelWidth(i, plots.Count, w), h, ImageFormat.Png));
            canvas.DrawBitmap(panel, i * w, 0);
        }
        using var image = surface.Snapshot();
        using var data = image.Encode(SKEncodedImageFormat.Png, 100);
        return AtomicFile.WriteAllBytes(path, data.ToArray());
    }

    private static string SaveSvg(List<Plot> plots, string path, int w, int h)
    {
        var inv = CultureInfo.InvariantCulture;
        var sb = new StringBuilder();
        int total = w * plots.Count + ColourBarPixels;
        sb.Append(inv, $"<svg xmlns=\"http://www.w3.org/2000/svg\" width=\"{total}\" height=\"{h}\" viewBox=\"0 0 {total} {h}\">\n");
        for (int i = 0; i < plots.Count; i++)
        {
            string svg = XmlDeclaration().Replace(plots[i].GetSvgXml(PanelWidth(i, plots.Count, w), h), "");
            // Nest each panel's own <svg> element, shifted to its column.
            svg = OpeningSvg().Replace(svg, m => m.Value.Replace("<svg", string.Create(inv, $"<svg x=\"{i * w}\" y=\"0\"")), 1);
            sb.Append(svg).Append('\n');
        }
        sb.Append("</svg>\n");
        return AtomicFile.WriteAllText(path, sb.ToString());
    }

    [GeneratedRegex(@"<\?xml[^>]*\?>")]
    private static partial Regex XmlDeclaration();

    [GeneratedRegex(@"<svg\b")]
    private static partial Regex OpeningSvg();
}
