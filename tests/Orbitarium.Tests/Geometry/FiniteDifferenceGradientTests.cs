using Orbitarium.Chemistry;
using Orbitarium.Geometry;

namespace Orbitarium.Tests.Geometry;

public class FiniteDifferenceGradientTests
{
    [Fact]
    public void Central_differences_reproduce_an_analytic_gradient_to_1e_6()
    {
        // Harmonic diatomic with its analytic gradient; central differences have error h²/6·E‴ (common practice).
        var surface = ModelSurfaces.HarmonicDiatomic(1.4, 0.37);
        var m = Molecule.Empty.AddAtom("H", 0.1, 0.2, 0.0).AddAtom("H", 0.3, -0.1, 0.75);
        var analytic = surface.Evaluate(m, true);
        var numeric = FiniteDifferenceGradient.Compute(new DelegateSurface("energy only", mol => surface.Evaluate(mol, false).EnergyHartree), m, 1e-3);
        Assert.Equal(GradientSource.FiniteDifference, numeric.GradientSource);
        for (int i = 0; i < 6; i++) Assert.Equal(analytic.GradientHartreePerBohr[i], numeric.GradientHartreePerBohr[i], 6);
    }

    [Fact]
    public void An_energy_only_surface_falls_back_to_finite_differences_and_says_so()
    {
        var surface = ModelSurfaces.WaterModel();
        var p = surface.EvaluateWithGradient(ModelSurfaces.DistortedWater());
        Assert.Equal(GradientSource.FiniteDifference, p.GradientSource);
        Assert.Equal(9, p.GradientHartreePerBohr.Length);
    }

    [Fact]
    public void A_step_outside_the_allowed_range_is_refused_with_a_clear_message()
    {
        var e = Assert.Throws<OrbitariumInputException>(() =>
            FiniteDifferenceGradient.Compute(ModelSurfaces.WaterModel(), ModelSurfaces.DistortedWater(), 0.5));
        Assert.Contains("0.005 bohr", e.Message);
    }
}
