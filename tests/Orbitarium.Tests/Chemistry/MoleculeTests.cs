using Orbitarium.Chemistry;

namespace Orbitarium.Tests.Chemistry;

public class MoleculeTests
{
    [Fact]
    public void Nuclear_repulsion_of_H2_at_1_4_bohr_is_one_over_R()
    {
        // Common practice: V_nn = Z_A Z_B / R = 1/1.4 for H2 at R = 1.4 bohr.
        var h2 = Molecule.Empty.AddAtom("H", 0, 0, 0, LengthUnit.Bohr).AddAtom("H", 0, 0, 1.4, LengthUnit.Bohr);
        Assert.Equal(1 / 1.4, h2.NuclearRepulsionEnergyHartree, 14);
    }

    [Fact]
    public void Nuclei_closer_than_a_tenth_of_an_angstrom_are_refused()
    {
        var e = Assert.Throws<OrbitariumInputException>(() =>
            Molecule.Empty.AddAtom("H", 0, 0, 0).AddAtom("H", 0, 0, 0.05));
        Assert.Contains("closer than 0.1", e.Message);
    }
}
