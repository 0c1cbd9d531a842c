using Orbitarium.Chemistry;
using Orbitarium.Geometry;
using Orbitarium.Geometry.Vibrations;

namespace Orbitarium.Tests.Geometry.Vibrations;

public class VibrationalAnalysisTests
{
    [Fact]
    public void A_harmonic_diatomic_has_the_closed_form_wavenumber()
    {
        // ν̃ = √(k/μ)/(2πc), evaluated in SI units here (k in J/m², μ in kg) from CODATA 2018 constants:
        // an independent route to the library's atomic-unit conversion.
        double k = 0.6, r0 = 1.4;
        var surface = ModelSurfaces.HarmonicDiatomic(r0, k);
        var h2 = Molecule.Empty.AddAtom("H", 0, 0, 0, LengthUnit.Bohr).AddAtom("H", 0.3, 0.2, r0 * 0.9, LengthUnit.Bohr);
        var at = h2.WithPositionsBohr([0, 0, 0, 0, 0, r0]);
        var vib = surface.Frequencies(at, 1e-3);
        double a0 = PhysicalConstants.BohrRadiusAngstrom * 1e-10;
        double kSi = k * PhysicalConstants.HartreeToJoule / (a0 * a0);
        double mu = 0.5 * 1.00782503223 * PhysicalConstants.AtomicMassUnitKilogram;
        double expected = Math.Sqrt(kSi / mu) / (2 * Math.PI * PhysicalConstants.SpeedOfLightCentimetrePerSecond);
        Assert.Single(vib.Modes);
        Assert.True(vib.IsLinear);
        Assert.Equal(expected, vib.Modes[0].WavenumberPerCm, 3);
        // Reduced mass 1/Σ l²(Cartesian) of the normalised mass-weighted mode: the atomic mass for a homonuclear
        // diatomic (common practice).
        Assert.Equal(1.00782503223, vib.Modes[0].ReducedMassDalton, 6);
    }

    [Fact]
    public void Wavenumbers_do_not_depend_on_orientation()
    {
        var surface = ModelSurfaces.WaterModel();
        var opt = surface.Optimize(ModelSurfaces.DistortedWater(), Orbitarium.Geometry.Optimization.OptimizationOptions.Tight with { FiniteDifferenceStepBohr = 1e-3 }).Molecule;
        var turned = opt.RotatedAboutAxis(new Vector3D(0.3, -0.5, 0.8), 47).TranslatedAngstrom(0.4, -1.1, 0.2);
        var a = surface.Frequencies(opt, 1e-3).WavenumbersPerCm;
        var b = surface.Frequencies(turned, 1e-3).WavenumbersPerCm;
        Assert.Equal(3, a.Length);
        for (int i = 0; i < 3; i++) Assert.Equal(a[i], b[i], 1);
    }

    [Fact]
    public void The_infrared_conversion_factor_matches_the_published_value()
    {
        // 1 (e²/u) of |∂μ/∂Q|² corresponds to 974.88 km/mol (common practice; commonly quoted as 974.86–974.88,
        // depending on the constants' year).
        Assert.Equal(974.88, VibrationalAnalysis.IrIntensityFactorKmPerMol, 0);
    }

    [Fact]
    public void A_point_charge_model_gives_ir_intensity_only_to_modes_that_change_the_dipole()
    {
        // Symmetric-stretch vs antisymmetric-stretch selection rule for a symmetric linear triatomic (common practice):
        // with charges −2q, +q, +q... here a linear A–B–A with charges +q, −2q, +q; the symmetric stretch is IR inactive.
        var baseSurface = ModelSurfaces.ValenceForceField([(0, 1, 2.2, 0.8), (1, 2, 2.2, 0.8)], [(0, 1, 2, 180.0, 0.2)]);
        var surface = new DelegateSurface("charged model", m => baseSurface.Evaluate(m, false).EnergyHartree, null,
            m => 0.3 * m.Atoms[0].PositionBohr - 0.6 * m.Atoms[1].PositionBohr + 0.3 * m.Atoms[2].PositionBohr);
        var co2 = Molecule.Empty.AddAtom("O", 0, 0, -2.2, LengthUnit.Bohr).AddAtom("C", 0, 0, 0, LengthUnit.Bohr).AddAtom("O", 0, 0, 2.2, LengthUnit.Bohr);
        var vib = surface.Frequencies(co2, 1e-3);
        Assert.Equal(4, vib.Modes.Length); // 3N − 5
        var symmetric = vib.Modes.Single(m => Math.Abs(m.CartesianDisplacement[2] + m.CartesianDisplacement[8]) < 1e-6 && Math.Abs(m.CartesianDisplacement[2]) > 0.1);
        Assert.True(symmetric.IrIntensityKmPerMol < 1e-6);
        Assert.Contains(vib.Modes, m => m.IrIntensityKmPerMol > 1);
    }
}
