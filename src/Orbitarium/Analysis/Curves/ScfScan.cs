using Orbitarium.Chemistry;
using Orbitarium.Scf;

namespace Orbitarium.Analysis;

/// <summary>
/// Energy scans computed with an SCF method: each point after the first starts from the previous point's orbitals
/// (<see cref="ScfOptions.WithInitialOrbitals"/>), which keeps the scan on one electronic state and saves iterations.
/// </summary>
public static class ScfScan
{
    /// <summary>Scans the distance between atoms a and b (0-based) with RHF, UHF or ROHF (or Kohn–Sham when the
    /// options carry a functional). Atom b moves along a→b.</summary>
    /// <param name="calculation">The calculation (molecule, basis, options) at the start geometry.</param>
    /// <param name="a">Fixed atom (0-based).</param>
    /// <param name="b">Moving atom (0-based).</param>
    /// <param name="distancesAngstrom">Distances in Å, in scan order. To follow a broken-symmetry UHF solution, scan from
    /// the dissociated end inwards with <see cref="ScfOptions.BreakSpinSymmetry"/> set: symmetry is broken at the first
    /// point and carried along by the restarts.</param>
    /// <param name="reference">RHF (default), UHF or ROHF.</param>
    /// <param name="progress">Receives a report after each point.</param>
    /// <param name="cancellationToken">Stops the scan.</param>
    public static EnergyScanResult BondLength(Calculation calculation, int a, int b, IReadOnlyList<double> distancesAngstrom,
        ScfReference reference = ScfReference.Restricted, IProgress<EnergyScanProgress>? progress = null, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(calculation);
        return EnergyScan.BondLength(calculation.Molecule, a, b, distancesAngstrom, Step(calculation, reference),
            MethodName(calculation, reference), progress, cancellationToken);
    }

    /// <summary>Scans any coordinate with an SCF method; <paramref name="setCoordinate"/> builds each geometry.</summary>
    /// <param name="calculation">The calculation at the start geometry.</param>
    /// <param name="values">Coordinate values in scan order.</param>
    /// <param name="setCoordinate">Returns the geometry for a value (e.g. from a Z-matrix).</param>
    /// <param name="coordinateName">Name of the coordinate.</param>
    /// <param name="coordinateUnit">Unit of the values ("Å", "°").</param>
    /// <param name="reference">RHF (default), UHF or ROHF.</param>
    /// <param name="progress">Receives a report after each point.</param>
    /// <param name="cancellationToken">Stops the scan.</param>
    public static EnergyScanResult Coordinate(Calculation calculation, IReadOnlyList<double> values, Func<Molecule, double, Molecule> setCoordinate,
        string coordinateName, string coordinateUnit, ScfReference reference = ScfReference.Restricted,
        IProgress<EnergyScanProgress>? progress = null, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(calculation);
        return EnergyScan.Run(calculation.Molecule, values, setCoordinate, Step(calculation, reference), coordinateName, coordinateUnit,
            MethodName(calculation, reference), progress, cancellationToken);
    }

    /// <summary>The scan step that runs the SCF at a geometry, restarting from the previous point's orbitals.</summary>
    /// <param name="calculation">The calculation whose basis set and options are used.</param>
    /// <param name="reference">RHF, UHF or ROHF.</param>
    public static ScanStep Step(Calculation calculation, ScfReference reference)
    {
        ArgumentNullException.ThrowIfNull(calculation);
        return (molecule, previous, ct) =>
        {
            var basis = calculation.Basis.WithMolecule(molecule);
            var options = calculation.Options;
            if (previous is ScfResult p)
                options = options.WithInitialOrbitals(p) with { BreakSpinSymmetry = false };
            var r = SelfConsistentField.Run(basis, reference, options, null, ct);
            return new EnergyScanPoint(0, r.TotalEnergyHartree, r.Converged, molecule, r);
        };
    }

    private static string MethodName(Calculation calculation, ScfReference reference)
    {
        string method = reference switch
        {
            ScfReference.Unrestricted => "UHF",
            ScfReference.RestrictedOpenShell => "ROHF",
            _ => "RHF",
        };
        if (calculation.Options.ExchangeCorrelation is { } xc) method = (reference == ScfReference.Unrestricted ? "U" : "R") + xc.Name;
        return $"{method}/{calculation.Basis.Name}";
    }
}
