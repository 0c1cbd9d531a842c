using Orbitarium.BasisSets;
using Orbitarium.Chemistry;
using Orbitarium.Integrals;

namespace Orbitarium.Tests.Integrals;

/// <summary>Normalisation and orthogonality of pure and Cartesian functions on one centre (real solid harmonics are
/// orthonormal over the sphere; Helgaker, Jørgensen and Olsen, section 6.4).</summary>
public class PureAndCartesianTests
{
    private static MolecularBasis OneCentre(bool pure)
    {
        var atom = Molecule.Empty.AddAtom("Ne", 0.3, -0.2, 0.1, LengthUnit.Bohr);
        var set = BasisSet.Create("one centre", pure).WithElement("Ne",
            new ShellDefinition(0, [3.0, 0.7], [0.4, 0.7]),
            new ShellDefinition(2, [2.1, 0.5], [0.5, 0.6]),
            new ShellDefinition(3, [1.4], [1.0]),
            new ShellDefinition(4, [0.9, 0.3], [0.3, 0.8]));
        return MolecularBasis.Create(atom, set);
    }

    [Fact]
    public void Pure_functions_on_one_centre_are_orthonormal()
    {
        var basis = OneCentre(pure: true);
        Assert.Equal(1 + 5 + 7 + 9, basis.FunctionCount);
        var s = OneElectronIntegrals.Overlap(basis);
        for (int i = 0; i < basis.FunctionCount; i++)
            for (int j = 0; j < basis.FunctionCount; j++)
                Assert.Equal(i == j ? 1.0 : 0.0, s[i, j], 13);
    }

    [Fact]
    public void Cartesian_functions_are_normalised_and_carry_the_lower_shells()
    {
        var basis = OneCentre(pure: false);
        Assert.Equal(1 + 6 + 10 + 15, basis.FunctionCount);
        var s = OneElectronIntegrals.Overlap(basis);
        for (int i = 0; i < basis.FunctionCount; i++) Assert.Equal(1.0, s[i, i], 13);
        // Cartesian d_xx overlaps the s function (its x²+y²+z² part); pure d functions never do.
        Assert.True(Math.Abs(s[0, 1]) > 0.1);
        var pure = OneElectronIntegrals.Overlap(OneCentre(pure: true));
        for (int f = 1; f <= 5; f++) Assert.Equal(0.0, pure[0, f], 14);
        // d_xy is orthogonal to d_xx on one centre (odd in x and y).
        Assert.Equal(0.0, s[1, 2], 14);
    }

    [Fact]
    public void Moments_shift_with_the_origin_as_the_binomial_expansion_says()
    {
        // (x − O′) = (x − O) + (O − O′) (algebra): D(O′) = D(O) + (O − O′)S and
        // Q_xy(O′) = Q_xy(O) + (O − O′)ₓ D_y(O) + (O − O′)_y D_x(O) + (O − O′)ₓ(O − O′)_y S.
        var basis = TestBases.WaterSpdf(pure: true);
        var o = new Vector3D(0.1, 0.2, -0.3); var o2 = new Vector3D(-1.0, 0.5, 0.7);
        var s = OneElectronIntegrals.Overlap(basis);
        var d1 = OneElectronIntegrals.Dipole(basis, o);
        var d2 = OneElectronIntegrals.Dipole(basis, o2);
        var shift = o - o2;
        for (int axis = 0; axis < 3; axis++)
            Assert.True((d2[axis] - d1[axis] - shift[axis] * s).InfinityNorm() < 1e-12);
        var q1 = OneElectronIntegrals.Quadrupole(basis, o);
        var q2 = OneElectronIntegrals.Quadrupole(basis, o2);
        var expectedXy = q1[1] + shift.X * d1[1] + shift.Y * d1[0] + shift.X * shift.Y * s;
        Assert.True((q2[1] - expectedXy).InfinityNorm() < 1e-12);
        var expectedZz = q1[5] + 2 * shift.Z * d1[2] + shift.Z * shift.Z * s;
        Assert.True((q2[5] - expectedZz).InfinityNorm() < 1e-12);
    }

    [Fact]
    public void Point_charges_attract_like_nuclei()
    {
        // A point charge +Z at each nucleus reproduces the nuclear attraction (definition).
        var basis = TestBases.WaterSpdf(pure: true);
        var charges = basis.Molecule.Atoms.Select(a => (a.PositionBohr, (double)a.NuclearCharge)).ToList();
        var v = OneElectronIntegrals.NuclearAttraction(basis);
        var pc = OneElectronIntegrals.PointChargeAttraction(basis, charges);
        Assert.True((v - pc).InfinityNorm() < 1e-13);
        Assert.Throws<OrbitariumInputException>(() => OneElectronIntegrals.PointChargeAttraction(basis, [(new Vector3D(double.NaN, 0, 0), 1.0)]));
    }
}
