namespace Orbitarium.Dft.Functionals;

/// <summary>
/// Becke 1988 gradient-corrected exchange: per spin, e_x,σ = e_x,σ^{LDA} − β ρσ^{4/3} x²/(1 + 6βx asinh x),
/// x = |∇ρσ|/ρσ^{4/3}, β = 0.0042.
/// </summary>
/// <remarks>A. D. Becke, Phys. Rev. A 38, 3098 (1988), eq. 8. Includes the Slater term. Registry name "b88".</remarks>
public sealed class Becke88Exchange : FunctionalComponent
{
    private const double Beta = 0.0042;

    /// <summary>The shared instance.</summary>
    public static Becke88Exchange Instance { get; } = new();

    private Becke88Exchange() { }

    /// <inheritdoc />
    public override string Name => "b88";

    /// <inheritdoc />
    public override bool IsGradientCorrected => true;

    /// <inheritdoc />
    public override string Source => "Becke, Phys. Rev. A 38, 3098 (1988)";

    internal override DualNumber EnergyDensity(DualNumber rhoA, DualNumber rhoB, DualNumber sigmaAA, DualNumber sigmaAB, DualNumber sigmaBB) =>
        Spin(rhoA, sigmaAA) + Spin(rhoB, sigmaBB);

    private static DualNumber Spin(DualNumber rho, DualNumber sigma)
    {
        if (rho.V < 0.5 * DensityThreshold) return 0;
        var r43 = DualNumber.Pow(rho, 4.0 / 3.0);
        var x = DualNumber.Sqrt(sigma) / r43;
        return -SlaterExchange.SpinCoefficient * r43 - Beta * sigma / r43 / (1 + 6 * Beta * x * DualNumber.Asinh(x));
    }
}
