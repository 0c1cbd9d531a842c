namespace Orbitarium.Dft.Functionals;

/// <summary>
/// PBE correlation: ε_c = ε_c^{PW92}(r_s, ζ) + H(r_s, ζ, t), H = γφ³ ln(1 + (β/γ) t² (1 + At²)/(1 + At² + A²t⁴)),
/// A = (β/γ)/(exp(−ε_c^{PW92}/(γφ³)) − 1), φ = ((1+ζ)^{2/3} + (1−ζ)^{2/3})/2, t = |∇ρ|/(2φk_sρ).
/// </summary>
/// <remarks>Perdew, Burke &amp; Ernzerhof, Phys. Rev. Lett. 77, 3865 (1996), eqs. 3, 7, 8; γ = (1 − ln 2)/π²,
/// β = 0.06672455060314922; the local part is PW92 with its more precise parameters
/// (<see cref="Pw92Correlation.Modified"/>). Registry name "pbec".</remarks>
public sealed class PbeCorrelation : FunctionalComponent
{
    private static readonly double Gamma = (1 - Math.Log(2)) / (Math.PI * Math.PI);
    private const double Beta = PbeExchange.PbeBeta;

    /// <summary>The shared instance.</summary>
    public static PbeCorrelation Instance { get; } = new();

    private PbeCorrelation() { }

    /// <inheritdoc />
    public override string Name => "pbec";

    /// <inheritdoc />
    public override bool IsGradientCorrected => true;

    /// <inheritdoc />
    public override string Source => "Perdew, Burke & Ernzerhof, Phys. Rev. Lett. 77, 3865 (1996)";

    internal override DualNumber EnergyDensity(DualNumber rhoA, DualNumber rhoB, DualNumber sigmaAA, DualNumber sigmaAB, DualNumber sigmaBB)
    {
        var rho = rhoA + rhoB;
        var eps = Pw92Correlation.Modified.EnergyPerElectron(rhoA, rhoB);
        var sigma = sigmaAA + 2 * sigmaAB + sigmaBB;
        var phi = 0.5 * (DualNumber.Pow(2 * rhoA / rho, 2.0 / 3.0) + DualNumber.Pow(2 * rhoB / rho, 2.0 / 3.0));
        var phi3 = phi * phi * phi;
        var kf = DualNumber.Cbrt(3 * Math.PI * Math.PI * rho);
        var ks2 = 4 * kf / Math.PI;
        var t2 = sigma / (4 * phi * phi * ks2 * rho * rho);
        var a = (Beta / Gamma) / (DualNumber.Exp(-eps / (Gamma * phi3)) - 1);
        var at2 = a * t2;
        var h = Gamma * phi3 * DualNumber.Log1P(Beta / Gamma * t2 * (1 + at2) / (1 + at2 + at2 * at2));
        return rho * (eps + h);
    }
}
