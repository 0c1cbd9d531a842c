using Orbitarium.Chemistry;

namespace Orbitarium.Geometry.Coordinates;

/// <summary>
/// One primitive internal coordinate q(x) of a molecule: a bond length, a bond angle, a dihedral, a linear-bend
/// component or a single Cartesian component, with its first derivatives (one row of Wilson's B matrix).
/// </summary>
/// <remarks>Values are in bohr (lengths) or radians (angles); Cartesian positions x are 3·N values in bohr.
/// Source: E. B. Wilson, J. C. Decius, P. C. Cross, <i>Molecular Vibrations</i> (McGraw-Hill, 1955), ch. 4.</remarks>
public abstract class InternalCoordinate
{
    /// <summary>The atoms involved (0-based indices).</summary>
    public abstract IReadOnlyList<int> Atoms { get; }

    /// <summary>The kind, e.g. "bond".</summary>
    public abstract string Kind { get; }

    /// <summary>Whether the coordinate is an angle (radians) rather than a length (bohr).</summary>
    public abstract bool IsAngular { get; }

    /// <summary>Whether values wrap around at ±π (dihedrals); differences are then taken modulo 2π.</summary>
    public virtual bool IsPeriodic => false;

    /// <summary>The value at Cartesian positions <paramref name="xBohr"/> (bohr or radians).</summary>
    public abstract double Value(ReadOnlySpan<double> xBohr);

    /// <summary>Writes ∂q/∂x into <paramref name="row"/> (length 3·N; entries of other atoms are left untouched,
    /// so clear the row first).</summary>
    public abstract void Derivatives(ReadOnlySpan<double> xBohr, Span<double> row);

    /// <summary>The difference q₁ − q₀, wrapped into (−π, π] for periodic coordinates.</summary>
    public double Difference(double q1, double q0)
    {
        double d = q1 - q0;
        if (IsPeriodic)
        {
            while (d > Math.PI) d -= 2 * Math.PI;
            while (d <= -Math.PI) d += 2 * Math.PI;
        }
        return d;
    }

    /// <summary>The value in display units: ångström for lengths, degrees for angles.</summary>
    public double DisplayValue(ReadOnlySpan<double> xBohr) =>
        IsAngular ? Value(xBohr) * 180 / Math.PI : Value(xBohr) * PhysicalConstants.AngstromPerBohr;

    /// <summary>Whether this coordinate is the same as <paramref name="other"/> (same kind, same atoms up to reversal).</summary>
    public virtual bool SameAs(InternalCoordinate other)
    {
        ArgumentNullException.ThrowIfNull(other);
        if (other.Kind != Kind || other.Atoms.Count != Atoms.Count) return false;
        bool forward = true, backward = true;
        for (int i = 0; i < Atoms.Count; i++)
        {
            forward &= Atoms[i] == other.Atoms[i];
            backward &= Atoms[i] == other.Atoms[Atoms.Count - 1 - i];
        }
        return forward || backward;
    }

    /// <inheritdoc />
    public override string ToString() => $"{Kind} {string.Join("-", Atoms.Select(a => a + 1))}";

    internal static Vector3D Position(ReadOnlySpan<double> x, int atom) => new(x[3 * atom], x[3 * atom + 1], x[3 * atom + 2]);

    internal static void Add(Span<double> row, int atom, Vector3D v)
    {
        row[3 * atom] += v.X;
        row[3 * atom + 1] += v.Y;
        row[3 * atom + 2] += v.Z;
    }
}
