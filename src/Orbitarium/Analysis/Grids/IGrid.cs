using Orbitarium.Chemistry;

namespace Orbitarium.Analysis;

/// <summary>A set of points in space (a plane, a line or a 3D box) on which a quantity is evaluated.</summary>
public interface IGrid
{
    /// <summary>Number of points.</summary>
    int PointCount { get; }

    /// <summary>Writes the positions (bohr) of points <paramref name="start"/> … start + length − 1 into <paramref name="pointsBohr"/>.</summary>
    /// <param name="start">Index of the first point.</param>
    /// <param name="pointsBohr">Destination; its length is the number of points written.</param>
    void FillPoints(int start, Span<Vector3D> pointsBohr);

    /// <summary>One line describing the grid (shape, size, spacing in Å).</summary>
    string Describe();
}
