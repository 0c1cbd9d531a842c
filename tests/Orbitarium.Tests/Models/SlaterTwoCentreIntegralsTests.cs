using Orbitarium.Models;

namespace Orbitarium.Tests.Models;

public class SlaterTwoCentreIntegralsTests
{
    private static double Slater(double r, double zeta) => Math.Sqrt(zeta * zeta * zeta / Math.PI) * Math.Exp(-zeta * r);

    [Theory]
    [InlineData(0.5)]
    [InlineData(2.0)]
    [InlineData(4.0)]
    public void Overlap_with_unit_exponent_is_the_textbook_formula(double r)
    {
        // Textbook closed form S(R) = e^{-R}(1 + R + R²/3) for ζ = 1 (Levine, Quantum Chemistry; /work/shared/REFERENCES.md).
        Assert.Equal(Math.Exp(-r) * (1 + r + r * r / 3), SlaterTwoCentreIntegrals.Overlap(r), 14);
    }

    [Theory]
    [InlineData(0.7, 1.0)]
    [InlineData(2.0, 1.0)]
    [InlineData(2.0, 1.24)]
    [InlineData(5.0, 0.9)]
    public void Overlap_coulomb_and_exchange_match_numerical_quadrature(double r, double zeta)
    {
        // Independent check: the same integrals by Gauss–Legendre quadrature in prolate spheroidal coordinates.
        // Tolerance 1e-9: the quadrature converges far below that for these smooth exponential integrands.
        double s = SpheroidalQuadrature.Integrate(r, (ra, rb) => Slater(ra, zeta) * Slater(rb, zeta));
        double j = SpheroidalQuadrature.Integrate(r, (ra, rb) => Slater(ra, zeta) * Slater(ra, zeta) / rb);
        double k = SpheroidalQuadrature.Integrate(r, (ra, rb) => Slater(ra, zeta) * Slater(rb, zeta) / ra);
        Assert.Equal(s, SlaterTwoCentreIntegrals.Overlap(r, zeta), 9);
        Assert.Equal(j, SlaterTwoCentreIntegrals.Coulomb(r, zeta), 9);
        Assert.Equal(k, SlaterTwoCentreIntegrals.Exchange(r, zeta), 9);
    }

    [Fact]
    public void Coulomb_integral_tends_to_one_over_R_far_apart()
    {
        // Common practice: a neutral-atom charge cloud seen from far away acts as a point charge.
        Assert.Equal(1 / 30.0, SlaterTwoCentreIntegrals.Coulomb(30.0), 12);
    }

    [Fact]
    public void A_negative_distance_is_refused_with_a_clear_message()
    {
        var e = Assert.Throws<OrbitariumInputException>(() => SlaterTwoCentreIntegrals.Overlap(-1.0));
        Assert.Contains("distance", e.Message);
    }
}
