using Orbitarium.BasisSets;

namespace Orbitarium.Tests.BasisSets;

public class BasisSetLibraryTests
{
    public class Get
    {
        [Theory]
        // Common practice: 6-31G(d) = 6-31G*, 6-31G(d,p) = 6-31G**, 6-311G(d,p) = 6-311G**; names are case-insensitive.
        [InlineData("6-31G(d)", "6-31G*")]
        [InlineData("6-31g*", "6-31G*")]
        [InlineData("6-31G(d,p)", "6-31G**")]
        [InlineData("6-31g(D,P)", "6-31G**")]
        [InlineData("6-311G(d,p)", "6-311G**")]
        [InlineData("CC-PVDZ", "cc-pVDZ")]
        [InlineData("sto-3g", "STO-3G")]
        [InlineData(" cc-pvtz ", "cc-pVTZ")]
        public void Finds_sets_by_alias_and_any_case(string asked, string canonical) =>
            Assert.Equal(canonical, BasisSetLibrary.Get(asked).Name);

        [Fact]
        public void An_unknown_name_lists_the_available_sets()
        {
            var e = Assert.Throws<OrbitariumInputException>(() => BasisSetLibrary.Get("6-31+G*"));
            Assert.Contains("Unknown basis set '6-31+G*'", e.Message);
            foreach (var n in new[] { "STO-3G", "STO-6G", "3-21G", "6-31G", "6-31G*", "6-31G**", "6-311G**", "cc-pVDZ", "cc-pVTZ" })
                Assert.Contains(n, e.Message);
        }

        [Fact]
        public void Names_list_the_common_sets_from_small_to_large() =>
            Assert.Equal(["STO-3G", "STO-6G", "3-21G", "6-31G", "6-31G*", "6-31G**", "6-311G**", "cc-pVDZ", "cc-pVTZ"],
                BasisSetLibrary.Names.Take(9));

        [Fact]
        public void FromLibrary_is_the_same_lookup() =>
            Assert.Same(BasisSetLibrary.Get("cc-pVDZ"), BasisSet.FromLibrary("CC-pvdz"));
    }

    public class TryGet
    {
        [Fact]
        public void Returns_false_for_an_unknown_name() => Assert.False(BasisSetLibrary.TryGet("nonsense", out _));

        [Fact]
        public void Returns_true_for_a_known_name()
        {
            Assert.True(BasisSetLibrary.TryGet("3-21g", out var set));
            Assert.Equal("3-21G", set.Name);
        }
    }

    public class BasedOn
    {
        [Fact]
        public void Six_31G_star_is_6_31G_plus_one_d_shell_on_heavy_atoms()
        {
            // Hariharan & Pople (1973): 6-31G* adds a single d shell (exponent 0.8 for C–F, from memory) to 6-31G.
            var plain = BasisSetLibrary.Get("6-31G").ShellsFor(Orbitarium.Chemistry.PeriodicTable.BySymbol("O"));
            var star = BasisSetLibrary.Get("6-31G*").ShellsFor(Orbitarium.Chemistry.PeriodicTable.BySymbol("O"));
            Assert.Equal(plain.Length + 1, star.Length);
            Assert.Equal(2, star[^1].AngularMomentum);
            Assert.Equal(0.8, star[^1].Exponents[0]);
            Assert.Equal(BasisSetLibrary.Get("6-31G").ShellsFor(Orbitarium.Chemistry.PeriodicTable.BySymbol("H")).Length,
                BasisSetLibrary.Get("6-31G*").ShellsFor(Orbitarium.Chemistry.PeriodicTable.BySymbol("H")).Length);
        }
    }
}
