using Orbitarium.Correlation;

namespace Orbitarium.Tests.Correlation;

public class CcsdTests
{
    public class Compute
    {
        [Fact]
        public void Equals_full_CI_for_minimal_basis_H2()
        {
            // CCSD is exact for two electrons (property of the method: T1 + T2 span every excitation; e.g.
            // Crawford & Schaefer, Rev. Comput. Chem. 14, 33 (2000)). Same integrals on both sides, so round-off only.
            var h = TestHamiltonians.H2();
            var cc = Ccsd.Compute(h, CorrelationOptions.Default.WithThresholds(1e-12, 1e-10));
            Assert.True(cc.Converged, cc.StopReason);
            Assert.Equal(FullCi.Compute(h).TotalEnergyHartree, cc.TotalEnergyHartree, 1e-9);
        }

        [Theory]
        [InlineData(6, 21)]
        [InlineData(8, 22)]
        public void Equals_full_CI_for_two_electrons_in_more_orbitals_even_with_a_non_canonical_reference(int m, int seed)
        {
            // Same property; the random Hamiltonian's Fock matrix has off-diagonal elements, which the
            // Stanton–Gauss equations keep.
            var h = TestHamiltonians.Random(m, 1, 1, seed);
            var cc = Ccsd.Compute(h, CorrelationOptions.Default.WithThresholds(1e-12, 1e-10));
            Assert.True(cc.Converged, cc.StopReason);
            Assert.Equal(FullCi.Compute(h).TotalEnergyHartree, cc.TotalEnergyHartree, 1e-8);
        }

        [Fact]
        public void Has_no_triples_correction_for_two_electrons()
        {
            // (T) needs three electrons (definition of the correction).
            var cc = Ccsd.ComputeWithTriples(TestHamiltonians.H2());
            Assert.Equal(0.0, cc.TriplesCorrectionHartree!.Value);
            Assert.Equal("CCSD(T)", cc.Method);
        }

        [Fact]
        public void Starts_from_the_MP2_energy()
        {
            // The first-order amplitudes give the MP2 energy (common practice; Stanton et al. 1991).
            // Orbital energies taken from the Fock matrix of the same integrals, so both use identical denominators.
            var h = TestHamiltonians.Random(6, 2, 2, 5);
            Assert.Equal(Mp2.Compute(h).CorrelationEnergyHartree, Ccsd.Compute(h).Mp2CorrelationEnergyHartree, 1e-12);
        }

        [Fact]
        public void Flags_non_convergence_with_the_reason_instead_of_hiding_it()
        {
            var h = TestHamiltonians.Random(6, 2, 2, 3);
            var cc = Ccsd.Compute(h, CorrelationOptions.Default.WithMaxIterations(2));
            Assert.False(cc.Converged);
            Assert.Contains("limit of 2 iterations", cc.StopReason);
            Assert.Contains("NOT CONVERGED", cc.ToString());
            Assert.Equal(2, cc.EnergyHistoryHartree.Length);
        }

        [Fact]
        public void Refuses_a_restricted_open_shell_and_suggests_a_UHF_reference()
        {
            var h = TestHamiltonians.Random(5, 2, 1, 4);
            var e = Assert.Throws<OrbitariumInputException>(() => Ccsd.Compute(h));
            Assert.Contains("UHF", e.Message);
        }

        [Fact]
        public void Refuses_a_problem_beyond_the_memory_budget_before_allocating()
        {
            var h = TestHamiltonians.Random(8, 2, 2, 4);
            // The closed-shell solver copies the 8⁴ integrals (32 KiB) before anything else: 0.01 MiB cannot hold them.
            var e = Assert.Throws<OrbitariumInputException>(() => Ccsd.Compute(h, CorrelationOptions.Default.WithMemoryBudgetMebibytes(0.01)));
            Assert.Contains("would need about", e.Message);
            Assert.Contains("budget", e.Message);
        }

        [Fact]
        public void Of_a_closed_shell_is_the_same_on_restricted_and_unrestricted_views()
        {
            // Spin-orbital CCSD does not depend on how the same orbitals are stored (common practice).
            var h = TestHamiltonians.Random(6, 2, 2, 9);
            var r = Ccsd.ComputeWithTriples(h, CorrelationOptions.Default.WithThresholds(1e-11, 1e-9));
            var u = Ccsd.ComputeWithTriples(h.AsUnrestricted(), CorrelationOptions.Default.WithThresholds(1e-11, 1e-9));
            Assert.Equal(r.TotalEnergyHartree, u.TotalEnergyHartree, 1e-9);
            Assert.Equal("UHF", u.ReferenceKind);
        }
    }
}
