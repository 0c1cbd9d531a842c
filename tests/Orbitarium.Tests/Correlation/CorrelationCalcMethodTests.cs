using System.Text.Json;
using Orbitarium.Shell.Commands;
using Orbitarium.Tests.Scf;

namespace Orbitarium.Tests.Correlation;

public class CorrelationCalcMethodTests
{
    private static (int Code, string Out, string Err) Calc(params string[] args)
    {
        var output = new StringWriter();
        var error = new StringWriter();
        int code = CalcCommand.Invoke(args, output, error);
        return (code, output.ToString(), error.ToString());
    }

    private static string WaterFile => ScfTestSystems.Example("tg1-water.xyz");

    [Theory]
    [InlineData("mp2")]
    [InlineData("ccsd(t)")]
    public void Json_has_reference_correlation_and_total_energies_that_add_up(string method)
    {
        var (code, text, err) = Calc("-g", WaterFile, "-b", "STO-3G", "-m", method, "--json");
        Assert.True(code == 0, err);
        using var doc = JsonDocument.Parse(text);
        var root = doc.RootElement;
        double reference = root.GetProperty("reference_energy").GetDouble();
        double correlation = root.GetProperty("correlation_energy").GetDouble();
        Assert.Equal(reference + correlation, root.GetProperty("total_energy").GetDouble(), 1e-10);
        Assert.Equal(root.GetProperty("scf_energy").GetDouble(), reference, 1e-8);
        Assert.InRange(correlation, -0.1, -0.01);
        Assert.Equal(method, root.GetProperty("method").GetString());
    }

    [Fact]
    public void Frozen_core_auto_freezes_the_oxygen_1s_and_a_bad_value_is_named()
    {
        // Common practice: the noble-gas core of each atom (O: [He], one orbital) is frozen.
        var (code, text, err) = Calc("-g", WaterFile, "-b", "6-31G", "-m", "mp2", "--frozen-core", "auto", "--json");
        Assert.True(code == 0, err);
        using var auto = JsonDocument.Parse(text);
        Assert.Equal(1, auto.RootElement.GetProperty("frozen_core").GetInt32());
        (code, text, err) = Calc("-g", WaterFile, "-b", "6-31G", "-m", "mp2", "--frozen-core", "1", "--json");
        using var one = JsonDocument.Parse(text);
        Assert.Equal(one.RootElement.GetProperty("correlation_energy").GetDouble(), auto.RootElement.GetProperty("correlation_energy").GetDouble(), 1e-12);

        (code, _, err) = Calc("-g", WaterFile, "-b", "6-31G", "-m", "mp2", "--frozen-core", "most");
        Assert.NotEqual(0, code);
        Assert.Contains("--frozen-core takes a number of orbitals or auto", err);
        Assert.DoesNotContain("   at ", err);
    }

    [Fact]
    public void Fci_and_cis_json_list_excitation_energies_and_oscillator_strengths()
    {
        string path = Path.Combine(Path.GetTempPath(), $"orbitarium-h2-{Guid.NewGuid():N}.xyz");
        File.WriteAllText(path, "2\nH2\nH 0 0 0\nH 0 0 0.74\n");
        try
        {
            var (code, text, err) = Calc("-g", path, "-b", "6-31G**", "-m", "fci", "--states", "4", "--json");
            Assert.True(code == 0, err);
            using var fci = JsonDocument.Parse(text);
            Assert.Equal(3, fci.RootElement.GetProperty("excitation_energies").GetArrayLength());
            Assert.Equal(3, fci.RootElement.GetProperty("oscillator_strengths").GetArrayLength());
            (code, text, err) = Calc("-g", path, "-b", "6-31G**", "-m", "eom-ccsd", "--states", "3", "--json");
            Assert.True(code == 0, err);
            using var eom = JsonDocument.Parse(text);
            // For two electrons EOM-CCSD singlets are FCI singlets (common practice): the lowest FCI excitation
            // above is a triplet, so it is not among them, but the lowest singlet is.
            var eomEnergies = eom.RootElement.GetProperty("excitation_energies");
            Assert.Equal(3, eomEnergies.GetArrayLength());
            Assert.Contains(fci.RootElement.GetProperty("excitation_energies").EnumerateArray(), e => Math.Abs(e.GetDouble() - eomEnergies[0].GetDouble()) < 1e-6);
            (code, text, err) = Calc("-g", path, "-b", "6-31G**", "-m", "cis", "--states", "2", "--json");
            Assert.True(code == 0, err);
            using var cis = JsonDocument.Parse(text);
            Assert.Equal(2, cis.RootElement.GetProperty("excitation_energies").GetArrayLength());
            Assert.True(cis.RootElement.GetProperty("excitation_energies")[0].GetDouble() > 0);
        }
        finally
        {
            File.Delete(path);
        }
    }

    [Fact]
    public void An_RHF_reference_for_an_open_shell_is_refused_with_the_remedy()
    {
        var (code, _, err) = Calc("-g", ScfTestSystems.Example("tg2-hydroxyl.xyz"), "-b", "STO-3G", "-m", "mp2", "--reference", "rhf");
        Assert.Equal(CalcCommand.InputError, code);
        Assert.Contains("--reference uhf", err);
    }
}
