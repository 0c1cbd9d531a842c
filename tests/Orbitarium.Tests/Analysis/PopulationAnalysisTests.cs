using Orbitarium.Analysis;
using Orbitarium.BasisSets;
using Orbitarium.Chemistry;
using Orbitarium.Scf;
using Orbitarium.Tests.Scf;

namespace Orbitarium.Tests.Analysis;

public class PopulationAnalysisTests
{
    private static readonly Lazy<ScfResult> Water = new(() =>
        Molecule.FromXyzFile(ScfTestSystems.Example("tg1-water.xyz")).WithBasis(BasisSetLibrary.Get("6-31G")).RunRhf());

    [Fact]
    public void Mulliken_and_Lowdin_charges_add_up_to_the_total_charge()
    {
        // Identity: Σ_A q_A = Σ Z − tr(DS) = total charge (both partitions conserve the electron count).
        var mulliken = MullikenPopulation.Charges(Water.Value);
        var lowdin = LowdinPopulation.Charges(Water.Value);
        Assert.Equal(0, mulliken.TotalChargeElementary, 1e-9);
        Assert.Equal(0, lowdin.TotalChargeElementary, 1e-9);
        Assert.True(mulliken.ChargesElementary[0] < -0.3, "oxygen carries a clear negative charge");
        Assert.Equal(mulliken.ChargesElementary[1], mulliken.ChargesElementary[2], 1e-8);
    }

    [Fact]
    public void Spin_populations_of_the_hydroxyl_radical_sum_to_one_unpaired_electron()
    {
        var r = ScfTestSystems.Hydroxyl().WithBasis(BasisSetLibrary.Get("STO-3G")).RunUhf();
        var q = MullikenPopulation.Charges(r);
        Assert.Equal(1.0, q.SpinPopulations.Sum(), 1e-9);
        Assert.True(q.SpinPopulations[0] > 0.9, "the unpaired electron sits on oxygen");
    }

    [Fact]
    public void Mayer_bond_order_of_H2_in_a_minimal_basis_is_exactly_one()
    {
        // Mayer, Chem. Phys. Lett. 97, 270 (1983): for H2 in a minimal basis DS has all elements 1, so B = 1 exactly.
        var r = ScfTestSystems.H2().WithBasis(BasisSetLibrary.Get("STO-3G")).RunRhf();
        var b = MayerBondOrders.Compute(r);
        Assert.Equal(1.0, b[0, 1], 1e-10);
        Assert.Equal(b[0, 1], b[1, 0], 12);
    }

    [Fact]
    public void Water_has_two_OH_single_bonds_by_Mayer_bond_order()
    {
        // Common practice: Mayer bond orders of the O–H bonds of water are close to 1 in split-valence bases.
        var bonds = MayerBondOrders.Bonds(Water.Value, 0.5);
        Assert.Equal(2, bonds.Count);
        foreach (var (_, _, order) in bonds) Assert.InRange(order, 0.8, 1.05);
    }

    [Fact]
    public void Orbital_compositions_sum_to_one_and_the_lowest_water_orbital_is_oxygen_s()
    {
        var all = OrbitalComposition.Analyse(Water.Value);
        foreach (var mo in all) Assert.Equal(1.0, mo.Contributions.Sum(c => c.Fraction), 1e-9);
        var core = all[0];
        Assert.Equal(0, core.Contributions[0].AtomIndex);
        Assert.Equal(0, core.Contributions[0].AngularMomentum);
        Assert.True(core.Contributions[0].Fraction > 0.99);
        Assert.Equal(2.0, core.Occupation);
    }
}
