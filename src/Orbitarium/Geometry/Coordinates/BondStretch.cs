namespace Orbitarium.Geometry.Coordinates;

/// <summary>The distance between two atoms, in bohr.</summary>
public sealed class BondStretch : InternalCoordinate
{
    /// <summary>The stretch between atoms <paramref name="i"/> and <paramref name="j"/> (0-based).</summary>
    public BondStretch(int i, int j)
    {
        if (i == j) throw new OrbitariumInputException($"A distance needs two different atoms; both are atom {i + 1}.");
        I = i; J = j;
    }

    /// <summary>First atom.</summary>
    public int I { get; }

    /// <summary>Second atom.</summary>
    public int J { get; }

    /// <inheritdoc />
    public override IReadOnlyList<int> Atoms => [I, J];

    /// <inheritdoc />
    public override string Kind => "bond";

    /// <inheritdoc />
    public override bool IsAngular => false;

    /// <inheritdoc />
    public override double Value(ReadOnlySpan<double> xBohr) => (Position(xBohr, I) - Position(xBohr, J)).Length;

    /// <inheritdoc />
    public override void Derivatives(ReadOnlySpan<double> xBohr, Span<double> row)
    {
        var e = (Position(xBohr, I) - Position(xBohr, J)).Normalized();
        Add(row, I, e);
        Add(row, J, -e);
    }
}
