namespace Orbitarium.Chemistry;

/// <summary>An atom of a molecule: an element at a position (stored in bohr).</summary>
/// <param name="Element">The element.</param>
/// <param name="PositionBohr">Nuclear position in bohr.</param>
public sealed record Atom(Element Element, Vector3D PositionBohr)
{
    /// <summary>Nuclear position in ångström.</summary>
    public Vector3D PositionAngstrom => PositionBohr * PhysicalConstants.AngstromPerBohr;

    /// <summary>Nuclear charge Z (equal to the atomic number).</summary>
    public int NuclearCharge => Element.AtomicNumber;

    /// <summary>The element symbol.</summary>
    public string Symbol => Element.Symbol;

    /// <summary>Creates an atom from a symbol and a position in the given unit (ångström by default).</summary>
    public static Atom Create(string symbol, double x, double y, double z, LengthUnit unit = LengthUnit.Angstrom)
    {
        double f = unit.ToBohrFactor();
        return new Atom(PeriodicTable.BySymbol(symbol), new Vector3D(x * f, y * f, z * f));
    }

    /// <summary>A copy at a new position in bohr.</summary>
    public Atom WithPositionBohr(Vector3D positionBohr) => this with { PositionBohr = positionBohr };

    /// <inheritdoc />
    public override string ToString()
    {
        var p = PositionAngstrom;
        return FormattableString.Invariant($"{Symbol} {p.X,12:F6} {p.Y,12:F6} {p.Z,12:F6} Å");
    }
}
