using Orbitarium.Chemistry;

namespace Orbitarium.Geometry.Coordinates;

/// <summary>The dihedral (torsion) angle i–j–k–l in radians, in (−π, π]; also used as an out-of-plane coordinate.</summary>
/// <remarks>Value and derivatives follow A. Blondel and M. Karplus, J. Comput. Chem. 17, 1132 (1996), eqs. 20–27,
/// which stay finite for planar arrangements; the sign is flipped to the IUPAC convention used by
/// <see cref="Molecule.DihedralDegrees"/>.</remarks>
public sealed class Dihedral : InternalCoordinate
{
    /// <summary>The dihedral i–j–k–l about the j–k axis (0-based indices).</summary>
    public Dihedral(int i, int j, int k, int l)
    {
        if (new HashSet<int> { i, j, k, l }.Count != 4)
            throw new OrbitariumInputException($"A dihedral needs four different atoms, got {i + 1}-{j + 1}-{k + 1}-{l + 1}.");
        I = i; J = j; K = k; L = l;
    }

    /// <summary>First atom.</summary>
    public int I { get; }

    /// <summary>Second atom (axis).</summary>
    public int J { get; }

    /// <summary>Third atom (axis).</summary>
    public int K { get; }

    /// <summary>Fourth atom.</summary>
    public int L { get; }

    /// <inheritdoc />
    public override IReadOnlyList<int> Atoms => [I, J, K, L];

    /// <inheritdoc />
    public override string Kind => "dihedral";

    /// <inheritdoc />
    public override bool IsAngular => true;

    /// <inheritdoc />
    public override bool IsPeriodic => true;

    /// <inheritdoc />
    public override double Value(ReadOnlySpan<double> xBohr)
    {
        var f = Position(xBohr, I) - Position(xBohr, J);
        var g = Position(xBohr, J) - Position(xBohr, K);
        var h = Position(xBohr, L) - Position(xBohr, K);
        var a = Vector3D.Cross(f, g);
        var b = Vector3D.Cross(h, g);
        double y = Vector3D.Dot(Vector3D.Cross(b, a), g) / g.Length;
        double x = Vector3D.Dot(a, b);
        return -Math.Atan2(y, x); // IUPAC sign (clockwise looking along j→k is positive)
    }

    /// <inheritdoc />
    public override void Derivatives(ReadOnlySpan<double> xBohr, Span<double> row)
    {
        var f = Position(xBohr, I) - Position(xBohr, J);
        var g = Position(xBohr, J) - Position(xBohr, K);
        var h = Position(xBohr, L) - Position(xBohr, K);
        var a = Vector3D.Cross(f, g);
        var b = Vector3D.Cross(h, g);
        double a2 = Math.Max(a.LengthSquared, 1e-16), b2 = Math.Max(b.LengthSquared, 1e-16), lg = g.Length;
        double fg = Vector3D.Dot(f, g), hg = Vector3D.Dot(h, g);
        var di = -lg / a2 * a;
        var dl = lg / b2 * b;
        var dj = lg / a2 * a + fg / (a2 * lg) * a - hg / (b2 * lg) * b;
        var dk = hg / (b2 * lg) * b - fg / (a2 * lg) * a - lg / b2 * b;
        Add(row, I, -di);
        Add(row, J, -dj);
        Add(row, K, -dk);
        Add(row, L, -dl);
    }
}
