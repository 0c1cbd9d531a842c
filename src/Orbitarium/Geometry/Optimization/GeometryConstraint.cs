using Orbitarium.Chemistry;
using Orbitarium.Geometry.Coordinates;

namespace Orbitarium.Geometry.Optimization;

/// <summary>
/// A constraint held during an optimisation: a fixed distance, angle or dihedral (for relaxed scans) or a frozen atom.
/// Atom indices are 0-based. A fixed coordinate with no value is held at its starting value.
/// </summary>
public abstract record GeometryConstraint
{
    private protected GeometryConstraint() { }

    /// <summary>Fix the distance between atoms <paramref name="i"/> and <paramref name="j"/>, at
    /// <paramref name="valueAngstrom"/> (Å) or, when null, at its starting value.</summary>
    public static GeometryConstraint Distance(int i, int j, double? valueAngstrom = null) => new DistanceConstraint(i, j, valueAngstrom);

    /// <summary>Fix the angle i–j–k (vertex j), at <paramref name="valueDegrees"/> or its starting value.</summary>
    public static GeometryConstraint Angle(int i, int j, int k, double? valueDegrees = null) => new AngleConstraint(i, j, k, valueDegrees);

    /// <summary>Fix the dihedral i–j–k–l, at <paramref name="valueDegrees"/> or its starting value.</summary>
    public static GeometryConstraint Dihedral(int i, int j, int k, int l, double? valueDegrees = null) => new DihedralConstraint(i, j, k, l, valueDegrees);

    /// <summary>Keep atom <paramref name="atom"/> where it is.</summary>
    public static GeometryConstraint Frozen(int atom) => new FrozenAtomConstraint(atom);

    /// <summary>The atoms the constraint involves.</summary>
    public abstract IReadOnlyList<int> Atoms { get; }

    /// <summary>The constrained coordinate, or null for a frozen atom.</summary>
    internal abstract InternalCoordinate? Coordinate { get; }

    /// <summary>The target in bohr or radians, or null to hold the starting value.</summary>
    internal abstract double? TargetInternal { get; }

    internal void Validate(Molecule molecule)
    {
        foreach (int a in Atoms)
            if (a < 0 || a >= molecule.AtomCount)
                throw new OrbitariumInputException(
                    $"The constraint {this} names atom index {a}, but the molecule has atoms 0..{molecule.AtomCount - 1} (indices are 0-based).");
        if (Atoms.Distinct().Count() != Atoms.Count)
            throw new OrbitariumInputException($"The constraint {this} repeats an atom; name different atoms.");
    }
}

/// <summary>A fixed interatomic distance.</summary>
/// <param name="I">First atom (0-based).</param>
/// <param name="J">Second atom (0-based).</param>
/// <param name="ValueAngstrom">The value in Å, or null for the starting value.</param>
public sealed record DistanceConstraint(int I, int J, double? ValueAngstrom) : GeometryConstraint
{
    /// <inheritdoc />
    public override IReadOnlyList<int> Atoms => [I, J];

    internal override InternalCoordinate Coordinate => new BondStretch(I, J);

    internal override double? TargetInternal => ValueAngstrom * PhysicalConstants.BohrPerAngstrom;

    /// <inheritdoc />
    public override string ToString() => $"distance {I}-{J}" + (ValueAngstrom is double v ? FormattableString.Invariant($" = {v} Å") : "");
}

/// <summary>A fixed bond angle.</summary>
/// <param name="I">End atom (0-based).</param>
/// <param name="J">Vertex atom.</param>
/// <param name="K">Other end atom.</param>
/// <param name="ValueDegrees">The value in degrees, or null for the starting value.</param>
public sealed record AngleConstraint(int I, int J, int K, double? ValueDegrees) : GeometryConstraint
{
    /// <inheritdoc />
    public override IReadOnlyList<int> Atoms => [I, J, K];

    internal override InternalCoordinate Coordinate => new BondAngle(I, J, K);

    internal override double? TargetInternal => ValueDegrees * Math.PI / 180;

    /// <inheritdoc />
    public override string ToString() => $"angle {I}-{J}-{K}" + (ValueDegrees is double v ? FormattableString.Invariant($" = {v}°") : "");
}

/// <summary>A fixed dihedral angle.</summary>
/// <param name="I">First atom (0-based).</param>
/// <param name="J">Second atom.</param>
/// <param name="K">Third atom.</param>
/// <param name="L">Fourth atom.</param>
/// <param name="ValueDegrees">The value in degrees, or null for the starting value.</param>
public sealed record DihedralConstraint(int I, int J, int K, int L, double? ValueDegrees) : GeometryConstraint
{
    /// <inheritdoc />
    public override IReadOnlyList<int> Atoms => [I, J, K, L];

    internal override InternalCoordinate Coordinate => new Coordinates.Dihedral(I, J, K, L);

    internal override double? TargetInternal => ValueDegrees * Math.PI / 180;

    /// <inheritdoc />
    public override string ToString() => $"dihedral {I}-{J}-{K}-{L}" + (ValueDegrees is double v ? FormattableString.Invariant($" = {v}°") : "");
}

/// <summary>An atom held in place.</summary>
/// <param name="Atom">The atom (0-based).</param>
public sealed record FrozenAtomConstraint(int Atom) : GeometryConstraint
{
    /// <inheritdoc />
    public override IReadOnlyList<int> Atoms => [Atom];

    internal override InternalCoordinate? Coordinate => null;

    internal override double? TargetInternal => null;

    /// <inheritdoc />
    public override string ToString() => $"frozen atom {Atom}";
}
