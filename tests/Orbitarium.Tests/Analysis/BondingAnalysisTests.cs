using Orbitarium.Analysis;
using Orbitarium.Scf;

namespace Orbitarium.Tests.Analysis;

public class BondingAnalysisTests
{
    [Fact]
    public void Minimal_basis_H2_orbitals_have_the_textbook_overlap_populations()
    {
        // Szabo & Ostlund, Modern Quantum Chemistry, ch. 3: STO-3G H2 at 1.4 bohr has S12 = 0.6593, and the orbitals are
        // (φ1 ± φ2)/√(2(1 ± S)), so the per-electron overlap populations are +S/(1+S) and −S/(1−S).
        double s = 0.6593;
        var table = BondingAnalysis.OverlapPopulations(AnalysisSystems.DihydrogenRhfSto3g);
        var bonding = table.ForOrbital(0).Single();
        var antibonding = table.ForOrbital(1).Single();
        Assert.Equal(s / (1 + s), bonding.PerElectron, 3e-4);
        Assert.Equal(-s / (1 - s), antibonding.PerElectron, 2e-3);
        Assert.Equal(BondCharacter.Bonding, bonding.Character);
        Assert.Equal(BondCharacter.Antibonding, antibonding.Character);
        Assert.Equal(2 * s / (1 + s), table.Total(0, 1), 1e-3);
    }

    [Fact]
    public void Unrestricted_results_give_alpha_and_beta_rows()
    {
        var oh = Orbitarium.Chemistry.Molecule.FromXyzFile(Path.Combine(RepoRoot(), "examples", "tg2-hydroxyl.xyz"));
        var r = oh.WithBasis("STO-3G").RunUhf();
        var table = BondingAnalysis.OverlapPopulations(r);
        Assert.Contains(table.Entries, e => e.SpinLabel == "α");
        Assert.Contains(table.Entries, e => e.SpinLabel == "β");
        // OH has one more α than β electron (doublet); the occupations show it.
        Assert.Equal(r.Molecule.AlphaElectronCount - r.Molecule.BetaElectronCount,
            (int)Math.Round(table.Entries.Where(e => e.SpinLabel == "α").Sum(e => e.Occupation) - table.Entries.Where(e => e.SpinLabel == "β").Sum(e => e.Occupation)));
    }

    internal static string RepoRoot()
    {
        var dir = new DirectoryInfo(AppContext.BaseDirectory);
        while (dir is not null && !File.Exists(Path.Combine(dir.FullName, "Repl.sln"))) dir = dir.Parent;
        return dir?.FullName ?? throw new InvalidOperationException("Repository root not found.");
    }
}
