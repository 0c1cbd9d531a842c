namespace Orbitarium.Dft.Functionals;

/// <summary>
/// Perdew–Wang 1992 correlation of the uniform electron gas, G(r_s) fits for the paramagnetic and ferromagnetic
/// gases and the spin stiffness, interpolated in ζ.
/// </summary>
/// <remarks>J. P. Perdew &amp; Y. Wang, Phys. Rev. B 45, 13244 (1992), eqs. 8–10 and table I:
/// G(r_s) = −2A(1 + α₁r_s) ln(1 + 1/(2A(β₁r_s^{1/2} + β₂r_s + β₃r_s^{3/2} + β₄r_s²))),
/// ε = ε_P − α_c f(ζ)/f''(0)(1 − ζ⁴) + (ε_F − ε_P) f(ζ) ζ⁴.
/// <see cref="Instance"/> ("pw92") uses the table's A values and f''(0) = 1.709921 as printed; <see cref="Modified"/>
/// ("pw92mod") uses A to more digits (0.0310907, 0.01554535, 0.0168869) and the exact f''(0), as PBE correlation does.</remarks>
public sealed class Pw92Correlation : FunctionalComponent
{
    private readonly double[] _a, _alpha1 = [0.21370, 0.20548, 0.11125], _beta1 = [7.5957, 14.1189, 10.357],
        _beta2 = [3.5876, 6.1977, 3.6231], _beta3 = [1.6382, 3.3662, 0.88026], _beta4 = [0.49294, 0.62517, 0.49671];
    private readonly double _fz20;

    /// <summary>PW92 with the parameters as printed in the paper (registry name "pw92").</summary>
    public static Pw92Correlation Instance { get; } = new(false);

    /// <summary>PW92 with the more precise A values and exact f''(0) (registry name "pw92mod"); used by PBE correlation.</summary>
    public static Pw92Correlation Modified { get; } = new(true);

    private Pw92Correlation(bool modified)
    {
        IsModified = modified;
        _a = modified ? [0.0310907, 0.01554535, 0.0168869] : [0.031091, 0.015545, 0.016887];
        _fz20 = modified ? UniformGas.SpinInterpolationCurvature : 1.709921;
    }

    /// <summary>Whether this is the more precise ("modified") parameter set.</summary>
    public bool IsModified { get; }

    /// <inheritdoc />
    public override string Name => IsModified ? "pw92mod" : "pw92";

    /// <inheritdoc />
    public override bool IsGradientCorrected => false;

    /// <inheritdoc />
    public override string Source => "Perdew & Wang, Phys. Rev. B 45, 13244 (1992)";

    private DualNumber G(int k, DualNumber rs, DualNumber sqrtRs)
    {
        var den = 2 * _a[k] * (_beta1[k] * sqrtRs + _beta2[k] * rs + _beta3[k] * rs * sqrtRs + _beta4[k] * rs * rs);
        return -2 * _a[k] * (1 + _alpha1[k] * rs) * DualNumber.Log1P(1 / den);
    }

    /// <summary>ε_c(r_s, ζ) per electron in hartree.</summary>
    internal DualNumber EnergyPerElectron(DualNumber rhoA, DualNumber rhoB)
    {
        var rho = rhoA + rhoB;
        var rs = UniformGas.WignerSeitzRadius(rho);
        var sq = DualNumber.Sqrt(rs);
        var zeta = (rhoA - rhoB) / rho;
        var f = UniformGas.SpinInterpolation(2 * rhoA / rho, 2 * rhoB / rho);
        var z4 = DualNumber.Square(DualNumber.Square(zeta));
        var g1 = G(0, rs, sq);
        var g2 = G(1, rs, sq);
        var g3 = G(2, rs, sq);
        return g1 + z4 * f * (g2 - g1 + g3 / _fz20) - f * g3 / _fz20;
    }

    internal override DualNumber EnergyDensity(DualNumber rhoA, DualNumber rhoB, DualNumber sigmaAA, DualNumber sigmaAB, DualNumber sigmaBB) =>
        (rhoA + rhoB) * EnergyPerElectron(rhoA, rhoB);
}
