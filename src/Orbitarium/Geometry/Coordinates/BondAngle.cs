namespace Orbitarium.Geometry.Coordinates;

/// <summary>The angle i–j–k at vertex j, in radians (0..π).</summary>
/// <remarks>Derivatives from Wilson, Decius &amp; Cross, <i>Molecular Vibrations</i>, §4-1; they are singular at π,
/// where <see cref="LinearBend"/> components are used instead.</remarks>
public sealed class BondAngle : InternalCoordinate
{
    /// <summary>The angle i–j–k with vertex <paramref name="j"/> (0-based indices).</summary>
    public BondAngle(int i, int j, int k)
    {
        if (i == j || j == k || i == k) throw new OrbitariumInputException($"An angle needs three different atoms, got {i + 1}-{j + 1}-{k + 1}.");
        I = i; J = j; K = k;
    }

    /// <summary>End atom.</summary>
    public int I { get; }

    /// <summary>Vertex atom.</summary>
    public int J { get; }

    /// <summary>Other end atom.</summary>
    public int K { get; }

    /// <inheritdoc />
    public override IReadOnlyList<int> Atoms => [I, J, K];

    /// <inheritdoc />
    public override string Kind => "angle";

    /// <inheritdoc />
    public override bool IsAngular => true;

    /// <inheritdoc />
    public override double Value(ReadOnlySpan<double> xBohr)
    {
        var u = Position(xBohr, I) - Position(xBohr, J);
        var v = Position(xBohr, K) - Position(xBohr, J);
        return Math.Acos(Math.Clamp(Chemistry.Vector3D.Dot(u, v) / (u.Length * v.Length), -1, 1));
    }

    /// <inheritdoc />
    public override void Derivatives(ReadOnlySpan<double> xBohr, Span<double> row)
    {
        var u = Position(xBohr, I) - Position(xBohr, J);
        var v = Position(xBohr, K) - Position(xBohr, J);
        double lu = u.Length, lv = v.Length;
        var eu = u / lu;
        var ev = v / lv;
        double c = Math.Clamp(Chemistry.Vector3D.Dot(eu, ev), -1, 1);
        double s = Math.Max(Math.Sqrt(1 - c * c), 1e-8);
        var di = (c * eu - ev) / (lu * s);
        var dk = (c * ev - eu) / (lv * s);
        Add(row, I, di);
        Add(row, K, dk);
        Add(row, J, -(di + dk));
    }
}
