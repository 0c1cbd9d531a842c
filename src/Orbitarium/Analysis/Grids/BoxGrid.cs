using System.Globalization;
using Orbitarium.Chemistry;

namespace Orbitarium.Analysis;

/// <summary>
/// A regular 3D grid aligned with the axes: origin corner, equal spacing, counts along x, y, z. Point (i, j, k)
/// is origin + spacing·(i, j, k); index = i + Nx·(j + Ny·k) (x fastest, the VTK image order).
/// </summary>
public sealed class BoxGrid : IGrid
{
    private BoxGrid(Vector3D originBohr, double spacingBohr, int nx, int ny, int nz)
    {
        OriginBohr = originBohr;
        SpacingBohr = spacingBohr;
        CountX = nx; CountY = ny; CountZ = nz;
        GridMemory.EnsureFits((long)nx * ny * nz, $"{nx} × {ny} × {nz}");
    }

    /// <summary>Corner with the smallest coordinates, in bohr.</summary>
    public Vector3D OriginBohr { get; }

    /// <summary>Spacing in bohr (the same along x, y and z).</summary>
    public double SpacingBohr { get; }

    /// <summary>Points along x.</summary>
    public int CountX { get; }

    /// <summary>Points along y.</summary>
    public int CountY { get; }

    /// <summary>Points along z.</summary>
    public int CountZ { get; }

    /// <inheritdoc />
    public int PointCount => CountX * CountY * CountZ;

    /// <summary>Volume per point in bohr³ (spacing cubed), the weight of a simple sum over the box.</summary>
    public double VoxelVolumeBohr3 => SpacingBohr * SpacingBohr * SpacingBohr;

    /// <inheritdoc />
    public void FillPoints(int start, Span<Vector3D> pointsBohr)
    {
        for (int p = 0; p < pointsBohr.Length; p++)
        {
            int index = start + p;
            int i = index % CountX, rest = index / CountX, j = rest % CountY, k = rest / CountY;
            pointsBohr[p] = new Vector3D(OriginBohr.X + i * SpacingBohr, OriginBohr.Y + j * SpacingBohr, OriginBohr.Z + k * SpacingBohr);
        }
    }

    /// <inheritdoc />
    public string Describe() => string.Create(CultureInfo.InvariantCulture,
        $"box {CountX} × {CountY} × {CountZ} points, spacing {SpacingBohr * PhysicalConstants.AngstromPerBohr:F3} Å");

    /// <inheritdoc />
    public override string ToString() => Describe();

    /// <summary>A box enclosing every atom with a margin on each side.</summary>
    /// <param name="molecule">The molecule.</param>
    /// <param name="marginAngstrom">Space beyond the outermost nuclei, Å (default 3).</param>
    /// <param name="spacingAngstrom">Point spacing, Å (default 0.1).</param>
    /// <exception cref="OrbitariumInputException">The molecule is empty, a size is not positive, or the grid would not fit in memory (the message gives the size needed).</exception>
    public static BoxGrid AroundMolecule(Molecule molecule, double marginAngstrom = 3.0, double spacingAngstrom = 0.1)
    {
        ArgumentNullException.ThrowIfNull(molecule);
        if (molecule.AtomCount == 0) throw new OrbitariumInputException("The molecule has no atoms; add atoms before building a grid around it.");
        GridChecks.NonNegative(marginAngstrom, "margin (Å)");
        GridChecks.Positive(spacingAngstrom, "grid spacing (Å)");
        double lo0 = double.MaxValue, lo1 = double.MaxValue, lo2 = double.MaxValue, hi0 = double.MinValue, hi1 = double.MinValue, hi2 = double.MinValue;
        foreach (var atom in molecule.Atoms)
        {
            var p = atom.PositionAngstrom;
            lo0 = Math.Min(lo0, p.X); lo1 = Math.Min(lo1, p.Y); lo2 = Math.Min(lo2, p.Z);
            hi0 = Math.Max(hi0, p.X); hi1 = Math.Max(hi1, p.Y); hi2 = Math.Max(hi2, p.Z);
        }
        var lo = new Vector3D(lo0 - marginAngstrom, lo1 - marginAngstrom, lo2 - marginAngstrom);
        var hi = new Vector3D(hi0 + marginAngstrom, hi1 + marginAngstrom, hi2 + marginAngstrom);
        return Spanning(lo, hi, spacingAngstrom);
    }

    /// <summary>A box from one corner to the opposite one (ångström).</summary>
    /// <param name="lowerCornerAngstrom">Corner with the smallest coordinates, Å.</param>
    /// <param name="upperCornerAngstrom">Opposite corner, Å.</param>
    /// <param name="spacingAngstrom">Point spacing, Å.</param>
    public static BoxGrid Spanning(Vector3D lowerCornerAngstrom, Vector3D upperCornerAngstrom, double spacingAngstrom)
    {
        GridChecks.Positive(spacingAngstrom, "grid spacing (Å)");
        var size = upperCornerAngstrom - lowerCornerAngstrom;
        if (!size.IsFinite || size.X <= 0 || size.Y <= 0 || size.Z <= 0)
            throw new OrbitariumInputException("The box's upper corner must lie above its lower corner along x, y and z.");
        int nx = GridChecks.Count(size.X, spacingAngstrom, "box");
        int ny = GridChecks.Count(size.Y, spacingAngstrom, "box");
        int nz = GridChecks.Count(size.Z, spacingAngstrom, "box");
        double f = PhysicalConstants.BohrPerAngstrom;
        return new BoxGrid(lowerCornerAngstrom * f, spacingAngstrom * f, nx, ny, nz);
    }
}
