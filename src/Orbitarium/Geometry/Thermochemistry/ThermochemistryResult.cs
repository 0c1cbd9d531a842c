using System.Globalization;
using System.Text;

namespace Orbitarium.Geometry.Thermochemistry;

/// <summary>Ideal-gas, rigid-rotor, harmonic-oscillator thermochemistry of one molecule at a temperature and pressure.
/// Energies are per molecule in hartree; entropies per molecule in hartree/kelvin (multiply by
/// <see cref="PhysicalConstants.HartreeToKJPerMol"/>·1000 for J K⁻¹ mol⁻¹).</summary>
/// <param name="TemperatureKelvin">Temperature T in K.</param>
/// <param name="PressurePascal">Pressure p in Pa.</param>
/// <param name="PointGroup">The point group used for the symmetry number (Schoenflies).</param>
/// <param name="SymmetryNumber">Rotational symmetry number σ.</param>
/// <param name="ElectronicEnergyHartree">The electronic energy E₀ at the geometry.</param>
/// <param name="ZeroPointEnergyHartree">Zero-point vibrational energy ½ Σ hcν̃.</param>
/// <param name="ThermalEnergyCorrectionHartree">E_trans + E_rot + E_vib(T) including the ZPE.</param>
/// <param name="EnthalpyCorrectionHartree">Thermal energy correction + k_B T.</param>
/// <param name="TranslationalEntropyHartreePerKelvin">Sackur–Tetrode entropy.</param>
/// <param name="RotationalEntropyHartreePerKelvin">Rigid-rotor entropy (high-temperature limit, with σ).</param>
/// <param name="VibrationalEntropyHartreePerKelvin">Harmonic-oscillator entropy (real modes only).</param>
/// <param name="ElectronicEntropyHartreePerKelvin">k_B ln(2S+1).</param>
/// <param name="ExcludedImaginaryModes">Imaginary modes left out of the vibrational sums.</param>
public sealed record ThermochemistryResult(
    double TemperatureKelvin,
    double PressurePascal,
    string PointGroup,
    int SymmetryNumber,
    double ElectronicEnergyHartree,
    double ZeroPointEnergyHartree,
    double ThermalEnergyCorrectionHartree,
    double EnthalpyCorrectionHartree,
    double TranslationalEntropyHartreePerKelvin,
    double RotationalEntropyHartreePerKelvin,
    double VibrationalEntropyHartreePerKelvin,
    double ElectronicEntropyHartreePerKelvin,
    int ExcludedImaginaryModes)
{
    /// <summary>Total entropy S in hartree/kelvin.</summary>
    public double EntropyHartreePerKelvin =>
        TranslationalEntropyHartreePerKelvin + RotationalEntropyHartreePerKelvin + VibrationalEntropyHartreePerKelvin + ElectronicEntropyHartreePerKelvin;

    /// <summary>Total entropy in J K⁻¹ mol⁻¹.</summary>
    public double EntropyJoulePerMoleKelvin => EntropyHartreePerKelvin * PhysicalConstants.HartreeToKJPerMol * 1000;

    /// <summary>Gibbs-energy correction H − TS − E₀ in hartree.</summary>
    public double GibbsCorrectionHartree => EnthalpyCorrectionHartree - TemperatureKelvin * EntropyHartreePerKelvin;

    /// <summary>E₀ + ZPE in hartree.</summary>
    public double ZeroPointCorrectedEnergyHartree => ElectronicEnergyHartree + ZeroPointEnergyHartree;

    /// <summary>Internal energy U = E₀ + thermal correction, hartree.</summary>
    public double InternalEnergyHartree => ElectronicEnergyHartree + ThermalEnergyCorrectionHartree;

    /// <summary>Enthalpy H = U + k_B T, hartree.</summary>
    public double EnthalpyHartree => ElectronicEnergyHartree + EnthalpyCorrectionHartree;

    /// <summary>Gibbs energy G = H − TS, hartree.</summary>
    public double GibbsEnergyHartree => ElectronicEnergyHartree + GibbsCorrectionHartree;

    /// <inheritdoc />
    public override string ToString()
    {
        var sb = new StringBuilder();
        sb.Append(CultureInfo.InvariantCulture, $"Thermochemistry at {TemperatureKelvin:F2} K, {PressurePascal:F0} Pa (point group {PointGroup}, σ = {SymmetryNumber})\n");
        sb.Append(CultureInfo.InvariantCulture, $"  zero-point energy      {ZeroPointEnergyHartree,16:F8} Eh\n");
        sb.Append(CultureInfo.InvariantCulture, $"  thermal energy corr.   {ThermalEnergyCorrectionHartree,16:F8} Eh\n");
        sb.Append(CultureInfo.InvariantCulture, $"  enthalpy correction    {EnthalpyCorrectionHartree,16:F8} Eh\n");
        sb.Append(CultureInfo.InvariantCulture, $"  Gibbs correction       {GibbsCorrectionHartree,16:F8} Eh\n");
        sb.Append(CultureInfo.InvariantCulture, $"  entropy                {EntropyJoulePerMoleKelvin,16:F4} J K⁻¹ mol⁻¹\n");
        sb.Append(CultureInfo.InvariantCulture, $"  E0 + ZPE               {ZeroPointCorrectedEnergyHartree,16:F8} Eh\n");
        sb.Append(CultureInfo.InvariantCulture, $"  H                      {EnthalpyHartree,16:F8} Eh\n");
        sb.Append(CultureInfo.InvariantCulture, $"  G                      {GibbsEnergyHartree,16:F8} Eh");
        if (ExcludedImaginaryModes > 0) sb.Append(CultureInfo.InvariantCulture, $"\n  ({ExcludedImaginaryModes} imaginary mode(s) left out)");
        return sb.ToString();
    }
}
