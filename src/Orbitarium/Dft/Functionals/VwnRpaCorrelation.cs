namespace Orbitarium.Dft.Functionals;

/// <summary>
/// VWN-RPA correlation: the Vosko–Wilk–Nusair formula with the parameters fitted to the random-phase-approximation
/// energies, interpolated in spin with f(ζ) alone. This is the correlation form inside the common B3LYP definition.
/// </summary>
/// <remarks>Vosko, Wilk &amp; Nusair, Can. J. Phys. 58, 1200 (1980), eq. 4.4 with the RPA parameters;
/// ε = ε_P + (ε_F − ε_P) f(ζ) (the form of the reference library libxc's "VWN_RPA"). Registry name "vwnrpa".
/// Not the same as <see cref="Vwn5Correlation"/>: RPA overestimates correlation, so this form is noticeably more negative.</remarks>
public sealed class VwnRpaCorrelation : FunctionalComponent
{
    /// <summary>The shared instance.</summary>
    public static VwnRpaCorrelation Instance { get; } = new();

    private VwnRpaCorrelation() { }

    /// <inheritdoc />
    public override string Name => "vwnrpa";

    /// <inheritdoc />
    public override bool IsGradientCorrected => false;

    /// <inheritdoc />
    public override string Source => "Vosko, Wilk & Nusair, Can. J. Phys. 58, 1200 (1980), RPA fit";

    internal override DualNumber EnergyDensity(DualNumber rhoA, DualNumber rhoB, DualNumber sigmaAA, DualNumber sigmaAB, DualNumber sigmaBB)
    {
        var rho = rhoA + rhoB;
        var rs = UniformGas.WignerSeitzRadius(rho);
        var f = UniformGas.SpinInterpolation(2 * rhoA / rho, 2 * rhoB / rho);
        var para = VwnFit.RpaParamagnetic.Evaluate(rs);
        var ferro = VwnFit.RpaFerromagnetic.Evaluate(rs);
        return rho * (para + (ferro - para) * f);
    }
}
