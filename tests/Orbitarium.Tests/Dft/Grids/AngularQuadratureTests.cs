using Orbitarium.Dft.Grids;

namespace Orbitarium.Tests.Dft.Grids;

public class AngularQuadratureTests
{
    private static double DoubleFactorial(int n)
    {
        double r = 1;
        for (int k = n; k > 1; k -= 2) r *= k;
        return r;
    }

    [Theory]
    [InlineData(11), InlineData(29), InlineData(59)]
    public void Given_a_degree_when_monomials_up_to_it_are_integrated_then_the_sphere_moments_are_exact(int degree)
    {
        // ∫ x^a y^b z^c dΩ = 4π (a−1)!!(b−1)!!(c−1)!!/(a+b+c+1)!! for a, b, c even, else 0
        // (Folland, Amer. Math. Monthly 108, 446 (2001)).
        var q = AngularQuadrature.OfDegree(degree);
        var px = new double[q.Count, degree + 1];
        var py = new double[q.Count, degree + 1];
        var pz = new double[q.Count, degree + 1];
        for (int k = 0; k < q.Count; k++)
        {
            px[k, 0] = py[k, 0] = pz[k, 0] = 1;
            for (int e = 1; e <= degree; e++)
            {
                px[k, e] = px[k, e - 1] * q.Directions[k].X;
                py[k, e] = py[k, e - 1] * q.Directions[k].Y;
                pz[k, e] = pz[k, e - 1] * q.Directions[k].Z;
            }
        }
        for (int a = 0; a <= degree; a++)
            for (int b = 0; a + b <= degree; b++)
                for (int c = 0; a + b + c <= degree; c++)
                {
                    double sum = 0;
                    for (int k = 0; k < q.Count; k++) sum += q.Weights[k] * px[k, a] * py[k, b] * pz[k, c];
                    double exact = a % 2 == 0 && b % 2 == 0 && c % 2 == 0
                        ? 4 * Math.PI * DoubleFactorial(a - 1) * DoubleFactorial(b - 1) * DoubleFactorial(c - 1) / DoubleFactorial(a + b + c + 1)
                        : 0;
                    Assert.True(Math.Abs(sum - exact) < 1e-12, $"x^{a} y^{b} z^{c}: {sum} vs {exact}");
                }
    }
}
