using Orbitarium.Chemistry;

namespace Orbitarium.Analysis;

/// <summary>One point of an energy scan.</summary>
/// <param name="Coordinate">Value of the scanned coordinate (in the scan's unit).</param>
/// <param name="EnergyHartree">Energy in hartree (NaN if the calculation failed).</param>
/// <param name="Converged">Whether the method reported convergence at this point.</param>
/// <param name="Molecule">The geometry computed.</param>
/// <param name="Details">The method's full result at this point (e.g. an SCF result), or null.</param>
public sealed record EnergyScanPoint(double Coordinate, double EnergyHartree, bool Converged, Molecule Molecule, object? Details);
