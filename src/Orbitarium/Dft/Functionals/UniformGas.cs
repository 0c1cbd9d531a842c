namespace Orbitarium.Dft.Functionals;

/// <summary>Helpers shared by the uniform-electron-gas based components: Wigner–Seitz radius and spin interpolation.</summary>
internal static class UniformGas
{
    /// <summary>2^{4/3} − 2, the denominator of the spin-interpolation function f(ζ).</summary>
    public static readonly double SpinInterpolationDenominator = Math.Pow(2, 4.0 / 3.0) - 2;

    /// <summary>f''(0) = 4 / (9 (2^{1/3} − 1)), exactly.</summary>
    public static readonly double SpinInterpolationCurvature = 4 / (9 * (Math.Cbrt(2) - 1));

    /// <summary>Wigner–Seitz radius r_s = (3 / (4πρ))^{1/3} in bohr.</summary>
    public static DualNumber WignerSeitzRadius(DualNumber rho) => DualNumber.Cbrt(3 / (4 * Math.PI * rho));

    /// <summary>f(ζ) = ((1+ζ)^{4/3} + (1−ζ)^{4/3} − 2) / (2^{4/3} − 2) from the spin densities
    /// (1 ± ζ = 2ρα/ρ, 2ρβ/ρ, which keeps full precision near ζ = ±1). Von Barth &amp; Hedin, J. Phys. C 5, 1629 (1972).</summary>
    public static DualNumber SpinInterpolation(DualNumber onePlusZeta, DualNumber oneMinusZeta) =>
        (DualNumber.Pow(onePlusZeta, 4.0 / 3.0) + DualNumber.Pow(oneMinusZeta, 4.0 / 3.0) - 2) / SpinInterpolationDenominator;
}
