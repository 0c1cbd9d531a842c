using Orbitarium.Analysis;
using Orbitarium.Chemistry;
using Orbitarium.Scf;

namespace Orbitarium.Tests.Analysis;

public class FieldEvaluatorTests
{
    // A uniform grid sums smooth Gaussians almost exactly (the trapezoid rule converges like exp(−π²/(a h²)),
    // common practice): with 0.1 Å spacing the sharpest cc-pVDZ hydrogen product (exponent 26 bohr⁻²) is summed to
    // about 2e-5, and 4 Å margins leave a tail below 1e-5 of the most diffuse one (exponent 0.24 bohr⁻²).
    internal static BoxGrid FineBox(Molecule m) => BoxGrid.AroundMolecule(m, marginAngstrom: 4.0, spacingAngstrom: 0.1);

    [Fact]
    public void An_occupied_orbital_integrates_to_norm_one_on_a_fine_grid()
    {
        var r = AnalysisSystems.DihydrogenRhfCcPvdz;
        var psi = ScfFields.Orbital(r, 0, FineBox(r.Molecule));
        var squared = new GridField(psi.Grid, psi.Molecule, [.. psi.ToArray().Select(v => v * v)], "ψ²", "bohr^-3", false);
        // Orthonormal MOs (common practice): ∫|ψ|² = 1; tolerance 1e-4 from the issue.
        Assert.Equal(1.0, squared.IntegrateOverBox(), 1e-4);
    }

    [Fact]
    public void The_total_density_integrates_to_the_electron_count()
    {
        var r = AnalysisSystems.DihydrogenRhfCcPvdz;
        Assert.Equal(2.0, ScfFields.Density(r, FineBox(r.Molecule)).IntegrateOverBox(), 1e-4);
    }

    [Fact]
    public void The_spin_density_of_a_hydrogen_atom_integrates_to_one_unpaired_electron()
    {
        var h = Molecule.Empty.AddAtom("H", 0, 0, 0).WithBasis("cc-pVDZ").RunUhf();
        var spin = ScfFields.SpinDensity(h, FineBox(h.Molecule));
        // One unpaired electron (common practice): ∫(ρα − ρβ) = Nα − Nβ = 1.
        Assert.Equal(1.0, spin.IntegrateOverBox(), 1e-4);
        Assert.True(spin.IsSigned);
    }

    [Fact]
    public void The_interference_part_integrates_to_the_orbital_overlap_population()
    {
        // Independent identity: ∫ 2 ψ_A ψ_B = 2 Σ_{μ∈A,ν∈B} c_μ c_ν S_μν, Mulliken's overlap population of the orbital
        // (Mulliken, J. Chem. Phys. 23, 1833 (1955)). Tolerance 1e-4: the grid sum of smooth Gaussians.
        var r = AnalysisSystems.DihydrogenRhfCcPvdz;
        var field = ScfFields.OrbitalInterference(r, 0, 0, 1, FineBox(r.Molecule));
        var table = BondingAnalysis.OverlapPopulations(r);
        Assert.Equal(table.ForOrbital(0)[0].Population, field.IntegrateOverBox(), 1e-4);
        Assert.True(table.ForOrbital(0)[0].Population > 0.5);
    }

    [Fact]
    public void An_unknown_orbital_index_is_refused_with_the_valid_range()
    {
        var r = AnalysisSystems.DihydrogenRhfSto3g;
        var line = LineGrid.AlongBond(r.Molecule, 0, 1);
        var e = Assert.Throws<OrbitariumInputException>(() => ScfFields.Orbital(r, 7, line));
        Assert.Contains("0..1", e.Message);
    }
}
