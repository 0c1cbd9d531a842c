using Orbitarium.BasisSets;
using Orbitarium.Chemistry;
using Orbitarium.Scf;

namespace Orbitarium.Tests.BasisSets;

/// <summary>Each built-in set, run through Hartree–Fock, reproduces published energies. Values recalled without the
/// document at hand are marked "from memory"; tolerances follow the printed digits.</summary>
public class PublishedEnergyTests
{
    private static Molecule Atom(string symbol) => Molecule.Empty.AddAtom(symbol, 0, 0, 0);

    [Theory]
    // One electron: the UHF energy is the lowest eigenvalue of h in the basis, a direct check of the s contraction.
    // Values from memory of standard tables of atomic HF energies (printed to 1e-6 Eh).
    [InlineData("3-21G", -0.496199)]
    [InlineData("6-31G", -0.498233)]
    [InlineData("cc-pVDZ", -0.499278)]
    public void Hydrogen_atom_energies_match_the_tabulated_values(string set, double energyHartree)
    {
        var r = Atom("H").WithBasis(BasisSetLibrary.Get(set)).RunUhf();
        Assert.True(r.Converged);
        Assert.Equal(energyHartree, r.TotalEnergyHartree, 2e-6);
    }

    [Theory]
    // From memory: H atom 6-311G** and cc-pVTZ both −0.49981 Eh (printed to 1e-5; same five s exponents).
    [InlineData("6-311G**")]
    [InlineData("cc-pVTZ")]
    public void Hydrogen_atom_in_the_triple_zeta_sets_is_within_2e_4_of_the_exact_minus_one_half(string set)
    {
        var r = Atom("H").WithBasis(BasisSetLibrary.Get(set)).RunUhf();
        Assert.Equal(-0.49981, r.TotalEnergyHartree, 1e-5);
    }

    [Theory]
    // Helium RHF, from memory of standard tables: STO-3G −2.807784 (ζ = 1.69; generated fit agrees to the printed
    // digits within 2e-6), 3-21G −2.835680, 6-31G and cc-pVDZ −2.855160.
    [InlineData("He", "STO-3G", -2.807784, 3e-6)]
    [InlineData("He", "3-21G", -2.835680, 2e-6)]
    [InlineData("He", "6-31G", -2.855160, 2e-6)]
    [InlineData("He", "cc-pVDZ", -2.855160, 2e-6)]
    // Neon RHF, from memory of standard tables: cc-pVDZ −128.488776, cc-pVTZ −128.531862, 6-31G −128.473877,
    // 6-31G* (6D, d 0.8) −128.474407 Eh (printed to 1e-6); 3-21G −127.80382 Eh (recalled to 1e-5 only).
    [InlineData("Ne", "cc-pVDZ", -128.488776, 2e-6)]
    [InlineData("Ne", "cc-pVTZ", -128.531862, 2e-6)]
    [InlineData("Ne", "6-31G", -128.473877, 2e-6)]
    [InlineData("Ne", "6-31G*", -128.474407, 2e-6)]
    [InlineData("Ne", "3-21G", -127.80382, 1e-5)]
    public void Closed_shell_atom_energies_match_the_tabulated_values(string symbol, string set, double energyHartree, double tolerance)
    {
        var r = Atom(symbol).WithBasis(BasisSetLibrary.Get(set)).RunRhf();
        Assert.True(r.Converged);
        Assert.Equal(energyHartree, r.TotalEnergyHartree, tolerance);
    }

    [Fact]
    public void Neon_lies_above_the_Hartree_Fock_limit_by_a_margin_that_shrinks_with_the_set()
    {
        // Numerical HF limit of Ne −128.547098 Eh (Froese Fischer, from memory). A finite Gaussian set is variational,
        // so every energy lies above it; a bigger set of the same family lies closer: 3-21G, 6-31G, 6-31G*, cc-pVTZ.
        const double limitHartree = -128.547098;
        double previous = double.PositiveInfinity;
        foreach (var set in new[] { "3-21G", "6-31G", "6-31G*", "cc-pVTZ" })
        {
            double e = Atom("Ne").WithBasis(BasisSetLibrary.Get(set)).RunRhf().TotalEnergyHartree;
            Assert.True(e > limitHartree && e < previous, $"Ne {set}: {e:F6} Eh (limit {limitHartree}, previous {previous:F6})");
            previous = e;
        }
    }

    [Theory]
    // Lithium 2S UHF, from memory of standard tables: 3-21G −7.381513, 6-31G −7.431236 Eh (printed to 1e-6).
    [InlineData("3-21G", -7.381513)]
    [InlineData("6-31G", -7.431236)]
    public void Lithium_atom_energies_match_the_tabulated_values(string set, double energyHartree)
    {
        var r = Atom("Li").WithMultiplicity(2).WithBasis(BasisSetLibrary.Get(set)).RunUhf();
        Assert.True(r.Converged);
        Assert.Equal(energyHartree, r.TotalEnergyHartree, 2e-6);
    }

    [Fact]
    public void Lithium_6_311G_lies_between_the_Hartree_Fock_limit_and_6_31G()
    {
        // No published 6-311G** value for Li is known to us; the recalled set must still be plausible: above the
        // numerical HF limit −7.432727 Eh (Froese Fischer, from memory), below the 6-31G value −7.431236 Eh (from
        // memory; a triple-split valence is expected to describe the 2s orbital better): a window 1.5 mEh wide.
        // Orbitarium gives −7.432026 Eh, 0.70 mEh above the limit.
        var r = Atom("Li").WithMultiplicity(2).WithBasis(BasisSetLibrary.Get("6-311G**")).RunUhf();
        Assert.True(r.Converged);
        Assert.InRange(r.TotalEnergyHartree, -7.432727, -7.431236);
    }

    private static Molecule Methane()
    {
        // R(CH) = 2.050 bohr, tetrahedral (Szabo & Ostlund, ch. 3, experimental geometry; from memory).
        double d = 2.050 / Math.Sqrt(3);
        return Molecule.Empty.AddAtom("C", 0, 0, 0, LengthUnit.Bohr)
            .AddAtom("H", d, d, d, LengthUnit.Bohr).AddAtom("H", -d, -d, d, LengthUnit.Bohr)
            .AddAtom("H", -d, d, -d, LengthUnit.Bohr).AddAtom("H", d, -d, -d, LengthUnit.Bohr);
    }

    private static Molecule HydrogenFluoride() =>
        Molecule.Empty.AddAtom("F", 0, 0, 0, LengthUnit.Bohr).AddAtom("H", 0, 0, 1.733, LengthUnit.Bohr);

    [Theory]
    // Szabo & Ostlund, Modern Quantum Chemistry, Table 3.13 (from memory; printed to 1e-3 Eh, Cartesian d):
    // CH4 STO-3G −39.727, 6-31G* −40.195, 6-31G** −40.202; FH 6-31G* −100.002, 6-31G** −100.011.
    [InlineData("CH4", "STO-3G", -39.727)]
    [InlineData("CH4", "6-31G*", -40.195)]
    [InlineData("CH4", "6-31G**", -40.202)]
    [InlineData("FH", "6-31G*", -100.002)]
    [InlineData("FH", "6-31G**", -100.011)]
    public void Molecular_RHF_energies_match_the_textbook_table(string molecule, string set, double energyHartree)
    {
        var m = molecule == "CH4" ? Methane() : HydrogenFluoride();
        var r = m.WithBasis(BasisSetLibrary.Get(set), pure: false).RunRhf();
        Assert.True(r.Converged);
        // Printed to 1 mEh; 1.5e-3 allows the rounding of printed geometry and energy.
        Assert.Equal(energyHartree, r.TotalEnergyHartree, 1.5e-3);
    }

    private static Molecule SecondRowHydride(string molecule)
    {
        // 6-31G*-optimised geometries as recalled with the energies below: HCl R = 1.266 Å; H2S R = 1.326 Å,
        // ∠HSH = 94.4°; SiH4 R = 1.475 Å, tetrahedral.
        switch (molecule)
        {
            case "HCl": return Molecule.FromZMatrix("Cl\nH 1 1.266\n");
            case "H2S": return Molecule.FromZMatrix("S\nH 1 1.326\nH 1 1.326 2 94.4\n");
            default:
                double t = 1.475 / Math.Sqrt(3);
                return Molecule.Empty.AddAtom("Si", 0, 0, 0).AddAtom("H", t, t, t).AddAtom("H", -t, -t, t)
                    .AddAtom("H", -t, t, -t).AddAtom("H", t, -t, -t);
        }
    }

    [Theory]
    // 6-31G*//6-31G* RHF energies (Cartesian d) of standard compilations, e.g. Hehre, Radom, Schleyer & Pople,
    // Ab Initio Molecular Orbital Theory (Wiley, 1986), from memory; printed to 1e-5 Eh. They check the second-row
    // 6-31G data together with the d exponents (Si 0.45, S 0.65, Cl 0.75). Over ±0.001 Å around the recalled bond
    // lengths the energy changes by under 5e-6 Eh, so 2e-5 covers the rounding of printed geometry and energy.
    [InlineData("HCl", -460.05998)]
    [InlineData("H2S", -398.66732)]
    [InlineData("SiH4", -291.22513)]
    public void Second_row_hydride_6_31G_star_energies_match_the_tabulated_values(string molecule, double energyHartree)
    {
        var r = SecondRowHydride(molecule).WithBasis(BasisSetLibrary.Get("6-31G*"), pure: false).RunRhf();
        Assert.True(r.Converged);
        Assert.Equal(energyHartree, r.TotalEnergyHartree, 2e-5);
    }

    [Fact]
    public void Water_cc_pVDZ_matches_the_widely_quoted_RHF_energy()
    {
        // From memory: H2O RHF/cc-pVDZ −76.02663 Eh near R(OH) = 0.96 Å, ∠HOH = 104.5° (pure d, the set's default);
        // 1e-3 Eh covers the uncertainty of the recalled geometry.
        var water = Molecule.FromZMatrix("O\nH 1 0.96\nH 1 0.96 2 104.5\n");
        var r = water.WithBasis(BasisSetLibrary.Get("cc-pVDZ")).RunRhf();
        Assert.True(r.Converged);
        Assert.Equal(-76.02663, r.TotalEnergyHartree, 1e-3);
    }
}
