using System.Globalization;

namespace Orbitarium.Models;

/// <summary>One point of the two-centre LCAO model: the integrals and energy of one combination at one distance.</summary>
/// <param name="DistanceBohr">Internuclear distance R in bohr.</param>
/// <param name="Exponent">Slater exponent ζ used (bohr⁻¹); optimised or fixed.</param>
/// <param name="Combination">In-phase (ψ₊) or out-of-phase (ψ₋).</param>
/// <param name="Overlap">Overlap S.</param>
/// <param name="CoulombHartree">Coulomb integral J = ⟨A|1/r_B|A⟩ in hartree.</param>
/// <param name="ExchangeHartree">Exchange (resonance) integral K = ⟨A|1/r_A|B⟩ in hartree.</param>
/// <param name="ElectronicEnergyHartree">Electronic energy (H_AA ± H_AB)/(1 ± S) in hartree.</param>
/// <param name="NuclearRepulsionHartree">Nuclear repulsion 1/R in hartree.</param>
public sealed record TwoCentreLcaoPoint(
    double DistanceBohr,
    double Exponent,
    LcaoCombination Combination,
    double Overlap,
    double CoulombHartree,
    double ExchangeHartree,
    double ElectronicEnergyHartree,
    double NuclearRepulsionHartree)
{
    /// <summary>Total energy E±(R) = electronic energy + 1/R, in hartree.</summary>
    public double TotalEnergyHartree => ElectronicEnergyHartree + NuclearRepulsionHartree;

    /// <summary>Binding energy relative to H(1s) + H⁺ (−0.5 Eₕ), in eV; negative when bound.</summary>
    public double EnergyRelativeToSeparatedElectronVolt => (TotalEnergyHartree + 0.5) * PhysicalConstants.HartreeToElectronVolt;

    /// <inheritdoc />
    public override string ToString() => string.Create(CultureInfo.InvariantCulture,
        $"R = {DistanceBohr:F3} bohr, ζ = {Exponent:F4}, {Combination}: S = {Overlap:F5}, J = {CoulombHartree:F5} Eh, K = {ExchangeHartree:F5} Eh, E = {TotalEnergyHartree:F6} Eh");
}
