namespace Orbitarium.Chemistry;

/// <summary>An immutable three-component vector of doubles (a position, a displacement or a field).
/// The unit is the caller's; Orbitarium stores positions in bohr.</summary>
/// <param name="X">x component.</param>
/// <param name="Y">y component.</param>
/// <param name="Z">z component.</param>
public readonly record struct Vector3D(double X, double Y, double Z)
{
    /// <summary>The zero vector.</summary>
    public static Vector3D Zero => default;

    /// <summary>Euclidean length.</summary>
    public double Length => Math.Sqrt(X * X + Y * Y + Z * Z);

    /// <summary>Squared Euclidean length.</summary>
    public double LengthSquared => X * X + Y * Y + Z * Z;

    /// <summary>Component by index 0, 1, 2 (x, y, z).</summary>
    public double this[int axis] => axis switch
    {
        0 => X,
        1 => Y,
        2 => Z,
        _ => throw new ArgumentOutOfRangeException(nameof(axis), axis, "Axis must be 0 (x), 1 (y) or 2 (z)."),
    };

    /// <summary>The unit vector in the same direction; throws for the zero vector.</summary>
    public Vector3D Normalized()
    {
        double length = Length;
        if (length == 0) throw new InvalidOperationException("Cannot normalise the zero vector.");
        return this / length;
    }

    /// <summary>Dot product.</summary>
    public static double Dot(Vector3D a, Vector3D b) => a.X * b.X + a.Y * b.Y + a.Z * b.Z;

    /// <summary>Cross product a × b.</summary>
    public static Vector3D Cross(Vector3D a, Vector3D b) =>
        new(a.Y * b.Z - a.Z * b.Y, a.Z * b.X - a.X * b.Z, a.X * b.Y - a.Y * b.X);

    /// <summary>Distance between two points.</summary>
    public static double Distance(Vector3D a, Vector3D b) => (a - b).Length;

    /// <summary>Sum.</summary>
    public static Vector3D operator +(Vector3D a, Vector3D b) => new(a.X + b.X, a.Y + b.Y, a.Z + b.Z);

    /// <summary>Difference.</summary>
    public static Vector3D operator -(Vector3D a, Vector3D b) => new(a.X - b.X, a.Y - b.Y, a.Z - b.Z);

    /// <summary>Negation.</summary>
    public static Vector3D operator -(Vector3D a) => new(-a.X, -a.Y, -a.Z);

    /// <summary>Scaling.</summary>
    public static Vector3D operator *(double s, Vector3D a) => new(s * a.X, s * a.Y, s * a.Z);

    /// <summary>Scaling.</summary>
    public static Vector3D operator *(Vector3D a, double s) => new(s * a.X, s * a.Y, s * a.Z);

    /// <summary>Division by a scalar.</summary>
    public static Vector3D operator /(Vector3D a, double s) => new(a.X / s, a.Y / s, a.Z / s);

    /// <summary>True when every component is a finite number.</summary>
    public bool IsFinite => double.IsFinite(X) && double.IsFinite(Y) && double.IsFinite(Z);

    /// <inheritdoc />
    public override string ToString() => FormattableString.Invariant($"({X:F6}, {Y:F6}, {Z:F6})");
}
