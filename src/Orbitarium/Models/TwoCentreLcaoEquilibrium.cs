using System.Globalization;

namespace Orbitarium.Models;

/// <summary>The minimum of the in-phase curve E₊(R) of the two-centre LCAO model.</summary>
/// <param name="DistanceBohr">Equilibrium distance Rₑ in bohr.</param>
/// <param name="Exponent">Slater exponent ζ at Rₑ (bohr⁻¹).</param>
/// <param name="TotalEnergyHartree">E₊(Rₑ) in hartree.</param>
/// <param name="DissociationEnergyHartree">Dₑ = −0.5 Eₕ − E₊(Rₑ): the energy to separate into H(1s) + H⁺, in hartree.</param>
public sealed record TwoCentreLcaoEquilibrium(double DistanceBohr, double Exponent, double TotalEnergyHartree, double DissociationEnergyHartree)
{
    /// <summary>Equilibrium distance in ångström.</summary>
    public double DistanceAngstrom => DistanceBohr * PhysicalConstants.AngstromPerBohr;

    /// <summary>Dₑ in electronvolt.</summary>
    public double DissociationEnergyElectronVolt => DissociationEnergyHartree * PhysicalConstants.HartreeToElectronVolt;

    /// <inheritdoc />
    public override string ToString() => string.Create(CultureInfo.InvariantCulture,
        $"Re = {DistanceBohr:F3} bohr ({DistanceAngstrom:F3} Å), ζ = {Exponent:F4}, E = {TotalEnergyHartree:F6} Eh, De = {DissociationEnergyElectronVolt:F3} eV");
}
