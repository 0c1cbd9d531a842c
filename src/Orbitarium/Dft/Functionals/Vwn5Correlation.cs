namespace Orbitarium.Dft.Functionals;

/// <summary>
/// VWN5 correlation: the Vosko–Wilk–Nusair formula fitted to the Ceperley–Alder quantum Monte Carlo energies
/// (the "VWN5" or "VWN" form of most programs; the form the NIST atomic LDA reference data use), with VWN's
/// spin-stiffness interpolation between the paramagnetic and ferromagnetic gases.
/// </summary>
/// <remarks>Vosko, Wilk &amp; Nusair, Can. J. Phys. 58, 1200 (1980), eq. 4.4 with the Ceperley–Alder parameters
/// (their table 5) and the interpolation of their eq. 3.2:
/// ε = ε_P + α_c f(ζ)/f''(0) (1 − ζ⁴) + (ε_F − ε_P) f(ζ) ζ⁴. Registry name "vwn5". Compare
/// <see cref="VwnRpaCorrelation"/>, the RPA-fitted set used inside B3LYP.</remarks>
public sealed class Vwn5Correlation : FunctionalComponent
{
    /// <summary>The shared instance.</summary>
    public static Vwn5Correlation Instance { get; } = new();

    private Vwn5Correlation() { }

    /// <inheritdoc />
    public override string Name => "vwn5";

    /// <inheritdoc />
    public override bool IsGradientCorrected => false;

    /// <inheritdoc />
    public override string Source => "Vosko, Wilk & Nusair, Can. J. Phys. 58, 1200 (1980), Ceperley-Alder fit (VWN5)";

    internal override DualNumber EnergyDensity(DualNumber rhoA, DualNumber rhoB, DualNumber sigmaAA, DualNumber sigmaAB, DualNumber sigmaBB)
    {
        var rho = rhoA + rhoB;
        var rs = UniformGas.WignerSeitzRadius(rho);
        var zeta = (rhoA - rhoB) / rho;
        var f = UniformGas.SpinInterpolation(2 * rhoA / rho, 2 * rhoB / rho);
        var z4 = DualNumber.Square(DualNumber.Square(zeta));
        var para = VwnFit.CeperleyAlderParamagnetic.Evaluate(rs);
        var ferro = VwnFit.CeperleyAlderFerromagnetic.Evaluate(rs);
        var stiffness = VwnFit.CeperleyAlderSpinStiffness.Evaluate(rs);
        var eps = para + stiffness * f * (1 - z4) / UniformGas.SpinInterpolationCurvature + (ferro - para) * f * z4;
        return rho * eps;
    }
}
