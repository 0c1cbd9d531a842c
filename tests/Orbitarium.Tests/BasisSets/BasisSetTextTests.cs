using Orbitarium.BasisSets;
using Orbitarium.Chemistry;

namespace Orbitarium.Tests.BasisSets;

public class BasisSetTextTests
{
    private const string Small = """
        # a small test set
        basis tiny
        alias tiny-1
        form pure
        source made for a test

        element H
          shell s
            3.0   0.4
            0.5   0.7
        element C
          shell sp
            2.0  -0.1   0.2
            0.3   1.0   0.9
          shell d
            0.8   1.0
        """;

    public class Parse
    {
        [Fact]
        public void Reads_shells_exponents_and_coefficients()
        {
            var set = BasisSet.Parse(Small);
            Assert.Equal("tiny", set.Name);
            Assert.True(set.DefaultPure);
            var c = set.ShellsFor(PeriodicTable.BySymbol("C"));
            Assert.Equal([0, 1, 2], c.Select(s => s.AngularMomentum));
            Assert.Equal([2.0, 0.3], c[1].Exponents.ToArray());
            Assert.Equal([0.2, 0.9], c[1].Coefficients.ToArray());
        }

        [Theory]
        [InlineData("basis x\nform pure\nelement H\n  shell s\n    1.0 1.0 2.0\n", 5, "needs 2 numbers")]
        [InlineData("basis x\nform pure\nelement Xx\n", 3, "unknown element symbol 'Xx'")]
        [InlineData("basis x\nform pure\nelement H\n  shell q\n", 4, "unknown shell letter 'q'")]
        [InlineData("basis x\nform pure\nelement H\n  shell s\n    -1.0 1.0\n", 5, "must be a positive number")]
        [InlineData("basis x\nform pure\nelement H\n  shell s\n    1.0 abc\n", 5, "'abc' is not a number")]
        [InlineData("basis x\nform sideways\n", 2, "form must be 'pure' or 'cartesian'")]
        [InlineData("basis x\nform pure\n  1.0 1.0\n", 3, "outside a shell")]
        [InlineData("basis x\nform pure\nelement H\n  shell s\nelement C\n", 4, "has no primitives")]
        [InlineData("basis x\nform pure\nwibble\n", 3, "unknown keyword 'wibble'")]
        [InlineData("basis x\nform pure\nelement H\n  shell s\n 1 1\nelement H\n", 6, "appears twice")]
        public void Errors_name_the_line(string text, int line, string fragment)
        {
            var e = Assert.Throws<OrbitariumInputException>(() => BasisSet.Parse(text));
            Assert.Equal(line, e.LineNumber);
            Assert.StartsWith($"line {line}:", e.Message);
            Assert.Contains(fragment, e.Message);
        }

        [Fact]
        public void A_missing_name_is_reported()
        {
            var e = Assert.Throws<OrbitariumInputException>(() => BasisSet.Parse("form pure\nelement H\n shell s\n 1 1\n"));
            Assert.Contains("'basis NAME'", e.Message);
        }

        [Fact]
        public void Fortran_style_exponents_are_accepted() =>
            Assert.Equal(1.5e-3, BasisSet.Parse("basis x\nform pure\nelement H\n shell s\n 1.5D-03 1.0\n").ShellsFor(PeriodicTable.BySymbol("H"))[0].Exponents[0]);
    }

    public class Write
    {
        [Theory]
        [InlineData("cc-pVTZ")]
        [InlineData("6-31G**")]
        [InlineData("STO-3G")]
        public void Round_trips_every_number_exactly(string name)
        {
            var set = BasisSetLibrary.Get(name);
            var back = BasisSet.Parse(set.ToText());
            Assert.Equal(set.Name, back.Name);
            Assert.Equal(set.DefaultPure, back.DefaultPure);
            Assert.Equal(set.Description, back.Description);
            Assert.Equal(set.AtomicNumbers, back.AtomicNumbers);
            foreach (int z in set.AtomicNumbers)
            {
                var a = set.ShellsFor(PeriodicTable.ByAtomicNumber(z));
                var b = back.ShellsFor(PeriodicTable.ByAtomicNumber(z));
                Assert.Equal(a.Length, b.Length);
                for (int k = 0; k < a.Length; k++)
                {
                    Assert.Equal(a[k].AngularMomentum, b[k].AngularMomentum);
                    Assert.Equal(a[k].Exponents.ToArray(), b[k].Exponents.ToArray());
                    Assert.Equal(a[k].Coefficients.ToArray(), b[k].Coefficients.ToArray());
                }
            }
        }

        [Fact]
        public void A_saved_file_reads_back()
        {
            string path = Path.Combine(Path.GetTempPath(), $"orbitarium-{Guid.NewGuid():N}.basis");
            try
            {
                var set = BasisSet.Create("mine", defaultPure: false).WithShell("H", 's', (1.2, 1.0)).WithEvenTemperedShells("He", 0, 0.1, 3.0, 4);
                set.Save(path);
                var back = BasisSet.FromFile(path);
                Assert.Equal([1, 2], back.AtomicNumbers);
                Assert.Equal(4, back.ShellsFor(PeriodicTable.BySymbol("He")).Length);
            }
            finally
            {
                File.Delete(path);
            }
        }

        [Fact]
        public void A_missing_file_gives_a_clear_message()
        {
            var e = Assert.Throws<OrbitariumInputException>(() => BasisSet.FromFile("/nonexistent/x.basis"));
            Assert.Contains("Cannot read the basis file", e.Message);
        }
    }
}
