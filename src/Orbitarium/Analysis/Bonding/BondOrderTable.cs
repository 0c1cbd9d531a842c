using System.Globalization;
using System.Text;
using Orbitarium.Chemistry;

namespace Orbitarium.Analysis;

/// <summary>Bond orders between every pair of atoms (a symmetric matrix, diagonal zero).</summary>
/// <param name="Molecule">The molecule.</param>
/// <param name="Values">Bond orders, [atom, atom] (0-based).</param>
/// <param name="Method">How they were computed, e.g. "Mayer".</param>
public sealed record BondOrderTable(Molecule Molecule, double[,] Values, string Method)
{
    /// <summary>Bond order between atoms a and b (0-based).</summary>
    /// <param name="a">First atom.</param>
    /// <param name="b">Second atom.</param>
    public double this[int a, int b] => Values[a, b];

    /// <inheritdoc />
    public override string ToString()
    {
        var inv = CultureInfo.InvariantCulture;
        var sb = new StringBuilder($"{Method} bond orders of {Molecule.Formula} (pairs above 0.05)");
        for (int a = 0; a < Molecule.AtomCount; a++)
            for (int b = a + 1; b < Molecule.AtomCount; b++)
                if (Math.Abs(Values[a, b]) > 0.05)
                    sb.Append(inv, $"\n  {Molecule.Atoms[a].Symbol}{a + 1}–{Molecule.Atoms[b].Symbol}{b + 1}  {Values[a, b]:F4}");
        return sb.ToString();
    }
}
