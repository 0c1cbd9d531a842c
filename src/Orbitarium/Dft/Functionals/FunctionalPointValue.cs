namespace Orbitarium.Dft.Functionals;

/// <summary>
/// A functional's energy density and first derivatives at one point of a spin-polarised density.
/// </summary>
/// <param name="EnergyDensity">e = ρ ε_xc, hartree per bohr³ (the quantity integrated over space).</param>
/// <param name="VRhoAlpha">∂e/∂ρα, hartree.</param>
/// <param name="VRhoBeta">∂e/∂ρβ, hartree.</param>
/// <param name="VSigmaAlphaAlpha">∂e/∂σαα with σαα = ∇ρα·∇ρα, hartree·bohr².</param>
/// <param name="VSigmaAlphaBeta">∂e/∂σαβ with σαβ = ∇ρα·∇ρβ, hartree·bohr².</param>
/// <param name="VSigmaBetaBeta">∂e/∂σββ, hartree·bohr².</param>
public readonly record struct FunctionalPointValue(
    double EnergyDensity, double VRhoAlpha, double VRhoBeta,
    double VSigmaAlphaAlpha, double VSigmaAlphaBeta, double VSigmaBetaBeta);

/// <summary>
/// A functional's energy density and first derivatives at one point of a closed-shell (unpolarised) density.
/// </summary>
/// <param name="EnergyDensity">e = ρ ε_xc, hartree per bohr³.</param>
/// <param name="VRho">∂e/∂ρ with ρ the total density, hartree.</param>
/// <param name="VSigma">∂e/∂σ with σ = |∇ρ|², hartree·bohr².</param>
public readonly record struct UnpolarizedFunctionalPointValue(double EnergyDensity, double VRho, double VSigma);
