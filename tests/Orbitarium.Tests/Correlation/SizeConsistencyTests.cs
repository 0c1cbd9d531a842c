using Orbitarium.Correlation;

namespace Orbitarium.Tests.Correlation;

public class SizeConsistencyTests
{
    // Two H2 molecules with no integrals between them (infinitely apart). Size consistency: Szabo & Ostlund §4.6
    // (truncated CI is not size consistent; MP2 and coupled cluster are).
    private static readonly MolecularOrbitalHamiltonian Monomer = TestHamiltonians.H2();
    private static readonly MolecularOrbitalHamiltonian Dimer = TestHamiltonians.NonInteractingPair(Monomer);

    [Fact]
    public void Mp2_of_two_separated_molecules_is_twice_the_monomer()
    {
        Assert.Equal(2 * Mp2.Compute(Monomer).CorrelationEnergyHartree, Mp2.Compute(Dimer).CorrelationEnergyHartree, 1e-12);
        Assert.Equal(2 * Monomer.ReferenceEnergyHartree, Dimer.ReferenceEnergyHartree, 1e-12);
    }

    [Fact]
    public void Ccsd_of_two_separated_molecules_is_twice_the_monomer()
    {
        var tight = CorrelationOptions.Default.WithThresholds(1e-12, 1e-10);
        Assert.Equal(2 * Ccsd.Compute(Monomer, tight).TotalEnergyHartree, Ccsd.Compute(Dimer, tight).TotalEnergyHartree, 1e-9);
    }

    [Fact]
    public void Full_CI_of_two_separated_molecules_is_twice_the_monomer()
    {
        Assert.Equal(2 * FullCi.Compute(Monomer).TotalEnergyHartree, FullCi.Compute(Dimer).TotalEnergyHartree, 1e-9);
    }

    [Fact]
    public void Cisd_of_two_separated_molecules_misses_part_of_the_correlation()
    {
        // For one H2, CISD = FCI; for two, CISD lacks the simultaneous double excitation on both (a quadruple),
        // so E(CISD, dimer) > 2 E(CISD, monomer) (Szabo & Ostlund §4.6). The defect is of order the product of the
        // two monomers' doubles weights, far above round-off.
        double monomer = Cisd.Compute(Monomer).TotalEnergyHartree;
        Assert.Equal(FullCi.Compute(Monomer).TotalEnergyHartree, monomer, 1e-10);
        double dimer = Cisd.Compute(Dimer).TotalEnergyHartree;
        Assert.True(dimer - 2 * monomer > 1e-4, $"CISD dimer {dimer} vs twice monomer {2 * monomer}");
    }
}
