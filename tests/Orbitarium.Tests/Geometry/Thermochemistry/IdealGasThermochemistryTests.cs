using Orbitarium.Chemistry;
using Orbitarium.Geometry;
using Orbitarium.Geometry.Thermochemistry;

namespace Orbitarium.Tests.Geometry.Thermochemistry;

public class IdealGasThermochemistryTests
{
    private const double R = PhysicalConstants.GasConstantJoulePerMoleKelvin;
    private static double ToJoulePerMoleKelvin(double hartreePerKelvin) => hartreePerKelvin * PhysicalConstants.HartreeToKJPerMol * 1000;

    // N2 at its equilibrium bond length 1.0977 Å with a harmonic force constant giving ω ≈ 2359 cm⁻¹.
    private static (Molecule Molecule, Orbitarium.Geometry.Vibrations.VibrationalAnalysis Vibrations) Nitrogen()
    {
        double r0 = 1.0977 * PhysicalConstants.BohrPerAngstrom;
        var surface = ModelSurfaces.HarmonicDiatomic(r0, 1.4648);
        var n2 = Molecule.Empty.AddAtom("N", 0, 0, 0, LengthUnit.Bohr).AddAtom("N", 0, 0, r0, LengthUnit.Bohr);
        return (n2, surface.Frequencies(n2, 1e-3));
    }

    [Fact]
    public void Translational_and_rotational_entropy_of_N2_match_the_closed_forms()
    {
        // McQuarrie, Statistical Mechanics, eqs. 5-20 (Sackur–Tetrode) and 6-40 (linear rigid rotor):
        // S_t = R[ln((2πmkT/h²)^{3/2} kT/p) + 5/2], S_r = R[ln(T/(σΘ_r)) + 1], Θ_r = h²/(8π²Ik), σ = 2 for N2.
        var (_, vib) = Nitrogen();
        var thermo = vib.Thermochemistry();
        double k = PhysicalConstants.BoltzmannJoulePerKelvin, h = PhysicalConstants.PlanckJouleSecond, T = 298.15, p = 1e5;
        double m = 2 * 14.00307400443 * PhysicalConstants.AtomicMassUnitKilogram;
        double sTrans = R * (Math.Log(Math.Pow(2 * Math.PI * m * k * T / (h * h), 1.5) * k * T / p) + 2.5);
        double mu = m / 4, r = 1.0977e-10;
        double theta = h * h / (8 * Math.PI * Math.PI * mu * r * r * k);
        double sRot = R * (Math.Log(T / (2 * theta)) + 1);
        Assert.Equal("D∞h", thermo.PointGroup);
        Assert.Equal(2, thermo.SymmetryNumber);
        Assert.Equal(sTrans, ToJoulePerMoleKelvin(thermo.TranslationalEntropyHartreePerKelvin), 6);
        Assert.Equal(sRot, ToJoulePerMoleKelvin(thermo.RotationalEntropyHartreePerKelvin), 6);
        // Θ_r(N2) = 2.88 K: McQuarrie, Table 6-1 (from memory).
        Assert.InRange(theta, 2.87, 2.89);
    }

    [Fact]
    public void Standard_entropy_of_N2_agrees_with_the_tabulated_value()
    {
        // S°(N2, 298.15 K, 1 bar) = 191.61 J K⁻¹ mol⁻¹: CODATA Key Values for Thermodynamics (Cox, Wagman, Medvedev,
        // 1989), from memory. Tolerance 0.1 J K⁻¹ mol⁻¹: rigid rotor at r_e instead of the vibrationally averaged r₀.
        var (_, vib) = Nitrogen();
        Assert.Equal(191.61, vib.Thermochemistry().EntropyJoulePerMoleKelvin, 0.1);
    }

    [Fact]
    public void Argon_entropy_is_the_Sackur_Tetrode_value()
    {
        // S°(Ar, 298.15 K, 1 bar) = 154.846 J K⁻¹ mol⁻¹: CODATA Key Values for Thermodynamics (1989), from memory.
        var ar = Molecule.Empty.AddAtom("Ar", 0, 0, 0);
        var vib = new DelegateSurface("atom", _ => -526.8, _ => [0.0, 0.0, 0.0]).Frequencies(ar);
        Assert.Empty(vib.Modes);
        var thermo = vib.Thermochemistry();
        Assert.Equal(154.846, thermo.EntropyJoulePerMoleKelvin, 0.01);
        Assert.Equal(2.5 * PhysicalConstants.BoltzmannHartreePerKelvin * 298.15, thermo.EnthalpyCorrectionHartree, 12); // H = 5/2 kT
    }

    [Fact]
    public void Zero_point_energy_is_half_the_sum_of_the_quanta()
    {
        var (_, vib) = Nitrogen();
        var thermo = vib.Thermochemistry();
        Assert.Equal(0.5 * vib.Modes[0].WavenumberPerCm / PhysicalConstants.HartreeToWavenumber, thermo.ZeroPointEnergyHartree, 12);
        Assert.Equal(thermo.EnthalpyHartree - 298.15 * thermo.EntropyHartreePerKelvin, thermo.GibbsEnergyHartree, 12);
    }

    [Fact]
    public void A_non_positive_temperature_is_refused()
    {
        var (_, vib) = Nitrogen();
        Assert.Throws<OrbitariumInputException>(() => vib.Thermochemistry(0));
    }
}
