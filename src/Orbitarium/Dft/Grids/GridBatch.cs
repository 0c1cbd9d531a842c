using Orbitarium.Chemistry;

namespace Orbitarium.Dft.Grids;

/// <summary>A block of spatially close grid points, contiguous in the grid's arrays: the unit of parallel work and
/// of basis-function screening.</summary>
/// <param name="Start">Index of the first point.</param>
/// <param name="Count">Number of points.</param>
/// <param name="CenterBohr">Centre of the bounding sphere.</param>
/// <param name="RadiusBohr">Radius of the bounding sphere.</param>
public sealed record GridBatch(int Start, int Count, Vector3D CenterBohr, double RadiusBohr);
