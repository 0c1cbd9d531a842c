using System.Collections.Immutable;
using Orbitarium.Chemistry;

namespace Orbitarium.Geometry;

/// <summary>One evaluated point of a potential-energy surface.</summary>
/// <param name="Molecule">The geometry.</param>
/// <param name="EnergyHartree">Total energy in hartree.</param>
/// <param name="GradientHartreePerBohr">dE/dx as 3·N values (x₁ y₁ z₁ x₂ …) in hartree/bohr, or empty when not computed.</param>
/// <param name="GradientSource">How the gradient was obtained (<see cref="Geometry.GradientSource.None"/> when empty).</param>
/// <param name="DipoleAtomicUnits">Electric dipole moment in e·a₀ about the origin, when the method provides it
/// (used for infrared intensities).</param>
public sealed record SurfacePoint(
    Molecule Molecule,
    double EnergyHartree,
    ImmutableArray<double> GradientHartreePerBohr,
    GradientSource GradientSource,
    Vector3D? DipoleAtomicUnits = null)
{
    /// <summary>Whether a gradient is present.</summary>
    public bool HasGradient => !GradientHartreePerBohr.IsDefaultOrEmpty;

    /// <summary>An energy-only point.</summary>
    public static SurfacePoint EnergyOnly(Molecule molecule, double energyHartree, Vector3D? dipoleAtomicUnits = null) =>
        new(molecule, energyHartree, [], GradientSource.None, dipoleAtomicUnits);

    /// <summary>The gradient of atom <paramref name="atom"/> (0-based) in hartree/bohr.</summary>
    /// <exception cref="InvalidOperationException">No gradient was computed.</exception>
    public Vector3D AtomGradient(int atom)
    {
        if (!HasGradient) throw new InvalidOperationException("This surface point carries no gradient; evaluate it with a gradient first.");
        return new Vector3D(GradientHartreePerBohr[3 * atom], GradientHartreePerBohr[3 * atom + 1], GradientHartreePerBohr[3 * atom + 2]);
    }

    /// <summary>Largest absolute gradient component in hartree/bohr (0 without a gradient).</summary>
    public double MaxGradientComponent
    {
        get
        {
            double m = 0;
            if (HasGradient) foreach (double g in GradientHartreePerBohr) m = Math.Max(m, Math.Abs(g));
            return m;
        }
    }
}
