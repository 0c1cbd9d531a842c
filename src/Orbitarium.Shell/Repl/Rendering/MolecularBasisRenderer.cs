using System.Globalization;
using Orbitarium.BasisSets;
using Spectre.Console;
using Spectre.Console.Rendering;

namespace Orbitarium.Shell.Repl.Rendering;

/// <summary>Shows a basis placed on a molecule: its name, shell and function counts, and functions per atom.</summary>
public static class MolecularBasisRenderer
{
    /// <summary>Renders <paramref name="basis"/>.</summary>
    public static IRenderable Render(MolecularBasis basis, ConsoleSettings settings)
    {
        ArgumentNullException.ThrowIfNull(basis);
        var table = new Table().Border(TableBorder.Rounded).BorderColor(Color.Grey);
        table.Title(new TableTitle(Markup.Escape($"{basis.Name} on {basis.Molecule.Formula}"), new Style(Color.Aqua, decoration: Decoration.Bold)));
        table.AddColumn(new TableColumn("#").RightAligned());
        table.AddColumn("atom");
        table.AddColumn(new TableColumn("functions").RightAligned());
        var perAtom = new int[basis.Molecule.AtomCount];
        foreach (int atom in basis.FunctionAtoms) perAtom[atom]++;
        for (int i = 0; i < perAtom.Length; i++)
            table.AddRow(i.ToString(CultureInfo.InvariantCulture), basis.Molecule.Atoms[i].Symbol, perAtom[i].ToString(CultureInfo.InvariantCulture));
        table.Caption(new TableTitle(string.Create(CultureInfo.InvariantCulture,
            $"{basis.Shells.Length} shells · {basis.FunctionCount} functions · {basis.CartesianFunctionCount} Cartesian · highest L = {basis.MaxAngularMomentum}"),
            new Style(Color.Grey)));
        return table;
    }
}
