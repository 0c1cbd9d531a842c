using System.Globalization;
using System.Text;

namespace Orbitarium.Plots;

/// <summary>
/// Coarse text renderings of figures for a terminal: curves in braille dots (2 × 4 dots per character), maps in
/// Unicode shade blocks (sequential) or shade blocks and dashes for negative values (diverging).
/// </summary>
public static class TerminalPreview
{
    /// <summary>Shade characters for increasing non-negative values.</summary>
    private const string Shades = " ░▒▓█";

    /// <summary>Characters for increasing negative magnitude.</summary>
    private const string NegativeShades = " ·-=≡";

    /// <summary>Renders one or more curves with braille dots, with the y range and x range printed around it.</summary>
    /// <param name="curves">Curves as (x, y) arrays; NaN points are skipped.</param>
    /// <param name="width">Width in characters (default 60).</param>
    /// <param name="height">Height in characters (default 14).</param>
    /// <param name="xLabel">x-axis label.</param>
    /// <param name="yLabel">y-axis label.</param>
    public static string Curves(IReadOnlyList<(double[] X, double[] Y)> curves, int width = 60, int height = 14, string xLabel = "", string yLabel = "")
    {
        ArgumentNullException.ThrowIfNull(curves);
        width = Math.Max(8, width); height = Math.Max(3, height);
        double xmin = double.MaxValue, xmax = double.MinValue, ymin = double.MaxValue, ymax = double.MinValue;
        foreach (var (x, y) in curves)
            for (int i = 0; i < Math.Min(x.Length, y.Length); i++)
            {
                if (!double.IsFinite(x[i]) || !double.IsFinite(y[i])) continue;
                xmin = Math.Min(xmin, x[i]); xmax = Math.Max(xmax, x[i]);
                ymin = Math.Min(ymin, y[i]); ymax = Math.Max(ymax, y[i]);
            }
        if (xmin > xmax) return "(no finite points)";
        if (xmax == xmin) { xmin -= 0.5; xmax += 0.5; }
        if (ymax == ymin) { ymin -= 0.5; ymax += 0.5; }
        int dotsX = 2 * width, dotsY = 4 * height;
        var dots = new bool[dotsY, dotsX];
        int Px(double x) => (int)Math.Round((x - xmin) / (xmax - xmin) * (dotsX - 1));
        int Py(double y) => dotsY - 1 - (int)Math.Round((y - ymin) / (ymax - ymin) * (dotsY - 1));
        foreach (var (x, y) in curves)
        {
            int? lx = null, ly = null;
            for (int i = 0; i < Math.Min(x.Length, y.Length); i++)
            {
                if (!double.IsFinite(x[i]) || !double.IsFinite(y[i])) { lx = null; continue; }
                int px = Px(x[i]), py = Py(y[i]);
                if (lx is int ax && ly is int ay)
                {
                    int steps = Math.Max(Math.Abs(px - ax), Math.Abs(py - ay));
                    for (int s = 0; s <= steps; s++)
                    {
                        int qx = ax + (steps == 0 ? 0 : (px - ax) * s / steps), qy = ay + (steps == 0 ? 0 : (py - ay) * s / steps);
                        dots[qy, qx] = true;
                    }
                }
                else dots[py, px] = true;
                lx = px; ly = py;
            }
        }
        var inv = CultureInfo.InvariantCulture;
        var sb = new StringBuilder();
        string top = ymax.ToString("G5", inv), bottom = ymin.ToString("G5", inv);
        int margin = Math.Max(top.Length, bottom.Length);
        if (yLabel.Length > 0) sb.Append(' ', margin + 1).Append(yLabel).Append('\n');
        for (int row = 0; row < height; row++)
        {
            string axis = row == 0 ? top : row == height - 1 ? bottom : "";
            sb.Append(axis.PadLeft(margin)).Append('┤');
            for (int col = 0; col < width; col++) sb.Append(BrailleCell(dots, row, col));
            sb.Append('\n');
        }
        string left = xmin.ToString("G4", inv), right = xmax.ToString("G4", inv);
        sb.Append(' ', margin + 1).Append(left).Append(' ', Math.Max(1, width - left.Length - right.Length)).Append(right);
        if (xLabel.Length > 0) sb.Append('\n').Append(' ', margin + 1 + Math.Max(0, (width - xLabel.Length) / 2)).Append(xLabel);
        return sb.ToString();
    }

    /// <summary>Renders a 2D array ([row, column], row 0 at the bottom) as shade blocks; signed maps show negative
    /// values with dots and dashes, positive ones with blocks, both scaled to the largest magnitude.</summary>
    /// <param name="values">The map, [row, column].</param>
    /// <param name="signed">True for a diverging (signed) quantity.</param>
    /// <param name="width">Width in characters (default 60).</param>
    /// <param name="height">Height in characters (default 24).</param>
    public static string Map(double[,] values, bool signed, int width = 60, int height = 24)
    {
        ArgumentNullException.ThrowIfNull(values);
        int rows = values.GetLength(0), cols = values.GetLength(1);
        if (rows == 0 || cols == 0) return "(empty map)";
        width = Math.Min(Math.Max(4, width), cols);
        height = Math.Min(Math.Max(2, height), rows);
        double max = 0, min = double.MaxValue;
        foreach (double v in values) { if (double.IsFinite(v)) { max = Math.Max(max, Math.Abs(v)); min = Math.Min(min, v); } }
        var sb = new StringBuilder();
        for (int r = height - 1; r >= 0; r--)
        {
            int r0 = r * rows / height, r1 = Math.Max(r0 + 1, (r + 1) * rows / height);
            for (int c = 0; c < width; c++)
            {
                int c0 = c * cols / width, c1 = Math.Max(c0 + 1, (c + 1) * cols / width);
                double sum = 0; int n = 0;
                for (int i = r0; i < r1; i++)
                    for (int j = c0; j < c1; j++)
                        if (double.IsFinite(values[i, j])) { sum += values[i, j]; n++; }
                double v = n == 0 ? 0 : sum / n;
                sb.Append(Cell(v, max, signed));
            }
            if (r > 0) sb.Append('\n');
        }
        return sb.ToString();
    }

    private static char Cell(double v, double max, bool signed)
    {
        if (max <= 0) return ' ';
        // A square-root scale shows the weak outer parts of densities and orbitals.
        double t = Math.Sqrt(Math.Min(1, Math.Abs(v) / max));
        int level = (int)Math.Round(t * (Shades.Length - 1));
        if (signed && v < 0) return NegativeShades[level];
        return Shades[level];
    }

    private static char BrailleCell(bool[,] dots, int row, int col)
    {
        // Braille dot bits: column 0 rows 0-2 → 1, 2, 4; column 1 rows 0-2 → 8, 16, 32; row 3 → 64 (left), 128 (right).
        int code = 0;
        int y0 = 4 * row, x0 = 2 * col;
        if (dots[y0, x0]) code |= 0x01;
        if (dots[y0 + 1, x0]) code |= 0x02;
        if (dots[y0 + 2, x0]) code |= 0x04;
        if (dots[y0, x0 + 1]) code |= 0x08;
        if (dots[y0 + 1, x0 + 1]) code |= 0x10;
        if (dots[y0 + 2, x0 + 1]) code |= 0x20;
        if (dots[y0 + 3, x0]) code |= 0x40;
        if (dots[y0 + 3, x0 + 1]) code |= 0x80;
        return (char)(0x2800 + code);
    }
}
