using System.Globalization;
using Orbitarium.Chemistry;

namespace Orbitarium.Analysis;

/// <summary>Equally spaced points on a straight segment from <see cref="StartBohr"/> to <see cref="EndBohr"/>.</summary>
public sealed class LineGrid : IGrid
{
    private LineGrid(Vector3D startBohr, Vector3D endBohr, int count)
    {
        StartBohr = startBohr;
        EndBohr = endBohr;
        PointCount = count;
    }

    /// <summary>First point in bohr.</summary>
    public Vector3D StartBohr { get; }

    /// <summary>Last point in bohr.</summary>
    public Vector3D EndBohr { get; }

    /// <inheritdoc />
    public int PointCount { get; }

    /// <summary>Length of the segment in ångström.</summary>
    public double LengthAngstrom => Vector3D.Distance(StartBohr, EndBohr) * PhysicalConstants.AngstromPerBohr;

    /// <summary>Distance of point <paramref name="index"/> from the start, in ångström.</summary>
    /// <param name="index">Point index 0..PointCount−1.</param>
    public double PositionAngstrom(int index) => LengthAngstrom * index / (PointCount - 1);

    /// <summary>Distance of a point's projection on the line from the start, in ångström.</summary>
    /// <param name="pointBohr">A point in bohr (e.g. a nucleus).</param>
    public double ProjectAngstrom(Vector3D pointBohr)
    {
        var axis = EndBohr - StartBohr;
        return Vector3D.Dot(pointBohr - StartBohr, axis.Normalized()) * PhysicalConstants.AngstromPerBohr;
    }

    /// <inheritdoc />
    public void FillPoints(int start, Span<Vector3D> pointsBohr)
    {
        var step = (EndBohr - StartBohr) / (PointCount - 1);
        for (int k = 0; k < pointsBohr.Length; k++) pointsBohr[k] = StartBohr + (start + k) * step;
    }

    /// <inheritdoc />
    public string Describe() => string.Create(CultureInfo.InvariantCulture, $"line of {PointCount} points over {LengthAngstrom:F3} Å");

    /// <inheritdoc />
    public override string ToString() => Describe();

    /// <summary>A segment between two points given in ångström.</summary>
    /// <param name="startAngstrom">First point, Å.</param>
    /// <param name="endAngstrom">Last point, Å.</param>
    /// <param name="count">Number of points (at least 2; default 201).</param>
    public static LineGrid Between(Vector3D startAngstrom, Vector3D endAngstrom, int count = 201)
    {
        if (!startAngstrom.IsFinite || !endAngstrom.IsFinite) throw new OrbitariumInputException("A line end has a coordinate that is not a finite number.");
        if (Vector3D.Distance(startAngstrom, endAngstrom) < 1e-9) throw new OrbitariumInputException("The line's two ends coincide; give two different points.");
        if (count < 2) throw new OrbitariumInputException($"A line needs at least 2 points, got {count}.");
        GridMemory.EnsureFits(count, $"line of {count}");
        return new LineGrid(startAngstrom * PhysicalConstants.BohrPerAngstrom, endAngstrom * PhysicalConstants.BohrPerAngstrom, count);
    }

    /// <summary>The line through atoms a and b (0-based), extended beyond each by <paramref name="extensionAngstrom"/>.</summary>
    /// <param name="molecule">The molecule.</param>
    /// <param name="a">Atom at the start side.</param>
    /// <param name="b">Atom at the end side.</param>
    /// <param name="extensionAngstrom">Extension beyond each atom, Å (default 1.5).</param>
    /// <param name="count">Number of points (default 301).</param>
    public static LineGrid AlongBond(Molecule molecule, int a, int b, double extensionAngstrom = 1.5, int count = 301)
    {
        ArgumentNullException.ThrowIfNull(molecule);
        GridChecks.AtomIndex(molecule, a); GridChecks.AtomIndex(molecule, b);
        if (a == b) throw new OrbitariumInputException($"A bond needs two different atoms; both indices are {a}.");
        GridChecks.NonNegative(extensionAngstrom, "extension (Å)");
        var pa = molecule.Atoms[a].PositionAngstrom;
        var pb = molecule.Atoms[b].PositionAngstrom;
        var u = (pb - pa).Normalized();
        return Between(pa - extensionAngstrom * u, pb + extensionAngstrom * u, count);
    }
}
