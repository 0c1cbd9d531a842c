using System.Globalization;
using System.Text.RegularExpressions;
using Orbitarium.Shell.Repl;

namespace Orbitarium.Tests.Shell.Repl;

/// <summary>Runs every workflow in <c>scripts/</c> through the <c>run</c> command's engine and checks its key numbers.</summary>
public partial class ScriptsFolderTests
{
    public static TheoryData<string> Scripts()
    {
        var data = new TheoryData<string>();
        foreach (string path in Directory.GetFiles(Path.Combine(TestConsoles.RepositoryRoot(), "scripts"), "*.csx").Order(StringComparer.Ordinal))
            data.Add(Path.GetFileName(path));
        return data;
    }

    [Fact]
    public void The_folder_holds_the_five_workflows()
    {
        var names = Directory.GetFiles(Path.Combine(TestConsoles.RepositoryRoot(), "scripts"), "*.csx");
        Assert.True(names.Length >= 5, string.Join(", ", names));
    }

    [Theory]
    [MemberData(nameof(Scripts))]
    public async Task Every_script_runs_to_the_end_and_prints_its_key_numbers(string name)
    {
        var output = new StringWriter();
        var error = new StringWriter();
        int exit = await ScriptRunner.RunAsync(Path.Combine(TestConsoles.RepositoryRoot(), "scripts", name), [], output, error);
        Assert.True(exit == 0, $"exit {exit}: {error}");
        Check(name, output.ToString());
    }

    private static double Number(string text, string pattern)
    {
        var match = Regex.Match(text, pattern);
        Assert.True(match.Success, $"'{pattern}' not found in:\n{text}");
        return double.Parse(match.Groups[1].Value, CultureInfo.InvariantCulture);
    }

    private static void Check(string name, string text)
    {
        switch (name)
        {
            case "tg7-bond-stretch.csx":
            {
                // H2 RHF/STO-3G at 1.4 bohr: -1.1167143 Eh with exactly normalised contractions
                // (Szabo & Ostlund, Modern Quantum Chemistry, ch. 3; /work/shared/REFERENCES.md). The published
                // STO-3G coefficients have 6 digits, so 2e-6 Eh.
                Assert.Equal(-1.1167143, Number(text, @"E\(1\.4000 bohr\) = (-?\d+\.\d+)"), 2e-6);
                // The curve rises on both sides of its minimum (a bound molecule; common practice).
                double e10 = Number(text, @"E\(1\.0000 bohr\) = (-?\d+\.\d+)"), e30 = Number(text, @"E\(3\.0000 bohr\) = (-?\d+\.\d+)");
                double lowest = Number(text, @"lowest point on the grid: R = \d+\.\d+ bohr, E = (-?\d+\.\d+)");
                Assert.True(lowest < e10 && lowest < e30);
                break;
            }
            case "tg1-basis-comparison.csx":
            {
                double sto3g = Number(text, @"STO-3G\s+\d+\s+E =\s+(-?\d+\.\d+)");
                double b321 = Number(text, @"3-21G\s+\d+\s+E =\s+(-?\d+\.\d+)");
                double b631 = Number(text, @"6-31G\*\s+\d+\s+E =\s+(-?\d+\.\d+)");
                double dz = Number(text, @"cc-pVDZ\s+\d+\s+E =\s+(-?\d+\.\d+)");
                // Water RHF near the experimental geometry, from memory: STO-3G -74.963, 6-31G* -76.011,
                // cc-pVDZ -76.027 Eh. TG-1's rounded geometry and recall allow 2 mEh.
                Assert.Equal(-74.963, sto3g, 2e-3);
                Assert.Equal(-76.011, b631, 2e-3);
                Assert.Equal(-76.027, dz, 2e-3);
                // Larger sets of the same kind lie lower (variational principle; common practice).
                Assert.True(sto3g > b321 && b321 > b631 && b631 > dz);
                break;
            }
            case "tg4-fluoride-stretch-correlated.csx":
            {
                double reHf = Number(text, @"RHF\s+r_e = (\d+\.\d+)"), reCc = Number(text, @"CCSD\(T\)\s+r_e = (\d+\.\d+)");
                double wHf = Number(text, @"RHF\s+r_e = \d+\.\d+\s+ω_e =\s+(\d+\.\d+)");
                double wCc = Number(text, @"CCSD\(T\)\s+r_e = \d+\.\d+\s+ω_e =\s+(\d+\.\d+)");
                // ¹H¹⁹F experiment: r_e = 0.9168 Å, ω_e = 4138.3 cm⁻¹ (K. P. Huber and G. Herzberg, Constants of
                // Diatomic Molecules, 1979; from memory). CCSD(T) in a double-zeta basis is typically within a few
                // mÅ and about 1 % (common practice): 0.01 Å and 2 % leave room for the basis, not for a wrong method.
                Assert.Equal(0.9168, reCc, 0.01);
                Assert.Equal(4138.3, wCc, 0.02 * 4138.3);
                // Hartree–Fock bonds are too short and too stiff; correlation lengthens and softens them (common
                // practice): here by about 0.02 Å and 7 %.
                Assert.True(reCc - reHf > 0.01, $"r_e RHF {reHf}, CCSD(T) {reCc}");
                Assert.True(wHf / wCc > 1.04, $"ω_e RHF {wHf}, CCSD(T) {wCc}");
                // The figure was written and is a PNG (signature 89 50 4E 47).
                string figure = Regex.Match(text, @"figure: (.+\.png)").Groups[1].Value.Trim();
                Assert.True(File.Exists(figure), $"no figure at '{figure}'");
                Assert.Equal(new byte[] { 0x89, 0x50, 0x4E, 0x47 }, File.ReadAllBytes(figure)[..4]);
                break;
            }
            case "tg2-hydroxyl-uhf-rohf.csx":
            {
                double eUhf = Number(text, @"UHF\s+E = (-?\d+\.\d+)"), eRohf = Number(text, @"ROHF\s+E = (-?\d+\.\d+)");
                double s2Uhf = Number(text, @"UHF\s+E = -?\d+\.\d+ Eh\s+<S\^2> = (\d+\.\d+)");
                double s2Rohf = Number(text, @"ROHF\s+E = -?\d+\.\d+ Eh\s+<S\^2> = (\d+\.\d+)");
                // UHF is variationally at or below ROHF; ROHF is a pure doublet, S(S+1) = 0.75; UHF of a
                // doublet radical is slightly contaminated (common practice).
                Assert.True(eUhf < eRohf, $"UHF {eUhf} should lie below ROHF {eRohf}");
                Assert.Equal(0.75, s2Rohf, 1e-6);
                Assert.InRange(s2Uhf, 0.750001, 0.77);
                break;
            }
            case "tg1-prototype-scf.csx":
            {
                // The hand-written loop and the library's RHF solve the same equations: they agree to the
                // convergence threshold (1e-10 Eh on the energy; 1e-6 Eh leaves room for the stopping rule).
                double proto = Number(text, @"prototype SCF: E = (-?\d+\.\d+)"), library = Number(text, @"library RHF:\s+E = (-?\d+\.\d+)");
                Assert.Equal(library, proto, 1e-6);
                break;
            }
            default:
                // A new script runs to the end; add its key numbers here.
                Assert.False(string.IsNullOrWhiteSpace(text), $"{name} printed nothing");
                break;
        }
    }
}
