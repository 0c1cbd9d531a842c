using System.Collections.Immutable;

namespace Orbitarium.Geometry.Vibrations;

/// <summary>One harmonic normal mode.</summary>
/// <param name="Index">0-based position in ascending order of wavenumber (imaginary modes first).</param>
/// <param name="WavenumberPerCm">Harmonic wavenumber in cm⁻¹; negative values denote imaginary frequencies.</param>
/// <param name="ForceConstantHartreePerBohr2Dalton">Eigenvalue of the mass-weighted Hessian, Eₕ/(bohr²·u).</param>
/// <param name="CartesianDisplacement">Normalised Cartesian displacement vector (3·N, dimensionless).</param>
/// <param name="IrIntensityKmPerMol">Infrared intensity in km/mol, or null when the method gives no dipoles.</param>
/// <param name="ReducedMassDalton">Reduced mass of the mode in u.</param>
public sealed record VibrationalMode(
    int Index,
    double WavenumberPerCm,
    double ForceConstantHartreePerBohr2Dalton,
    ImmutableArray<double> CartesianDisplacement,
    double? IrIntensityKmPerMol,
    double ReducedMassDalton)
{
    /// <summary>Whether the frequency is imaginary (negative curvature: a saddle-point direction).</summary>
    public bool IsImaginary => WavenumberPerCm < 0;

    /// <inheritdoc />
    public override string ToString() =>
        FormattableString.Invariant($"mode {Index + 1,3}: {Math.Abs(WavenumberPerCm),10:F2}{(IsImaginary ? "i" : " ")} cm⁻¹") +
        (IrIntensityKmPerMol is double ir ? FormattableString.Invariant($"  IR {ir,9:F3} km/mol") : "");
}
