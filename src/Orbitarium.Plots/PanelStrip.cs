using System.Globalization;
using System.Text;
using System.Text.RegularExpressions;
using Orbitarium.Analysis;
using ScottPlot;
using SkiaSharp;

namespace Orbitarium.Plots;

/// <summary>
/// A strip of maps side by side with one shared colour scale — typically the same quantity at several bond lengths,
/// so the build-up or depletion of bond density is seen at a glance.
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
        PlotSaver.CheckSize(w * fields.Count, h);
        var plots = new List<Plot>();
        for (int i = 0; i < fields.Count; i++)
        {
            var plot = new Plot();
            FieldMap.Draw(plot, fields[i], options with { Title = titles[i] }, limit, colorBar: i == fields.Count - 1);
            plots.Add(plot);
        }
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
            WidthPixels = w * fields.Count,
            HeightPixels = h,
        };
    }

    private static string SavePng(List<Plot> plots, string path, int w, int h)
    {
        using var surface = SKSurface.Create(new SKImageInfo(w * plots.Count, h));
        var canvas = surface.Canvas;
        canvas.Clear(SKColors.White);
        for (int i = 0; i < plots.Count; i++)
        {
            using var panel = SKBitmap.Decode(plots[i].GetImageBytes(w, h, ImageFormat.Png));
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
        sb.Append(inv, $"<svg xmlns=\"http://www.w3.org/2000/svg\" width=\"{w * plots.Count}\" height=\"{h}\" viewBox=\"0 0 {w * plots.Count} {h}\">\n");
        for (int i = 0; i < plots.Count; i++)
        {
            string svg = XmlDeclaration().Replace(plots[i].GetSvgXml(w, h), "");
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
