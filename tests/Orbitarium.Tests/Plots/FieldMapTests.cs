using Orbitarium.Analysis;
using Orbitarium.Chemistry;
using Orbitarium.Models;
using Orbitarium.Plots;

namespace Orbitarium.Tests.Plots;

public class FieldMapTests
{
    internal static GridField AntibondingOrbital(double distanceBohr = 2.0)
    {
        var molecule = TwoCentreLcaoModel.MoleculeAt(distanceBohr);
        var plane = PlaneGrid.ContainingBond(molecule, 0, 1, new Vector3D(1, 0, 0), marginAngstrom: 1.5, spacingAngstrom: 0.05);
        return TwoCentreLcaoModel.WithExponent(1.0).OrbitalField(distanceBohr, plane, LcaoCombination.OutOfPhase);
    }

    [Fact]
    public void Writes_a_valid_png_of_sensible_size()
    {
        using var dir = new PlotTestFolder();
        var file = FieldMap.Save(AntibondingOrbital(), dir.File("sigma-u.png"));
        var bytes = File.ReadAllBytes(file.Path);
        // PNG signature 89 50 4E 47 0D 0A 1A 0A (ISO/IEC 15948, section 5.2).
        Assert.Equal(new byte[] { 0x89, 0x50, 0x4E, 0x47, 0x0D, 0x0A, 0x1A, 0x0A }, bytes[..8]);
        Assert.InRange(bytes.Length, 10_000, 5_000_000);
        // IHDR width and height, big-endian at bytes 16..23 (same standard).
        Assert.Equal(800, (bytes[16] << 24) | (bytes[17] << 16) | (bytes[18] << 8) | bytes[19]);
        Assert.Equal(file.HeightPixels, (bytes[20] << 24) | (bytes[21] << 16) | (bytes[22] << 8) | bytes[23]);
        Assert.Contains('█', file.TerminalPreview);
        Assert.Contains('≡', file.TerminalPreview);
    }

    [Fact]
    public void Writes_a_valid_svg()
    {
        using var dir = new PlotTestFolder();
        var file = FieldMap.Save(AntibondingOrbital(), dir.File("sigma-u.svg"));
        string text = File.ReadAllText(file.Path);
        // SVG 1.1 (W3C): a root <svg> element in the SVG namespace.
        Assert.Contains("<svg", text);
        Assert.Contains("http://www.w3.org/2000/svg", text);
        Assert.EndsWith("</svg>", text.TrimEnd());
        Assert.Contains("H1", text);
    }

    [Fact]
    public void The_zero_contour_of_the_out_of_phase_orbital_lies_on_the_midplane()
    {
        // ψ− = (A − B)/√(2(1 − S)) vanishes exactly where r_A = r_B (common practice): the bisecting plane, u = 0 here.
        var field = AntibondingOrbital();
        var points = FieldMap.ContourPoints(field, 0.0);
        Assert.NotEmpty(points);
        double spacing = ((PlaneGrid)field.Grid).SpacingBohr * PhysicalConstants.AngstromPerBohr;
        Assert.All(points, p => Assert.InRange(p.UAngstrom, -0.5 * spacing, 0.5 * spacing));
        // and it spans the plane vertically.
        Assert.True(points.Max(p => p.VAngstrom) - points.Min(p => p.VAngstrom) > 2.5);
    }

    [Fact]
    public void The_in_phase_density_difference_is_positive_between_the_nuclei_on_the_map()
    {
        // Interference piles charge between the nuclei for ψ+ (Levine, Quantum Chemistry): no zero contour crosses the
        // bond between the nuclei.
        var model = TwoCentreLcaoModel.WithExponent(1.0);
        var molecule = TwoCentreLcaoModel.MoleculeAt(2.0);
        var plane = PlaneGrid.ContainingBond(molecule, 0, 1, new Vector3D(1, 0, 0), 1.5, 0.05);
        var field = model.DensityField(2.0, plane, TwoCentreDensityPart.Interference);
        var zero = FieldMap.ContourPoints(field, 0.0);
        Assert.DoesNotContain(zero, p => Math.Abs(p.VAngstrom) < 0.05 && Math.Abs(p.UAngstrom) < 0.5);
    }

    [Fact]
    public void An_unknown_extension_is_refused()
    {
        var e = Assert.Throws<OrbitariumInputException>(() => FieldMap.Save(AntibondingOrbital(), "map.bmp"));
        Assert.Contains(".png or .svg", e.Message);
    }

    [Fact]
    public void A_missing_folder_gives_a_clear_message()
    {
        var e = Assert.Throws<OrbitariumInputException>(() => FieldMap.Save(AntibondingOrbital(), "/no-such-folder-orbitarium/map.png"));
        Assert.Contains("does not exist", e.Message);
    }

    [Fact]
    public void A_field_on_a_line_cannot_be_mapped()
    {
        var m = TwoCentreLcaoModel.MoleculeAt(2.0);
        var line = LineGrid.AlongBond(m, 0, 1);
        var f = TwoCentreLcaoModel.WithExponent(1.0).OrbitalField(2.0, line);
        Assert.Throws<OrbitariumInputException>(() => FieldMap.Save(f, "x.png"));
    }
}
