using MathNet.Numerics;
using Orbitarium.Integrals;

namespace Orbitarium.Tests.Integrals;

public class BoysFunctionTests
{
    /// <summary>
    /// Reference from the convergent positive series F_m(T) = e^{−T} Σᵢ (2T)^i / ((2m+1)(2m+3)…(2m+2i+1))
    /// (Helgaker, Jørgensen and Olsen, Molecular Electronic-Structure Theory, eq. 9.8.12), summed in 28-digit decimal
    /// arithmetic; e^T likewise from its Taylor series in decimal.
    /// </summary>
    private static double DecimalReference(int m, double t)
    {
        decimal T = (decimal)t;
        decimal term = 1m / (2 * m + 1), sum = term;
        for (int i = 1; i < 2000; i++)
        {
            term = term * 2 * T / (2 * m + 2 * i + 1);
            sum += term;
            if (term < sum * 1e-27m) break;
        }
        decimal eTerm = 1m, eSum = 1m;
        for (int n = 1; n < 2000; n++)
        {
            eTerm = eTerm * T / n;
            eSum += eTerm;
            if (eTerm < eSum * 1e-27m) break;
        }
        return (double)sum / (double)eSum;
    }

    public static TheoryData<int, double> Points()
    {
        var data = new TheoryData<int, double>();
        foreach (int m in new[] { 0, 1, 2, 5, 8, 12, 16, 22, 27, 32 })
            foreach (double t in new[] { 0.0, 1e-9, 1e-3, 0.031, 0.3, 1.0, 1.7, 4.99, 9.3, 12.34, 17.0, 25.5, 29.97, 36.0, 44.4, 52.0, 59.99, 60.01, 62.5 })
                data.Add(m, t);
        return data;
    }

    [Theory]
    [MemberData(nameof(Points))]
    public void Agrees_with_a_28_digit_series_to_1e_14_relative(int m, double t)
    {
        double expected = DecimalReference(m, t);
        double actual = BoysFunction.Evaluate(m, t);
        Assert.True(Math.Abs(actual - expected) <= 1e-14 * expected, $"F_{m}({t}) = {actual:R}, reference {expected:R}, rel {Math.Abs(actual - expected) / expected:G3}");
    }

    [Fact]
    public void F0_matches_the_error_function_closed_form()
    {
        // F_0(T) = √π erf(√T) / (2√T) (Szabo and Ostlund, Modern Quantum Chemistry, eq. A.32); erf from MathNet.Numerics.
        for (double t = 1e-4; t < 80; t *= 1.37)
        {
            double expected = Math.Sqrt(Math.PI) * SpecialFunctions.Erf(Math.Sqrt(t)) / (2 * Math.Sqrt(t));
            Assert.True(Math.Abs(BoysFunction.Evaluate(0, t) - expected) <= 2e-15 * expected, $"T = {t}");
        }
    }

    [Theory]
    [InlineData(0, 70.0)]
    [InlineData(5, 100.0)]
    [InlineData(12, 250.0)]
    [InlineData(20, 1000.0)]
    [InlineData(32, 1e5)]
    public void Large_arguments_follow_the_asymptotic_expansion(int m, double t)
    {
        // F_m(T) = Γ(m+½)/(2T^{m+½}) − Γ(m+½, T)/(2T^{m+½}); Γ(m+½)/2 = (2m−1)!! √π / 2^{m+1} and
        // Γ(s, T) ~ T^{s−1} e^{−T} (1 + (s−1)/T + (s−1)(s−2)/T² + …) (Abramowitz & Stegun 6.5.32).
        double lead = AngularMomentumDoubleFactorial(2 * m - 1) * Math.Sqrt(Math.PI) / Math.Pow(2, m + 1) / Math.Pow(t, m + 0.5);
        double s = m + 0.5, series = 0, term = 1;
        for (int k = 0; k < 30; k++) { series += term; term *= (s - 1 - k) / t; }
        double correction = Math.Exp(-t) / (2 * t) * series;
        double expected = lead - correction;
        Assert.True(Math.Abs(BoysFunction.Evaluate(m, t) - expected) <= 1e-14 * expected);
    }

    [Fact]
    public void All_orders_at_once_match_single_evaluations_and_the_downward_recursion()
    {
        // F_m(T) = (2T F_{m+1}(T) + e^{−T}) / (2m+1): the standard recursion (Helgaker et al., eq. 9.8.13).
        var values = new double[BoysFunction.MaxOrder + 1];
        foreach (double t in new[] { 0.2, 3.3, 18.0, 47.0, 75.0 })
        {
            BoysFunction.Evaluate(BoysFunction.MaxOrder, t, values);
            for (int m = 0; m < BoysFunction.MaxOrder; m++)
            {
                Assert.Equal(BoysFunction.Evaluate(m, t), values[m], 1e-15 * values[m]);
                double rhs = (2 * t * values[m + 1] + Math.Exp(-t)) / (2 * m + 1);
                Assert.True(Math.Abs(values[m] - rhs) <= 1e-14 * values[m]);
            }
        }
    }

    [Fact]
    public void Bad_arguments_are_refused()
    {
        Assert.Throws<ArgumentOutOfRangeException>(() => BoysFunction.Evaluate(-1, 1.0));
        Assert.Throws<ArgumentOutOfRangeException>(() => BoysFunction.Evaluate(BoysFunction.MaxOrder + 1, 1.0));
        Assert.Throws<ArgumentOutOfRangeException>(() => BoysFunction.Evaluate(0, -1e-3));
        Assert.Throws<ArgumentOutOfRangeException>(() => BoysFunction.Evaluate(0, double.NaN));
    }

    private static double AngularMomentumDoubleFactorial(int n) => Orbitarium.BasisSets.AngularMomentum.DoubleFactorial(n);
}
