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
    public void Given_an_unknown_grid_level_when_run_then_exit_code_2_names_the_levels()
    {
        var (code, _, err) = Calc("-g", ScfTestSystems.Example("tg1-water.xyz"), "-b", "STO-3G", "-m", "pbe", "--grid", "huge");
        Assert.Equal(2, code);
        Assert.Contains("veryfine", err);
    }
}
