using System.Collections.Immutable;
using Orbitarium.Chemistry;

namespace Orbitarium.Dft.Grids;

/// <summary>
/// An atom-centred molecular integration grid: Treutler–Ahlrichs radial shells × Gauss–Legendre/trapezoid angular
/// rules on every atom, pruned, weighted by Becke's partition with atomic size adjustment, screened for tiny
/// weights and grouped into spatially compact batches.
/// </summary>
/// <remarks>∫ f(r) d³r ≈ Σ_p w_p f(r_p). Radial: <see cref="TreutlerAhlrichsRadialQuadrature"/>; angular:
/// <see cref="AngularQuadrature"/>, laid out in a frame fixed to the molecule (principal axes of the nuclear charge;
/// the polar axis on the molecular axis for a linear molecule), so that the grid turns with the molecule and keeps
/// a linear molecule's cylindrical symmetry; partition: Becke, J. Chem. Phys. 88, 2547 (1988). Immutable.</remarks>
public sealed class MolecularGrid
{
    /// <summary>Target number of points per batch (at most this many).</summary>
    public const int MaxBatchSize = 256;

    /// <summary>Edge of the cubes points are binned into before batching, bohr.</summary>
    public const double BatchCubeEdgeBohr = 4.0;

    private readonly Vector3D[] _points;
    private readonly double[] _weights;

    private MolecularGrid(Molecule molecule, GridSpecification spec, GridLevel? level, Vector3D[] points, double[] weights,
        ImmutableArray<GridBatch> batches, int pointsBeforeScreening)
    {
        Molecule = molecule;
        Specification = spec;
        Level = level;
        _points = points;
        _weights = weights;
        Batches = batches;
        PointsBeforeScreening = pointsBeforeScreening;
    }

    /// <summary>The molecule the grid was built for.</summary>
    public Molecule Molecule { get; }

    /// <summary>The sizes used.</summary>
    public GridSpecification Specification { get; }

    /// <summary>The named level, or null for a custom specification.</summary>
    public GridLevel? Level { get; }

    /// <summary>Number of points kept.</summary>
    public int PointCount => _weights.Length;

    /// <summary>Number of points before weight screening removed those with negligible weight.</summary>
    public int PointsBeforeScreening { get; }

    /// <summary>Point positions in bohr.</summary>
    public ReadOnlySpan<Vector3D> PointsBohr => _points;

    /// <summary>Quadrature weights (bohr³), including the Becke partition.</summary>
    public ReadOnlySpan<double> Weights => _weights;

    /// <summary>The batches (contiguous ranges of points).</summary>
    public ImmutableArray<GridBatch> Batches { get; }

    internal Vector3D[] PointArray => _points;
    internal double[] WeightArray => _weights;

    /// <summary>Builds the grid of a named level.</summary>
    /// <param name="molecule">The molecule (positions in bohr).</param>
    /// <param name="level">Grid level (default <see cref="GridLevel.Default"/>).</param>
    /// <param name="cancellationToken">Stops the build.</param>
    public static MolecularGrid Create(Molecule molecule, GridLevel level = GridLevel.Default, CancellationToken cancellationToken = default) =>
        Build(molecule, GridSpecification.ForLevel(level), level, cancellationToken);

    /// <summary>Builds a grid of custom sizes.</summary>
    /// <exception cref="OrbitariumInputException">An empty molecule or sizes out of range.</exception>
    public static MolecularGrid Create(Molecule molecule, GridSpecification specification, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(specification);
        return Build(molecule, specification.Validated(), null, cancellationToken);
    }

    private static MolecularGrid Build(Molecule molecule, GridSpecification spec, GridLevel? level, CancellationToken ct)
    {
        ArgumentNullException.ThrowIfNull(molecule);
        if (molecule.AtomCount == 0) throw new OrbitariumInputException("Cannot build a molecular grid for a molecule without atoms.");
        var partition = new BeckePartition(molecule);
        var orientation = GridOrientation.For(molecule);
        int n = molecule.AtomCount;
        var perAtomPoints = new List<Vector3D>[n];
        var perAtomWeights = new List<double>[n];
        var rawCounts = new int[n];
        Parallel.For(0, n, new ParallelOptions { CancellationToken = ct }, a =>
        {
            var atom = molecule.Atoms[a];
            int z = atom.Element.AtomicNumber;
            double rbs = BraggSlaterRadii.RadiusBohr(atom.Element);
            var (radii, rw) = TreutlerAhlrichsRadialQuadrature.Create(spec.RadialPointsFor(z), TreutlerAhlrichsRadialQuadrature.Scaling(z));
            var pts = new List<Vector3D>();
            var wts = new List<double>();
            Span<double> scratch = stackalloc double[2 * n];
            int raw = 0;
            for (int i = 0; i < radii.Length; i++)
            {
                var ang = AngularQuadrature.OfDegree(spec.AngularDegreeAt(radii[i], rbs));
                var dirs = ang.Directions;
                var aw = ang.Weights;
                raw += dirs.Count;
                for (int k = 0; k < dirs.Count; k++)
                {
                    var p = atom.PositionBohr + radii[i] * orientation.Apply(dirs[k]);
                    double w = rw[i] * aw[k];
                    if (Math.Abs(w) < spec.WeightThreshold) continue;
                    w *= partition.Weight(a, p, scratch);
                    if (Math.Abs(w) < spec.WeightThreshold) continue;
                    pts.Add(p);
                    wts.Add(w);
                }
            }
            perAtomPoints[a] = pts;
            perAtomWeights[a] = wts;
            rawCounts[a] = raw;
        });
        var allPoints = perAtomPoints.SelectMany(p => p).ToArray();
        var allWeights = perAtomWeights.SelectMany(w => w).ToArray();
        var (points, weights, batches) = MakeBatches(allPoints, allWeights);
        return new MolecularGrid(molecule, spec, level, points, weights, batches, rawCounts.Sum());
    }

    private static (Vector3D[], double[], ImmutableArray<GridBatch>) MakeBatches(Vector3D[] points, double[] weights)
    {
        // Bin into cubes, order the cubes, then cut each cube's points into chunks of at most MaxBatchSize.
        var keys = new (int X, int Y, int Z)[points.Length];
        for (int i = 0; i < points.Length; i++)
            keys[i] = ((int)Math.Floor(points[i].X / BatchCubeEdgeBohr), (int)Math.Floor(points[i].Y / BatchCubeEdgeBohr), (int)Math.Floor(points[i].Z / BatchCubeEdgeBohr));
        var order = Enumerable.Range(0, points.Length).ToArray();
        Array.Sort(order, (i, j) =>
        {
            int c = keys[i].X.CompareTo(keys[j].X);
            if (c != 0) return c;
            c = keys[i].Y.CompareTo(keys[j].Y);
            if (c != 0) return c;
            c = keys[i].Z.CompareTo(keys[j].Z);
            return c != 0 ? c : i.CompareTo(j);
        });
        var sortedPoints = new Vector3D[points.Length];
        var sortedWeights = new double[points.Length];
        for (int i = 0; i < order.Length; i++)
        {
            sortedPoints[i] = points[order[i]];
            sortedWeights[i] = weights[order[i]];
        }
        var batches = ImmutableArray.CreateBuilder<GridBatch>();
        int start = 0;
        while (start < order.Length)
        {
            var key = keys[order[start]];
            int end = start;
            while (end < order.Length && keys[order[end]] == key) end++;
            int cubeCount = end - start;
            int chunks = (cubeCount + MaxBatchSize - 1) / MaxBatchSize;
            for (int c = 0; c < chunks; c++)
            {
                int s = start + c * cubeCount / chunks, e = start + (c + 1) * cubeCount / chunks;
                batches.Add(Bound(sortedPoints, s, e - s));
            }
            start = end;
        }
        return (sortedPoints, sortedWeights, batches.ToImmutable());
    }

    private static GridBatch Bound(Vector3D[] points, int start, int count)
    {
        double minX = double.MaxValue, minY = double.MaxValue, minZ = double.MaxValue;
        double maxX = double.MinValue, maxY = double.MinValue, maxZ = double.MinValue;
        for (int i = start; i < start + count; i++)
        {
            var p = points[i];
            minX = Math.Min(minX, p.X); minY = Math.Min(minY, p.Y); minZ = Math.Min(minZ, p.Z);
            maxX = Math.Max(maxX, p.X); maxY = Math.Max(maxY, p.Y); maxZ = Math.Max(maxZ, p.Z);
        }
        var center = new Vector3D(0.5 * (minX + maxX), 0.5 * (minY + maxY), 0.5 * (minZ + maxZ));
        double r = 0;
        for (int i = start; i < start + count; i++) r = Math.Max(r, Vector3D.Distance(points[i], center));
        return new GridBatch(start, count, center, r);
    }

    /// <summary>Integrates a function of position (bohr) over the grid.</summary>
    public double Integrate(Func<Vector3D, double> function)
    {
        ArgumentNullException.ThrowIfNull(function);
        double sum = 0, c = 0;
        for (int i = 0; i < _points.Length; i++)
        {
            // Kahan summation: the grid has up to a few million terms.
            double y = _weights[i] * function(_points[i]) - c;
            double t = sum + y;
            c = t - sum - y;
            sum = t;
        }
        return sum;
    }

    /// <summary>One line such as "grid Default (50 radial (H), degree 29, pruned): 31,234 points in 180 batches".</summary>
    public string Description =>
        FormattableString.Invariant($"grid {(Level?.ToString() ?? "custom")} ({Specification}): {PointCount:N0} points in {Batches.Length} batches");

    /// <inheritdoc />
    public override string ToString() => Description;
}
