using System.Globalization;
using System.Text;
using Orbitarium.Analysis;
using ScottPlot;

namespace Orbitarium.Plots;

/// <summary>
/// Orbital energy-level diagrams: molecular levels in the middle, fragment (or atomic) levels at the sides, dashed
/// lines where a fragment orbital contributes, dots for electrons, and each molecular level labelled with its main
/// atomic components and bonding character (blue bonding, red antibonding, grey non-bonding).
/// </summary>
public static class LevelDiagram
{
    private const double HalfWidth = 0.18;

    /// <summary>Writes the diagram as PNG or SVG.</summary>
    /// <param name="data">The diagram data (see <see cref="OrbitalLevelDiagram"/>).</param>
    /// <param name="path">Output path ending in .png or .svg.</param>
    /// <param name="widthPixels">Width in pixels (default 1000).</param>
    /// <param name="heightPixels">Height in pixels (default 750).</param>
    public static PlotFile Save(LevelDiagramData data, string path, int widthPixels = 1000, int heightPixels = 750)
    {
        ArgumentNullException.ThrowIfNull(data);
        PlotSaver.FormatOf(path);
        var plot = new Plot();
        var xs = ColumnPositions(data);
        double emin = double.MaxValue, emax = double.MinValue;
        for (int ci = 0; ci < data.Columns.Count; ci++)
        {
            var col = data.Columns[ci];
            var (offsets, groups) = DegenerateOffsets(col.Levels);
            for (int li = 0; li < col.Levels.Count; li++)
            {
                var level = col.Levels[li];
                double x = xs[ci] + offsets[li];
                double w = groups[li] > 1 ? HalfWidth / (1.1 * groups[li]) : HalfWidth;
                emin = Math.Min(emin, level.EnergyHartree); emax = Math.Max(emax, level.EnergyHartree);
                var color = level.Character switch
                {
                    BondCharacter.Bonding => Colors.Blue,
                    BondCharacter.Antibonding => Colors.Red,
                    BondCharacter.NonBonding => Colors.Gray,
                    _ => Colors.Black,
                };
                var line = plot.Add.Line(x - w, level.EnergyHartree, x + w, level.EnergyHartree);
                line.LineColor = color;
                line.LineWidth = 3;
                line.MarkerSize = 0;
                int electrons = (int)Math.Round(level.Occupation);
                for (int e = 0; e < electrons; e++)
                    plot.Add.Marker(x + (electrons == 1 ? 0 : (e == 0 ? -0.04 : 0.04)), level.EnergyHartree, MarkerShape.FilledCircle, 8, Colors.Black);
                bool firstOfGroup = li == 0 || groups[li] == 1 || offsets[li - 1] >= offsets[li];
                if (!firstOfGroup) continue;
                string text = groups[li] > 1 ? $"{level.Label} (×{groups[li]})" : level.Label;
                if (ci == data.MoleculeColumn || data.Columns.Count == 1)
                {
                    var t = plot.Add.Text(text, xs[ci] + HalfWidth + 0.02, level.EnergyHartree);
                    t.LabelFontSize = 11;
                    t.LabelFontColor = color;
                    t.LabelAlignment = Alignment.MiddleLeft;
                }
                else
                {
                    bool left = ci < data.MoleculeColumn;
                    var t = plot.Add.Text(text, xs[ci] + (left ? -HalfWidth - 0.02 : HalfWidth + 0.02), level.EnergyHartree);
                    t.LabelFontSize = 11;
                    t.LabelAlignment = left ? Alignment.MiddleRight : Alignment.MiddleLeft;
                }
            }
        }
        foreach (var c in data.Connections)
        {
            var frag = data.Columns[c.FragmentColumn];
            var mol = data.Columns[data.MoleculeColumn];
            double xf = xs[c.FragmentColumn] + (c.FragmentColumn < data.MoleculeColumn ? HalfWidth : -HalfWidth);
            double xm = xs[data.MoleculeColumn] + (c.FragmentColumn < data.MoleculeColumn ? -HalfWidth : HalfWidth);
            var line = plot.Add.Line(xf, frag.Levels[c.FragmentLevel].EnergyHartree, xm, mol.Levels[c.MoleculeLevel].EnergyHartree);
            line.LinePattern = LinePattern.Dashed;
            line.LineColor = Colors.Black.WithAlpha(0.25 + 0.6 * Math.Min(1, c.Weight));
            line.LineWidth = 1;
            line.MarkerSize = 0;
        }
        for (int ci = 0; ci < data.Columns.Count; ci++)
        {
            var t = plot.Add.Text(data.Columns[ci].Title, xs[ci], emax + 0.08 * Math.Max(0.2, emax - emin));
            t.LabelFontSize = 16;
            t.LabelBold = true;
            t.LabelAlignment = Alignment.LowerCenter;
        }
        double pad = 0.12 * Math.Max(0.2, emax - emin);
        plot.Axes.SetLimits(xs[0] - 0.9, xs[^1] + 1.2, emin - pad, emax + 2 * pad);
        plot.Axes.Bottom.IsVisible = false;
        plot.Axes.Bottom.TickLabelStyle.IsVisible = false;
        plot.Axes.Bottom.MajorTickStyle.Length = 0;
        plot.Axes.Bottom.MinorTickStyle.Length = 0;
        plot.Grid.XAxisStyle.MajorLineStyle.Width = 0;
        plot.Title(data.Title);
        plot.YLabel("orbital energy (Eh)");
        return PlotSaver.Save(plot, path, widthPixels, heightPixels, data.Title, TextDiagram(data));
    }

    /// <summary>A plain-text rendering: one line per molecular level with its occupation and label, fragment levels beside.</summary>
    /// <param name="data">The diagram data.</param>
    public static string TextDiagram(LevelDiagramData data)
    {
        ArgumentNullException.ThrowIfNull(data);
        var inv = CultureInfo.InvariantCulture;
        var sb = new StringBuilder();
        sb.Append(data.Title).Append('\n');
        var mol = data.Columns[data.MoleculeColumn];
        foreach (var level in mol.Levels.Reverse())
        {
            string dots = level.Occupation >= 1.5 ? "↑↓" : level.Occupation >= 0.5 ? "↑ " : "  ";
            sb.Append(inv, $"{level.EnergyHartree,10:F4} Eh  ─{dots}─  {level.Label}\n");
        }
        for (int ci = 0; ci < data.Columns.Count; ci++)
        {
            if (ci == data.MoleculeColumn) continue;
            sb.Append(inv, $"{data.Columns[ci].Title}: ");
            sb.Append(string.Join(", ", data.Columns[ci].Levels.Select(l => string.Create(inv, $"{l.Label} {l.EnergyHartree:F4}{(l.Occupation > 0 ? " (occ)" : "")}"))));
            sb.Append('\n');
        }
        return sb.ToString().TrimEnd('\n');
    }

    private static double[] ColumnPositions(LevelDiagramData data)
    {
        var xs = new double[data.Columns.Count];
        for (int i = 0; i < xs.Length; i++) xs[i] = 1.3 * i;
        return xs;
    }

    /// <summary>Horizontal offsets that spread levels of (nearly) equal energy side by side.</summary>
    private static (double[] Offsets, int[] GroupSizes) DegenerateOffsets(IReadOnlyList<EnergyLevel> levels)
    {
        var offsets = new double[levels.Count];
        var groups = new int[levels.Count];
        int i = 0;
        while (i < levels.Count)
        {
            int j = i;
            while (j + 1 < levels.Count && Math.Abs(levels[j + 1].EnergyHartree - levels[i].EnergyHartree) < 1e-4) j++;
            int n = j - i + 1;
            for (int k = 0; k < n; k++)
            {
                offsets[i + k] = n > 1 ? (k - (n - 1) / 2.0) * (2 * HalfWidth / n) : 0;
                groups[i + k] = n;
            }
            i = j + 1;
        }
        return (offsets, groups);
    }
}
