using System.Text.Json;
using Orbitarium.Chemistry;
using Orbitarium.Shell.Commands;
using Orbitarium.Tests.Scf;

namespace Orbitarium.Tests.Geometry;

public class CalcGeometryTaskTests
{
    private static (int Code, string Out, string Err) Calc(params string[] args)
    {
        var output = new StringWriter();
        var error = new StringWriter();
        int code = CalcCommand.Invoke(args, output, error);
        return (code, output.ToString(), error.ToString());
    }

    private static string TempXyz() => Path.Combine(Path.GetTempPath(), $"orbitarium-geom-{Guid.NewGuid():N}.xyz");

    [Fact]
    public void Optimize_writes_the_geometry_and_reports_it_in_json()
    {
        // RHF/STO-3G H2: R_e = 0.712 Å (Hehre, Radom, Schleyer & Pople, Ab Initio Molecular Orbital Theory, 1986,
        // Table 6.1; from memory).
        string path = TempXyz();
        var (code, text, err) = Calc("-g", ScfTestSystems.Example("tg7-dihydrogen.xyz"), "-b", "STO-3G", "-m", "rhf",
            "--task", "optimize", "--json", "--output", path);
        Assert.True(code == 0, err);
        using var json = JsonDocument.Parse(text);
        var root = json.RootElement;
        Assert.Equal("optimize", root.GetProperty("task").GetString());
        Assert.Equal("analytic", root.GetProperty("gradient_source").GetString());
        Assert.True(root.GetProperty("optimization").GetProperty("converged").GetBoolean());
        var g = root.GetProperty("geometry");
        var a = g[0].EnumerateArray().Select(v => v.GetDouble()).ToArray();
        var b = g[1].EnumerateArray().Select(v => v.GetDouble()).ToArray();
        double r = Math.Sqrt(a.Zip(b, (p, q) => (p - q) * (p - q)).Sum());
        Assert.InRange(r, 0.710, 0.714);
        var written = Molecule.FromXyzFile(path);
        Assert.Equal(r, written.DistanceAngstrom(0, 1), 6);
        File.Delete(path);
    }

    [Fact]
    public void Kohn_sham_optimisation_uses_the_analytic_gradient()
    {
        // Wiring check: RKS methods now report analytic gradients (KohnShamGradient), and the optimiser converges with them.
        var (code, text, err) = Calc("-g", ScfTestSystems.Example("tg7-dihydrogen.xyz"), "-b", "STO-3G", "-m", "svwn5",
            "--task", "optimize", "--json");
        Assert.True(code == 0, err);
        using var json = JsonDocument.Parse(text);
        var root = json.RootElement;
        Assert.Equal("analytic", root.GetProperty("gradient_source").GetString());
        Assert.True(root.GetProperty("optimization").GetProperty("converged").GetBoolean());
    }

    [Fact]
    public void A_step_limit_gives_exit_code_3_and_still_writes_the_best_geometry()
    {
        string path = TempXyz();
        var (code, _, err) = Calc("-g", ScfTestSystems.Example("tg1-water.xyz"), "-b", "STO-3G", "-m", "rhf",
            "--task", "optimize", "--max-steps", "1", "--output", path);
        Assert.Equal(3, code);
        Assert.Contains("did not converge", err);
        Assert.Contains("NOT CONVERGED", File.ReadAllText(path));
        File.Delete(path);
    }

    [Fact]
    public void Frequencies_report_wavenumbers_and_thermochemistry()
    {
        var (code, text, err) = Calc("-g", ScfTestSystems.Example("tg7-dihydrogen.xyz"), "-b", "STO-3G", "-m", "rhf",
            "--task", "frequencies", "--json", "--temperature", "300");
        Assert.True(code == 0, err);
        using var json = JsonDocument.Parse(text);
        var root = json.RootElement;
        Assert.Equal(1, root.GetProperty("frequencies_cm1").GetArrayLength());
        var thermo = root.GetProperty("thermochemistry");
        Assert.Equal("D∞h", thermo.GetProperty("point_group").GetString());
        Assert.Equal(300, thermo.GetProperty("temperature_k").GetDouble());
        Assert.True(thermo.GetProperty("zero_point_energy").GetDouble() > 0);
    }

    [Fact]
    public void An_unknown_task_is_bad_input()
    {
        var (code, _, err) = Calc("-g", ScfTestSystems.Example("tg7-dihydrogen.xyz"), "-b", "STO-3G", "-m", "rhf", "--task", "dance");
        Assert.Equal(2, code);
        Assert.Contains("Unknown task", err);
    }
}
