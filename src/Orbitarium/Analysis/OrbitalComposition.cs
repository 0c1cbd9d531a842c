using System.Collections.Immutable;
using System.Globalization;
using System.Text;
using Orbitarium.BasisSets;
using Orbitarium.Scf;

namespace Orbitarium.Analysis;

/// <summary>One atom-and-shell-type share of a molecular orbital.</summary>
/// <param name="AtomIndex">0-based atom index.</param>
/// <param name="AtomLabel">Element symbol and 1-based index, e.g. "O1".</param>
/// <param name="AngularMomentum">Angular momentum L of the basis functions (0 s, 1 p, 2 d, …).</param>
/// <param name="Fraction">Mulliken share of the orbital's one electron, Σ_μ c_μi (S c_i)_μ over those functions (sums to 1 over all parts).</param>
public sealed record OrbitalContribution(int AtomIndex, string AtomLabel, int AngularMomentum, double Fraction)
{
    /// <inheritdoc />
    public override string ToString() => FormattableString.Invariant($"{AtomLabel} {BasisSets.AngularMomentum.Letter(AngularMomentum)} {100 * Fraction:F1}%");
}

/// <summary>The make-up of one molecular orbital by atom and angular momentum.</summary>
/// <param name="Index">0-based orbital index (ascending energy).</param>
/// <param name="Spin">"alpha", "beta", or "" for restricted orbitals.</param>
/// <param name="EnergyHartree">Orbital energy, hartree.</param>
/// <param name="Occupation">Electrons in the orbital (0–2 restricted, 0–1 per spin unrestricted).</param>
/// <param name="Contributions">Shares by (atom, L), largest first.</param>
public sealed record OrbitalMakeup(int Index, string Spin, double EnergyHartree, double Occupation, ImmutableArray<OrbitalContribution> Contributions)
{
    /// <summary>Share of each atom (index → fraction).</summary>
    public ImmutableDictionary<int, double> ByAtom =>
        Contributions.GroupBy(c => c.AtomIndex).ToImmutableDictionary(g => g.Key, g => g.Sum(c => c.Fraction));

    /// <summary>Share of each angular momentum (L → fraction).</summary>
    public ImmutableDictionary<int, double> ByAngularMomentum =>
        Contributions.GroupBy(c => c.AngularMomentum).ToImmutableDictionary(g => g.Key, g => g.Sum(c => c.Fraction));

    /// <inheritdoc />
    public override string ToString()
    {
        var sb = new StringBuilder();
        sb.Append(CultureInfo.InvariantCulture, $"MO {Index + 1}{(Spin.Length > 0 ? " " + Spin : "")}  {EnergyHartree:F6} Eh  occ {Occupation:F1}: ");
        sb.Append(string.Join(", ", Contributions.Where(c => c.Fraction >= 0.05)));
        return sb.ToString();
    }
}

/// <summary>Orbital composition analysis: which atoms and which kinds of shells make up each molecular orbital,
/// by Mulliken's partition of the orbital's normalisation Σ_μν c_μi S_μν c_νi = 1.</summary>
/// <remarks>R. S. Mulliken, J. Chem. Phys. 23, 1833 (1955). Shares can be slightly negative in diffuse bases.</remarks>
public static class OrbitalComposition
{
    /// <summary>The make-up of every orbital (α then β for unrestricted results).</summary>
    public static IReadOnlyList<OrbitalMakeup> Analyse(ScfResult result)
    {
        ArgumentNullException.ThrowIfNull(result);
        var list = new List<OrbitalMakeup>();
        bool unrestricted = result.Reference == ScfReference.Unrestricted;
        for (int i = 0; i < result.OrbitalCount; i++) list.Add(Analyse(result, i, beta: false));
        if (unrestricted)
            for (int i = 0; i < result.OrbitalCount; i++) list.Add(Analyse(result, i, beta: true));
        return list;
    }

    /// <summary>The make-up of orbital <paramref name="index"/> (0-based), α or β.</summary>
    public static OrbitalMakeup Analyse(ScfResult result, int index, bool beta = false)
    {
        ArgumentNullException.ThrowIfNull(result);
        if (index < 0 || index >= result.OrbitalCount)
            throw new ArgumentOutOfRangeException(nameof(index), index, $"Orbital index must be 0..{result.OrbitalCount - 1}.");
        var basis = result.Basis;
        var c = (beta ? result.CoefficientsBeta : result.CoefficientsAlpha).Column(index);
        var sc = result.Overlap * c;
        var parts = new Dictionary<(int Atom, int L), double>();
        for (int mu = 0; mu < basis.FunctionCount; mu++)
        {
            int atom = basis.FunctionAtoms[mu];
            int l = basis.Shells[basis.FunctionShells[mu]].AngularMomentum;
            parts[(atom, l)] = parts.GetValueOrDefault((atom, l)) + c[mu] * sc[mu];
        }
        var contributions = parts
            .Select(p => new OrbitalContribution(p.Key.Atom,
                p.Key.Atom >= 0 ? $"{result.Molecule.Atoms[p.Key.Atom].Symbol}{p.Key.Atom + 1}" : "X", p.Key.L, p.Value))
            .OrderByDescending(p => p.Fraction)
            .ToImmutableArray();
        bool unrestricted = result.Reference == ScfReference.Unrestricted;
        double occupation = unrestricted
            ? (beta ? result.OccupationsBeta[index] : result.OccupationsAlpha[index])
            : result.OccupationsAlpha[index] + result.OccupationsBeta[index];
        double energy = beta ? result.OrbitalEnergiesBetaHartree[index] : result.OrbitalEnergiesAlphaHartree[index];
        return new OrbitalMakeup(index, unrestricted ? (beta ? "beta" : "alpha") : "", energy, occupation, contributions);
    }
}
