namespace Orbitarium.Geometry.Coordinates;

/// <summary>One Cartesian component of one atom's position, in bohr: the coordinates of the Cartesian optimiser.</summary>
public sealed class CartesianComponent : InternalCoordinate
{
    /// <summary>Component <paramref name="axis"/> (0 = x, 1 = y, 2 = z) of atom <paramref name="atom"/> (0-based).</summary>
    public CartesianComponent(int atom, int axis)
    {
        if (axis is < 0 or > 2) throw new ArgumentOutOfRangeException(nameof(axis), axis, "Axis must be 0 (x), 1 (y) or 2 (z).");
        Atom = atom;
        Axis = axis;
    }

    /// <summary>The atom.</summary>
    public int Atom { get; }

    /// <summary>The axis: 0 = x, 1 = y, 2 = z.</summary>
    public int Axis { get; }

    /// <inheritdoc />
    public override IReadOnlyList<int> Atoms => [Atom];

    /// <inheritdoc />
    public override string Kind => "cartesian";

    /// <inheritdoc />
    public override bool IsAngular => false;

    /// <inheritdoc />
    public override bool SameAs(InternalCoordinate other) => other is CartesianComponent c && c.Atom == Atom && c.Axis == Axis;

    /// <inheritdoc />
    public override double Value(ReadOnlySpan<double> xBohr) => xBohr[3 * Atom + Axis];

    /// <inheritdoc />
    public override void Derivatives(ReadOnlySpan<double> xBohr, Span<double> row) => row[3 * Atom + Axis] += 1;

    /// <inheritdoc />
    public override string ToString() => $"{"xyz"[Axis]} of atom {Atom + 1}";
}
