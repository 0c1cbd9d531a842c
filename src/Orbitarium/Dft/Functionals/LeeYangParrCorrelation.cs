namespace Orbitarium.Dft.Functionals;

/// <summary>
/// Lee–Yang–Parr correlation in the closed form without the Laplacian, spin-polarised.
/// </summary>
/// <remarks>C. Lee, W. Yang &amp; R. G. Parr, Phys. Rev. B 37, 785 (1988); the form after integration by parts of
/// B. Miehlich, A. Savin, H. Stoll &amp; H. Preuss, Chem. Phys. Lett. 157, 200 (1989), eq. 2, with a = 0.04918,
/// b = 0.132, c = 0.2533, d = 0.349. Registry name "lyp".</remarks>
public sealed class LeeYangParrCorrelation : FunctionalComponent
{
    private const double A = 0.04918, B = 0.132, C = 0.2533, D = 0.349;
    private static readonly double Cf = 0.3 * Math.Pow(3 * Math.PI * Math.PI, 2.0 / 3.0);
    private static readonly double TwoToElevenThirds = Math.Pow(2, 11.0 / 3.0);

    /// <summary>The shared instance.</summary>
    public static LeeYangParrCorrelation Instance { get; } = new();

    private LeeYangParrCorrelation() { }

    /// <inheritdoc />
    public override string Name => "lyp";

    /// <inheritdoc />
    public override bool IsGradientCorrected => true;

    /// <inheritdoc />
    public override string Source => "Lee, Yang & Parr, Phys. Rev. B 37, 785 (1988); Miehlich et al., Chem. Phys. Lett. 157, 200 (1989)";

    internal override DualNumber EnergyDensity(DualNumber ra, DualNumber rb, DualNumber saa, DualNumber sab, DualNumber sbb)
    {
        var rho = ra + rb;
        var rm13 = 1 / DualNumber.Cbrt(rho);
        var denom = 1 + D * rm13;
        var omega = DualNumber.Exp(-C * rm13) / denom * DualNumber.Pow(rho, -11.0 / 3.0);
        var delta = C * rm13 + D * rm13 / denom;
        var sigma = saa + 2 * sab + sbb;
        var rarb = ra * rb;
        var bracket = TwoToElevenThirds * Cf * (DualNumber.Pow(ra, 8.0 / 3.0) + DualNumber.Pow(rb, 8.0 / 3.0))
            + (47.0 / 18.0 - 7.0 / 18.0 * delta) * sigma
            - (2.5 - delta / 18.0) * (saa + sbb)
            - (delta - 11) / 9.0 * (ra / rho * saa + rb / rho * sbb);
        var rho2 = rho * rho;
        var rest = -2.0 / 3.0 * rho2 * sigma + (2.0 / 3.0 * rho2 - ra * ra) * sbb + (2.0 / 3.0 * rho2 - rb * rb) * saa;
        return -A * 4 / denom * rarb / rho - A * B * omega * (rarb * bracket + rest);
    }
}
