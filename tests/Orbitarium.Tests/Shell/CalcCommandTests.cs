using System.Diagnostics;
using System.Text.Json;
using Orbitarium.Shell.Commands;
using Orbitarium.Tests.Scf;

namespace Orbitarium.Tests.Shell;

public class CalcCommandTests
{
    private static (int Code, string Out, string Err) Calc(params string[] args)
    {
        var output = new StringWriter();
        var error = new StringWriter();
        int code = CalcCommand.Invoke(args, output, error);
        return (code, output.ToString(), error.ToString());
    }

    private static string Example(string name) => ScfTestSystems.Example(name);

    [Fact]
    public void Water_RHF_json_has_every_contract_key_and_exit_code_0()
    {
        var (code, text, err) = Calc("--geometry", Example("tg1-water.xyz"), "--basis", "STO-3G", "--method", "rhf", "--json");
        Assert.True(code == 0, err);
        using var doc = JsonDocument.Parse(text);
        var root = doc.RootElement;
        foreach (var key in new[] { "method", "basis", "n_basis", "n_electrons", "charge", "multiplicity", "total_energy",
                     "nuclear_repulsion", "converged", "iterations", "orbital_energies", "mulliken_charges", "dipole_debye", "timings" })
            Assert.True(root.TryGetProperty(key, out _), $"missing key {key}");
        Assert.False(root.TryGetProperty("s_squared", out _));
        Assert.Equal("rhf", root.GetProperty("method").GetString());
        Assert.Equal(7, root.GetProperty("n_basis").GetInt32());
        Assert.Equal(10, root.GetProperty("n_electrons").GetInt32());
        Assert.True(root.GetProperty("converged").GetBoolean());
        Assert.Equal(7, root.GetProperty("orbital_energies").GetProperty("alpha").GetArrayLength());
        Assert.Equal(3, root.GetProperty("mulliken_charges").GetArrayLength());
        Assert.Equal(3, root.GetProperty("dipole_debye").GetArrayLength());
        Assert.InRange(root.GetProperty("total_energy").GetDouble(), -75.1, -74.9);
    }

    [Fact]
    public void Hydroxyl_UHF_json_reports_s_squared()
    {
        var (code, text, err) = Calc("-g", Example("tg2-hydroxyl.xyz"), "-b", "STO-3G", "-m", "uhf", "--json");
        Assert.True(code == 0, err);
        using var doc = JsonDocument.Parse(text);
        Assert.InRange(doc.RootElement.GetProperty("s_squared").GetDouble(), 0.75, 0.76);
        Assert.Equal(2, doc.RootElement.GetProperty("multiplicity").GetInt32());
    }

    [Fact]
    public void The_summary_shows_energy_convergence_orbitals_charges_and_dipole()
    {
        var (code, text, _) = Calc("--geometry", Example("tg1-water.xyz"), "--basis", "STO-3G", "--method", "rhf");
        Assert.Equal(0, code);
        foreach (var part in new[] { "Energy (hartree)", "SCF converged", "Orbitals", "Mulliken", "Dipole moment (debye" })
            Assert.Contains(part, text);
    }

    [Theory]
    [InlineData("missing.xyz", "STO-3G", "rhf", "Cannot read")]
    [InlineData("tg1-water.xyz", "no-such-basis", "rhf", "Unknown basis")]
    [InlineData("tg1-water.xyz", "STO-3G", "casino", "Unknown method")]
    [InlineData("tg2-hydroxyl.xyz", "STO-3G", "rhf", "UHF or ROHF")]
    public void Bad_input_prints_one_line_and_exits_with_code_2(string file, string basis, string method, string expected)
    {
        var (code, text, err) = Calc("--geometry", Example(file), "--basis", basis, "--method", method);
        Assert.Equal(2, code);
        Assert.Equal("", text);
        Assert.Contains(expected, err);
        Assert.Single(err.TrimEnd().Split('\n'));
    }

    [Fact]
    public void Impossible_multiplicity_and_unknown_options_exit_with_code_2()
    {
        Assert.Equal(2, Calc("-g", Example("tg1-water.xyz"), "-b", "STO-3G", "-m", "uhf", "--multiplicity", "2").Code);
        Assert.Equal(2, Calc("-g", Example("tg1-water.xyz"), "-b", "STO-3G", "-m", "rhf", "--frobnicate").Code);
        Assert.Equal(2, Calc("-g", Example("tg1-water.xyz"), "-b", "STO-3G").Code);
    }

    [Fact]
    public void Malformed_xyz_and_unknown_elements_exit_with_code_2()
    {
        string dir = Directory.CreateTempSubdirectory("orbitarium-calc").FullName;
        string bad = Path.Combine(dir, "bad.xyz"), alien = Path.Combine(dir, "alien.xyz"), close = Path.Combine(dir, "close.xyz");
        File.WriteAllText(bad, "2\nbroken\nO 0 0\nH 0 0 1\n");
        File.WriteAllText(alien, "1\nalien\nXq 0 0 0\n");
        File.WriteAllText(close, "2\nclose\nH 0 0 0\nH 0 0 0.01\n");
        foreach (var f in new[] { bad, alien, close })
        {
            var (code, _, err) = Calc("-g", f, "-b", "STO-3G", "-m", "rhf");
            Assert.Equal(2, code);
            Assert.Single(err.TrimEnd().Split('\n'));
        }
    }

    [Fact]
    public void A_basis_lacking_an_element_exits_with_code_2()
    {
        string dir = Directory.CreateTempSubdirectory("orbitarium-calc").FullName;
        string kr = Path.Combine(dir, "kr.xyz");
        File.WriteAllText(kr, "1\nkrypton\nKr 0 0 0\n");
        var (code, _, err) = Calc("-g", kr, "-b", "6-31G", "-m", "rhf");
        Assert.Equal(2, code);
        Assert.Contains("Kr", err);
    }

    [Fact]
    public void A_failed_SCF_exits_with_code_3_and_still_writes_the_flagged_result()
    {
        var (code, text, err) = Calc("-g", Example("tg1-water.xyz"), "-b", "STO-3G", "-m", "rhf", "--json", "--max-iterations", "2");
        Assert.Equal(3, code);
        using var doc = JsonDocument.Parse(text);
        Assert.False(doc.RootElement.GetProperty("converged").GetBoolean());
        Assert.Contains("did not converge", err);
    }

    [Fact]
    public void Output_to_a_file_is_written_whole()
    {
        string path = Path.Combine(Directory.CreateTempSubdirectory("orbitarium-calc").FullName, "water.json");
        var (code, text, _) = Calc("-g", Example("tg7-dihydrogen.xyz"), "-b", "STO-3G", "-m", "rhf", "--json", "--output", path);
        Assert.Equal(0, code);
        Assert.Equal("", text);
        using var doc = JsonDocument.Parse(File.ReadAllText(path));
        Assert.Equal(2, doc.RootElement.GetProperty("n_electrons").GetInt32());
        Assert.Single(Directory.GetFiles(Path.GetDirectoryName(path)!));
    }

    [Fact]
    public void The_built_executable_runs_calc_and_returns_the_exit_codes()
    {
        string dll = Path.Combine(AppContext.BaseDirectory, "orbitarium.dll");
        Assert.True(File.Exists(dll), dll);
        (int, string) Run(params string[] args)
        {
            var psi = new ProcessStartInfo("dotnet") { RedirectStandardOutput = true, RedirectStandardError = true };
            psi.ArgumentList.Add(dll);
            foreach (var a in args) psi.ArgumentList.Add(a);
            using var p = Process.Start(psi)!;
            string o = p.StandardOutput.ReadToEnd();
            p.StandardError.ReadToEnd();
            p.WaitForExit();
            return (p.ExitCode, o);
        }
        var (ok, json) = Run("calc", "--geometry", Example("tg7-dihydrogen.xyz"), "--basis", "STO-3G", "--method", "rhf", "--json");
        Assert.Equal(0, ok);
        using var doc = JsonDocument.Parse(json);
        Assert.True(doc.RootElement.GetProperty("converged").GetBoolean());
        Assert.Equal(2, Run("calc", "--geometry", Example("tg7-dihydrogen.xyz"), "--basis", "nope", "--method", "rhf").Item1);
    }
}
