using Orbitarium.Chemistry;
using Orbitarium.Geometry.Coordinates;

namespace Orbitarium.Tests.Geometry.Coordinates;

public class InternalCoordinateTests
{
    private static readonly Molecule Skewed = Molecule.Empty
        .AddAtom("C", 0.1, -0.2, 0.05)
        .AddAtom("O", 1.3, 0.15, -0.1)
        .AddAtom("H", -0.4, -0.9, 0.8)
        .AddAtom("H", 1.9, 0.7, 0.6);

    public static TheoryData<string> Kinds => new() { "bond", "angle", "dihedral", "linear bend" };

    private static InternalCoordinate Make(string kind) => kind switch
    {
        "bond" => new BondStretch(0, 1),
        "angle" => new BondAngle(2, 0, 1),
        "dihedral" => new Dihedral(2, 0, 1, 3),
        _ => new LinearBend(2, 0, 1, new Vector3D(0.3, 0.9, -0.2), 0),
    };

    [Theory]
    [MemberData(nameof(Kinds))]
    public void Wilson_B_rows_match_central_differences_of_the_values(string kind)
    {
        // Identity: ∂q/∂x by central differences (h = 1e-5 bohr, error ~1e-10) equals the analytic B row.
        var c = Make(kind);
        var x = Skewed.PositionsBohr();
        var row = new double[x.Length];
        c.Derivatives(x, row);
        for (int i = 0; i < x.Length; i++)
        {
            var xp = (double[])x.Clone(); xp[i] += 1e-5;
            var xm = (double[])x.Clone(); xm[i] -= 1e-5;
            double fd = c.Difference(c.Value(xp), c.Value(xm)) / 2e-5;
            Assert.Equal(fd, row[i], 7);
        }
    }

    [Fact]
    public void Dihedral_value_agrees_with_the_molecule_dihedral()
    {
        // Two independent formulas for the same torsion (IUPAC sign convention, common practice).
        var x = Skewed.PositionsBohr();
        double q = new Dihedral(2, 0, 1, 3).Value(x) * 180 / Math.PI;
        Assert.Equal(Skewed.DihedralDegrees(2, 0, 1, 3), q, 9);
    }

    [Fact]
    public void Water_gets_two_bonds_and_one_angle_and_spans_three_internal_motions()
    {
        var water = ModelSurfaces.DistortedWater();
        var set = RedundantInternalCoordinates.FromConnectivity(water);
        Assert.Equal(2, set.Coordinates.Count(c => c is BondStretch));
        Assert.Single(set.Coordinates, c => c is BondAngle);
        Assert.Equal(3, set.Rank(water.PositionsBohr())); // 3N − 6 = 3 (common practice)
    }

    [Fact]
    public void A_linear_triatomic_uses_two_linear_bend_components()
    {
        var co2 = Molecule.Empty.AddAtom("O", 0, 0, -1.16).AddAtom("C", 0, 0, 0).AddAtom("O", 0, 0, 1.16);
        var set = RedundantInternalCoordinates.FromConnectivity(co2);
        Assert.Equal(2, set.Coordinates.Count(c => c is LinearBend));
        Assert.Equal(4, set.Rank(co2.PositionsBohr())); // 3N − 5 = 4 (common practice)
    }

    [Fact]
    public void Planar_formaldehyde_is_spanned_thanks_to_the_out_of_plane_coordinate()
    {
        var h2co = Molecule.Empty.AddAtom("C", 0, 0, 0).AddAtom("O", 0, 0, 1.2)
            .AddAtom("H", 0, 0.94, -0.54).AddAtom("H", 0, -0.94, -0.54);
        var set = RedundantInternalCoordinates.FromConnectivity(h2co);
        Assert.Equal(6, set.Rank(h2co.PositionsBohr())); // 3N − 6 = 6
    }

    [Fact]
    public void Back_transformation_reaches_the_requested_coordinate_change()
    {
        var water = ModelSurfaces.DistortedWater();
        var set = RedundantInternalCoordinates.FromConnectivity(water);
        var x = water.PositionsBohr();
        var step = MathNet.Numerics.LinearAlgebra.Vector<double>.Build.Dense(set.Count);
        step[0] = 0.05; // first bond +0.05 bohr, others unchanged
        var (xNew, converged) = set.BackTransform(x, step);
        Assert.True(converged);
        var q0 = set.Values(x);
        var q1 = set.Values(xNew);
        Assert.Equal(q0[0] + 0.05, q1[0], 8);
        for (int i = 1; i < set.Count; i++) Assert.Equal(q0[i], q1[i], 8);
    }
}
