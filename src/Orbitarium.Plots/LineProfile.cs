using Orbitarium.Analysis;
using ScottPlot;

namespace Orbitarium.Plots;

/// <summary>Line profiles of one or more quantities along a line (e.g. a bond axis), with the atoms on the line
/// marked by vertical lines and labels; the horizontal axis is the distance along the line in ångström.</summary>
public static class LineProfile
{
    /// <summary>Writes the profiles of fields on <see cref="LineGrid"/>s (all on the same line) as PNG or SVG.</summary>
    /// <param name="fields">Fields evaluated on line grids.</param>
    /// <param name="path">Output path ending in .png or .svg.</param>
    /// <param name="title">Title; null names the quantities.</param>
    /// <param name="widthPixels">Width in pixels (default 800).</param>
    /// <param name="heightPixels">Height in pixels (default 500).</param>
    /// <exception cref="OrbitariumInputException">No field, a field not on a line, or an unusable path.</exception>
    public static PlotFile Save(IReadOnlyList<GridField> fields, string path, string? title = null, int widthPixels = 800, int heightPixels = 500)
    {
        ArgumentNullException.ThrowIfNull(fields);
        if (fields.Count == 0) throw new OrbitariumInputException("Give at least one field for a line profile.");
        PlotSaver.FormatOf(path);
        var plot = new Plot();
        var curves = new List<(double[], double[])>();
        bool signed = false;
        foreach (var f in fields)
        {
            if (f.Grid is not LineGrid line)
                throw new OrbitariumInputException("A line profile needs fields on a line grid (LineGrid.AlongBond or LineGrid.Between).");
            var x = Enumerable.Range(0, line.PointCount).Select(line.PositionAngstrom).ToArray();
            var y = f.ToArray();
            var s = plot.Add.ScatterLine(x, y);
            s.LegendText = f.Quantity;
            s.LineWidth = 2;
            curves.Add((x, y));
            signed |= f.IsSigned;
        }
        if (signed) plot.Add.HorizontalLine(0, 1, Colors.Gray, LinePattern.Dashed);
        var first = (LineGrid)fields[0].Grid;
        foreach (var (atom, index) in fields[0].Molecule.Atoms.Select((a, i) => (a, i)))
        {
            double s = first.ProjectAngstrom(atom.PositionBohr);
            var foot = first.StartBohr + (s / first.LengthAngstrom) * (first.EndBohr - first.StartBohr);
            double off = Chemistry.Vector3D.Distance(foot, atom.PositionBohr) * Orbitarium.PhysicalConstants.AngstromPerBohr;
            if (off > 0.3 || s < 0 || s > first.LengthAngstrom) continue;
            plot.Add.VerticalLine(s, 1, Colors.Black.WithAlpha(0.5), LinePattern.Dotted);
            var label = plot.Add.Text($"{atom.Symbol}{index + 1}", s, 0);
            label.LabelFontSize = 14;
            label.LabelBold = true;
            label.LabelAlignment = Alignment.LowerCenter;
        }
        plot.Title(title ?? string.Join(", ", fields.Select(f => f.Quantity)));
        plot.XLabel("distance along the line (Å)");
        plot.YLabel(fields[0].Unit.Length > 0 ? $"value ({fields[0].Unit})" : "value");
        if (fields.Count > 1) plot.ShowLegend(Alignment.UpperRight);
        string preview = TerminalPreview.Curves(curves, xLabel: "distance (Å)", yLabel: fields[0].Quantity);
        return PlotSaver.Save(plot, path, widthPixels, heightPixels, $"line profile of {string.Join(", ", fields.Select(f => f.Quantity))}", preview);
    }
}
