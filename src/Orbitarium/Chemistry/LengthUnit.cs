namespace Orbitarium.Chemistry;

/// <summary>Unit of a length given to or taken from a molecule.</summary>
public enum LengthUnit
{
    /// <summary>Ångström, 10⁻¹⁰ m (the default for XYZ files and Z-matrices).</summary>
    Angstrom,

    /// <summary>Bohr, the atomic unit of length a₀ = 0.529177210903 Å (CODATA 2018).</summary>
    Bohr,
}

/// <summary>Conversions between <see cref="LengthUnit"/> values.</summary>
public static class LengthUnitExtensions
{
    /// <summary>Factor that turns a length in <paramref name="unit"/> into bohr.</summary>
    public static double ToBohrFactor(this LengthUnit unit) => unit switch
    {
        LengthUnit.Angstrom => PhysicalConstants.BohrPerAngstrom,
        LengthUnit.Bohr => 1.0,
        _ => throw new ArgumentOutOfRangeException(nameof(unit), unit, "Unknown length unit."),
    };

    /// <summary>Parses "angstrom"/"a"/"ang" or "bohr"/"au" (case-insensitive).</summary>
    public static LengthUnit Parse(string text) => text.Trim().ToLowerInvariant() switch
    {
        "angstrom" or "ang" or "a" or "å" => LengthUnit.Angstrom,
        "bohr" or "au" or "a0" => LengthUnit.Bohr,
        _ => throw new OrbitariumInputException($"Unknown length unit '{text}': use 'angstrom' or 'bohr'."),
    };
}
