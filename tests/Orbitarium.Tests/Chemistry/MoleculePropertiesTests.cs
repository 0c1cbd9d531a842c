using Orbitarium.Chemistry;

namespace Orbitarium.Tests.Chemistry;

public class MoleculePropertiesTests
{
    // Water, R(OH) = 0.9572 Å, ∠HOH = 104.52° (common practice), in the yz plane with O at the origin.
    private static Molecule Water() => Molecule.FromZMatrix("O\nH 1 0.9572\nH 1 0.9572 2 104.52\n");

    private static Molecule CarbonMonoxide() => Molecule.Empty.AddAtom("C", 0, 0, 0).AddAtom("O", 0, 0, 1.128);

    [Fact]
    public void Nuclear_repulsion_of_water_matches_the_hand_computed_sum()
    {
        // Hand-computed: 2·8/R(OH) + 1/R(HH) with R(OH) = 0.9572 Å, R(HH) = 1.5139006545 Å, a₀ = 0.529177210903 Å
        // (CODATA 2018): 9.194964854 Eh.
        Assert.Equal(9.194964854, Water().NuclearRepulsionEnergyHartree, 1e-8);
    }

    [Fact]
    public void Centre_of_mass_of_CO_lies_on_the_bond_by_the_mass_ratio()
    {
        // Hand-computed: z = m(O)·R / (m(C) + m(O)) with m(¹²C) = 12, m(¹⁶O) = 15.99491461957 u (AME2016), R = 1.128 Å:
        // 0.6444836120 Å.
        Assert.Equal(0.6444836120, CarbonMonoxide().CenterOfMassBohr.Z * PhysicalConstants.AngstromPerBohr, 1e-9);
    }

    [Fact]
    public void Inertia_of_CO_is_the_reduced_mass_times_R_squared()
    {
        // Linear molecule (textbook): I = μR², μ = m(C)m(O)/(m(C)+m(O)); hand-computed 31.15300597 u·bohr².
        var moments = CarbonMonoxide().PrincipalMomentsDaltonBohr2();
        Assert.Equal(0, moments[0], 10);
        Assert.Equal(31.15300597, moments[1], 1e-7);
        Assert.Equal(31.15300597, moments[2], 1e-7);
    }

    [Fact]
    public void Principal_moments_of_water_match_the_hand_computed_values()
    {
        // Hand-computed from the geometry with m(¹H) = 1.00782503223 u, m(¹⁶O) = 15.99491461957 u (AME2016):
        // 2.194260517, 4.124275165, 6.318535682 u·bohr² (planar: the largest is the sum of the other two).
        var moments = Water().PrincipalMomentsDaltonBohr2();
        Assert.Equal(2.194260517, moments[0], 1e-8);
        Assert.Equal(4.124275165, moments[1], 1e-8);
        Assert.Equal(6.318535682, moments[2], 1e-8);
    }

    [Fact]
    public void Bonded_pairs_of_water_are_the_two_OH_bonds()
    {
        // Covalent radii O 0.66, H 0.31 Å (Cordero et al. 2008): O–H 0.957 < 1.3·0.97; H···H 1.514 > 1.3·0.62.
        Assert.Equal(new (int, int)[] { (0, 1), (0, 2) }, Water().BondedPairs().ToArray());
    }

    [Theory]
    // Hill order (common practice): C first, then H, then alphabetical; alphabetical without carbon.
    [InlineData("3\n\nO 0 0 0\nH 0 0 0.96\nH 0 0.93 -0.24\n", "H2O")]
    [InlineData("2\n\nNa 0 0 0\nCl 0 0 2.36\n", "ClNa")]
    [InlineData("9\n\nC 0 0 0\nC 0 0 1.52\nO 1.2 0 2.2\nH 0 1 -0.4\nH 0.9 -0.5 -0.4\nH -0.9 -0.5 -0.4\nH 0 -1 1.9\nH -0.9 0.5 1.9\nH 1.2 0 3.1\n", "C2H6O")]
    public void Formula_follows_Hill_order(string xyz, string formula) => Assert.Equal(formula, Molecule.FromXyz(xyz).Formula);

    [Fact]
    public void Electron_counts_follow_charge_and_multiplicity()
    {
        // Water cation: 10 − 1 = 9 electrons, doublet by default: 5 α, 4 β. Triplet neutral water: 6 α, 4 β.
        var cation = Water().WithCharge(1);
        Assert.Equal(9, cation.ElectronCount);
        Assert.Equal(2, cation.Multiplicity);
        Assert.Equal(5, cation.AlphaElectronCount);
        Assert.Equal(4, cation.BetaElectronCount);
        var triplet = Water().WithMultiplicity(3);
        Assert.Equal(6, triplet.AlphaElectronCount);
        Assert.Equal(4, triplet.BetaElectronCount);
    }

    [Fact]
    public void Fluent_building_returns_new_molecules()
    {
        var one = Molecule.Empty.AddAtom("H", 0, 0, 0);
        var two = one.AddAtom("H", 0, 0, 0.74);
        Assert.Equal(1, one.AtomCount);
        Assert.Equal(2, two.AtomCount);
    }

    [Theory]
    [InlineData("tg1-water.xyz", 1)]
    [InlineData("tgb-benzene.xyz", 6)]
    [InlineData("tg7-dihydrogen.xyz", 0)]
    public void The_standard_frozen_core_counts_the_noble_gas_cores(string file, int expected)
    {
        // Common practice: one 1s orbital per first-row atom, none for hydrogen.
        var molecule = Molecule.FromXyzFile(Path.Combine(Orbitarium.Tests.Shell.Repl.TestConsoles.RepositoryRoot(), "examples", file));
        Assert.Equal(expected, molecule.StandardFrozenCoreOrbitals);
    }

    [Fact]
    public void The_standard_frozen_core_of_second_row_atoms_is_the_neon_shell_and_never_freezes_every_electron()
    {
        var silane = Molecule.Empty.AddAtom("Si", 0, 0, 0).AddAtom("H", 0.855, 0.855, 0.855).AddAtom("H", -0.855, -0.855, 0.855)
            .AddAtom("H", -0.855, 0.855, -0.855).AddAtom("H", 0.855, -0.855, -0.855);
        Assert.Equal(5, silane.StandardFrozenCoreOrbitals);
        // Li⁺ is all core: its two electrons are correlated rather than both frozen. The Li atom keeps 1s frozen.
        Assert.Equal(0, Molecule.Empty.AddAtom("Li", 0, 0, 0).WithCharge(1).StandardFrozenCoreOrbitals);
        Assert.Equal(1, Molecule.Empty.AddAtom("Li", 0, 0, 0).StandardFrozenCoreOrbitals);
        Assert.Equal(9, Element.FromSymbol("Br").NobleGasCoreOrbitals);
    }
}
