using System.Globalization;
using Orbitarium.Chemistry;

namespace Orbitarium.Analysis;

/// <summary>A method the scan calls at each geometry: returns the energy, whether it converged, and its full result,
/// given the previous point's result (null at the first point) so it can restart from the previous orbitals.</summary>
/// <param name="molecule">The geometry to compute.</param>
/// <param name="previous">The previous point's <see cref="EnergyScanPoint.Details"/>, or null.</param>
/// <param name="cancellationToken">Stops the calculation.</param>
public delegate EnergyScanPoint ScanStep(Molecule molecule, object? previous, CancellationToken cancellationToken);

/// <summary>
/// Energy scans along a bond length or any internal coordinate, computing each point with a caller-given method and
/// restarting each point from the previous one's result.
/// </summary>
public static class EnergyScan
{
    /// <summary>Scans any coordinate: <paramref name="setCoordinate"/> builds each geometry from the start molecule.</summary>
    /// <param name="start">The starting geometry.</param>
    /// <param name="values">Values of the coordinate, in scan order (neighbouring values make restarts effective).</param>
    /// <param name="setCoordinate">Returns the geometry with the coordinate set to a value.</param>
    /// <param name="step">Computes one point.</param>
    /// <param name="coordinateName">Name of the coordinate for tables and plots.</param>
    /// <param name="coordinateUnit">Unit of the values ("Å", "°", …).</param>
    /// <param name="methodName">Name of the method for tables and plots.</param>
    /// <param name="progress">Receives a report after each point.</param>
    /// <param name="cancellationToken">Stops the scan between (and within) points.</param>
    public static EnergyScanResult Run(Molecule start, IReadOnlyList<double> values, Func<Molecule, double, Molecule> setCoordinate,
        ScanStep step, string coordinateName, string coordinateUnit, string methodName,
        IProgress<EnergyScanProgress>? progress = null, CancellationToken cancellationToken = default) =>
        RunCore(start, values, setCoordinate, step, coordinateName, coordinateUnit, methodName, null, progress, cancellationToken);

    /// <summary>Scans the distance between atoms <paramref name="a"/> and <paramref name="b"/> (0-based): atom b moves
    /// along the a→b direction, every other atom stays.</summary>
    /// <param name="start">The starting geometry.</param>
    /// <param name="a">Fixed atom (0-based).</param>
    /// <param name="b">Moving atom (0-based).</param>
    /// <param name="distancesAngstrom">Distances in Å, in scan order.</param>
    /// <param name="step">Computes one point.</param>
    /// <param name="methodName">Name of the method for tables and plots.</param>
    /// <param name="progress">Receives a report after each point.</param>
    /// <param name="cancellationToken">Stops the scan.</param>
    /// <exception cref="OrbitariumInputException">An atom index is unknown, the atoms are the same, or a distance is not positive.</exception>
    public static EnergyScanResult BondLength(Molecule start, int a, int b, IReadOnlyList<double> distancesAngstrom, ScanStep step,
        string methodName = "", IProgress<EnergyScanProgress>? progress = null, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(start);
        ArgumentNullException.ThrowIfNull(distancesAngstrom);
        GridChecks.AtomIndex(start, a); GridChecks.AtomIndex(start, b);
        if (a == b) throw new OrbitariumInputException($"A bond length needs two different atoms; both indices are {a}.");
        foreach (double d in distancesAngstrom) GridChecks.Positive(d, "scan distance (Å)");
        string name = string.Create(CultureInfo.InvariantCulture, $"r({start.Atoms[a].Symbol}{a + 1}–{start.Atoms[b].Symbol}{b + 1})");
        return RunCore(start, distancesAngstrom, (m, d) => WithBondLength(m, a, b, d), step, name, "Å", methodName, (a, b), progress, cancellationToken);
    }

    /// <summary>Returns a copy of the molecule with atom b moved along a→b to distance <paramref name="distanceAngstrom"/> from atom a.</summary>
    /// <param name="molecule">The molecule.</param>
    /// <param name="a">Fixed atom (0-based).</param>
    /// <param name="b">Moving atom (0-based).</param>
    /// <param name="distanceAngstrom">New distance in Å.</param>
    public static Molecule WithBondLength(Molecule molecule, int a, int b, double distanceAngstrom)
    {
        ArgumentNullException.ThrowIfNull(molecule);
        var pa = molecule.Atoms[a].PositionBohr;
        var u = (molecule.Atoms[b].PositionBohr - pa).Normalized();
        return molecule.WithAtomPositionBohr(b, pa + distanceAngstrom * PhysicalConstants.BohrPerAngstrom * u);
    }

    private static EnergyScanResult RunCore(Molecule start, IReadOnlyList<double> values, Func<Molecule, double, Molecule> setCoordinate,
        ScanStep step, string coordinateName, string coordinateUnit, string methodName, (int, int)? bond,
        IProgress<EnergyScanProgress>? progress, CancellationToken cancellationToken)
    {
        ArgumentNullException.ThrowIfNull(start);
        ArgumentNullException.ThrowIfNull(values);
        ArgumentNullException.ThrowIfNull(setCoordinate);
        ArgumentNullException.ThrowIfNull(step);
        if (values.Count == 0) throw new OrbitariumInputException("The scan has no coordinate values; give at least one.");
        var points = new List<EnergyScanPoint>(values.Count);
        object? previous = null;
        for (int i = 0; i < values.Count; i++)
        {
            cancellationToken.ThrowIfCancellationRequested();
            var molecule = setCoordinate(start, values[i]);
            var result = step(molecule, previous, cancellationToken);
            var point = result with { Coordinate = values[i], Molecule = molecule };
            points.Add(point);
            previous = point.Details ?? previous;
            progress?.Report(new EnergyScanProgress(i + 1, values.Count, point));
        }
        return new EnergyScanResult(coordinateName, coordinateUnit, methodName, points, bond);
    }
}
