using Orbitarium.BasisSets;
using Orbitarium.Chemistry;
using Orbitarium.Scf;
using static Orbitarium.Tests.Scf.ScfTestSystems;

namespace Orbitarium.Tests.Scf;

/// <summary>Exact properties of the Hartree–Fock energy (common practice): invariance under rigid motions and
/// relabelling of atoms, size consistency for non-interacting fragments, and the agreement of RHF, UHF and ROHF
/// for a closed shell.</summary>
public class InvarianceTests
{
    private static readonly BasisSet Basis = BasisSetLibrary.Get("6-31G");

    private static double Energy(Molecule m) => m.WithBasis(Basis).RunRhf().TotalEnergyHartree;

    [Fact]
    public void Energy_is_unchanged_by_rotation_translation_and_permutation_of_atoms()
    {
        var water = Molecule.FromXyzFile(Example("tg1-water.xyz"));
        double e0 = Energy(water);
        double rotated = Energy(water.RotatedAboutAxis(new Vector3D(1, 2, 3), 37));
        double moved = Energy(water.TranslatedAngstrom(1.5, -2.0, 0.7));
        double permuted = Energy(water.Permuted([2, 0, 1]));
        Assert.Equal(e0, rotated, 1e-9);
        Assert.Equal(e0, moved, 1e-9);
        Assert.Equal(e0, permuted, 1e-9);
    }

    [Fact]
    public void Two_molecules_100_angstrom_apart_have_the_sum_of_their_energies()
    {
        var water = Molecule.FromXyzFile(Example("tg1-water.xyz"));
        var h2 = Molecule.FromXyzFile(Example("tg7-dihydrogen.xyz"));
        var far = h2.TranslatedAngstrom(0, 0, 100);
        var pair = water.WithAtoms(water.Atoms.Concat(far.Atoms));
        Assert.Equal(Energy(water) + Energy(h2), Energy(pair), 1e-8);
    }

    [Fact]
    public void RHF_UHF_and_ROHF_agree_for_a_closed_shell()
    {
        var calc = Molecule.FromXyzFile(Example("tg1-water.xyz")).WithBasis(Basis);
        var rhf = calc.RunRhf();
        var uhf = calc.RunUhf();
        var rohf = calc.RunRohf();
        Assert.Equal(rhf.TotalEnergyHartree, uhf.TotalEnergyHartree, 1e-9);
        Assert.Equal(rhf.TotalEnergyHartree, rohf.TotalEnergyHartree, 1e-9);
        Assert.Equal(0, uhf.SpinSquared, 1e-9);
    }

    [Fact]
    public void UHF_lies_at_or_below_ROHF_for_an_open_shell()
    {
        // Variational ordering (common practice): UHF relaxes the ROHF constraint, so E(UHF) ≤ E(ROHF); ROHF is a
        // pure doublet, UHF slightly contaminated.
        var calc = Hydroxyl().WithBasis(Basis);
        var uhf = calc.RunUhf();
        var rohf = calc.RunRohf();
        Assert.True(uhf.Converged && rohf.Converged);
        Assert.True(uhf.TotalEnergyHartree < rohf.TotalEnergyHartree - 1e-6,
            $"E(UHF) = {uhf.TotalEnergyHartree}, E(ROHF) = {rohf.TotalEnergyHartree}");
        Assert.Equal(0.75, rohf.SpinSquared, 1e-9);
        Assert.InRange(uhf.SpinSquared, 0.75, 0.77);
    }
}
