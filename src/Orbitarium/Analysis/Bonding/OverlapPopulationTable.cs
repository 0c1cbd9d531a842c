using System.Globalization;
using System.Text;
using Orbitarium.Chemistry;

namespace Orbitarium.Analysis;

/// <summary>
/// Mulliken overlap populations per atom pair, split per orbital (α and β separately for unrestricted results), with
/// each orbital's bonding character for each pair.
/// </summary>
/// <param name="Molecule">The molecule.</param>
/// <param name="Entries">One entry per (orbital, pair), for every orbital (occupied and virtual) and every pair asked for.</param>
/// <param name="Threshold">Per-electron population below which (in size) an orbital counts as non-bonding.</param>
public sealed record OverlapPopulationTable(Molecule Molecule, IReadOnlyList<OrbitalPairPopulation> Entries, double Threshold)
{
    /// <summary>The total overlap population of a pair: the sum over occupied orbitals of occupation × per-electron value.</summary>
    /// <param name="a">First atom (0-based).</param>
    /// <param name="b">Second atom (0-based).</param>
    public double Total(int a, int b)
    {
        var (i, j) = a < b ? (a, b) : (b, a);
        double s = 0;
        foreach (var e in Entries) if (e.AtomA == i && e.AtomB == j) s += e.Population;
        return s;
    }

    /// <summary>The entries of one orbital (all pairs).</summary>
    /// <param name="orbital">Orbital index (0-based).</param>
    /// <param name="spinLabel">"" restricted, "α" or "β".</param>
    public IReadOnlyList<OrbitalPairPopulation> ForOrbital(int orbital, string spinLabel = "") =>
        [.. Entries.Where(e => e.Orbital == orbital && e.SpinLabel == spinLabel)];

    /// <summary>The pair on which the orbital's overlap population is largest in size (its dominant bonding
    /// interaction), or null when there are no pairs.</summary>
    /// <param name="orbital">Orbital index (0-based).</param>
    /// <param name="spinLabel">"" restricted, "α" or "β".</param>
    public OrbitalPairPopulation? Dominant(int orbital, string spinLabel = "") =>
        ForOrbital(orbital, spinLabel).MaxBy(e => Math.Abs(e.PerElectron));

    /// <inheritdoc />
    public override string ToString()
    {
        var inv = CultureInfo.InvariantCulture;
        var sb = new StringBuilder();
        sb.Append(inv, $"Overlap populations of {Molecule.Formula} (non-bonding below ±{Threshold:0.###} per electron)\n");
        var pairs = Entries.Select(e => (e.AtomA, e.AtomB)).Distinct().ToList();
        sb.Append($"{"MO",6} {"E / Eh",10} {"occ",5}");
        foreach (var (a, b) in pairs) sb.Append(inv, $" {Label(a) + "–" + Label(b),16}");
        sb.Append('\n');
        foreach (var g in Entries.GroupBy(e => (e.SpinLabel, e.Orbital)))
        {
            var first = g.First();
            sb.Append(inv, $"{first.Orbital + first.SpinLabel,6} {first.EnergyHartree,10:F4} {first.Occupation,5:0.##}");
            foreach (var (a, b) in pairs)
            {
                var e = g.FirstOrDefault(x => x.AtomA == a && x.AtomB == b);
                string mark = e is null ? "" : e.Character switch { BondCharacter.Bonding => "b", BondCharacter.Antibonding => "a*", _ => "n" };
                sb.Append(inv, $" {(e is null ? "" : e.PerElectron.ToString("+0.0000;-0.0000", inv) + " " + mark),16}");
            }
            sb.Append('\n');
        }
        sb.Append($"{"total",6} {"",10} {"",5}");
        foreach (var (a, b) in pairs) sb.Append(inv, $" {Total(a, b),16:+0.0000;-0.0000}");
        return sb.ToString();
    }

    private string Label(int atom) => $"{Molecule.Atoms[atom].Symbol}{atom + 1}";
}
