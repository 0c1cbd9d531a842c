using Orbitarium.BasisSets;
using Orbitarium.Chemistry;
using Orbitarium.Scf;
using static Orbitarium.Tests.Scf.ScfTestSystems;

namespace Orbitarium.Tests.Scf;

public class ReferenceEnergyTests
{
    [Fact]
    public void H2_STO3G_at_1_4_bohr_matches_the_textbook_RHF_energy()
    {
        // Szabo & Ostlund, Modern Quantum Chemistry, ch. 3: −1.1167 Eh printed; −1.1167143 with exactly normalised
        // contractions of the published STO-3G fit (ζ = 1.24) — confirmed in /work/shared/REFERENCES.md.
        var basis = BasisSet.Create("STO-3G (ζ 1.24)", false).WithElement("H", PublishedSto3G1s(1.24));
        var result = H2().WithBasis(basis).RunRhf();
        Assert.True(result.Converged);
        Assert.Equal(-1.1167143, result.TotalEnergyHartree, 6e-8);
        Assert.Equal(-1.1167, result.TotalEnergyHartree, 5e-5);
    }

    [Fact]
    public void HeH_cation_with_generated_STO3G_fits_matches_the_exactly_normalised_value()
    {
        // Szabo & Ostlund, ch. 3: HeH+ at R = 1.4632 bohr with STO-3G fits, ζ(He) = 2.0925, ζ(H) = 1.24.
        // The book prints −2.860662 Eh: its program sets the diagonal overlaps to exactly 1, although the printed
        // six-digit contraction coefficients do not normalise the contracted functions exactly. With the contractions
        // normalised exactly (as Orbitarium always does) the value is −2.8606587 Eh (REFERENCES.md). The shells come
        // from Orbitarium's STO-nG generator, whose least-squares fit reproduces the published one to its printed digits.
        var basis = BasisSet.Create("STO-3G (ζ He 2.0925, H 1.24)", false)
            .WithElement("He", StoNGBasis.ShellsFor("1s", 2.0925, 3))
            .WithElement("H", StoNGBasis.ShellsFor("1s", 1.24, 3));
        var heh = Molecule.Empty.AddAtom("He", 0, 0, 0, LengthUnit.Bohr).AddAtom("H", 0, 0, 1.4632, LengthUnit.Bohr).WithCharge(1);
        var result = heh.WithBasis(basis).RunRhf();
        Assert.True(result.Converged);
        Assert.Equal(-2.8606587, result.TotalEnergyHartree, 2e-6);
        Assert.NotEqual(-2.860662, Math.Round(result.TotalEnergyHartree, 6));
    }

    [Fact]
    public void Hydrogen_atom_UHF_STO3G_gives_the_minimal_basis_energy_and_a_pure_doublet()
    {
        // −0.4665819 Eh: ⟨1s|h|1s⟩ of the published STO-3G (ζ = 1.24) hydrogen function (Hehre, Stewart & Pople 1969;
        // Szabo & Ostlund ch. 3 use the same function). One electron: ⟨S²⟩ = ½(½+1) = 0.75 exactly.
        var h = Molecule.Empty.AddAtom("H", 0, 0, 0);
        var result = h.WithBasis(BasisSetLibrary.Get("STO-3G")).RunUhf();
        Assert.True(result.Converged);
        Assert.Equal(-0.4665819, result.TotalEnergyHartree, 2e-7);
        Assert.Equal(0.75, result.SpinSquared, 12);
    }

    [Fact]
    public void Water_STO3G_at_the_textbook_geometry_matches_the_published_RHF_energy()
    {
        // Szabo & Ostlund, Modern Quantum Chemistry, Table 3.13 (from memory): H2O, R = 1.809 bohr, 104.52°,
        // STO-3G −74.963 Eh (printed to 1 mEh; the generated STO-3G fit differs from the published one in the 6th digit).
        var result = Water().WithBasis(BasisSetLibrary.Get("STO-3G")).RunRhf();
        Assert.True(result.Converged);
        Assert.Equal(-74.963, result.TotalEnergyHartree, 1e-3);
    }

    [Fact]
    public void Water_6_31G_star_star_at_the_textbook_geometry_matches_the_published_RHF_energy()
    {
        // Szabo & Ostlund, Table 3.13 (from memory): H2O 6-31G** −76.023 Eh at R = 1.809 bohr, 104.52°
        // (the book's 6-31G* and 6-31G** sets use six Cartesian d functions).
        var result = Water().WithBasis(BasisSetLibrary.Get("6-31G**"), pure: false).RunRhf();
        Assert.True(result.Converged);
        Assert.Equal(-76.023, result.TotalEnergyHartree, 1.5e-3);
    }
}
