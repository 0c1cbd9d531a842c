using System.Globalization;
using System.Text;

namespace Orbitarium.Chemistry;

/// <summary>Reads and writes XYZ coordinates: a line with the atom count, a comment line, then one
/// "symbol x y z" line per atom (ångström unless stated). The symbol may also be an atomic number.</summary>
public static class XyzFormat
{
    /// <summary>Parses one XYZ block.</summary>
    /// <exception cref="OrbitariumInputException">The text is malformed; the message names the line.</exception>
    public static Molecule Parse(string text, LengthUnit unit = LengthUnit.Angstrom, int charge = 0, int? multiplicity = null)
    {
        ArgumentNullException.ThrowIfNull(text);
        var lines = text.Replace("\r\n", "\n").Split('\n');
        int first = 0;
        while (first < lines.Length && string.IsNullOrWhiteSpace(lines[first])) first++;
        if (first == lines.Length)
            throw new OrbitariumInputException("The XYZ text is empty: expected an atom count, a comment line and one line per atom.");
        if (!int.TryParse(lines[first].Trim(), NumberStyles.Integer, CultureInfo.InvariantCulture, out int count) || count < 1)
            throw new OrbitariumInputException(
                $"expected the number of atoms (a positive integer), found '{Shorten(lines[first])}'.", first + 1);
        string title = first + 1 < lines.Length ? lines[first + 1].Trim() : "";
        var atoms = new List<Atom>(count);
        double f = unit.ToBohrFactor();
        int lineIndex = first + 2;
        for (; lineIndex < lines.Length && atoms.Count < count; lineIndex++)
        {
            string line = lines[lineIndex];
            if (string.IsNullOrWhiteSpace(line))
                throw new OrbitariumInputException(
                    $"blank line where atom {atoms.Count + 1} of {count} was expected; the count line says {count} atoms.", lineIndex + 1);
            var atom = ParseAtomLine(line, lineIndex + 1, f);
            for (int j = 0; j < atoms.Count; j++)
            {
                double d = Vector3D.Distance(atom.PositionBohr, atoms[j].PositionBohr) * PhysicalConstants.AngstromPerBohr;
                if (d < Molecule.MinimumNuclearSeparationAngstrom)
                    throw new OrbitariumInputException(FormattableString.Invariant(
                        $"atom {atoms.Count + 1} ({atom.Symbol}) is {d:F4} Å from atom {j + 1} ({atoms[j].Symbol}) on line {first + 3 + j}, closer than {Molecule.MinimumNuclearSeparationAngstrom} Å; check the coordinates and their unit."), lineIndex + 1);
            }
            atoms.Add(atom);
        }
        if (atoms.Count < count)
            throw new OrbitariumInputException(
                $"The XYZ text declares {count} atoms on line {first + 1} but lists only {atoms.Count}; fix the count or add the missing atoms.");
        for (; lineIndex < lines.Length; lineIndex++)
        {
            if (!string.IsNullOrWhiteSpace(lines[lineIndex]))
                throw new OrbitariumInputException(
                    $"more atom lines than the {count} declared on line {first + 1}; fix the count or remove the extra lines.", lineIndex + 1);
        }
        return Molecule.FromAtoms(atoms, charge, multiplicity, title);
    }

    /// <summary>Reads an XYZ file.</summary>
    /// <exception cref="OrbitariumInputException">The file is missing, unreadable or malformed.</exception>
    public static Molecule ReadFile(string path, LengthUnit unit = LengthUnit.Angstrom, int charge = 0, int? multiplicity = null)
    {
        string text;
        try
        {
            text = File.ReadAllText(path);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException or ArgumentException or NotSupportedException)
        {
            throw new OrbitariumInputException($"Cannot read the geometry file '{path}': {e.Message}", e);
        }
        try
        {
            return Parse(text, unit, charge, multiplicity);
        }
        catch (OrbitariumInputException e)
        {
            throw new OrbitariumInputException($"{path}: {e.Message}", e);
        }
    }

    /// <summary>Writes a molecule as XYZ text in ångström with 10 decimals.</summary>
    public static string Write(Molecule molecule)
    {
        ArgumentNullException.ThrowIfNull(molecule);
        var sb = new StringBuilder();
        sb.Append(molecule.AtomCount.ToString(CultureInfo.InvariantCulture)).Append('\n');
        sb.Append(molecule.Title.Replace('\n', ' ')).Append('\n');
        foreach (var a in molecule.Atoms)
        {
            var p = a.PositionAngstrom;
            sb.Append(CultureInfo.InvariantCulture, $"{a.Symbol,-2} {p.X,18:F10} {p.Y,18:F10} {p.Z,18:F10}\n");
        }
        return sb.ToString();
    }

    /// <summary>Writes several frames (e.g. an optimisation trajectory) as one multi-frame XYZ text.</summary>
    public static string WriteFrames(IEnumerable<Molecule> frames)
    {
        ArgumentNullException.ThrowIfNull(frames);
        var sb = new StringBuilder();
        foreach (var m in frames) sb.Append(Write(m));
        return sb.ToString();
    }

    private static Atom ParseAtomLine(string line, int lineNumber, double toBohr)
    {
        var parts = line.Split((char[]?)null, StringSplitOptions.RemoveEmptyEntries);
        if (parts.Length < 4)
            throw new OrbitariumInputException(
                $"expected 'symbol x y z', found '{Shorten(line)}'.", lineNumber);
        Element element;
        if (int.TryParse(parts[0], NumberStyles.Integer, CultureInfo.InvariantCulture, out int z))
        {
            try { element = PeriodicTable.ByAtomicNumber(z); }
            catch (OrbitariumInputException e) { throw new OrbitariumInputException(e.Message, lineNumber); }
        }
        else
        {
            // Labels such as "C1" or "H_a" keep their leading letters as the symbol.
            string symbol = new(parts[0].TakeWhile(char.IsLetter).ToArray());
            if (!PeriodicTable.TryBySymbol(symbol, out element))
                throw new OrbitariumInputException(
                    $"unknown element symbol '{parts[0]}'; Orbitarium knows H to Kr.", lineNumber);
        }
        var xyz = new double[3];
        for (int k = 0; k < 3; k++)
        {
            if (!double.TryParse(parts[k + 1], NumberStyles.Float, CultureInfo.InvariantCulture, out xyz[k]))
                throw new OrbitariumInputException(
                    $"coordinate '{parts[k + 1]}' of {element.Symbol} is not a number.", lineNumber);
            if (!double.IsFinite(xyz[k]))
                throw new OrbitariumInputException(
                    $"coordinate '{parts[k + 1]}' of {element.Symbol} is not finite; give a real number.", lineNumber);
        }
        return new Atom(element, new Vector3D(xyz[0] * toBohr, xyz[1] * toBohr, xyz[2] * toBohr));
    }

    private static string Shorten(string s)
    {
        s = s.Trim();
        return s.Length <= 60 ? s : s[..57] + "...";
    }
}
