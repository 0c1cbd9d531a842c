using Orbitarium.Chemistry;

namespace Orbitarium.Tests.Chemistry;

public class XyzFormatTests
{
    private const string Water = "3\nwater\nO 0.0 0.0 0.1173\nH 0.0 0.7572 -0.4692\nH 0.0 -0.7572 -0.4692\n";

    public class Parse
    {
        [Fact]
        public void Reads_atoms_in_angstrom_and_stores_bohr()
        {
            var m = Molecule.FromXyz(Water);
            Assert.Equal(3, m.AtomCount);
            Assert.Equal("water", m.Title);
            // CODATA 2018: 1 Å = 1/0.529177210903 bohr.
            Assert.Equal(0.7572 / 0.529177210903, m.Atoms[1].PositionBohr.Y, 12);
        }

        [Fact]
        public void Writing_and_reading_back_gives_the_same_molecule()
        {
            var m = Molecule.FromXyz(Water);
            var back = Molecule.FromXyz(m.ToXyz());
            Assert.Equal(m.Title, back.Title);
            for (int i = 0; i < m.AtomCount; i++)
            {
                Assert.Equal(m.Atoms[i].Element, back.Atoms[i].Element);
                // Written with 10 decimals in ångström: agreement to 1e-10 Å ≈ 2e-10 bohr.
                Assert.True(Vector3D.Distance(m.Atoms[i].PositionBohr, back.Atoms[i].PositionBohr) < 1e-9);
            }
        }

        [Theory]
        [InlineData("3\nt\nO 0 0 0\nXx 0 0 1\nH 0 1 0\n", 4, "unknown element symbol 'Xx'")]
        [InlineData("3\nt\nO 0 0 0\nH 0 0\nH 0 1 0\n", 4, "expected 'symbol x y z'")]
        [InlineData("3\nt\nO 0 0 0\nH 0 abc 1\nH 0 1 0\n", 4, "is not a number")]
        [InlineData("3\nt\nO 0 0 0\nH 0 NaN 1\nH 0 1 0\n", 4, "not finite")]
        [InlineData("3\nt\nO 0 0 0\nH 0 Infinity 1\nH 0 1 0\n", 4, "not finite")]
        [InlineData("3\nt\nO 0 0 0\nH 0 0 1\nH 0 0 1.05\n", 5, "closer than 0.1")]
        [InlineData("2\nt\nO 0 0 0\nH 0 0 1\nH 0 1 0\n", 5, "more atom lines than the 2 declared")]
        [InlineData("three\nt\nO 0 0 0\n", 1, "number of atoms")]
        public void Bad_input_names_the_line(string text, int line, string fragment)
        {
            var e = Assert.Throws<OrbitariumInputException>(() => Molecule.FromXyz(text));
            Assert.Equal(line, e.LineNumber);
            Assert.Contains(fragment, e.Message);
        }

        [Fact]
        public void Too_few_atoms_names_the_count_line()
        {
            var e = Assert.Throws<OrbitariumInputException>(() => Molecule.FromXyz("3\nt\nO 0 0 0\nH 0 0 1"));
            Assert.Contains("declares 3 atoms on line 1 but lists only 2", e.Message);
        }

        [Fact]
        public void An_impossible_multiplicity_is_refused_with_the_electron_count()
        {
            // Water has 10 electrons: only odd multiplicities 1, 3, … are possible (2S+1 with N − 2S even).
            var e = Assert.Throws<OrbitariumInputException>(() => Molecule.FromXyz(Water, multiplicity: 2));
            Assert.Contains("Multiplicity 2 is impossible for 10 electrons", e.Message);
            var f = Assert.Throws<OrbitariumInputException>(() => Molecule.FromXyz(Water, multiplicity: 13));
            Assert.Contains("no larger than 11", f.Message);
        }
    }
}
