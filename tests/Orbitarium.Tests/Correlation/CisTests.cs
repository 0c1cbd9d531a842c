using Orbitarium.Correlation;

namespace Orbitarium.Tests.Correlation;

public class CisTests
{
    private static (double Gap, double J, double K, double Mu) H2Parts(MolecularOrbitalHamiltonian h)
    {
        var f = h.FockMatrix(false);
        var g = h.RepulsionAlphaAlpha;
        return (f[3] - f[0], g[3], g[5], 0.7 / Math.Sqrt(1 - TestHamiltonians.S12 * TestHamiltonians.S12));
    }

    public class Singlets
    {
        [Fact]
        public void Of_minimal_basis_H2_are_the_closed_form_of_the_two_by_two_problem()
        {
            // The two singly excited determinants 1α→2α and 1β→2β give the 2×2 matrix [[Δ − J + K, K], [K, Δ − J + K]]
            // with eigenvalues Δ − J + 2K (singlet) and Δ − J (triplet) (Szabo & Ostlund ch. 2 and §4.2, common practice).
            var h = TestHamiltonians.H2();
            var (gap, j, k, mu) = H2Parts(h);
            var s = Cis.Singlets(h, 1);
            Assert.Equal(gap - j + 2 * k, s.ExcitationEnergiesHartree[0], 1e-12);
            // f = ⅔ ω |√2 ⟨1|z|2⟩|² with |⟨1|z|2⟩| = (R/2)/√(1 − S²) for the symmetric/antisymmetric pair (common practice).
            Assert.Equal(2.0 / 3.0 * s.ExcitationEnergiesHartree[0] * 2 * mu * mu, s.OscillatorStrengths[0], 1e-10);
            // With the printed MO values (Szabo & Ostlund §3.5.2, from memory): Δ = 1.2485, J12 = 0.6636, K12 = 0.1813.
            Assert.Equal(1.2485 - 0.6636 + 2 * 0.1813, s.ExcitationEnergiesHartree[0], 5e-4);
        }
    }

    public class Triplets
    {
        [Fact]
        public void Of_minimal_basis_H2_are_the_gap_minus_the_Coulomb_integral_and_dark()
        {
            var h = TestHamiltonians.H2();
            var (gap, j, _, _) = H2Parts(h);
            var t = Cis.Triplets(h, 1);
            Assert.Equal(gap - j, t.ExcitationEnergiesHartree[0], 1e-12);
            Assert.Equal(0.0, t.OscillatorStrengths[0], 1e-14);
        }
    }

    public class Unrestricted
    {
        [Fact]
        public void On_a_closed_shell_holds_the_singlets_and_triplets_together()
        {
            // Spin-orbital CIS of a closed shell is the union of the singlet and triplet manifolds (common practice).
            var h = TestHamiltonians.Random(5, 2, 2, 41);
            var u = Cis.Unrestricted(h.AsUnrestricted(), 12);
            var both = Cis.Singlets(h, 6).ExcitationEnergiesHartree.Concat(Cis.Triplets(h, 6).ExcitationEnergiesHartree).Order().ToArray();
            Assert.Equal(12, u.ExcitationEnergiesHartree.Length);
            for (int n = 0; n < 12; n++) Assert.Equal(both[n], u.ExcitationEnergiesHartree[n], 1e-10);
        }

        [Fact]
        public void Spin_adapted_forms_refuse_an_open_shell_and_point_to_the_unrestricted_one()
        {
            var e = Assert.Throws<OrbitariumInputException>(() => Cis.Singlets(TestHamiltonians.Random(5, 2, 1, 1)));
            Assert.Contains("unrestricted", e.Message);
        }
    }

    public class RandomPhase
    {
        [Fact]
        public void Of_minimal_basis_H2_is_the_one_by_one_closed_form()
        {
            // One excitation: ω = √((A − B)(A + B)) with A = Δ − J + 2K, B = K for the singlet and A = Δ − J, B = −K
            // for the triplet (RPA equations, Rowe, Rev. Mod. Phys. 40, 153 (1968); common practice).
            var h = TestHamiltonians.H2();
            var (gap, j, k, _) = H2Parts(h);
            double a = gap - j + 2 * k, b = k;
            Assert.Equal(Math.Sqrt((a - b) * (a + b)), Rpa.Singlets(h, 1).ExcitationEnergiesHartree[0], 1e-12);
            double at = gap - j, bt = -k;
            Assert.Equal(Math.Sqrt((at - bt) * (at + bt)), Rpa.Triplets(h, 1).ExcitationEnergiesHartree[0], 1e-12);
        }

        [Fact]
        public void Lies_below_CIS_for_every_singlet()
        {
            // RPA roots are below the CIS (Tamm–Dancoff) roots for a stable reference (common practice).
            var h = TestHamiltonians.Random(6, 2, 2, 17);
            var cis = Cis.Singlets(h, 4).ExcitationEnergiesHartree;
            var rpa = Rpa.Singlets(h, 4).ExcitationEnergiesHartree;
            for (int n = 0; n < 4; n++) Assert.True(rpa[n] <= cis[n] + 1e-12);
        }
    }
}
