using System.Globalization;
using Orbitarium.Analysis;
using ScottPlot;

namespace Orbitarium.Plots;

/// <summary>
/// Heat and contour maps of a quantity in a plane, with atoms marked and labelled and axes in ångström: a diverging
/// colour scale centred on zero for signed quantities (orbitals, differences), a sequential one for densities.
/// </summary>
public static class FieldMap
{
    /// <summary>Writes the map of a field on a <see cref="PlaneGrid"/> as PNG or SVG (chosen by the extension).</summary>
    /// <param name="field">A field evaluated on a plane grid.</param>
    /// <param name="path">Output path ending in .png or .svg.</param>
    /// <param name="options">Drawing options (default <see cref="FieldMapOptions.Default"/>).</param>
    /// <returns>The written file with a terminal preview of the map.</returns>
    /// <exception cref="OrbitariumInputException">The field is not on a plane, or the path is unusable.</exception>
    public static PlotFile Save(GridField field, string path, FieldMapOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(field);
        options ??= FieldMapOptions.Default;
        PlotSaver.FormatOf(path);
        var plot = new Plot();
        double limit = Draw(plot, field, options, options.ColorLimit, colorBar: true);
        _ = limit;
        string preview = TerminalPreview.Map(field.ToPlaneArray(), field.IsSigned);
        return PlotSaver.Save(plot, path, options.WidthPixels, options.HeightPixels ?? FittingHeight((PlaneGrid)field.Grid, options.WidthPixels, 230),
            $"map of {field.Quantity} ({((PlaneGrid)field.Grid).Describe()})", preview);
    }

    /// <summary>Draws the map into a plot; returns the colour limit used.</summary>
    internal static double Draw(Plot plot, GridField field, FieldMapOptions options, double? colorLimit, bool colorBar)
    {
        if (field.Grid is not PlaneGrid plane)
            throw new OrbitariumInputException("A map needs a field on a plane grid (PlaneGrid); evaluate the quantity on a plane first.");
        int nu = plane.CountU, nv = plane.CountV;
        var values = field.ToPlaneArray();
        double maxAbs = 0, maxValue = double.MinValue;
        foreach (double v in values) { maxAbs = Math.Max(maxAbs, Math.Abs(v)); maxValue = Math.Max(maxValue, v); }
        double limit = colorLimit ?? (maxAbs > 0 ? maxAbs : 1);

        // ScottPlot draws row 0 at the top; the plane's row 0 is at the bottom (smallest v).
        var flipped = new double[nv, nu];
        for (int j = 0; j < nv; j++)
            for (int i = 0; i < nu; i++) flipped[nv - 1 - j, i] = values[j, i];
        var heat = plot.Add.Heatmap(flipped);
        double h = plane.SpacingBohr * Orbitarium.PhysicalConstants.AngstromPerBohr;
        heat.Smooth = true;
        heat.Extent = new CoordinateRect(plane.UAngstrom(0) - h / 2, plane.UAngstrom(nu - 1) + h / 2, plane.VAngstrom(0) - h / 2, plane.VAngstrom(nv - 1) + h / 2);
        if (field.IsSigned)
        {
            heat.Colormap = new ScottPlot.Colormaps.Balance();
            heat.ManualRange = new ScottPlot.Range(-limit, limit);
        }
        else
        {
            heat.Colormap = new ScottPlot.Colormaps.Viridis();
            heat.ManualRange = new ScottPlot.Range(0, limit);
        }
        if (colorBar)
        {
            var bar = plot.Add.ColorBar(heat);
            bar.Label = field.Unit.Length > 0 ? $"{field.Quantity} ({field.Unit})" : field.Quantity;
        }

        if (options.ShowContours)
        {
            var coords = new Coordinates3d[nv, nu];
            for (int j = 0; j < nv; j++)
                for (int i = 0; i < nu; i++) coords[j, i] = new Coordinates3d(plane.UAngstrom(i), plane.VAngstrom(j), values[j, i]);
            var levels = options.ContourLevels ?? DefaultLevels(field.IsSigned, maxAbs);
            AddContours(plot, coords, [.. levels.Where(l => l > 0)], Colors.Black.WithAlpha(0.75), LinePattern.Solid, 1);
            if (field.IsSigned)
            {
                AddContours(plot, coords, [.. levels.Where(l => l > 0).Select(l => -l)], Colors.Black.WithAlpha(0.75), LinePattern.Dashed, 1);
                AddContours(plot, coords, [0.0], Colors.Black, LinePattern.DenselyDashed, 2);
            }
        }

        foreach (var (atom, index) in field.Molecule.Atoms.Select((a, i) => (a, i)))
        {
            var (u, v, d) = plane.Project(atom.PositionBohr);
            if (u < plane.UAngstrom(0) || u > plane.UAngstrom(nu - 1) || v < plane.VAngstrom(0) || v > plane.VAngstrom(nv - 1)) continue;
            bool inPlane = Math.Abs(d) <= options.InPlaneToleranceAngstrom;
            var marker = plot.Add.Marker(u, v, inPlane ? MarkerShape.FilledCircle : MarkerShape.OpenCircle, 9, Colors.Black);
            marker.MarkerStyle.LineColor = Colors.White;
            var label = plot.Add.Text($"{atom.Symbol}{index + 1}", u, v);
            label.LabelFontSize = 14;
            label.LabelBold = true;
            label.LabelFontColor = Colors.Black;
            label.LabelBackgroundColor = Colors.White.WithAlpha(0.7);
            label.LabelAlignment = Alignment.LowerLeft;
            label.OffsetX = 6;
            label.OffsetY = -6;
        }

        plot.Title(options.Title ?? field.Quantity);
        plot.XLabel("in-plane coordinate u (Å)");
        plot.YLabel("in-plane coordinate v (Å)");
        plot.Axes.SetLimits(heat.Extent.Value);
        plot.Axes.SquareUnits();
        return limit;
    }

    /// <summary>The points of the contour lines drawn at <paramref name="level"/> (Å in-plane coordinates), as
    /// ScottPlot computes them for the figure; used to check where a contour falls.</summary>
    /// <param name="field">A field on a plane grid.</param>
    /// <param name="level">The contour level in the field's unit (0 for the nodal line of a signed quantity).</param>
    public static IReadOnlyList<(double UAngstrom, double VAngstrom)> ContourPoints(GridField field, double level)
    {
        ArgumentNullException.ThrowIfNull(field);
        if (field.Grid is not PlaneGrid plane)
            throw new OrbitariumInputException("Contours need a field on a plane grid (PlaneGrid).");
        var values = field.ToPlaneArray();
        var coords = new Coordinates3d[plane.CountV, plane.CountU];
        for (int j = 0; j < plane.CountV; j++)
            for (int i = 0; i < plane.CountU; i++) coords[j, i] = new Coordinates3d(plane.UAngstrom(i), plane.VAngstrom(j), values[j, i]);
        var contours = new ScottPlot.Plottables.ContourLines { ContourLineLevels = [level] };
        contours.Update(coords);
        var list = new List<(double, double)>();
        foreach (var line in contours.Lines)
            foreach (var c in line.Path.Points) list.Add((c.X, c.Y));
        return list;
    }

    internal static int FittingHeight(PlaneGrid plane, int width, int extraWidth)
    {
        double aspect = plane.HalfWidthVBohr / plane.HalfWidthUBohr;
        return (int)Math.Clamp((width - extraWidth) * aspect + 110, 250, 3000);
    }

    /// <summary>Contour levels: ±0.02·2^k for signed quantities, 0.001·2^k for densities, up to the largest |value|.</summary>
    internal static IReadOnlyList<double> DefaultLevels(bool signed, double maxAbs)
    {
        var levels = new List<double>();
        double start = signed ? 0.02 : 0.001;
        for (double l = start; l < maxAbs && levels.Count < 12; l *= 2) levels.Add(l);
        if (levels.Count == 0 && maxAbs > 0) levels.Add(maxAbs / 2);
        return levels;
    }

    private static void AddContours(Plot plot, Coordinates3d[,] coords, double[] levels, Color color, LinePattern pattern, float width)
    {
        if (levels.Length == 0) return;
        var contours = new ScottPlot.Plottables.ContourLines
        {
            ContourLineLevels = levels,
            LineColor = color,
            LinePattern = pattern,
            LineWidth = width,
        };
        contours.LabelStyle.IsVisible = false;
        contours.Update(coords);
        plot.Add.Plottable(contours);
    }

    internal static string Format(double v) => v.ToString("G3", CultureInfo.InvariantCulture);
}
