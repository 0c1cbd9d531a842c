namespace Orbitarium.Dft.Grids;

/// <summary>
/// The sizes that define a molecular grid: radial points per atom, angular degree, pruning and weight screening.
/// </summary>
/// <param name="RadialPoints">Radial points for H and He; heavier atoms get 5 more per period (Li–Ne +5, Na–Ar +10, …).</param>
/// <param name="AngularDegree">Degree of spherical harmonics the angular rule integrates exactly in the valence region.</param>
/// <param name="Pruned">Whether to use fewer angular points near the nucleus and far out (see <see cref="AngularDegreeAt"/>).</param>
/// <param name="WeightThreshold">Points whose final weight magnitude is below this are dropped (default 1e-15).</param>
public sealed record GridSpecification(int RadialPoints, int AngularDegree, bool Pruned = true, double WeightThreshold = 1e-15)
{
    /// <summary>The specification of a named level.</summary>
    public static GridSpecification ForLevel(GridLevel level) => level switch
    {
        GridLevel.Coarse => new(35, 17),
        GridLevel.Default => new(50, 29),
        GridLevel.Fine => new(75, 41),
        GridLevel.VeryFine => new(120, 59),
        _ => throw new OrbitariumInputException($"Unknown grid level {level}; use Coarse, Default, Fine or VeryFine."),
    };

    /// <summary>Radial points for an element: <see cref="RadialPoints"/> + 5 × (period − 1).</summary>
    public int RadialPointsFor(int atomicNumber)
    {
        int period = atomicNumber <= 2 ? 1 : atomicNumber <= 10 ? 2 : atomicNumber <= 18 ? 3 : atomicNumber <= 36 ? 4 : atomicNumber <= 54 ? 5 : 6;
        return RadialPoints + 5 * (period - 1);
    }

    /// <summary>
    /// Angular degree used at distance r from a nucleus of Bragg–Slater radius R: min(L, 11) for r &lt; 0.25R
    /// (the nearly spherical core), min(L, 17) for r &lt; 0.5R, L in the valence region, and min(L, 23) beyond 8R
    /// where the density is small and smooth. Without pruning, always L.
    /// </summary>
    /// <remarks>A scheme in the spirit of the SG-1 partitioning of P. M. W. Gill, B. G. Johnson &amp; J. A. Pople,
    /// Chem. Phys. Lett. 209, 506 (1993); the region boundaries are Orbitarium's own choice, checked by the
    /// electron-count and Gaussian-integral tests.</remarks>
    public int AngularDegreeAt(double radiusBohr, double braggSlaterRadiusBohr)
    {
        if (!Pruned) return AngularDegree;
        double x = radiusBohr / braggSlaterRadiusBohr;
        if (x < 0.25) return Math.Min(AngularDegree, 11);
        if (x < 0.5) return Math.Min(AngularDegree, 17);
        if (x > 8) return Math.Min(AngularDegree, 35);
        return AngularDegree;
    }

    /// <summary>Validates the sizes.</summary>
    /// <exception cref="OrbitariumInputException">A size out of range.</exception>
    public GridSpecification Validated()
    {
        if (RadialPoints < 5 || RadialPoints > 1000)
            throw new OrbitariumInputException($"Radial points must lie between 5 and 1000; {RadialPoints} was given.");
        if (AngularDegree < 3 || AngularDegree > 131)
            throw new OrbitariumInputException($"The angular degree must lie between 3 and 131; {AngularDegree} was given.");
        if (!(WeightThreshold >= 0))
            throw new OrbitariumInputException($"The weight threshold must be zero or positive; {WeightThreshold} was given.");
        return this;
    }

    /// <inheritdoc />
    public override string ToString() => $"{RadialPoints} radial (H), degree {AngularDegree}{(Pruned ? ", pruned" : "")}";
}
