using System.Collections.Immutable;
using System.Globalization;
using System.Text;
using Orbitarium.Chemistry;

namespace Orbitarium.Geometry.Optimization;

/// <summary>One point of a relaxed scan.</summary>
/// <param name="Value">The scanned coordinate's value (Å or degrees).</param>
/// <param name="Optimization">The constrained optimisation at that value.</param>
public sealed record RelaxedScanPoint(double Value, OptimizationResult Optimization)
{
    /// <summary>Energy at the relaxed geometry, hartree.</summary>
    public double EnergyHartree => Optimization.EnergyHartree;

    /// <summary>The relaxed geometry.</summary>
    public Molecule Molecule => Optimization.Molecule;
}

/// <summary>The outcome of a relaxed scan: one constrained optimisation per value, in order.</summary>
/// <param name="Coordinate">A description of the scanned coordinate, e.g. "distance 0-1".</param>
/// <param name="Unit">"Å" or "degrees".</param>
/// <param name="Points">The points in scan order.</param>
public sealed record RelaxedScanResult(string Coordinate, string Unit, ImmutableArray<RelaxedScanPoint> Points)
{
    /// <summary>Whether every constrained optimisation converged.</summary>
    public bool AllConverged => Points.All(p => p.Optimization.Converged);

    /// <summary>The relaxed geometries as multi-frame XYZ text.</summary>
    public string ToXyzFrames() => XyzFormat.WriteFrames(Points.Select(p =>
        p.Molecule.WithTitle(string.Create(CultureInfo.InvariantCulture, $"{Coordinate} = {p.Value} {Unit} E = {p.EnergyHartree:F10} Eh"))));

    /// <inheritdoc />
    public override string ToString()
    {
        var sb = new StringBuilder();
        sb.Append(CultureInfo.InvariantCulture, $"Relaxed scan of {Coordinate} ({Points.Length} points{(AllConverged ? "" : ", NOT ALL CONVERGED")})");
        foreach (var p in Points)
            sb.Append(CultureInfo.InvariantCulture, $"\n  {p.Value,12:F4} {Unit}  {p.EnergyHartree,18:F10} Eh{(p.Optimization.Converged ? "" : "  (not converged)")}");
        return sb.ToString();
    }
}

/// <summary>
/// Relaxed scans: a distance, angle or dihedral is fixed at a series of values and every other coordinate is optimised
/// at each one, each optimisation starting from the previous relaxed geometry.
/// </summary>
public static class RelaxedScan
{
    /// <summary>Runs a relaxed scan.</summary>
    /// <param name="surface">The energy/gradient provider.</param>
    /// <param name="molecule">The starting geometry.</param>
    /// <param name="scanned">A <see cref="DistanceConstraint"/>, <see cref="AngleConstraint"/> or <see cref="DihedralConstraint"/>
    /// (its own value is ignored) naming the coordinate.</param>
    /// <param name="values">Values in Å (distances) or degrees (angles, dihedrals).</param>
    /// <param name="options">Optimisation settings; their constraints are kept in addition to the scanned one.</param>
    /// <param name="progress">Receives each finished point.</param>
    /// <param name="cancellationToken">Stops the scan.</param>
    /// <exception cref="OrbitariumInputException">No values, or the constraint is a frozen atom.</exception>
    public static RelaxedScanResult Run(IPotentialEnergySurface surface, Molecule molecule, GeometryConstraint scanned,
        IReadOnlyList<double> values, OptimizationOptions? options = null, IProgress<RelaxedScanPoint>? progress = null,
        CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(surface);
        ArgumentNullException.ThrowIfNull(molecule);
        ArgumentNullException.ThrowIfNull(scanned);
        ArgumentNullException.ThrowIfNull(values);
        if (values.Count == 0) throw new OrbitariumInputException("A relaxed scan needs at least one value of the coordinate.");
        options ??= OptimizationOptions.Default;
        scanned.Validate(molecule);
        var points = ImmutableArray.CreateBuilder<RelaxedScanPoint>(values.Count);
        var current = molecule;
        string unit = scanned is DistanceConstraint ? "Å" : "degrees";
        foreach (double v in values)
        {
            cancellationToken.ThrowIfCancellationRequested();
            GeometryConstraint fixedAt = scanned switch
            {
                DistanceConstraint d => d with { ValueAngstrom = v },
                AngleConstraint a => a with { ValueDegrees = v },
                DihedralConstraint t => t with { ValueDegrees = v },
                _ => throw new OrbitariumInputException("Scan a distance, angle or dihedral; a frozen atom has no value to scan."),
            };
            var result = GeometryOptimizer.Run(surface, current, options.WithConstraint(fixedAt), null, cancellationToken);
            var point = new RelaxedScanPoint(v, result);
            points.Add(point);
            progress?.Report(point);
            current = result.Molecule;
        }
        string name = scanned switch
        {
            DistanceConstraint d => $"distance {d.I}-{d.J}",
            AngleConstraint a => $"angle {a.I}-{a.J}-{a.K}",
            DihedralConstraint t => $"dihedral {t.I}-{t.J}-{t.K}-{t.L}",
            _ => scanned.ToString(),
        };
        return new RelaxedScanResult(name, unit, points.MoveToImmutable());
    }
}
