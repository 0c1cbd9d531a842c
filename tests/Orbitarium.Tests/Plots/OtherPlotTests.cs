using Orbitarium.Analysis;
using Orbitarium.Chemistry;
using Orbitarium.Models;
using Orbitarium.Plots;
using Orbitarium.Tests.Analysis;

namespace Orbitarium.Tests.Plots;

public class OtherPlotTests
{
    private static void AssertPng(string path)
    {
        var bytes = File.ReadAllBytes(path);
        // PNG signature (ISO/IEC 15948, section 5.2).
        Assert.Equal(new byte[] { 0x89, 0x50, 0x4E, 0x47, 0x0D, 0x0A, 0x1A, 0x0A }, bytes[..8]);
        Assert.True(bytes.Length > 5_000);
    }

    [Fact]
    public void A_line_profile_of_the_density_parts_is_written()
    {
        using var dir = new PlotTestFolder();
        var model = TwoCentreLcaoModel.WithExponent(1.0);
        var line = LineGrid.AlongBond(TwoCentreLcaoModel.MoleculeAt(2.0), 0, 1);
        var fields = new[] { TwoCentreDensityPart.Total, TwoCentreDensityPart.OnA, TwoCentreDensityPart.Interference }
            .Select(p => model.DensityField(2.0, line, p)).ToList();
        var file = LineProfile.Save(fields, dir.File("profile.png"));
        AssertPng(file.Path);
        Assert.Contains(file.TerminalPreview, c => c >= '\u2801' && c <= '\u28FF');
    }

    [Fact]
    public void A_panel_strip_puts_one_panel_per_bond_length_side_by_side()
    {
        using var dir = new PlotTestFolder();
        var model = TwoCentreLcaoModel.WithExponent(1.0);
        double[] r = [1.5, 2.5, 4.0];
        var fields = r.Select(x =>
        {
            var m = TwoCentreLcaoModel.MoleculeAt(x);
            var plane = PlaneGrid.ContainingBond(m, 0, 1, new Vector3D(1, 0, 0), 1.2, 0.08);
            return model.DensityField(x, plane, TwoCentreDensityPart.DifferenceFromAtoms);
        }).ToList();
        var png = PanelStrip.Save(fields, [.. r.Select(x => $"R = {x} bohr")], dir.File("strip.png"));
        AssertPng(png.Path);
        Assert.Equal(3 * 450 + 120, png.WidthPixels);   // three panels and the last one's colour bar
        using (var image = SkiaSharp.SKBitmap.Decode(png.Path)) Assert.Equal(png.WidthPixels, image.Width);
        var svg = PanelStrip.Save(fields, [.. r.Select(x => $"R = {x} bohr")], dir.File("strip.svg"));
        var doc = System.Xml.Linq.XDocument.Load(svg.Path);
        Assert.Equal("svg", doc.Root!.Name.LocalName);
        Assert.Equal(3, doc.Root.Elements().Count(e => e.Name.LocalName == "svg"));
    }

    [Fact]
    public void An_energy_curve_with_a_Morse_fit_shows_the_fit_parameters()
    {
        using var dir = new PlotTestFolder();
        var model = TwoCentreLcaoModel.WithOptimizedExponent();
        double[] rb = [.. Enumerable.Range(0, 13).Select(i => 1.5 + 0.125 * i)];
        var scan = EnergyScan.Run(TwoCentreLcaoModel.MoleculeAt(2.0), [.. rb.Select(x => x * PhysicalConstants.AngstromPerBohr)],
            (m, d) => TwoCentreLcaoModel.MoleculeAt(d * PhysicalConstants.BohrPerAngstrom),
            (m, _, _) => new EnergyScanPoint(0, model.Evaluate(m.DistanceBohr(0, 1)).TotalEnergyHartree, true, m, null),
            "R", "Å", model.Name);
        var fit = MorseFit.Fit(scan);
        var file = EnergyCurve.Save([scan], dir.File("curve.svg"), fit);
        Assert.Contains("Morse", File.ReadAllText(file.Path));
        EnergyCurve.Save([scan], dir.File("curve.png"), fit);
        Assert.Contains("rms residual", file.TerminalPreview);
        // Near its minimum the model curve is close to a Morse curve, so the fit's Re is near the model's own minimum,
        // 2.00 bohr (Finkelstein & Horowitz 1928; Levine); 0.03 bohr allows for the Morse form's approximation.
        Assert.Equal(2.00, fit.Potential.EquilibriumDistanceBohr, 0.03);
    }

    [Fact]
    public void A_level_diagram_of_H2_shows_bonding_and_antibonding_levels_between_the_atoms()
    {
        using var dir = new PlotTestFolder();
        var data = OrbitalLevelDiagram.FromAtoms(AnalysisSystems.DihydrogenRhfSto3g);
        var mol = data.Columns[data.MoleculeColumn];
        // Minimal-basis H2: σg bonding (occupied, 2 electrons), σu antibonding (empty) — Szabo & Ostlund, ch. 3.
        Assert.Equal(BondCharacter.Bonding, mol.Levels[0].Character);
        Assert.Equal(2.0, mol.Levels[0].Occupation);
        Assert.Equal(BondCharacter.Antibonding, mol.Levels[1].Character);
        // Each atom's 1s connects to both molecular levels with weight (1 ± S)/2 ≥ 0.17 (S = 0.6593).
        Assert.Equal(4, data.Connections.Count);
        var file = LevelDiagram.Save(data, dir.File("levels.png"));
        AssertPng(file.Path);
        Assert.Contains("bonding", file.TerminalPreview);
    }
}
