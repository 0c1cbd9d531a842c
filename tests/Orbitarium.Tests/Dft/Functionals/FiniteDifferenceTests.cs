using Orbitarium.Dft.Functionals;

namespace Orbitarium.Tests.Dft.Functionals;

/// <summary>
/// The analytic first derivatives (vrho, vsigma) of every built-in component match central finite differences
/// of its energy density. Central differences with relative step h = 1e-5 err by O(h²) ≈ 1e-10 relative plus
/// rounding ≈ 1e-16/h; tolerance 1e-6 relative (common practice).
/// </summary>
public class FiniteDifferenceTests
{
    private const double Step = 1e-5, Tolerance = 1e-6;

    public static TheoryData<string> ComponentNames()
    {
        var data = new TheoryData<string>();
        foreach (var n in FunctionalRegistry.ComponentNames) data.Add(n);
        return data;
    }

    private static double Central(Func<double, double> f, double x)
    {
        double h = Step * Math.Abs(x);
        return (f(x + h) - f(x - h)) / (2 * h);
    }

    private static void AssertClose(double fd, double analytic, string what)
    {
        double scale = Math.Max(Math.Abs(fd), 1e-6);
        Assert.True(Math.Abs(fd - analytic) <= Tolerance * scale, $"{what}: finite difference {fd:R}, analytic {analytic:R}");
    }

    [Theory]
    [MemberData(nameof(ComponentNames))]
    public void Given_a_closed_shell_density_when_differentiated_then_the_analytic_derivatives_match(string name)
    {
        Assert.True(FunctionalRegistry.TryGetComponent(name, out var c));
        foreach (var (rho, sigma) in FunctionalTestPoints.Unpolarized)
        {
            var v = c.EvaluateUnpolarized(rho, sigma);
            AssertClose(Central(r => c.EvaluateUnpolarized(r, sigma).EnergyDensity, rho), v.VRho, $"{name} vrho at {rho}");
            if (c.IsGradientCorrected)
                AssertClose(Central(s => c.EvaluateUnpolarized(rho, s).EnergyDensity, sigma), v.VSigma, $"{name} vsigma at {rho}");
        }
    }

    [Theory]
    [MemberData(nameof(ComponentNames))]
    public void Given_a_spin_polarized_density_when_differentiated_then_all_five_derivatives_match(string name)
    {
        Assert.True(FunctionalRegistry.TryGetComponent(name, out var c));
        foreach (var (ra, rb, saa, sab, sbb) in FunctionalTestPoints.Polarized)
        {
            var v = c.Evaluate(ra, rb, saa, sab, sbb);
            string at = $"{name} at ({ra}, {rb}, {saa}, {sab}, {sbb})";
            AssertClose(Central(x => c.Evaluate(x, rb, saa, sab, sbb).EnergyDensity, ra), v.VRhoAlpha, at + " vrho_a");
            AssertClose(Central(x => c.Evaluate(ra, x, saa, sab, sbb).EnergyDensity, rb), v.VRhoBeta, at + " vrho_b");
            if (!c.IsGradientCorrected) continue;
            AssertClose(Central(x => c.Evaluate(ra, rb, x, sab, sbb).EnergyDensity, saa), v.VSigmaAlphaAlpha, at + " vsigma_aa");
            AssertClose(Central(x => c.Evaluate(ra, rb, saa, x, sbb).EnergyDensity, sab), v.VSigmaAlphaBeta, at + " vsigma_ab");
            AssertClose(Central(x => c.Evaluate(ra, rb, saa, sab, x).EnergyDensity, sbb), v.VSigmaBetaBeta, at + " vsigma_bb");
        }
    }

    [Fact]
    public void Given_equal_spin_densities_when_evaluated_polarized_then_the_closed_shell_values_follow()
    {
        // Identity: e(ρ/2, ρ/2, σ/4, σ/4, σ/4) = e(ρ, σ) and vrho = ∂e/∂ρα (common practice).
        foreach (var name in FunctionalRegistry.ComponentNames)
        {
            Assert.True(FunctionalRegistry.TryGetComponent(name, out var c));
            var u = c.EvaluateUnpolarized(0.4, 0.2);
            var p = c.Evaluate(0.2, 0.2, 0.05, 0.05, 0.05);
            Assert.Equal(u.EnergyDensity, p.EnergyDensity, 12);
            Assert.Equal(u.VRho, p.VRhoAlpha, 12);
        }
    }
}
