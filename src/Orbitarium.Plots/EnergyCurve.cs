using System.Globalization;
using Orbitarium.Analysis;
using ScottPlot;

namespace Orbitarium.Plots;

/// <summary>Energy curves E(R): computed points of one or more scans, optionally a fitted Morse potential with its
/// parameters and residual printed on the figure.</summary>
public static class EnergyCurve
{
    /// <summary>Writes E(R) of one or more scans (energies in hartree), with an optional Morse fit, as PNG or SVG.</summary>
    /// <param name="scans">Scans to draw, each as one labelled series (label = method name).</param>
    /// <param name="path">Output path ending in .png or .svg.</param>
    /// <param name="fit">A Morse fit to draw as a smooth curve with Rₑ, Dₑ, ωₑ and the residual, or null.</param>
    /// <param name="title">Title; null uses the coordinate name.</param>
    /// <param name="widthPixels">Width in pixels (default 800).</param>
    /// <param name="heightPixels">Height in pixels (default 550).</param>
    public static PlotFile Save(IReadOnlyList<EnergyScanResult> scans, string path, MorseFitResult? fit = null, string? title = null,
        int widthPixels = 800, int heightPixels = 550)
    {
        ArgumentNullException.ThrowIfNull(scans);
        if (scans.Count == 0) throw new OrbitariumInputException("Give at least one scan to plot.");
        var series = new List<CurveSeries>();
        foreach (var s in scans) series.Add(new CurveSeries(s.MethodName.Length > 0 ? s.MethodName : "scan", s.Coordinates, s.EnergiesHartree));
        string? note = null;
        if (fit is not null)
        {
            var xs = scans[0].Coordinates.Where(double.IsFinite).ToArray();
            double lo = xs.Min(), hi = xs.Max();
            var x = Enumerable.Range(0, 200).Select(i => lo + (hi - lo) * i / 199.0).ToArray();
            var y = x.Select(r => fit.Potential.EnergyHartree(r * Orbitarium.PhysicalConstants.BohrPerAngstrom)).ToArray();
            series.Add(new CurveSeries("Morse fit", x, y, ShowMarkers: false));
            note = FitNote(fit);
        }
        var first = scans[0];
        return Save(series, path, $"{first.CoordinateName} ({first.CoordinateUnit})", "energy (Eh)", title ?? $"energy along {first.CoordinateName}", note, widthPixels, heightPixels);
    }

    /// <summary>Writes any set of curves as a line chart (for example the two-centre model's E±(R) beside the exact values).</summary>
    /// <param name="series">The curves.</param>
    /// <param name="path">Output path ending in .png or .svg.</param>
    /// <param name="xLabel">x-axis label with unit.</param>
    /// <param name="yLabel">y-axis label with unit.</param>
    /// <param name="title">Title.</param>
    /// <param name="note">Text printed in the upper right corner, or null.</param>
    /// <param name="widthPixels">Width in pixels (default 800).</param>
    /// <param name="heightPixels">Height in pixels (default 550).</param>
    public static PlotFile Save(IReadOnlyList<CurveSeries> series, string path, string xLabel, string yLabel, string title, string? note = null,
        int widthPixels = 800, int heightPixels = 550)
    {
        ArgumentNullException.ThrowIfNull(series);
        if (series.Count == 0) throw new OrbitariumInputException("Give at least one curve to plot.");
        PlotSaver.FormatOf(path);
        var plot = new Plot();
        var palette = new ScottPlot.Palettes.Category10();
        for (int i = 0; i < series.Count; i++)
        {
            var s = series[i];
            if (s.X.Length != s.Y.Length) throw new OrbitariumInputException($"Curve \"{s.Label}\" has {s.X.Length} x values but {s.Y.Length} y values.");
            var scatter = plot.Add.Scatter(s.X, s.Y, palette.GetColor(i));
            scatter.LegendText = s.Label;
            scatter.LineWidth = 2;
            scatter.MarkerSize = s.ShowMarkers ? 7 : 0;
        }
        if (note is not null)
        {
            var a = plot.Add.Annotation(note, Alignment.UpperCenter);
            a.LabelFontSize = 13;
            a.LabelBackgroundColor = Colors.White.WithAlpha(0.85);
        }
        plot.Title(title);
        plot.XLabel(xLabel);
        plot.YLabel(yLabel);
        plot.ShowLegend(Alignment.LowerRight);
        string preview = TerminalPreview.Curves([.. series.Select(s => (s.X, s.Y))], xLabel: xLabel, yLabel: yLabel);
        if (note is not null) preview += "\n" + note;
        return PlotSaver.Save(plot, path, widthPixels, heightPixels, title, preview);
    }

    private static string FitNote(MorseFitResult fit)
    {
        var inv = CultureInfo.InvariantCulture;
        string omega = fit.HarmonicWavenumber is double w ? string.Create(inv, $", ωe = {w:F0} cm⁻¹") : "";
        return string.Create(inv,
            $"Morse: Re = {fit.EquilibriumDistanceAngstrom:F4} Å, De = {fit.DissociationEnergyElectronVolt:F3} eV{omega}\nrms residual {fit.RmsResidualHartree:E1} Eh, max {fit.MaxResidualHartree:E1} Eh{(fit.Converged ? "" : " (fit NOT converged)")}");
    }
}
