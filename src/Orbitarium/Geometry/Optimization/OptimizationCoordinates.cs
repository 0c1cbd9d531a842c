namespace Orbitarium.Geometry.Optimization;

/// <summary>The coordinates the optimiser steps in.</summary>
public enum OptimizationCoordinates
{
    /// <summary>Redundant internal coordinates from the connectivity (default); falls back to Cartesian when they do
    /// not span the molecule's internal motions.</summary>
    RedundantInternal,

    /// <summary>Cartesian coordinates (translations and rotations projected out).</summary>
    Cartesian,
}
