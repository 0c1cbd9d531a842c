using System.Globalization;
using Orbitarium.Chemistry;
using Spectre.Console;
using Spectre.Console.Rendering;

namespace Orbitarium.Shell.Repl.Rendering;

/// <summary>Shows a molecule as a table of atoms (positions in ångström) under a line with formula, charge and spin.</summary>
public static class MoleculeRenderer
{
    /// <summary>Renders <paramref name="molecule"/>.</summary>
    public static IRenderable Render(Molecule molecule, ConsoleSettings settings)
    {
        ArgumentNullException.ThrowIfNull(molecule);
        ArgumentNullException.ThrowIfNull(settings);
        var table = new Table().Border(TableBorder.Rounded).BorderColor(Color.Grey);
        string title = molecule.Title.Length > 0 ? $"{molecule.Formula} · {molecule.Title}" : molecule.Formula;
        table.AddColumn(new TableColumn("#").RightAligned());
        table.AddColumn(new TableColumn("atom"));
        table.AddColumn(new TableColumn("x / Å").RightAligned());
        table.AddColumn(new TableColumn("y / Å").RightAligned());
        table.AddColumn(new TableColumn("z / Å").RightAligned());
        for (int i = 0; i < molecule.AtomCount; i++)
        {
            var atom = molecule.Atoms[i];
            var p = atom.PositionAngstrom;
            table.AddRow(
                i.ToString(CultureInfo.InvariantCulture),
                atom.Symbol,
                p.X.ToString("F6", CultureInfo.InvariantCulture),
                p.Y.ToString("F6", CultureInfo.InvariantCulture),
                p.Z.ToString("F6", CultureInfo.InvariantCulture));
        }
        string caption = string.Create(CultureInfo.InvariantCulture,
            $"charge {molecule.Charge} · multiplicity {molecule.Multiplicity} · {molecule.ElectronCount} electrons · " +
            $"nuclear repulsion {molecule.NuclearRepulsionEnergyHartree:F8} Eh");
        return new Rows(new Text(title, new Style(Color.Aqua, decoration: Decoration.Bold)), table, new Text(caption, new Style(Color.Grey)));
    }
}
