using System.Collections.Immutable;
using MathNet.Numerics.LinearAlgebra;
using Orbitarium.Chemistry;

namespace Orbitarium.Geometry.Vibrations;

/// <summary>A Cartesian Hessian at a geometry, with the dipole derivatives when the method provides dipoles.</summary>
/// <param name="Molecule">The geometry.</param>
/// <param name="EnergyHartree">Energy at the geometry.</param>
/// <param name="GradientHartreePerBohr">Gradient at the geometry (3·N, hartree/bohr).</param>
/// <param name="HessianHartreePerBohr2">∂²E/∂xᵢ∂xⱼ (3N × 3N, hartree/bohr², symmetrised).</param>
/// <param name="DipoleDerivatives">∂μ_k/∂xᵢ (3 × 3N, e·a₀/bohr = e), or null without dipoles.</param>
/// <param name="GradientSource">How the gradients differentiated were obtained.</param>
/// <param name="StepBohr">The finite-difference displacement used.</param>
public sealed record CartesianHessian(
    Molecule Molecule,
    double EnergyHartree,
    ImmutableArray<double> GradientHartreePerBohr,
    Matrix<double> HessianHartreePerBohr2,
    Matrix<double>? DipoleDerivatives,
    GradientSource GradientSource,
    double StepBohr);
