using Orbitarium.Correlation;

namespace Orbitarium.Tests.Correlation;

public class FullCiTests
{
    public class Compute
    {
        [Fact]
        public void Gives_the_published_H2_minimal_basis_energy()
        {
            // Szabo & Ostlund ch. 4 (REFERENCES.md): H2/STO-3G, R = 1.4 bohr, full CI −1.1373 Eh (printed).
            // Input integrals carry four decimals, so ±3e-4.
            var fci = FullCi.Compute(TestHamiltonians.H2());
            Assert.Equal(-1.1373, fci.TotalEnergyHartree, 3e-4);
            Assert.True(fci.Converged);
        }

        [Fact]
        public void Matches_the_two_by_two_closed_form_of_minimal_basis_H2()
        {
            // Szabo & Ostlund §4.1: E = ½(H11 + H22) − ½√((H22 − H11)² + 4K12²) with H11 = 2h11 + J11, H22 = 2h22 + J22,
            // evaluated on the same transformed integrals (tolerance: round-off).
            var h = TestHamiltonians.H2();
            var g = h.RepulsionAlphaAlpha;
            var c = h.CoreHamiltonianAlpha;
            double a = 2 * c[0] + g[0], d = 2 * c[3] + g[15], k = g[5];
            double exact = 0.5 * (a + d) - 0.5 * Math.Sqrt((d - a) * (d - a) + 4 * k * k) + h.NuclearRepulsionEnergyHartree;
            Assert.Equal(exact, FullCi.Compute(h).TotalEnergyHartree, 1e-10);
        }

        [Fact]
        public void Reports_the_triplet_of_H2_with_spin_squared_two_at_its_closed_form_energy()
        {
            // All four determinants: the Sz = 0 component of the triplet has E = h11 + h22 + J12 − K12 + 1/R and
            // ⟨S²⟩ = 2 (Szabo & Ostlund §2.5, spin-adapted configurations; common practice).
            var h = TestHamiltonians.H2();
            var fci = FullCi.Compute(h, roots: 4);
            int t = fci.SpinSquared.IndexOf(fci.SpinSquared.Max());
            Assert.Equal(2.0, fci.SpinSquared[t], 1e-8);
            var g = h.RepulsionAlphaAlpha;
            var c = h.CoreHamiltonianAlpha;
            Assert.Equal(c[0] + c[3] + g[3] - g[5] + h.NuclearRepulsionEnergyHartree, fci.RootEnergiesHartree[t], 1e-10);
            Assert.Equal(0.0, fci.SpinSquared[0], 1e-8);
        }

        [Theory]
        [InlineData(6, 1, 1, 11)]   // two electrons, 36 determinants (dense path)
        [InlineData(9, 1, 1, 12)]   // two electrons, 81 determinants (Davidson)
        [InlineData(7, 2, 1, 13)]   // three electrons, doublet, 147 determinants
        [InlineData(6, 2, 2, 14)]   // four electrons, 225 determinants
        public void Equals_the_exact_diagonalisation_of_an_independently_built_Hamiltonian(int m, int na, int nb, int seed)
        {
            // Independent check (common practice): the second-quantised H applied term by term to spin-orbital bit
            // strings, diagonalised densely, has the same lowest eigenvalues as the string-driven Davidson FCI.
            var h = TestHamiltonians.Random(m, na, nb, seed);
            var exact = SecondQuantizedHamiltonian.LowestEigenvalues(h, 3);
            var fci = FullCi.Compute(h, roots: 3, CorrelationOptions.Default.WithThresholds(1e-10, 1e-7));
            Assert.True(fci.Converged, fci.StopReason);
            for (int k = 0; k < 3; k++) Assert.Equal(exact[k], fci.RootEnergiesHartree[k], 1e-8);
        }

        [Fact]
        public void Refuses_a_space_larger_than_the_memory_budget_and_names_both_sizes()
        {
            var h = TestHamiltonians.Random(8, 3, 3, 5);
            var tight = CorrelationOptions.Default.WithMemoryBudgetMebibytes(0.5);
            var e = Assert.Throws<OrbitariumInputException>(() => FullCi.Compute(h, 1, tight));
            Assert.Contains("would need", e.Message);
            Assert.Contains("budget of 0.5 MiB", e.Message);
        }

        [Fact]
        public void Reports_progress_and_stops_when_cancelled()
        {
            var h = TestHamiltonians.Random(6, 2, 2, 6);
            var reports = new List<CorrelationProgress>();
            var fci = FullCi.Compute(h, 1, null, new SyncProgress(reports));
            Assert.NotEmpty(reports);
            Assert.Equal(fci.TotalEnergyHartree, reports[^1].EnergyHartree, 1e-6);
            using var cts = new CancellationTokenSource();
            cts.Cancel();
            Assert.ThrowsAny<OperationCanceledException>(() => FullCi.Compute(h, 1, null, null, cts.Token));
        }
    }
}

/// <summary>Collects progress reports synchronously (Progress&lt;T&gt; posts asynchronously).</summary>
internal sealed class SyncProgress(List<CorrelationProgress> sink) : IProgress<CorrelationProgress>
{
    public void Report(CorrelationProgress value) => sink.Add(value);
}
