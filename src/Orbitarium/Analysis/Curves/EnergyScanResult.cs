using System.Globalization;
using System.Text;

namespace Orbitarium.Analysis;

/// <summary>An energy curve along one coordinate.</summary>
/// <param name="CoordinateName">Name of the coordinate, e.g. "r(H1–H2)".</param>
/// <param name="CoordinateUnit">Unit of the coordinate ("Å" for distances, "°" for angles).</param>
/// <param name="MethodName">Name of the method used, e.g. "RHF/cc-pVDZ".</param>
/// <param name="Points">The points, in scan order.</param>
/// <param name="BondAtoms">The two atoms (0-based) whose distance was scanned, or null for another coordinate.</param>
public sealed record EnergyScanResult(string CoordinateName, string CoordinateUnit, string MethodName,
    IReadOnlyList<EnergyScanPoint> Points, (int A, int B)? BondAtoms)
{
    /// <summary>Whether every point converged.</summary>
    public bool AllConverged => Points.All(p => p.Converged);

    /// <summary>The coordinates as an array.</summary>
    public double[] Coordinates => [.. Points.Select(p => p.Coordinate)];

    /// <summary>The energies (hartree) as an array.</summary>
    public double[] EnergiesHartree => [.. Points.Select(p => p.EnergyHartree)];

    /// <summary>The point with the lowest energy.</summary>
    public EnergyScanPoint Lowest => Points.Where(p => double.IsFinite(p.EnergyHartree)).MinBy(p => p.EnergyHartree)
        ?? throw new InvalidOperationException("The scan has no point with a finite energy.");

    /// <inheritdoc />
    public override string ToString()
    {
        var inv = CultureInfo.InvariantCulture;
        var sb = new StringBuilder();
        sb.Append(inv, $"Energy scan of {CoordinateName} ({MethodName}), {Points.Count} points\n");
        sb.Append(inv, $"{CoordinateName + " / " + CoordinateUnit,16}  {"E / Eh",16}  {"ΔE / kcal/mol",14}\n");
        double emin = Points.Count == 0 ? 0 : Points.Where(p => double.IsFinite(p.EnergyHartree)).Select(p => p.EnergyHartree).DefaultIfEmpty(0).Min();
        foreach (var p in Points)
            sb.Append(inv, $"{p.Coordinate,16:F4}  {p.EnergyHartree,16:F8}  {(p.EnergyHartree - emin) * PhysicalConstants.HartreeToKcalPerMol,14:F3}{(p.Converged ? "" : "  not converged")}\n");
        return sb.ToString().TrimEnd('\n');
    }
}
