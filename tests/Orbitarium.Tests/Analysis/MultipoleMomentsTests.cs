using Orbitarium.Analysis;
using Orbitarium.BasisSets;
using Orbitarium.Chemistry;
using Orbitarium.Scf;
using Orbitarium.Tests.Scf;

namespace Orbitarium.Tests.Analysis;

public class MultipoleMomentsTests
{
    [Fact]
    public void Water_STO3G_dipole_matches_the_published_value()
    {
        // Szabo & Ostlund, Modern Quantum Chemistry, Table 3.15 (from memory): H2O STO-3G dipole 1.71 D at
        // R = 1.809 bohr, 104.52°, along the C2 axis (hydrogens on the positive side, so μ points from O to the H's).
        var r = ScfTestSystems.Water().WithBasis(BasisSetLibrary.Get("STO-3G")).RunRhf();
        var m = MultipoleMoments.Compute(r);
        Assert.Equal(1.71, m.DipoleMagnitudeDebye, 0.02);
        Assert.True(m.DipoleDebye.Z > 0);
        Assert.Equal(0, m.DipoleDebye.X, 1e-9);
        Assert.Equal(0, m.DipoleDebye.Y, 1e-8);
    }

    [Fact]
    public void The_dipole_of_a_neutral_molecule_does_not_depend_on_the_origin_and_the_quadrupole_is_traceless()
    {
        // Identity: μ(O') = μ(O) − Q (O' − O) with total charge Q = 0; Θ is built traceless.
        var r = Molecule.FromXyzFile(ScfTestSystems.Example("tg1-water.xyz")).WithBasis(BasisSetLibrary.Get("6-31G")).RunRhf();
        var a = MultipoleMoments.Compute(r);
        var b = MultipoleMoments.Compute(r, new Vector3D(3, -1, 2));
        Assert.Equal(a.DipoleAtomicUnits.X, b.DipoleAtomicUnits.X, 1e-9);
        Assert.Equal(a.DipoleAtomicUnits.Y, b.DipoleAtomicUnits.Y, 1e-9);
        Assert.Equal(a.DipoleAtomicUnits.Z, b.DipoleAtomicUnits.Z, 1e-9);
        var t = a.QuadrupoleAtomicUnits;
        Assert.Equal(0, t[0, 0] + t[1, 1] + t[2, 2], 1e-10);
    }

    [Fact]
    public void H2_has_no_dipole()
    {
        var r = ScfTestSystems.H2().WithBasis(BasisSetLibrary.Get("STO-3G")).RunRhf();
        Assert.Equal(0, MultipoleMoments.Compute(r).DipoleMagnitudeDebye, 1e-9);
    }
}
