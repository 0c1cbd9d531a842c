namespace Orbitarium.Analysis;

/// <summary>
/// The Morse potential E(R) = E_min + Dₑ (1 − e^{−a(R − Rₑ)})² (P. M. Morse, Phys. Rev. 34, 57 (1929)).
/// </summary>
/// <param name="EquilibriumDistanceBohr">Rₑ in bohr.</param>
/// <param name="DissociationEnergyHartree">Dₑ in hartree (depth below the dissociation limit).</param>
/// <param name="RangeParameterPerBohr">a in bohr⁻¹.</param>
/// <param name="MinimumEnergyHartree">E_min = E(Rₑ) in hartree.</param>
public sealed record MorsePotential(double EquilibriumDistanceBohr, double DissociationEnergyHartree, double RangeParameterPerBohr, double MinimumEnergyHartree)
{
    /// <summary>Rₑ in ångström.</summary>
    public double EquilibriumDistanceAngstrom => EquilibriumDistanceBohr * PhysicalConstants.AngstromPerBohr;

    /// <summary>Dₑ in electronvolt.</summary>
    public double DissociationEnergyElectronVolt => DissociationEnergyHartree * PhysicalConstants.HartreeToElectronVolt;

    /// <summary>Energy at distance R (bohr), in hartree.</summary>
    /// <param name="distanceBohr">R in bohr.</param>
    public double EnergyHartree(double distanceBohr)
    {
        double x = 1 - Math.Exp(-RangeParameterPerBohr * (distanceBohr - EquilibriumDistanceBohr));
        return MinimumEnergyHartree + DissociationEnergyHartree * x * x;
    }

    /// <summary>Harmonic wavenumber ωₑ = a √(2Dₑ/μ) in cm⁻¹ for a reduced mass μ in dalton.</summary>
    /// <param name="reducedMassDalton">Reduced mass μ in dalton (u).</param>
    public double HarmonicWavenumber(double reducedMassDalton)
    {
        if (!(reducedMassDalton > 0)) throw new OrbitariumInputException($"The reduced mass must be positive (dalton), got {reducedMassDalton}.");
        double mu = reducedMassDalton * PhysicalConstants.AtomicMassUnitInElectronMasses;
        return RangeParameterPerBohr * Math.Sqrt(2 * DissociationEnergyHartree / mu) * PhysicalConstants.HartreeToWavenumber;
    }

    /// <summary>Reduced mass m_A m_B/(m_A + m_B) of two atoms in dalton (most-abundant-isotope masses).</summary>
    /// <param name="a">First element.</param>
    /// <param name="b">Second element.</param>
    public static double ReducedMassDalton(Chemistry.Element a, Chemistry.Element b)
    {
        ArgumentNullException.ThrowIfNull(a);
        ArgumentNullException.ThrowIfNull(b);
        double ma = a.MostAbundantIsotopeMassDalton, mb = b.MostAbundantIsotopeMassDalton;
        return ma * mb / (ma + mb);
    }
}
