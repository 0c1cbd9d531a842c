using Orbitarium.Chemistry;

namespace Orbitarium.Geometry.Coordinates;

/// <summary>
/// One component of the bend of a (nearly) linear chain i–j–k: q = u·(eⱼᵢ + eⱼₖ), where eⱼᵢ and eⱼₖ are the unit
/// vectors from the centre j and u is a fixed unit vector perpendicular to the chain. Two such components (along
/// two perpendicular u) replace the ordinary angle, whose derivatives are singular at 180°.
/// </summary>
/// <remarks>For a small bend δ in the plane of u, q ≈ δ (radians). The construction is common practice in
/// redundant-internal-coordinate optimisers; see e.g. V. Bakken and T. Helgaker, J. Chem. Phys. 117, 9160 (2002).</remarks>
public sealed class LinearBend : InternalCoordinate
{
    /// <summary>The bend component of chain i–j–k along the fixed direction <paramref name="direction"/>.</summary>
    public LinearBend(int i, int j, int k, Vector3D direction, int component)
    {
        if (i == j || j == k || i == k) throw new OrbitariumInputException($"A linear bend needs three different atoms, got {i + 1}-{j + 1}-{k + 1}.");
        I = i; J = j; K = k;
        Direction = direction.Normalized();
        Component = component;
    }

    /// <summary>End atom.</summary>
    public int I { get; }

    /// <summary>Centre atom.</summary>
    public int J { get; }

    /// <summary>Other end atom.</summary>
    public int K { get; }

    /// <summary>The fixed unit vector u the bend is measured along.</summary>
    public Vector3D Direction { get; }

    /// <summary>Which of the two components this is (0 or 1).</summary>
    public int Component { get; }

    /// <inheritdoc />
    public override IReadOnlyList<int> Atoms => [I, J, K];

    /// <inheritdoc />
    public override string Kind => "linear bend";

    /// <inheritdoc />
    public override bool IsAngular => true;

    /// <inheritdoc />
    public override bool SameAs(InternalCoordinate other) =>
        other is LinearBend b && b.J == J && b.Component == Component && ((b.I == I && b.K == K) || (b.I == K && b.K == I));

    /// <inheritdoc />
    public override double Value(ReadOnlySpan<double> xBohr)
    {
        var a = (Position(xBohr, I) - Position(xBohr, J)).Normalized();
        var b = (Position(xBohr, K) - Position(xBohr, J)).Normalized();
        return Vector3D.Dot(Direction, a + b);
    }

    /// <inheritdoc />
    public override void Derivatives(ReadOnlySpan<double> xBohr, Span<double> row)
    {
        var ra = Position(xBohr, I) - Position(xBohr, J);
        var rb = Position(xBohr, K) - Position(xBohr, J);
        double la = ra.Length, lb = rb.Length;
        var a = ra / la;
        var b = rb / lb;
        var da = (Direction - Vector3D.Dot(Direction, a) * a) / la;
        var db = (Direction - Vector3D.Dot(Direction, b) * b) / lb;
        Add(row, I, da);
        Add(row, K, db);
        Add(row, J, -(da + db));
    }

    /// <inheritdoc />
    public override string ToString() => $"{Kind} {I + 1}-{J + 1}-{K + 1} ({(Component == 0 ? "a" : "b")})";
}
