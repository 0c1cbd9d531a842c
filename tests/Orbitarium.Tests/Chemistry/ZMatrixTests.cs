using Orbitarium.Chemistry;

namespace Orbitarium.Tests.Chemistry;

public class ZMatrixTests
{
    [Fact]
    public void Water_from_internal_coordinates_matches_its_Cartesian_geometry()
    {
        // Water, R(OH) = 0.9572 Å, ∠HOH = 104.52° (common practice experimental geometry). Hand-computed:
        // R(HH) = 2 · 0.9572 · sin(52.26°) = 1.5139006545 Å.
        var z = Molecule.FromZMatrix("O\nH 1 0.9572\nH 1 0.9572 2 104.52\n");
        Assert.Equal(0.9572, z.DistanceAngstrom(0, 1), 12);
        Assert.Equal(0.9572, z.DistanceAngstrom(0, 2), 12);
        Assert.Equal(1.5139006545, z.DistanceAngstrom(1, 2), 1e-9);
        Assert.Equal(104.52, z.AngleDegrees(1, 0, 2), 10);
    }

    [Fact]
    public void Variables_below_a_blank_line_are_substituted()
    {
        var z = Molecule.FromZMatrix("O\nH 1 r\nH 1 r 2 a\n\nr = 0.9572\na = 104.52\n");
        Assert.Equal(0.9572, z.DistanceAngstrom(0, 2), 12);
        Assert.Equal(104.52, z.AngleDegrees(1, 0, 2), 10);
    }

    [Fact]
    public void A_trans_dihedral_puts_the_fourth_atom_in_the_plane_opposite_the_first()
    {
        // Hand-computed: bonds of 1 Å and right angles; first atom at the origin, second at +z, third in the xz plane
        // at (±1, 0, 1). Dihedral 180° puts the fourth atom at (±1, 0, 2): coplanar, trans to the first.
        var m = Molecule.FromZMatrix("C\nC 1 1.0\nC 2 1.0 1 90\nC 3 1.0 2 90 1 180\n");
        var p = m.Atoms.Select(a => a.PositionAngstrom).ToArray();
        Assert.Equal(0, p[1].X, 12); Assert.Equal(1, p[1].Z, 12);
        Assert.Equal(1, Math.Abs(p[2].X), 12); Assert.Equal(0, p[2].Y, 12); Assert.Equal(1, p[2].Z, 12);
        Assert.Equal(p[2].X, p[3].X, 12); Assert.Equal(0, p[3].Y, 12); Assert.Equal(2, p[3].Z, 12);
    }

    [Fact]
    public void Hydrogen_peroxide_keeps_its_dihedral()
    {
        // H2O2 with R(OO) = 1.475 Å, R(OH) = 0.95 Å, ∠OOH = 94.8°, dihedral 111.5° (a gas-phase-like geometry);
        // the dihedral measured back from Cartesian coordinates must equal the input (sign convention: common practice).
        var m = Molecule.FromZMatrix("O\nO 1 1.475\nH 1 0.95 2 94.8\nH 2 0.95 1 94.8 3 111.5\n");
        Assert.Equal(1.475, m.DistanceAngstrom(0, 1), 12);
        Assert.Equal(0.95, m.DistanceAngstrom(1, 3), 12);
        Assert.Equal(94.8, m.AngleDegrees(0, 1, 3), 10);
        Assert.Equal(111.5, Math.Abs(m.DihedralDegrees(2, 0, 1, 3)), 10);
    }

    [Theory]
    [InlineData("O\nH 1\n", 2, "needs 3 fields")]
    [InlineData("O\nQq 1 1.0\n", 2, "unknown element symbol")]
    [InlineData("O\nH 5 1.0\n", 2, "not an earlier atom")]
    [InlineData("O\nH 1 r\n", 2, "neither a number nor a variable")]
    public void Bad_lines_are_named(string text, int line, string fragment)
    {
        var e = Assert.Throws<OrbitariumInputException>(() => Molecule.FromZMatrix(text));
        Assert.Equal(line, e.LineNumber);
        Assert.Contains(fragment, e.Message);
    }
}
