using Orbitarium.Analysis;
using Orbitarium.Chemistry;
using Orbitarium.Models;
using Orbitarium.Plots;

namespace Orbitarium.Tests.Plots;

public class FieldMapTests
{
    private static (GridField Field, PlaneGrid Plane) AntibondingOrbital()
    {
        var model = TwoCentreLcaoModel.WithExponent(1.0);
        var molecule = TwoCentreLcaoModel.MoleculeAt(2.0);
        var plane = PlaneGrid.ContainingBond(molecule, 0, 1, new Vector3D(1, 0, 0), marginAngstrom: 1.5, spacingAngstrom: 0.05);
        return (model.OrbitalField(2.0, plane, LcaoCombination.OutOfPhase), plane);
    }

    [Fact]
    public void Writes_a_valid_png_of_sensible_size()
    {
        using var dir = new PlotTestFolder();
        var (field, _) = AntibondingOrbital();
        var file = FieldMap.Save(field, dir.File("sigma-u.png"));
        var bytes = File.ReadAllBytes(file.Path);
        // PNG signature 89 50 4E 47 0D 0A 1A 0A (ISO/IEC 15948, section 5.2).
        Assert.Equal(new byte[] { 0x89, 0x50, 0x4E, 0x47, 0x0D, 0x0A, 0x1A, 0x0A }, bytes[..8]);
        Assert.InRange(bytes.Length, 10_000, 5_000_000);
        Assert.Equal(800, file.WidthPixels);
        Assert.Contains('█', file.TerminalPreview);
    }
}
