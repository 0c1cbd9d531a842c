using Orbitarium.BasisSets;

namespace Orbitarium.Tests.BasisSets;

public class StoNGFitTests
{
    public class Fit
    {
        [Fact]
        public void STO_3G_1s_matches_the_published_expansion()
        {
            // Hehre, Stewart & Pople, J. Chem. Phys. 51, 2657 (1969), Table I (see REFERENCES.md): ζ = 1 1s.
            var fit = StoNGFit.Fit(3, SlaterOrbital.S1);
            double[] alpha = [2.227660, 0.405771, 0.109818];
            double[] c = [0.154329, 0.535328, 0.444635];
            for (int i = 0; i < 3; i++)
            {
                Assert.Equal(alpha[i], fit.Exponents[i], 1e-4 * alpha[i]);
                Assert.Equal(c[i], fit.Coefficients[0][i], 1e-4);
            }
        }

        [Fact]
        public void STO_3G_2sp_with_shared_exponents_matches_the_published_expansion()
        {
            // Hehre, Stewart & Pople (1969), Table I (see REFERENCES.md): ζ = 1 2sp, 2s and 2p fitted together.
            var fit = StoNGFit.Fit(3, SlaterOrbital.S2, SlaterOrbital.P2);
            double[] alpha = [0.994203, 0.231031, 0.0751386];
            double[] cs = [-0.0999672, 0.399513, 0.700115];
            double[] cp = [0.155916, 0.607684, 0.391957];
            for (int i = 0; i < 3; i++)
            {
                Assert.Equal(alpha[i], fit.Exponents[i], 1e-4 * alpha[i]);
                Assert.Equal(cs[i], fit.Coefficients[0][i], 1e-4);
                Assert.Equal(cp[i], fit.Coefficients[1][i], 1e-4);
            }
        }

        [Fact]
        public void STO_3G_3sp_matches_the_published_exponents()
        {
            // Hehre, Ditchfield, Stewart & Pople, J. Chem. Phys. 52, 2769 (1970): ζ = 1 3sp exponents
            // 0.4828540, 0.1347150, 0.0527266 (from memory; consistent with the published Na 3sp exponents
            // 1.4787406, 0.4125649, 0.1614751 for ζ = 1.75).
            var fit = StoNGFit.Fit(3, SlaterOrbital.S3, SlaterOrbital.P3);
            double[] alpha = [0.4828540, 0.1347150, 0.0527266];
            for (int i = 0; i < 3; i++) Assert.Equal(alpha[i], fit.Exponents[i], 1e-4 * alpha[i]);
        }

        [Theory]
        [InlineData(2)]
        [InlineData(3)]
        [InlineData(4)]
        [InlineData(6)]
        public void More_Gaussians_fit_the_1s_Slater_function_better(int n)
        {
            // Variational property of the least-squares fit: the residual falls with n.
            var fewer = StoNGFit.Fit(n - 1, SlaterOrbital.S1);
            var more = StoNGFit.Fit(n, SlaterOrbital.S1);
            Assert.True(more.Residuals[0] < fewer.Residuals[0]);
        }

        [Fact]
        public void Exponents_scale_with_the_square_of_zeta()
        {
            // The STO-nG expansion of a ζ orbital is the ζ = 1 expansion scaled by ζ² (Hehre et al. 1969):
            // published O 1s exponent 130.70932 = 2.227660 · 7.66² (from memory).
            var fit = StoNGFit.Fit(3, SlaterOrbital.S1);
            Assert.Equal(130.70932, fit.ExponentsFor(7.66)[0], 1e-3);
        }

        [Fact]
        public void An_impossible_Slater_function_is_refused()
        {
            var e = Assert.Throws<OrbitariumInputException>(() => StoNGFit.Fit(3, new SlaterOrbital(2, 2)));
            Assert.Contains("n must exceed L", e.Message);
        }
    }

    public class Overlap
    {
        [Fact]
        public void Quadrature_overlap_agrees_with_the_closed_form_for_a_1s_Gaussian()
        {
            // ⟨g|1s⟩ for ζ = 1 is N_g N_s I₂ with I_k = ∫ r^k e^{−r−αr²} dr: I₀ = √(π/4α) e^{1/4α} erfc(1/2√α),
            // I₁ = (1 − I₀)/2α, I₂ = (I₀ − I₁)/2α (integration by parts; standard integral tables).
            double a = 0.7;
            double i0 = Math.Sqrt(Math.PI / (4 * a)) * Math.Exp(1 / (4 * a)) * MathNet.Numerics.SpecialFunctions.Erfc(1 / (2 * Math.Sqrt(a)));
            double i1 = (1 - i0) / (2 * a);
            double i2 = (i0 - i1) / (2 * a);
            double ng = Math.Pow(2 * a / Math.PI, 0.75) * Math.Sqrt(4 * Math.PI);
            double ns = 2;
            Assert.Equal(ng * ns * i2, StoNGFit.Overlap(SlaterOrbital.S1, a), 1e-13);
        }
    }
}
