namespace Orbitarium.Geometry.Symmetry;

/// <summary>A molecular point group found by <see cref="PointGroupDetector"/>, with its rotational symmetry number.</summary>
/// <param name="Name">Schoenflies symbol, e.g. "C2v", "D3h", "D∞h" (written "Dinfh" in <see cref="AsciiName"/>).</param>
/// <param name="SymmetryNumber">Rotational symmetry number σ: the order of the rotational subgroup (1 for C∞v, 2 for D∞h).</param>
/// <param name="ToleranceAngstrom">The tolerance the detection used, Å.</param>
public sealed record PointGroup(string Name, int SymmetryNumber, double ToleranceAngstrom)
{
    /// <summary>The name with ∞ spelt "inf", for plain-text files.</summary>
    public string AsciiName => Name.Replace("∞", "inf", StringComparison.Ordinal);

    /// <inheritdoc />
    public override string ToString() => $"{Name} (σ = {SymmetryNumber})";
}
