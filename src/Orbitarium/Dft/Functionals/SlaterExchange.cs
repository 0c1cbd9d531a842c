namespace Orbitarium.Dft.Functionals;

/// <summary>
/// Slater (Dirac) exchange of the uniform electron gas: e_x = −(3/4)(6/π)^{1/3} Σ_σ ρ_σ^{4/3}
/// (−(3/4)(3/π)^{1/3} ρ^{4/3} for a closed shell).
/// </summary>
/// <remarks>P. A. M. Dirac, Proc. Cambridge Philos. Soc. 26, 376 (1930); J. C. Slater, Phys. Rev. 81, 385 (1951)
/// with α = 2/3. Registry name "slater".</remarks>
public sealed class SlaterExchange : FunctionalComponent
{
    /// <summary>(3/4)(6/π)^{1/3}, the per-spin coefficient.</summary>
    internal static readonly double SpinCoefficient = 0.75 * Math.Cbrt(6 / Math.PI);

    /// <summary>The shared instance.</summary>
    public static SlaterExchange Instance { get; } = new();

    private SlaterExchange() { }

    /// <inheritdoc />
    public override string Name => "slater";

    /// <inheritdoc />
    public override bool IsGradientCorrected => false;

    /// <inheritdoc />
    public override string Source => "Dirac, Proc. Cambridge Philos. Soc. 26, 376 (1930); Slater, Phys. Rev. 81, 385 (1951)";

    internal override DualNumber EnergyDensity(DualNumber rhoA, DualNumber rhoB, DualNumber sigmaAA, DualNumber sigmaAB, DualNumber sigmaBB) =>
        -SpinCoefficient * (DualNumber.Pow(rhoA, 4.0 / 3.0) + DualNumber.Pow(rhoB, 4.0 / 3.0));
}
