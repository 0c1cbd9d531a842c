using Orbitarium.BasisSets;
using Orbitarium.Chemistry;
using Orbitarium.Correlation;
using Orbitarium.Scf;
using static Orbitarium.Tests.Scf.ScfTestSystems;

namespace Orbitarium.Tests.Correlation;

public class ScfResultCorrelationTests
{
    private static readonly CorrelationOptions Tight = CorrelationOptions.Default.WithThresholds(1e-11, 1e-9);

    private static ScfResult H2Published() =>
        H2().WithBasis(BasisSet.Create("STO-3G (ζ 1.24)", false).WithElement("H", PublishedSto3G1s(1.24))).RunRhf();

    public class FullCiOnResults
    {
        [Fact]
        public void Of_H2_STO3G_at_1_4_bohr_is_the_textbook_value()
        {
            // Szabo & Ostlund ch. 4: −1.1373 Eh printed, −1.1372759 recomputed with exactly normalised contractions
            // (REFERENCES.md). Tolerance: 1e-7 (last recomputed digit).
            var fci = H2Published().Fci();
            Assert.Equal(-1.1372759, fci.TotalEnergyHartree, 1e-7);
        }

        [Fact]
        public void Of_the_lithium_atom_is_a_pure_doublet()
        {
            // UHF orbitals, S_z = ½: FCI roots are spin eigenfunctions, ⟨S²⟩ = ¾ for a doublet (common practice).
            var fci = Molecule.Empty.AddAtom("Li", 0, 0, 0).WithBasis("STO-3G").RunUhf().Fci(2);
            Assert.Equal(0.75, fci.SpinSquared[0], 1e-8);
        }
    }

    public class CcsdOnResults
    {
        [Theory]
        [InlineData("6-31G**")]
        [InlineData("cc-pVDZ")]
        public void Equals_full_CI_for_H2_in_a_polarised_basis(string basis)
        {
            // CCSD is exact for two electrons (property of the method), here with 10 basis functions.
            var rhf = H2().WithBasis(basis).RunRhf();
            var cc = rhf.Ccsd(Tight);
            Assert.True(cc.Converged, cc.StopReason);
            Assert.Equal(rhf.Fci().TotalEnergyHartree, cc.TotalEnergyHartree, 1e-8);
        }
    }

    public class WaterMinimalBasis
    {
        // Water/STO-3G at the textbook geometry (R(OH) = 1.809 bohr, 104.52°; Szabo & Ostlund ch. 3).
        private static readonly Lazy<(ScfResult Rhf, MolecularOrbitalHamiltonian H)> System = new(() =>
        {
            var rhf = Water().WithBasis("STO-3G").RunRhf();
            return (rhf, rhf.ToMolecularOrbitalHamiltonian());
        });

        [Fact]
        public void Energies_are_ordered_full_CI_below_CCSD_T_below_CCSD_below_MP2()
        {
            // No published worked example at hand for this basis and geometry, so internal consistency: near
            // equilibrium FCI ≤ CCSD(T) ≤ CCSD ≤ MP2 (common practice), and (T) moves CCSD towards FCI.
            var h = System.Value.H;
            var mp2 = Mp2.Compute(h).TotalEnergyHartree;
            var cc = global::Orbitarium.Correlation.Ccsd.ComputeWithTriples(h, Tight);
            var fci = FullCi.Compute(h).TotalEnergyHartree;
            Assert.True(fci < cc.TotalEnergyHartree && cc.TotalEnergyHartree < cc.CcsdTotalEnergyHartree && cc.CcsdTotalEnergyHartree < mp2,
                $"FCI {fci}, CCSD(T) {cc.TotalEnergyHartree}, CCSD {cc.CcsdTotalEnergyHartree}, MP2 {mp2}");
            Assert.True(Math.Abs(cc.TotalEnergyHartree - fci) < Math.Abs(cc.CcsdTotalEnergyHartree - fci));
            // CCSD recovers well over 99 % of the FCI correlation energy of water in a minimal basis (common practice).
            Assert.True(cc.CcsdCorrelationEnergyHartree / (fci - h.ReferenceEnergyHartree) > 0.99);
        }

        [Fact]
        public void Mp2_from_the_result_transforms_only_ovov_and_agrees_with_the_full_transformation()
        {
            // Two routes through the quarter-transformations: (ia|jb) only, and all (pq|rs) (consistency).
            Assert.Equal(Mp2.Compute(System.Value.H).CorrelationEnergyHartree, System.Value.Rhf.Mp2().CorrelationEnergyHartree, 1e-11);
        }

        [Fact]
        public void Unrestricted_MP2_on_the_closed_shell_equals_restricted_MP2()
        {
            // UHF collapses to RHF for closed-shell water near equilibrium, and UHF-MP2 then equals RHF-MP2 (common practice).
            var uhf = Water().WithBasis("STO-3G").RunUhf();
            Assert.Equal(System.Value.Rhf.Mp2().CorrelationEnergyHartree, uhf.Mp2().CorrelationEnergyHartree, 1e-7);
        }

        [Fact]
        public void Frozen_core_full_CI_stays_above_the_all_electron_value_and_close_to_it()
        {
            // Freezing O 1s removes its (small) correlation: variational, so higher; the core–valence part of water in
            // a minimal basis is below 1 mEh (common practice).
            var h = System.Value.H;
            var all = FullCi.Compute(h).TotalEnergyHartree;
            var frozen = FullCi.Compute(h, 1, CorrelationOptions.Default.WithFrozenCore(1)).TotalEnergyHartree;
            Assert.InRange(frozen - all, 0, 1e-3);
        }
    }

    public class SizeConsistency
    {
        [Fact]
        public void Mp2_and_CCSD_of_two_H2_100_angstrom_apart_are_twice_the_monomer()
        {
            // Size consistency (Szabo & Ostlund §4.6): fragments 100 Å apart interact by ~1e-12 Eh (quadrupole–quadrupole ∝ R⁻⁵).
            var h2 = H2();
            var dimer = h2.CombinedWith(h2.TranslatedAngstrom(100, 0, 0));
            var mono = h2.WithBasis("6-31G**").RunRhf();
            var pair = dimer.WithBasis("6-31G**").RunRhf();
            Assert.Equal(2 * mono.Mp2().CorrelationEnergyHartree, pair.Mp2().CorrelationEnergyHartree, 1e-9);
            Assert.Equal(2 * mono.Ccsd(Tight).CorrelationEnergyHartree, pair.Ccsd(Tight).CorrelationEnergyHartree, 1e-8);
        }

        [Fact]
        public void Cisd_of_two_H2_100_angstrom_apart_is_not_twice_the_monomer()
        {
            // Truncated CI is not size consistent (Szabo & Ostlund §4.6): the dimer misses the product of the two
            // monomers' double excitations; full CI has no such defect.
            var h2 = H2();
            var dimer = h2.CombinedWith(h2.TranslatedAngstrom(100, 0, 0));
            var mono = h2.WithBasis("STO-3G").RunRhf();
            var pair = dimer.WithBasis("STO-3G").RunRhf();
            Assert.True(pair.Cisd().TotalEnergyHartree - 2 * mono.Cisd().TotalEnergyHartree > 1e-4);
            Assert.Equal(2 * mono.Fci().TotalEnergyHartree, pair.Fci().TotalEnergyHartree, 1e-9);
        }
    }

    public class ExcitedStates
    {
        [Fact]
        public void Rpa_oscillator_strengths_of_H2_approach_the_Thomas_Reiche_Kuhn_sum_as_the_basis_grows()
        {
            // TRK sum rule: Σ_n f_0n = N = 2 for the exact spectrum; RPA obeys it in the complete-basis limit
            // (Harris, J. Chem. Phys. 50, 3947 (1969); common practice). Observed (length gauge, all RPA singlets):
            // STO-3G 0.885, 6-31G** 2.355, cc-pVTZ 2.168 — far below in a minimal basis, overshooting with a small
            // polarised basis, and closing in on 2 with the larger one.
            double Sum(string basis) => H2().WithBasis(basis).RunRhf().Rpa(1000).OscillatorStrengthSum;
            double minimal = Sum("STO-3G"), small = Sum("6-31G**"), large = Sum("cc-pVTZ");
            Assert.True(Math.Abs(large - 2) < Math.Abs(small - 2) && Math.Abs(large - 2) < Math.Abs(minimal - 2),
                $"Σf: STO-3G {minimal}, 6-31G** {small}, cc-pVTZ {large}");
        }

        [Fact]
        public void Unrestricted_CIS_runs_on_the_hydroxyl_radical_and_triplets_are_dark()
        {
            var oh = Hydroxyl().WithBasis("STO-3G").RunUhf();
            var cis = oh.Cis(3);
            Assert.Equal("unrestricted", cis.Manifold);
            Assert.Equal(3, cis.ExcitationEnergiesHartree.Length);
            var triplets = Water().WithBasis("STO-3G").RunRhf().Cis(3, triplets: true);
            Assert.All(triplets.OscillatorStrengths, f => Assert.Equal(0.0, f));
        }
    }

    public class BadInput
    {
        [Fact]
        public void Mp2_on_an_ROHF_reference_suggests_the_UHF_reference()
        {
            var rohf = Hydroxyl().WithBasis("STO-3G").RunRohf();
            var e = Assert.Throws<OrbitariumInputException>(() => rohf.Mp2());
            Assert.Contains("RunUhf", e.Message);
        }

        [Fact]
        public void Full_CI_beyond_the_memory_budget_is_refused_before_any_integral_with_both_sizes()
        {
            // Water/cc-pVDZ: 24 orbitals, 10 electrons → 42504² ≈ 1.8e9 determinants.
            var e = Assert.Throws<OrbitariumInputException>(() => Water().WithBasis("cc-pVDZ").RunRhf().Fci());
            Assert.Contains("would need about", e.Message);
            Assert.Contains("budget of 2.0 GiB", e.Message);
        }
    }
}
