using Orbitarium.Chemistry;
using Orbitarium.Geometry;

namespace Orbitarium.Tests.Geometry.Symmetry;

public class PointGroupDetectorTests
{
    // Point groups and symmetry numbers of these molecules are facts of the trade (common practice; e.g. Cotton,
    // Chemical Applications of Group Theory, ch. 3; symmetry numbers as in Cramer, Essentials of Computational Chemistry, Table 10.1).
    [Theory]
    [InlineData("3\n\nO 0 0 0.1173\nH 0 0.7572 -0.4692\nH 0 -0.7572 -0.4692", "C2v", 2)]
    [InlineData("4\n\nN 0 0 0.1\nH 0.9377 0 -0.27\nH -0.46885 0.81207 -0.27\nH -0.46885 -0.81207 -0.27", "C3v", 3)]
    [InlineData("5\n\nC 0 0 0\nH 0.6291 0.6291 0.6291\nH -0.6291 -0.6291 0.6291\nH -0.6291 0.6291 -0.6291\nH 0.6291 -0.6291 -0.6291", "Td", 12)]
    [InlineData("3\n\nO 0 0 -1.16\nC 0 0 0\nO 0 0 1.16", "D∞h", 2)]
    [InlineData("3\n\nH 0 0 -1.066\nC 0 0 0\nN 0 0 1.153", "C∞v", 1)]
    [InlineData("6\n\nC 0 0 0.667\nC 0 0 -0.667\nH 0 0.923 1.238\nH 0 -0.923 1.238\nH 0 0.923 -1.238\nH 0 -0.923 -1.238", "D2h", 4)]
    [InlineData("4\n\nO 0 0.7 0\nO 0 -0.7 0\nH 0.9 0.9 0.3\nH -0.9 -0.9 0.3", "C2", 2)]
    [InlineData("3\n\nO 0 0 0\nH 0.96 0 0\nH -0.25 1.05 0.1", "Cs", 1)]
    [InlineData("4\n\nC 0 0 0\nO 0 0 1.2\nH 0 0.94 -0.54\nF 0.1 -0.94 -0.54", "C1", 1)]
    [InlineData("4\n\nB 0 0 0\nF 1.31 0 0\nF -0.655 1.13449 0\nF -0.655 -1.13449 0", "D3h", 6)]
    public void Common_molecules_get_their_point_group_and_symmetry_number(string xyz, string expected, int sigma)
    {
        var group = Molecule.FromXyz(xyz).PointGroup();
        Assert.Equal(expected, group.Name);
        Assert.Equal(sigma, group.SymmetryNumber);
    }

    [Fact]
    public void Benzene_is_D6h()
    {
        var m = Molecule.Empty;
        for (int k = 0; k < 6; k++)
        {
            double t = k * Math.PI / 3;
            m = m.AddAtom("C", 1.39 * Math.Cos(t), 1.39 * Math.Sin(t), 0).AddAtom("H", 2.47 * Math.Cos(t), 2.47 * Math.Sin(t), 0);
        }
        var group = m.RotatedAboutAxis(new Vector3D(1, 2, 3), 33).PointGroup();
        Assert.Equal("D6h", group.Name);
        Assert.Equal(12, group.SymmetryNumber);
    }

    [Fact]
    public void Staggered_ethane_is_D3d()
    {
        var m = Molecule.FromZMatrix("C\nC 1 1.53\nH 1 1.09 2 111\nH 1 1.09 2 111 3 120\nH 1 1.09 2 111 3 -120\n" +
                                     "H 2 1.09 1 111 3 180\nH 2 1.09 1 111 3 60\nH 2 1.09 1 111 3 -60");
        Assert.Equal("D3d", m.PointGroup().Name);
    }

    [Fact]
    public void A_small_distortion_is_forgiven_within_the_tolerance_but_not_beyond()
    {
        var water = Molecule.FromXyz("3\n\nO 0 0 0.1173\nH 0 0.7572 -0.4692\nH 0 -0.7602 -0.4692");
        Assert.Equal("C2v", water.PointGroup(0.05).Name);
        Assert.Equal("Cs", water.PointGroup(0.001).Name);
    }
}
