using System.Collections.Immutable;
using System.Globalization;
using System.Text;
using Orbitarium.Chemistry;

namespace Orbitarium.Analysis;

/// <summary>Partial atomic charges and electron populations from one population analysis.</summary>
/// <param name="Method">The analysis, e.g. "Mulliken" or "Löwdin".</param>
/// <param name="Molecule">The molecule the charges belong to.</param>
/// <param name="ChargesElementary">Partial charge of each atom in units of e (nuclear charge minus electron population).</param>
/// <param name="Populations">Electron population of each atom (α + β).</param>
/// <param name="SpinPopulations">α − β population of each atom (zero for closed shells).</param>
public sealed record AtomicCharges(
    string Method,
    Molecule Molecule,
    ImmutableArray<double> ChargesElementary,
    ImmutableArray<double> Populations,
    ImmutableArray<double> SpinPopulations)
{
    /// <summary>Sum of the charges (equals the molecule's total charge up to round-off).</summary>
    public double TotalChargeElementary
    {
        get
        {
            double s = 0;
            foreach (double q in ChargesElementary) s += q;
            return s;
        }
    }

    /// <inheritdoc />
    public override string ToString()
    {
        var sb = new StringBuilder();
        sb.Append(CultureInfo.InvariantCulture, $"{Method} charges (e):");
        for (int a = 0; a < ChargesElementary.Length; a++)
            sb.Append(CultureInfo.InvariantCulture, $"\n  {Molecule.Atoms[a].Symbol}{a + 1,-4} {ChargesElementary[a],10:F6}   spin {SpinPopulations[a],9:F6}");
        return sb.ToString();
    }
}
