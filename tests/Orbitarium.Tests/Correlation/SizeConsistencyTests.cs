using Orbitarium.Chemistry;
using Orbitarium.Scf;
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

    [Fact]
    public void Mp2_of_eight_far_apart_helium_atoms_in_112_functions_is_eight_times_the_atom()
    {
        // Size consistency of MP2 (Szabo & Ostlund §4.6), here also a guard on size: 8 × 14 cc-pVTZ functions is more
        // than a dense N⁴ copy of the AO integrals allowed before (107 functions). Atoms 20 Å apart: the He–He
        // dispersion −C6/R⁶, C6 ≈ 1.46 au (from memory), is 5e-10 Eh for the nearest pairs, so the 28 pairs together
        // stay below 1e-8 Eh (at 10 Å the cube's MP2 interaction is already 1.5e-7 Eh). Tolerance 5e-8 Eh.
        var cluster = Molecule.Empty;
        for (int i = 0; i < 8; i++) cluster = cluster.AddAtom("He", 20.0 * (i & 1), 20.0 * ((i >> 1) & 1), 20.0 * (i >> 2));
        var big = cluster.WithBasis("cc-pVTZ").RunRhf();
        Assert.Equal(112, big.Basis.FunctionCount);
        double atom = Molecule.Empty.AddAtom("He", 0, 0, 0).WithBasis("cc-pVTZ").RunRhf().Mp2().CorrelationEnergyHartree;
        Assert.Equal(8 * atom, big.Mp2().CorrelationEnergyHartree, 5e-8);
    }
}
