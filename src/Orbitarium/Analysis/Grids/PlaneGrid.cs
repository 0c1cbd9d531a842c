using System.Globalization;
using Orbitarium.Chemistry;

namespace Orbitarium.Analysis;

/// <summary>
/// A rectangular grid of points in a plane: centre, two orthonormal in-plane axes U and V, and an equal spacing.
/// Point (i, j) sits at centre + u_i U + v_j V with u_i = −HalfWidthU + i·spacing; index = j·CountU + i.
/// </summary>
public sealed class PlaneGrid : IGrid
{
    private PlaneGrid(Vector3D centerBohr, Vector3D axisU, Vector3D axisV, double halfWidthUBohr, double halfWidthVBohr, double spacingBohr)
    {
        CenterBohr = centerBohr;
        AxisU = axisU;
        AxisV = axisV;
        SpacingBohr = spacingBohr;
        CountU = GridChecks.Count(2 * halfWidthUBohr, spacingBohr, "plane");
        CountV = GridChecks.Count(2 * halfWidthVBohr, spacingBohr, "plane");
        HalfWidthUBohr = 0.5 * (CountU - 1) * spacingBohr;
        HalfWidthVBohr = 0.5 * (CountV - 1) * spacingBohr;
        GridMemory.EnsureFits((long)CountU * CountV, $"{CountU} × {CountV}");
    }

    /// <summary>Centre of the plane in bohr.</summary>
    public Vector3D CenterBohr { get; }

    /// <summary>First in-plane unit vector (the horizontal axis of a map).</summary>
    public Vector3D AxisU { get; }

    /// <summary>Second in-plane unit vector (the vertical axis of a map).</summary>
    public Vector3D AxisV { get; }

    /// <summary>Unit normal U × V.</summary>
    public Vector3D Normal => Vector3D.Cross(AxisU, AxisV);

    /// <summary>Spacing between neighbouring points in bohr.</summary>
    public double SpacingBohr { get; }

    /// <summary>Points along U.</summary>
    public int CountU { get; }

    /// <summary>Points along V.</summary>
    public int CountV { get; }

    /// <summary>Half the width along U in bohr.</summary>
    public double HalfWidthUBohr { get; }

    /// <summary>Half the width along V in bohr.</summary>
    public double HalfWidthVBohr { get; }

    /// <inheritdoc />
    public int PointCount => CountU * CountV;

    /// <summary>In-plane coordinate u of column i, in ångström (0 at the centre).</summary>
    /// <param name="i">Column index 0..CountU−1.</param>
    public double UAngstrom(int i) => (-HalfWidthUBohr + i * SpacingBohr) * PhysicalConstants.AngstromPerBohr;

    /// <summary>In-plane coordinate v of row j, in ångström (0 at the centre).</summary>
    /// <param name="j">Row index 0..CountV−1.</param>
    public double VAngstrom(int j) => (-HalfWidthVBohr + j * SpacingBohr) * PhysicalConstants.AngstromPerBohr;

    /// <summary>Projects a point (bohr) onto the plane: in-plane coordinates u, v and signed distance from the plane, all in ångström.</summary>
    /// <param name="pointBohr">The point in bohr.</param>
    public (double UAngstrom, double VAngstrom, double DistanceAngstrom) Project(Vector3D pointBohr)
    {
        var d = pointBohr - CenterBohr;
        return (Vector3D.Dot(d, AxisU) * PhysicalConstants.AngstromPerBohr,
                Vector3D.Dot(d, AxisV) * PhysicalConstants.AngstromPerBohr,
                Vector3D.Dot(d, Normal) * PhysicalConstants.AngstromPerBohr);
    }

    /// <inheritdoc />
    public void FillPoints(int start, Span<Vector3D> pointsBohr)
    {
        for (int k = 0; k < pointsBohr.Length; k++)
        {
            int p = start + k, i = p % CountU, j = p / CountU;
            double u = -HalfWidthUBohr + i * SpacingBohr, v = -HalfWidthVBohr + j * SpacingBohr;
            pointsBohr[k] = CenterBohr + u * AxisU + v * AxisV;
        }
    }

    /// <inheritdoc />
    public string Describe() => string.Create(CultureInfo.InvariantCulture,
        $"plane {CountU} × {CountV} points, {2 * HalfWidthUBohr * PhysicalConstants.AngstromPerBohr:F2} × {2 * HalfWidthVBohr * PhysicalConstants.AngstromPerBohr:F2} Å, spacing {SpacingBohr * PhysicalConstants.AngstromPerBohr:F3} Å");

    /// <inheritdoc />
    public override string ToString() => Describe();

    /// <summary>The plane through three atoms (0-based indices), U along a→b, sized to hold every atom's projection
    /// plus a margin.</summary>
    /// <param name="molecule">The molecule.</param>
    /// <param name="a">First atom (0-based).</param>
    /// <param name="b">Second atom; U points from a to b.</param>
    /// <param name="c">Third atom, on the +V side.</param>
    /// <param name="marginAngstrom">Space around the outermost atoms, Å (default 2).</param>
    /// <param name="spacingAngstrom">Point spacing, Å (default 0.05).</param>
    /// <exception cref="OrbitariumInputException">The three atoms are collinear, an index is unknown, or the grid is too large.</exception>
    public static PlaneGrid ThroughAtoms(Molecule molecule, int a, int b, int c, double marginAngstrom = 2.0, double spacingAngstrom = 0.05)
    {
        ArgumentNullException.ThrowIfNull(molecule);
        GridChecks.AtomIndex(molecule, a); GridChecks.AtomIndex(molecule, b); GridChecks.AtomIndex(molecule, c);
        var pa = molecule.Atoms[a].PositionBohr;
        var ab = molecule.Atoms[b].PositionBohr - pa;
        var ac = molecule.Atoms[c].PositionBohr - pa;
        var n = Vector3D.Cross(ab, ac);
        if (ab.Length < 1e-8 || ac.Length < 1e-8 || n.Length < 1e-3 * ab.Length * ac.Length)
            throw new OrbitariumInputException(
                $"Atoms {a}, {b} and {c} are collinear and do not define a plane; choose a non-collinear third atom, or use PlaneGrid.ContainingBond or PlaneGrid.FromPointAndNormal.");
        var u = ab.Normalized();
        var v = Vector3D.Cross(n.Normalized(), u);
        return Enclosing(molecule, pa, u, v, marginAngstrom, spacingAngstrom);
    }

    /// <summary>A plane containing the bond a–b (0-based indices), U along a→b. V is the component of
    /// <paramref name="inPlaneDirection"/> perpendicular to the bond; by default the direction towards the nearest
    /// atom off the bond axis, or any perpendicular for a linear molecule.</summary>
    /// <param name="molecule">The molecule.</param>
    /// <param name="a">First atom (0-based).</param>
    /// <param name="b">Second atom.</param>
    /// <param name="inPlaneDirection">Optional second in-plane direction (any unit).</param>
    /// <param name="marginAngstrom">Space around the outermost atoms, Å (default 2).</param>
    /// <param name="spacingAngstrom">Point spacing, Å (default 0.05).</param>
    public static PlaneGrid ContainingBond(Molecule molecule, int a, int b, Vector3D? inPlaneDirection = null,
        double marginAngstrom = 2.0, double spacingAngstrom = 0.05)
    {
        ArgumentNullException.ThrowIfNull(molecule);
        GridChecks.AtomIndex(molecule, a); GridChecks.AtomIndex(molecule, b);
        if (a == b) throw new OrbitariumInputException($"A bond needs two different atoms; both indices are {a}.");
        var pa = molecule.Atoms[a].PositionBohr;
        var u = (molecule.Atoms[b].PositionBohr - pa).Normalized();
        Vector3D? w = inPlaneDirection;
        if (w is null)
        {
            double best = double.MaxValue;
            for (int k = 0; k < molecule.AtomCount; k++)
            {
                var d = molecule.Atoms[k].PositionBohr - pa;
                var perp = d - Vector3D.Dot(d, u) * u;
                if (perp.Length > 0.1 && d.Length < best) { best = d.Length; w = perp; }
            }
        }
        var v = PerpendicularPart(w ?? AnyPerpendicular(u), u);
        if (v is null)
            throw new OrbitariumInputException("The given in-plane direction is parallel to the bond; give a direction with a component perpendicular to it.");
        return Enclosing(molecule, pa, u, v.Value, marginAngstrom, spacingAngstrom);
    }

    /// <summary>A plane given by a centre point and a normal (ångström), with a width and height.</summary>
    /// <param name="centerAngstrom">Centre of the plane in Å.</param>
    /// <param name="normal">Normal direction (any length but not zero).</param>
    /// <param name="widthAngstrom">Extent along U in Å.</param>
    /// <param name="heightAngstrom">Extent along V in Å.</param>
    /// <param name="spacingAngstrom">Point spacing, Å (default 0.05).</param>
    /// <param name="horizontalDirection">Optional direction for U (projected into the plane); default x, or y when the normal is along x.</param>
    /// <exception cref="OrbitariumInputException">The normal is zero, a size is not positive, or the grid is too large.</exception>
    public static PlaneGrid FromPointAndNormal(Vector3D centerAngstrom, Vector3D normal, double widthAngstrom, double heightAngstrom,
        double spacingAngstrom = 0.05, Vector3D? horizontalDirection = null)
    {
        if (!normal.IsFinite || normal.Length < 1e-12)
            throw new OrbitariumInputException("The plane's normal is zero or not finite; give a non-zero normal vector.");
        if (!centerAngstrom.IsFinite) throw new OrbitariumInputException("The plane's centre has a coordinate that is not a finite number.");
        GridChecks.Positive(widthAngstrom, "plane width (Å)");
        GridChecks.Positive(heightAngstrom, "plane height (Å)");
        GridChecks.Positive(spacingAngstrom, "grid spacing (Å)");
        var n = normal.Normalized();
        var h = horizontalDirection ?? (Math.Abs(n.X) < 0.9 ? new Vector3D(1, 0, 0) : new Vector3D(0, 1, 0));
        var u = PerpendicularPart(h, n) ?? PerpendicularPart(AnyPerpendicular(n), n)!.Value;
        var v = Vector3D.Cross(n, u);
        double f = PhysicalConstants.BohrPerAngstrom;
        return new PlaneGrid(centerAngstrom * f, u, v, 0.5 * widthAngstrom * f, 0.5 * heightAngstrom * f, spacingAngstrom * f);
    }

    private static PlaneGrid Enclosing(Molecule molecule, Vector3D origin, Vector3D u, Vector3D v, double marginAngstrom, double spacingAngstrom)
    {
        GridChecks.NonNegative(marginAngstrom, "margin (Å)");
        GridChecks.Positive(spacingAngstrom, "grid spacing (Å)");
        double uMin = double.MaxValue, uMax = double.MinValue, vMin = double.MaxValue, vMax = double.MinValue;
        foreach (var atom in molecule.Atoms)
        {
            var d = atom.PositionBohr - origin;
            double pu = Vector3D.Dot(d, u), pv = Vector3D.Dot(d, v);
            uMin = Math.Min(uMin, pu); uMax = Math.Max(uMax, pu);
            vMin = Math.Min(vMin, pv); vMax = Math.Max(vMax, pv);
        }
        double m = marginAngstrom * PhysicalConstants.BohrPerAngstrom;
        var center = origin + 0.5 * (uMin + uMax) * u + 0.5 * (vMin + vMax) * v;
        return new PlaneGrid(center, u, v, 0.5 * (uMax - uMin) + m, 0.5 * (vMax - vMin) + m, spacingAngstrom * PhysicalConstants.BohrPerAngstrom);
    }

    private static Vector3D? PerpendicularPart(Vector3D w, Vector3D unit)
    {
        var p = w - Vector3D.Dot(w, unit) * unit;
        return p.Length < 1e-6 * Math.Max(1, w.Length) ? null : p.Normalized();
    }

    private static Vector3D AnyPerpendicular(Vector3D unit) =>
        Math.Abs(unit.X) < 0.9 ? new Vector3D(1, 0, 0) : new Vector3D(0, 1, 0);
}
