using System.Collections.Immutable;
using MathNet.Numerics.LinearAlgebra;
using Orbitarium.Chemistry;

namespace Orbitarium.Geometry.Coordinates;

/// <summary>
/// A set of primitive coordinates (usually redundant internal coordinates) with Wilson's B matrix, the generalised
/// inverse of G = B·Bᵀ, and the iterative back-transformation from coordinate steps to Cartesian positions.
/// </summary>
/// <remarks>
/// Built from the connectivity: every bond (covalent radii × 1.3, disconnected fragments joined by their closest
/// pair), every angle between bonds at an atom (two <see cref="LinearBend"/> components when it exceeds 175°), every
/// dihedral about a bond whose angles are not linear, and out-of-plane dihedrals at three-connected atoms.
/// Source: P. Pulay and G. Fogarasi, J. Chem. Phys. 96, 2856 (1992); C. Peng, P. Y. Ayala, H. B. Schlegel and
/// M. J. Frisch, J. Comput. Chem. 17, 49 (1996).
/// </remarks>
public sealed class RedundantInternalCoordinates
{
    /// <summary>Angles above this (degrees) are treated as linear: 175°.</summary>
    public const double LinearAngleDegrees = 175.0;

    private RedundantInternalCoordinates(ImmutableArray<InternalCoordinate> coordinates, int atomCount)
    {
        Coordinates = coordinates;
        AtomCount = atomCount;
    }

    /// <summary>The primitive coordinates.</summary>
    public ImmutableArray<InternalCoordinate> Coordinates { get; }

    /// <summary>Number of atoms of the molecule the set was built for.</summary>
    public int AtomCount { get; }

    /// <summary>Number of primitive coordinates.</summary>
    public int Count => Coordinates.Length;

    /// <summary>A set made of the given coordinates.</summary>
    public static RedundantInternalCoordinates FromCoordinates(IEnumerable<InternalCoordinate> coordinates, int atomCount)
    {
        ArgumentNullException.ThrowIfNull(coordinates);
        return new([.. coordinates], atomCount);
    }

    /// <summary>The 3·N Cartesian components as coordinates (the Cartesian fallback).</summary>
    public static RedundantInternalCoordinates Cartesian(int atomCount)
    {
        var list = new List<InternalCoordinate>(3 * atomCount);
        for (int a = 0; a < atomCount; a++)
            for (int k = 0; k < 3; k++) list.Add(new CartesianComponent(a, k));
        return new([.. list], atomCount);
    }

    /// <summary>Builds redundant internal coordinates from the connectivity of <paramref name="molecule"/>.</summary>
    public static RedundantInternalCoordinates FromConnectivity(Molecule molecule)
    {
        ArgumentNullException.ThrowIfNull(molecule);
        int n = molecule.AtomCount;
        var bonds = Connectivity(molecule);
        var neighbours = new List<int>[n];
        for (int a = 0; a < n; a++) neighbours[a] = [];
        foreach (var (i, j) in bonds) { neighbours[i].Add(j); neighbours[j].Add(i); }

        var list = new List<InternalCoordinate>();
        foreach (var (i, j) in bonds) list.Add(new BondStretch(i, j));
        var linear = new HashSet<(int, int, int)>();
        for (int j = 0; j < n; j++)
        {
            var nb = neighbours[j];
            for (int p = 0; p < nb.Count; p++)
                for (int q = p + 1; q < nb.Count; q++)
                {
                    int i = nb[p], k = nb[q];
                    double deg = molecule.AngleDegrees(i, j, k);
                    if (deg > LinearAngleDegrees)
                    {
                        linear.Add((i, j, k)); linear.Add((k, j, i));
                        var axis = (molecule.Atoms[k].PositionBohr - molecule.Atoms[i].PositionBohr).Normalized();
                        var u = Perpendicular(axis);
                        var w = Vector3D.Cross(axis, u).Normalized();
                        list.Add(new LinearBend(i, j, k, u, 0));
                        list.Add(new LinearBend(i, j, k, w, 1));
                    }
                    else
                    {
                        list.Add(new BondAngle(i, j, k));
                    }
                }
        }
        foreach (var (j, k) in bonds)
            foreach (int i in neighbours[j])
            {
                if (i == k || molecule.AngleDegrees(i, j, k) > LinearAngleDegrees) continue;
                foreach (int l in neighbours[k])
                {
                    if (l == j || l == i || molecule.AngleDegrees(j, k, l) > LinearAngleDegrees) continue;
                    list.Add(new Dihedral(i, j, k, l));
                }
            }
        // Out-of-plane coordinates for three-connected atoms (planar centres need them; they are harmless otherwise).
        for (int c = 0; c < n; c++)
        {
            if (neighbours[c].Count != 3) continue;
            int a = neighbours[c][0], b = neighbours[c][1], d = neighbours[c][2];
            if (molecule.AngleDegrees(a, b, d) > LinearAngleDegrees || molecule.AngleDegrees(b, d, c) > LinearAngleDegrees) continue;
            list.Add(new Dihedral(a, b, d, c));
        }
        return new([.. list], n);
    }

    /// <summary>The bonded pairs used: covalent radii × 1.3, plus the closest pair joining each pair of fragments
    /// until the molecule is connected.</summary>
    public static IReadOnlyList<(int I, int J)> Connectivity(Molecule molecule)
    {
        ArgumentNullException.ThrowIfNull(molecule);
        int n = molecule.AtomCount;
        var bonds = new List<(int I, int J)>(molecule.BondedPairs());
        var parent = new int[n];
        for (int a = 0; a < n; a++) parent[a] = a;
        int Find(int a) { while (parent[a] != a) a = parent[a] = parent[parent[a]]; return a; }
        foreach (var (i, j) in bonds) parent[Find(i)] = Find(j);
        while (true)
        {
            double best = double.MaxValue;
            (int, int) pair = (-1, -1);
            for (int i = 0; i < n; i++)
                for (int j = i + 1; j < n; j++)
                    if (Find(i) != Find(j))
                    {
                        double d = molecule.DistanceBohr(i, j);
                        if (d < best) { best = d; pair = (i, j); }
                    }
            if (pair.Item1 < 0) break;
            bonds.Add(pair);
            parent[Find(pair.Item1)] = Find(pair.Item2);
        }
        return bonds;
    }

    /// <summary>Returns a set with <paramref name="coordinate"/> added unless an equal one is present; the index of
    /// the coordinate in the returned set is written to <paramref name="index"/>.</summary>
    public RedundantInternalCoordinates WithCoordinate(InternalCoordinate coordinate, out int index)
    {
        ArgumentNullException.ThrowIfNull(coordinate);
        for (int i = 0; i < Count; i++)
            if (Coordinates[i].SameAs(coordinate)) { index = i; return this; }
        index = Count;
        return new(Coordinates.Add(coordinate), AtomCount);
    }

    /// <summary>All coordinate values at <paramref name="xBohr"/>.</summary>
    public double[] Values(ReadOnlySpan<double> xBohr)
    {
        var q = new double[Count];
        for (int i = 0; i < Count; i++) q[i] = Coordinates[i].Value(xBohr);
        return q;
    }

    /// <summary>Wilson's B matrix ∂q/∂x (Count × 3N). Columns of atoms in <paramref name="frozenAtoms"/> are zero.</summary>
    public Matrix<double> WilsonB(ReadOnlySpan<double> xBohr, IReadOnlySet<int>? frozenAtoms = null)
    {
        int n3 = 3 * AtomCount;
        var b = Matrix<double>.Build.Dense(Count, n3);
        var row = new double[n3];
        for (int i = 0; i < Count; i++)
        {
            Array.Clear(row);
            Coordinates[i].Derivatives(xBohr, row);
            for (int c = 0; c < n3; c++)
                if (frozenAtoms is null || !frozenAtoms.Contains(c / 3)) b[i, c] = row[c];
        }
        return b;
    }

    /// <summary>Generalised inverse of a symmetric matrix through its eigen-decomposition, discarding eigenvalues
    /// below <paramref name="threshold"/> (times the largest).</summary>
    public static Matrix<double> GeneralizedInverse(Matrix<double> symmetric, double threshold = 1e-8)
    {
        ArgumentNullException.ThrowIfNull(symmetric);
        var evd = symmetric.Evd(Symmetricity.Symmetric);
        var v = evd.EigenVectors;
        var d = evd.EigenValues;
        double max = 0;
        for (int i = 0; i < d.Count; i++) max = Math.Max(max, Math.Abs(d[i].Real));
        var inv = Matrix<double>.Build.Dense(symmetric.RowCount, symmetric.ColumnCount);
        for (int k = 0; k < d.Count; k++)
        {
            double e = d[k].Real;
            if (Math.Abs(e) <= threshold * Math.Max(max, 1e-300)) continue;
            var col = v.Column(k);
            inv += col.OuterProduct(col) / e;
        }
        return inv;
    }

    /// <summary>Number of independent coordinates (rank of B) at a geometry.</summary>
    public int Rank(ReadOnlySpan<double> xBohr, IReadOnlySet<int>? frozenAtoms = null)
    {
        if (Count == 0) return 0;
        var b = WilsonB(xBohr, frozenAtoms);
        var evd = (b * b.Transpose()).Evd(Symmetricity.Symmetric);
        double max = 0;
        foreach (var e in evd.EigenValues) max = Math.Max(max, e.Real);
        int r = 0;
        foreach (var e in evd.EigenValues) if (e.Real > 1e-8 * Math.Max(max, 1e-300)) r++;
        return r;
    }

    /// <summary>
    /// Finds Cartesian positions whose coordinates move by <paramref name="stepQ"/> from those at
    /// <paramref name="xBohr"/>: iterates x ← x + Bᵀ G⁻ (q_target − q(x)) until the Cartesian change is below 10⁻¹⁰ bohr.
    /// </summary>
    /// <returns>The new positions, and whether the iteration converged (otherwise the first-order step is returned).</returns>
    public (double[] PositionsBohr, bool Converged) BackTransform(double[] xBohr, Vector<double> stepQ,
        IReadOnlySet<int>? frozenAtoms = null, int maxIterations = 50)
    {
        ArgumentNullException.ThrowIfNull(xBohr);
        ArgumentNullException.ThrowIfNull(stepQ);
        var q0 = Values(xBohr);
        var target = new double[Count];
        for (int i = 0; i < Count; i++) target[i] = q0[i] + stepQ[i];
        var x = (double[])xBohr.Clone();
        double[]? firstOrder = null;
        double previousNorm = double.MaxValue;
        for (int it = 0; it < maxIterations; it++)
        {
            var b = WilsonB(x, frozenAtoms);
            var gInv = GeneralizedInverse(b * b.Transpose());
            var q = Values(x);
            var dq = Vector<double>.Build.Dense(Count);
            for (int i = 0; i < Count; i++) dq[i] = Coordinates[i].Difference(target[i], q[i]);
            var dx = b.Transpose() * (gInv * dq);
            double norm = dx.L2Norm();
            if (it > 0 && norm > previousNorm * 2) break; // diverging
            for (int c = 0; c < x.Length; c++) x[c] += dx[c];
            firstOrder ??= (double[])x.Clone();
            previousNorm = norm;
            if (norm < 1e-10) return (x, true);
        }
        if (previousNorm < 1e-6) return (x, true);
        return (firstOrder ?? x, false);
    }

    /// <summary>
    /// Moves <paramref name="xBohr"/> the least (in the Cartesian sense) so that the coordinates with the given indices
    /// take the target values exactly (Newton iterations on the constraints alone, to 10⁻¹² in the coordinate).
    /// </summary>
    public double[] EnforceValues(double[] xBohr, IReadOnlyList<int> indices, IReadOnlyList<double> targets, IReadOnlySet<int>? frozenAtoms = null)
    {
        ArgumentNullException.ThrowIfNull(xBohr);
        var x = (double[])xBohr.Clone();
        if (indices.Count == 0) return x;
        var sub = FromCoordinates(indices.Select(i => Coordinates[i]), AtomCount);
        for (int it = 0; it < 100; it++)
        {
            var q = sub.Values(x);
            var dq = Vector<double>.Build.Dense(indices.Count);
            double worst = 0;
            for (int i = 0; i < indices.Count; i++)
            {
                dq[i] = sub.Coordinates[i].Difference(targets[i], q[i]);
                worst = Math.Max(worst, Math.Abs(dq[i]));
            }
            if (worst < 1e-12) break;
            var b = sub.WilsonB(x, frozenAtoms);
            var dx = b.Transpose() * (GeneralizedInverse(b * b.Transpose(), 1e-12) * dq);
            for (int c = 0; c < x.Length; c++) x[c] += dx[c];
        }
        return x;
    }

    private static Vector3D Perpendicular(Vector3D axis)
    {
        var trial = Math.Abs(axis.X) < 0.9 ? new Vector3D(1, 0, 0) : new Vector3D(0, 1, 0);
        return (trial - Vector3D.Dot(trial, axis) * axis).Normalized();
    }

    /// <inheritdoc />
    public override string ToString()
    {
        var counts = Coordinates.GroupBy(c => c.Kind).Select(g => $"{g.Count()} {g.Key}{(g.Count() == 1 ? "" : "s")}");
        return $"{Count} coordinates ({string.Join(", ", counts)})";
    }
}
