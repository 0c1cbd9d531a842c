namespace Orbitarium.Dft.Functionals;

/// <summary>
/// PBE exchange: e_x = e_x^{LDA}(ρ) F(s), F(s) = 1 + κ − κ/(1 + μs²/κ), s = |∇ρ|/(2k_Fρ), κ = 0.804,
/// μ = βπ²/3 with β = 0.06672455060314922; spin-polarised by the exact spin scaling
/// E_x[ρα, ρβ] = ½(E_x[2ρα] + E_x[2ρβ]).
/// </summary>
/// <remarks>J. P. Perdew, K. Burke &amp; M. Ernzerhof, Phys. Rev. Lett. 77, 3865 (1996), eqs. 11–14; erratum 78, 1396
/// (1997). Registry name "pbex".</remarks>
public sealed class PbeExchange : FunctionalComponent
{
    private const double Kappa = 0.804;
    internal const double PbeBeta = 0.06672455060314922;
    private static readonly double Mu = PbeBeta * Math.PI * Math.PI / 3;
    private static readonly double UnpolarizedSlater = 0.75 * Math.Cbrt(3 / Math.PI);
    private static readonly double FermiFactor = 4 * Math.Pow(3 * Math.PI * Math.PI, 2.0 / 3.0);

    /// <summary>The shared instance.</summary>
    public static PbeExchange Instance { get; } = new();

    private PbeExchange() { }

    /// <inheritdoc />
    public override string Name => "pbex";

    /// <inheritdoc />
    public override bool IsGradientCorrected => true;

    /// <inheritdoc />
    public override string Source => "Perdew, Burke & Ernzerhof, Phys. Rev. Lett. 77, 3865 (1996)";

    internal override DualNumber EnergyDensity(DualNumber rhoA, DualNumber rhoB, DualNumber sigmaAA, DualNumber sigmaAB, DualNumber sigmaBB) =>
        0.5 * (Unpolarized(2 * rhoA, 4 * sigmaAA) + Unpolarized(2 * rhoB, 4 * sigmaBB));

    private static DualNumber Unpolarized(DualNumber rho, DualNumber sigma)
    {
        if (rho.V < DensityThreshold) return 0;
        var r43 = DualNumber.Pow(rho, 4.0 / 3.0);
        var s2 = sigma / (FermiFactor * r43 * r43);
        var f = 1 + Kappa - Kappa / (1 + Mu * s2 / Kappa);
        return -UnpolarizedSlater * r43 * f;
    }
}
