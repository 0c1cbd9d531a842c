using Orbitarium.Analysis;
using Orbitarium.Chemistry;

namespace Orbitarium.Tests.Analysis;

public class GridTests
{
    private static readonly Molecule Linear = Molecule.Empty.AddAtom("O", 0, 0, 0).AddAtom("C", 0, 0, 1.2).AddAtom("O", 0, 0, 2.4);

    [Fact]
    public void A_plane_through_collinear_atoms_is_refused_with_a_remedy()
    {
        var e = Assert.Throws<OrbitariumInputException>(() => PlaneGrid.ThroughAtoms(Linear, 0, 1, 2));
        Assert.Contains("collinear", e.Message);
        Assert.Contains("ContainingBond", e.Message);
    }

    [Fact]
    public void A_plane_containing_a_bond_of_a_linear_molecule_works()
    {
        var plane = PlaneGrid.ContainingBond(Linear, 0, 2);
        var (u, v, d) = plane.Project(Linear.Atoms[1].PositionBohr);
        Assert.Equal(0.0, d, 10);
        Assert.Equal(0.0, v, 10);
        Assert.Equal(0.0, u, 10);
    }

    [Fact]
    public void A_box_too_large_for_memory_is_refused_up_front_with_the_size_needed()
    {
        var e = Assert.Throws<OrbitariumInputException>(() => BoxGrid.AroundMolecule(Linear, marginAngstrom: 50, spacingAngstrom: 0.005));
        Assert.Contains("would need", e.Message);
        Assert.Contains("GB", e.Message);
    }

    [Fact]
    public void A_zero_normal_is_refused()
    {
        Assert.Throws<OrbitariumInputException>(() => PlaneGrid.FromPointAndNormal(Vector3D.Zero, Vector3D.Zero, 2, 2));
    }

    [Fact]
    public void Box_points_run_x_fastest_from_the_lower_corner()
    {
        var box = BoxGrid.Spanning(new Vector3D(0, 0, 0), new Vector3D(1, 1, 1), 0.5);
        Span<Vector3D> p = new Vector3D[4];
        box.FillPoints(0, p);
        Assert.Equal(3, box.CountX);
        Assert.Equal(0.5 * PhysicalConstants.BohrPerAngstrom, p[1].X, 12);
        Assert.Equal(0.5 * PhysicalConstants.BohrPerAngstrom, p[3].Y, 12);
    }
}
