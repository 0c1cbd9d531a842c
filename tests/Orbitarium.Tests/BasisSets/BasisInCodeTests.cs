using Orbitarium.BasisSets;
using Orbitarium.Chemistry;

namespace Orbitarium.Tests.BasisSets;

public class BasisInCodeTests
{
    private static Molecule Water() => Molecule.FromXyz("3\nwater\nO 0 0 0.1173\nH 0 0.7572 -0.4692\nH 0 -0.7572 -0.4692\n");

    [Fact]
    public void A_set_written_in_code_places_like_a_library_set()
    {
        // The cc-pVDZ hydrogen functions written out by hand (Dunning 1989, from memory, as in the library file)
        // give the same shells as the library copy.
        var mine = BasisSet.Create("my-H", defaultPure: true)
            .WithShell("H", 's', (13.01, 0.019685), (1.962, 0.137977), (0.4446, 0.478148), (0.122, 0.50124))
            .WithShell("H", 's', (0.122, 1.0))
            .WithShell("H", 'p', (0.727, 1.0));
        var lib = BasisSetLibrary.Get("cc-pVDZ").ShellsFor(PeriodicTable.BySymbol("H"));
        var own = mine.ShellsFor(PeriodicTable.BySymbol("H"));
        Assert.Equal(lib.Length, own.Length);
        for (int k = 0; k < lib.Length; k++)
        {
            Assert.Equal(lib[k].Exponents.ToArray(), own[k].Exponents.ToArray());
            Assert.Equal(lib[k].Coefficients.ToArray(), own[k].Coefficients.ToArray());
        }
    }

    [Fact]
    public void Per_atom_sets_mix_on_one_molecule()
    {
        // cc-pVDZ on O (14 pure functions) and STO-3G on each H (1 each): 16 functions (common practice counts).
        var basis = MolecularBasis.Create(Water(), [BasisSet.FromLibrary("cc-pVDZ"), BasisSet.FromLibrary("STO-3G"), BasisSet.FromLibrary("STO-3G")]);
        Assert.Equal(16, basis.FunctionCount);
        Assert.Equal("cc-pVDZ+STO-3G", basis.Name);
    }

    [Fact]
    public void Overriding_the_default_form_changes_the_d_count()
    {
        // 6-311G** is pure by default (5D): water 30 functions; with Cartesian d (6D) 31.
        var set = BasisSet.FromLibrary("6-311G**");
        Assert.Equal(31, MolecularBasis.Create(Water(), set, pure: false).FunctionCount);
        Assert.Equal(30, MolecularBasis.Create(Water(), set.WithDefaultPure(true)).FunctionCount);
    }

    [Fact]
    public void A_set_lacking_an_element_names_the_atom_and_the_remedy()
    {
        var e = Assert.Throws<OrbitariumInputException>(() =>
            MolecularBasis.Create(Water(), BasisSet.Create("only-H", false).WithShell("H", 's', (1.0, 1.0))));
        Assert.Contains("Atom 1", e.Message);
        Assert.Contains("no functions for oxygen (O)", e.Message);
    }

    [Fact]
    public void STO_nG_shells_for_any_zeta_and_n()
    {
        // Exponents of the STO-4G 2sp fit scale as ζ² (Hehre et al. 1969).
        var one = StoNGBasis.ShellsFor("2sp", 1.0, 4);
        var c = StoNGBasis.ShellsFor("2sp", 1.72, 4);
        Assert.Equal(2, c.Count);
        for (int i = 0; i < 4; i++) Assert.Equal(one[0].Exponents[i] * 1.72 * 1.72, c[1].Exponents[i], 1e-12);
        Assert.Throws<OrbitariumInputException>(() => StoNGBasis.ShellsFor("2x", 1.0, 3));
    }
}
