using Orbitarium;
using Orbitarium.Dft.Functionals;

namespace Orbitarium.Tests.Dft.Functionals;

public class ExchangeCorrelationFunctionalTests
{
    public class Parse
    {
        [Fact]
        public void Given_the_b3lyp_formula_when_parsed_then_it_equals_the_registered_b3lyp()
        {
            var mine = ExchangeCorrelationFunctional.Parse("0.08*slater + 0.72*b88 + 0.2*hf + 0.19*vwnrpa + 0.81*lyp", "mine");
            var b3lyp = FunctionalRegistry.Get("b3lyp");
            Assert.Equal(0.2, mine.ExactExchangeFraction, 15);
            var a = mine.EvaluateUnpolarized(0.3, 0.1);
            var b = b3lyp.EvaluateUnpolarized(0.3, 0.1);
            Assert.Equal(b.EnergyDensity, a.EnergyDensity, 14);
            Assert.Equal(b.VSigma, a.VSigma, 14);
        }

        [Fact]
        public void Given_a_mixture_of_named_functionals_when_parsed_then_weights_and_exact_exchange_combine()
        {
            var half = ExchangeCorrelationFunctional.Parse("0.5*pbe0 + 0.5*pbe");
            Assert.Equal(0.125, half.ExactExchangeFraction, 15);
            Assert.Contains(half.Components, c => c.Component.Name == "pbex" && Math.Abs(c.Weight - 0.875) < 1e-15);
        }

        [Fact]
        public void Given_an_unknown_name_when_parsed_then_the_message_lists_the_known_ones()
        {
            var e = Assert.Throws<OrbitariumInputException>(() => ExchangeCorrelationFunctional.Parse("0.5*b89 + lyp"));
            Assert.Contains("b89", e.Message);
            Assert.Contains("b88", e.Message);
        }
    }

    public class Registry
    {
        [Theory]
        [InlineData("svwn5"), InlineData("blyp"), InlineData("b3lyp"), InlineData("pbe"), InlineData("pbe0"), InlineData("PBE0")]
        public void Given_a_common_name_when_looked_up_then_a_functional_is_found(string name) =>
            Assert.NotNull(FunctionalRegistry.Get(name));

        [Fact]
        public void Given_b3lyp_when_inspected_then_it_uses_the_rpa_fitted_vwn() =>
            Assert.Contains(FunctionalRegistry.Get("b3lyp").Components, c => c.Component is VwnRpaCorrelation && c.Weight == 0.19);
    }
}
