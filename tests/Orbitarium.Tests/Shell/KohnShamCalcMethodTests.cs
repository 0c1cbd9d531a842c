using System.Text.Json;
using Orbitarium.Shell.Commands;
using Orbitarium.Tests.Scf;

namespace Orbitarium.Tests.Shell;

public class KohnShamCalcMethodTests
{
    private static (int Code, string Out, string Err) Calc(params string[] args)
    {
        var output = new StringWriter();
        var error = new StringWriter();
        int code = CalcCommand.Invoke(args, output, error);
        return (code, output.ToString(), error.ToString());
    }

    [Fact]
    public void Given_a_functional_as_the_method_when_run_with_a_grid_level_then_the_json_reports_the_dft_keys()
    {
        var (code, text, err) = Calc("-g", ScfTestSystems.Example("tg1-water.xyz"), "-b", "STO-3G", "-m", "svwn5", "--grid", "coarse", "--json");
        Assert.True(code == 0, err);
        using var doc = JsonDocument.Parse(text);
        var root = doc.RootElement;
        Assert.Equal("svwn5", root.GetProperty("method").GetString());
        Assert.Equal("coarse", root.GetProperty("grid_level").GetString());
        Assert.True(root.GetProperty("grid_points").GetInt32() > 1000);
        Assert.True(root.GetProperty("exchange_correlation_energy").GetDouble() < 0);
        Assert.InRange(root.GetProperty("integrated_electrons").GetDouble(), 9.99, 10.01);
        Assert.Equal(0.0, root.GetProperty("exact_exchange_fraction").GetDouble());
    }

    [Fact]
    public void An_oscillating_radical_converges_with_a_level_shift_and_says_how()
    {
        // NO (²Π) in SVWN5/6-31G*: the half-filled π* pair makes plain DIIS oscillate (|FDS − SDF| ~1e-2 after
        // 128 iterations without a shift); a 0.2 Eh level shift (Saunders & Hillier 1973) damps it, whether asked for
        // or switched on automatically after 30 iterations. Stopped before that, the run fails with the advice.
        string xyz = Path.Combine(Path.GetTempPath(), $"orbitarium-no-{Guid.NewGuid():N}.xyz");
        File.WriteAllText(xyz, "2\nnitric oxide\nN 0 0 0\nO 0 0 1.15\n");
        try
        {
            var (code, _, err) = Calc("-g", xyz, "-b", "6-31G*", "-m", "svwn5", "--max-iterations", "25");
            Assert.Equal(3, code);
            Assert.Contains("--level-shift", err);
            var (shifted, text, err2) = Calc("-g", xyz, "-b", "6-31G*", "-m", "svwn5", "--level-shift", "0.2", "--json");
            Assert.True(shifted == 0, err2);
            var (automatic, autoText, err4) = Calc("-g", xyz, "-b", "6-31G*", "-m", "svwn5", "--json");
            Assert.True(automatic == 0, err4);
            using var asked = JsonDocument.Parse(text);
            using var auto = JsonDocument.Parse(autoText);
            // Same solution either way (a level shift changes the path, not the fixed point); 1e-8 Eh covers the
            // SCF thresholds.
            Assert.Equal(asked.RootElement.GetProperty("total_energy").GetDouble(), auto.RootElement.GetProperty("total_energy").GetDouble(), 1e-8);
            Assert.Equal(30, auto.RootElement.GetProperty("automatic_level_shift_iteration").GetInt32());
            Assert.Equal(JsonValueKind.Null, asked.RootElement.GetProperty("automatic_level_shift_iteration").ValueKind);
            var (bad, _, err3) = Calc("-g", xyz, "-b", "6-31G*", "-m", "svwn5", "--level-shift", "-1");
            Assert.Equal(2, bad);
            Assert.Contains("--level-shift", err3);
        }
        finally { File.Delete(xyz); }
    }

    [Fact]
    public void Given_an_unknown_grid_level_when_run_then_exit_code_2_names_the_levels()
    {
        var (code, _, err) = Calc("-g", ScfTestSystems.Example("tg1-water.xyz"), "-b", "STO-3G", "-m", "pbe", "--grid", "huge");
        Assert.Equal(2, code);
        Assert.Contains("veryfine", err);
    }
}
