using Orbitarium.Analysis;
using Orbitarium.Chemistry;

namespace Orbitarium.Tests.Analysis;

public class MorseFitTests
{
    [Fact]
    public void Recovers_the_parameters_of_synthetic_Morse_data()
    {
        // Synthetic data from a known Morse potential (Morse, Phys. Rev. 34, 57 (1929)) with deterministic noise of
        // 1e-7 Eh; the fit must return the generating parameters.
        var truth = new MorsePotential(1.40, 0.1745, 1.03, -1.17);
        var random = new Random(7);
        var r = Enumerable.Range(0, 15).Select(i => (1.0 + 0.12 * i) * PhysicalConstants.AngstromPerBohr).ToArray();
        var e = r.Select(x => truth.EnergyHartree(x * PhysicalConstants.BohrPerAngstrom) + 1e-7 * (random.NextDouble() - 0.5)).ToArray();
        var fit = MorseFit.Fit(r, e);
        Assert.True(fit.Converged);
        Assert.Equal(1.40, fit.Potential.EquilibriumDistanceBohr, 1e-4);
        Assert.Equal(0.1745, fit.Potential.DissociationEnergyHartree, 1e-4);
        Assert.Equal(1.03, fit.Potential.RangeParameterPerBohr, 1e-4);
        Assert.True(fit.RmsResidualHartree < 1e-7);
    }

    [Fact]
    public void The_harmonic_wavenumber_follows_from_a_De_and_the_reduced_mass()
    {
        // ωe = a √(2De/μ) (Morse 1929). With the Morse parameters of H2 (De = 4.7446 eV, a = 1.9426 Å⁻¹, μ = 0.50391 u;
        // Huber & Herzberg constants, from memory) this gives about 4400 cm⁻¹ (observed ωe = 4401 cm⁻¹, from memory).
        var p = new MorsePotential(1.4011, 4.7446 / PhysicalConstants.HartreeToElectronVolt, 1.9426 * PhysicalConstants.AngstromPerBohr, -1.17);
        double mu = MorsePotential.ReducedMassDalton(Element.FromSymbol("H"), Element.FromSymbol("H"));
        Assert.Equal(0.50391, mu, 1e-4);
        Assert.InRange(p.HarmonicWavenumber(mu), 4371.0, 4431.0);
    }

    [Fact]
    public void A_curve_without_an_interior_minimum_is_refused()
    {
        var e = Assert.Throws<OrbitariumInputException>(() => MorseFit.Fit([1.0, 1.1, 1.2, 1.3], [-1.0, -1.1, -1.2, -1.3]));
        Assert.Contains("no minimum", e.Message);
    }
}
