using MathNet.Numerics.LinearAlgebra;
using Orbitarium.Correlation;

namespace Orbitarium.Tests.Correlation;

public class MolecularIntegralTransformationTests
{
    public class TransformRepulsion
    {
        [Fact]
        public void Turns_the_printed_H2_AO_integrals_into_the_printed_MO_integrals()
        {
            // Given the AO integrals of H2/STO-3G at 1.4 bohr (Szabo & Ostlund §3.5.2, four decimals, from memory)
            var h = TestHamiltonians.H2();
            var g = h.RepulsionAlphaAlpha;
            var core = h.CoreHamiltonianAlpha;
            // Then the MO integrals match the book's MO values to the rounding of the input (±3e-4).
            Assert.Equal(TestHamiltonians.H11, core[0], 3e-4);
            Assert.Equal(TestHamiltonians.H22, core[3], 3e-4);
            Assert.Equal(TestHamiltonians.J11, g[0], 3e-4);                 // (11|11)
            Assert.Equal(TestHamiltonians.J12, g[(0 * 2 + 0) * 4 + 3], 3e-4); // (11|22)
            Assert.Equal(TestHamiltonians.J22, g[15], 3e-4);                // (22|22)
            Assert.Equal(TestHamiltonians.K12, g[(0 * 2 + 1) * 4 + 1], 3e-4); // (12|12)
            // And the reference energy is the printed RHF energy −1.1167 Eh (REFERENCES.md).
            Assert.Equal(-1.1167, h.ReferenceEnergyHartree, 3e-4);
        }

        [Theory]
        [InlineData(3, 1)]
        [InlineData(5, 2)]
        public void Equals_the_direct_eight_fold_sum_on_seeded_random_input(int n, int seed)
        {
            // Identity check (common practice): the four quarter-transformations give the same numbers as the
            // O(N⁸) sum Σ C C C C (μν|λσ) with different coefficient blocks on each index.
            var rng = new Random(seed);
            var ao = new double[n * n * n * n];
            for (int i = 0; i < ao.Length; i++) ao[i] = rng.NextDouble() - 0.5;
            Matrix<double> Rand(int k) => Matrix<double>.Build.Dense(n, k, (_, _) => rng.NextDouble() - 0.5);
            var c1 = Rand(2); var c2 = Rand(3); var c3 = Rand(1); var c4 = Rand(n);
            var fast = MolecularIntegralTransformation.TransformRepulsion(ao, c1, c2, c3, c4);
            int idx = 0;
            for (int p = 0; p < 2; p++)
                for (int q = 0; q < 3; q++)
                    for (int r = 0; r < 1; r++)
                        for (int s = 0; s < n; s++)
                        {
                            double v = 0;
                            for (int a = 0; a < n; a++)
                                for (int b = 0; b < n; b++)
                                    for (int c = 0; c < n; c++)
                                        for (int d = 0; d < n; d++)
                                            v += c1[a, p] * c2[b, q] * c3[c, r] * c4[d, s] * ao[((a * n + b) * n + c) * n + d];
                            Assert.Equal(v, fast[idx++], 1e-12);
                        }
        }

        [Fact]
        public void Refuses_an_AO_tensor_of_the_wrong_size_naming_the_expected_count()
        {
            var c = Matrix<double>.Build.DenseIdentity(3);
            var e = Assert.Throws<OrbitariumInputException>(() => MolecularIntegralTransformation.TransformRepulsion(new double[10], c, c, c, c));
            Assert.Contains("81", e.Message);
        }
    }
}
