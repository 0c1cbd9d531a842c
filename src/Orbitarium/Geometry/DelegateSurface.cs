using System.Collections.Immutable;
using Orbitarium.Chemistry;

namespace Orbitarium.Geometry;

/// <summary>A potential-energy surface built from delegates: an energy function and, optionally, its gradient.
/// Handy for model potentials in scripts and for plugging any energy method into the optimiser.</summary>
public sealed class DelegateSurface : IPotentialEnergySurface
{
    private readonly Func<Molecule, double> _energy;
    private readonly Func<Molecule, double[]>? _gradient;
    private readonly Func<Molecule, Vector3D>? _dipole;

    /// <summary>Creates the surface.</summary>
    /// <param name="methodName">Name shown in results.</param>
    /// <param name="energyHartree">Energy in hartree of a geometry; must be thread-safe.</param>
    /// <param name="gradientHartreePerBohr">Analytic gradient (3·N values, hartree/bohr), or null to use finite differences.</param>
    /// <param name="dipoleAtomicUnits">Dipole moment in e·a₀, or null when unknown.</param>
    public DelegateSurface(string methodName, Func<Molecule, double> energyHartree,
        Func<Molecule, double[]>? gradientHartreePerBohr = null, Func<Molecule, Vector3D>? dipoleAtomicUnits = null)
    {
        ArgumentNullException.ThrowIfNull(methodName);
        ArgumentNullException.ThrowIfNull(energyHartree);
        MethodName = methodName;
        _energy = energyHartree;
        _gradient = gradientHartreePerBohr;
        _dipole = dipoleAtomicUnits;
    }

    /// <inheritdoc />
    public string MethodName { get; }

    /// <inheritdoc />
    public bool HasAnalyticGradient => _gradient is not null;

    /// <inheritdoc />
    public SurfacePoint Evaluate(Molecule molecule, bool withGradient, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(molecule);
        cancellationToken.ThrowIfCancellationRequested();
        double e = _energy(molecule);
        Vector3D? mu = _dipole?.Invoke(molecule);
        if (withGradient && _gradient is not null)
        {
            var g = _gradient(molecule);
            if (g.Length != 3 * molecule.AtomCount)
                throw new InvalidOperationException($"The gradient delegate returned {g.Length} values; expected {3 * molecule.AtomCount} (3 per atom).");
            return new SurfacePoint(molecule, e, [.. g], GradientSource.Analytic, mu);
        }
        return SurfacePoint.EnergyOnly(molecule, e, mu);
    }
}
