using System.Globalization;
using System.Text;

namespace Orbitarium.Analysis;

/// <summary>The result of fitting a Morse potential to an energy curve.</summary>
/// <param name="Potential">The fitted potential.</param>
/// <param name="HarmonicWavenumber">ωₑ in cm⁻¹, or null when no reduced mass was known.</param>
/// <param name="ReducedMassDalton">The reduced mass used for ωₑ (dalton), or null.</param>
/// <param name="RmsResidualHartree">Root-mean-square residual of the fit in hartree.</param>
/// <param name="MaxResidualHartree">Largest absolute residual in hartree.</param>
/// <param name="PointCount">Number of points fitted.</param>
/// <param name="Iterations">Simplex iterations used.</param>
/// <param name="Converged">Whether the simplex met its tolerance before the iteration limit.</param>
public sealed record MorseFitResult(
    MorsePotential Potential,
    double? HarmonicWavenumber,
    double? ReducedMassDalton,
    double RmsResidualHartree,
    double MaxResidualHartree,
    int PointCount,
    int Iterations,
    bool Converged)
{
    /// <summary>Rₑ in ångström.</summary>
    public double EquilibriumDistanceAngstrom => Potential.EquilibriumDistanceAngstrom;

    /// <summary>Dₑ in electronvolt.</summary>
    public double DissociationEnergyElectronVolt => Potential.DissociationEnergyElectronVolt;

    /// <inheritdoc />
    public override string ToString()
    {
        var inv = CultureInfo.InvariantCulture;
        var sb = new StringBuilder();
        sb.Append(inv, $"Morse fit of {PointCount} points: Re = {Potential.EquilibriumDistanceAngstrom:F4} Å, De = {Potential.DissociationEnergyHartree:F6} Eh ({Potential.DissociationEnergyElectronVolt:F3} eV), a = {Potential.RangeParameterPerBohr:F4} bohr⁻¹");
        if (HarmonicWavenumber is double w) sb.Append(inv, $", ωe = {w:F0} cm⁻¹ (μ = {ReducedMassDalton:F4} u)");
        sb.Append(inv, $"; rms residual {RmsResidualHartree:E2} Eh, max {MaxResidualHartree:E2} Eh");
        if (!Converged) sb.Append(inv, $" — NOT converged after {Iterations} iterations");
        return sb.ToString();
    }
}
