using Orbitarium.Correlation;

namespace Orbitarium.Tests.Correlation;

public class Mp2Tests
{
    public class Compute
    {
        [Fact]
        public void Of_minimal_basis_H2_is_the_closed_form_K12_squared_over_twice_the_gap()
        {
            // Szabo & Ostlund §6.4: E(2) = K12² / (2(ε1 − ε2)); with the printed K12 = 0.1813, ε1 = −0.5782, ε2 = 0.6703
            // (from memory) that is −0.0132 Eh. Tolerance covers the four-decimal inputs.
            var mp2 = Mp2.Compute(TestHamiltonians.H2());
            double k = TestHamiltonians.K12;
            double closed = k * k / (2 * (TestHamiltonians.Epsilon1 - TestHamiltonians.Epsilon2));
            Assert.Equal(closed, mp2.CorrelationEnergyHartree, 2e-4);
            // Two electrons in one orbital have no same-spin pair.
            Assert.Equal(0.0, mp2.SameSpinEnergyHartree, 1e-14);
        }

        [Fact]
        public void Unrestricted_equals_restricted_on_a_closed_shell()
        {
            // UHF-MP2 formulas reduce to RHF-MP2 for identical α and β orbitals (common practice).
            var h = TestHamiltonians.Random(7, 3, 3, 31);
            var r = Mp2.Compute(h);
            var u = Mp2.Compute(h.AsUnrestricted());
            Assert.Equal(r.CorrelationEnergyHartree, u.CorrelationEnergyHartree, 1e-12);
            Assert.Equal(r.SameSpinEnergyHartree, u.SameSpinEnergyHartree, 1e-12);
            Assert.Equal(r.OppositeSpinEnergyHartree, u.OppositeSpinEnergyHartree, 1e-12);
            Assert.Equal("UHF", u.ReferenceKind);
        }

        [Fact]
        public void Scales_the_spin_components_with_the_published_factors_by_default()
        {
            // Grimme, J. Chem. Phys. 118, 9095 (2003): SCS-MP2 uses 6/5 (opposite spin) and 1/3 (same spin).
            var r = Mp2.Compute(TestHamiltonians.Random(6, 2, 2, 8));
            Assert.Equal(1.2 * r.OppositeSpinEnergyHartree + r.SameSpinEnergyHartree / 3, r.ScaledCorrelationEnergyHartree(), 1e-14);
        }

        [Fact]
        public void Reports_its_energy_through_progress()
        {
            var reports = new List<CorrelationProgress>();
            var r = Mp2.Compute(TestHamiltonians.H2(), null, new SyncProgress(reports));
            Assert.Single(reports);
            Assert.Equal(r.CorrelationEnergyHartree, reports[0].EnergyHartree);
            Assert.Equal("MP2", reports[0].Method);
        }

        [Fact]
        public void Refuses_a_restricted_open_shell_and_names_the_right_reference()
        {
            var e = Assert.Throws<OrbitariumInputException>(() => Mp2.Compute(TestHamiltonians.Random(5, 2, 1, 1)));
            Assert.Contains("run a UHF reference", e.Message);
        }

        [Fact]
        public void With_a_frozen_core_leaves_out_the_core_pairs()
        {
            var h = TestHamiltonians.Random(7, 3, 3, 2);
            var all = Mp2.Compute(h);
            var frozen = Mp2.Compute(h, CorrelationOptions.Default.WithFrozenCore(1));
            Assert.Equal(1, frozen.FrozenCoreOrbitals);
            Assert.True(frozen.CorrelationEnergyHartree > all.CorrelationEnergyHartree);
            Assert.Throws<OrbitariumInputException>(() => Mp2.Compute(h, CorrelationOptions.Default.WithFrozenCore(4)));
        }
    }
}
