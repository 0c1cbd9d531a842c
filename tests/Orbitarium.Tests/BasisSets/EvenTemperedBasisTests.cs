using Orbitarium.BasisSets;
using Orbitarium.Chemistry;

namespace Orbitarium.Tests.BasisSets;

public class EvenTemperedBasisTests
{
    [Fact]
    public void Exponents_form_the_geometric_series_alpha_beta_to_the_k()
    {
        // Definition (Ruedenberg, Raffenetti & Bardo 1973): αₖ = α·βᵏ.
        var e = EvenTemperedBasis.Exponents(0.05, 3.0, 5);
        Assert.Equal([0.05, 0.15, 0.45, 1.35, 4.05], e.Select(x => Math.Round(x, 12)));
    }

    [Fact]
    public void Shells_are_uncontracted_largest_exponent_first()
    {
        var shells = EvenTemperedBasis.Shells(2, 0.1, 2.5, 4);
        Assert.All(shells, s => { Assert.Equal(2, s.AngularMomentum); Assert.Equal(1, s.PrimitiveCount); });
        Assert.Equal(0.1 * 2.5 * 2.5 * 2.5, shells[0].Exponents[0], 1e-12);
        Assert.Equal(0.1, shells[^1].Exponents[0], 1e-15);
    }

    [Fact]
    public void Create_builds_a_per_element_set()
    {
        var set = EvenTemperedBasis.Create("et-Ne", "Ne", [(0, 0.1, 2.5, 14), (1, 0.15, 2.5, 8)]);
        Assert.Equal(22, set.ShellsFor(PeriodicTable.BySymbol("Ne")).Length);
    }

    [Theory]
    [InlineData(-1.0, 2.0, 3, "α")]
    [InlineData(1.0, 1.0, 3, "β")]
    [InlineData(1.0, 2.0, 0, "1 to 100")]
    public void Bad_parameters_are_refused(double alpha, double beta, int count, string fragment)
    {
        var e = Assert.Throws<OrbitariumInputException>(() => EvenTemperedBasis.Exponents(alpha, beta, count));
        Assert.Contains(fragment, e.Message);
    }
}
