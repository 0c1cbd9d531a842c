using System.Globalization;

namespace Orbitarium.Chemistry;

/// <summary>
/// Builds Cartesian coordinates from internal coordinates (a Z-matrix).
/// </summary>
/// <remarks>
/// Layout, one atom per line (atoms are referred to by 1-based line number):
/// <code>
/// O
/// H 1 0.958
/// H 1 0.958 2 104.48
/// X 1 r 2 a 3 d        (bond to atom 1, angle with atom 2, dihedral with atom 3)
/// </code>
/// Lengths are in ångström (or the unit given), angles in degrees. A value may be a name defined after a
/// blank line as <c>name = value</c>. The first atom sits at the origin, the second on +z, the third in the xz plane.
/// Placement uses the natural-extension reference frame construction (Parsons et al., J. Comput. Chem. 26, 1063 (2005)).
/// </remarks>
public static class ZMatrix
{
    /// <summary>Parses a Z-matrix into a molecule.</summary>
    /// <exception cref="OrbitariumInputException">A line is malformed; the message names the line.</exception>
    public static Molecule Parse(string text, LengthUnit unit = LengthUnit.Angstrom, int charge = 0, int? multiplicity = null)
    {
        ArgumentNullException.ThrowIfNull(text);
        var lines = text.Replace("\r\n", "\n").Split('\n');
        var rows = new List<(string[] Parts, int Line)>();
        var variables = new Dictionary<string, double>(StringComparer.Ordinal);
        bool inVariables = false;
        for (int i = 0; i < lines.Length; i++)
        {
            string line = lines[i];
            int hash = line.IndexOf('#');
            if (hash >= 0) line = line[..hash];
            if (string.IsNullOrWhiteSpace(line))
            {
                if (rows.Count > 0) inVariables = true;
                continue;
            }
            if (inVariables)
            {
                var kv = line.Split('=', 2);
                if (kv.Length != 2 || !double.TryParse(kv[1].Trim(), NumberStyles.Float, CultureInfo.InvariantCulture, out double v))
                    throw new OrbitariumInputException($"expected 'name = value' in the variables block, found '{line.Trim()}'.", i + 1);
                variables[kv[0].Trim()] = v;
            }
            else
            {
                rows.Add((line.Split((char[]?)null, StringSplitOptions.RemoveEmptyEntries), i + 1));
            }
        }
        if (rows.Count == 0)
            throw new OrbitariumInputException("The Z-matrix is empty: give one atom per line.");

        double toBohr = unit.ToBohrFactor();
        var positions = new List<Vector3D>();
        var atoms = new List<Atom>();
        for (int n = 0; n < rows.Count; n++)
        {
            var (p, lineNo) = rows[n];
            int expected = n switch { 0 => 1, 1 => 3, 2 => 5, _ => 7 };
            if (p.Length != expected)
                throw new OrbitariumInputException(
                    $"atom {n + 1} needs {expected} fields ({Describe(n)}), found {p.Length}.", lineNo);
            string symbol = new(p[0].TakeWhile(char.IsLetter).ToArray());
            if (!PeriodicTable.TryBySymbol(symbol, out var element))
                throw new OrbitariumInputException($"unknown element symbol '{p[0]}'; Orbitarium knows H to Kr.", lineNo);

            Vector3D pos;
            if (n == 0)
            {
                pos = Vector3D.Zero;
            }
            else
            {
                int a = Reference(p[1], n, lineNo);
                double r = Value(p[2], variables, lineNo, "bond length") * toBohr;
                if (r <= 0) throw new OrbitariumInputException($"bond length {p[2]} must be positive.", lineNo);
                if (n == 1)
                {
                    pos = positions[a] + new Vector3D(0, 0, r);
                }
                else
                {
                    int b = Reference(p[3], n, lineNo);
                    if (b == a) throw new OrbitariumInputException("the angle reference repeats the bond reference.", lineNo);
                    double theta = Value(p[4], variables, lineNo, "angle") * Math.PI / 180;
                    Vector3D c;
                    double phi;
                    if (n == 2)
                    {
                        // Third atom: place in the xz plane.
                        var ab = (positions[b] - positions[a]).Normalized();
                        var perp = Math.Abs(ab.X) < 0.9 ? new Vector3D(1, 0, 0) : new Vector3D(0, 1, 0);
                        c = positions[b] + Vector3D.Cross(ab, Vector3D.Cross(perp, ab));
                        phi = 0;
                    }
                    else
                    {
                        int ci = Reference(p[5], n, lineNo);
                        if (ci == a || ci == b) throw new OrbitariumInputException("the dihedral reference repeats another reference.", lineNo);
                        c = positions[ci];
                        phi = Value(p[6], variables, lineNo, "dihedral") * Math.PI / 180;
                    }
                    pos = Place(positions[a], positions[b], c, r, theta, phi, lineNo);
                }
            }
            positions.Add(pos);
            atoms.Add(new Atom(element, pos));
        }
        return Molecule.FromAtoms(atoms, charge, multiplicity);
    }

    private static Vector3D Place(Vector3D a, Vector3D b, Vector3D c, double r, double theta, double phi, int lineNo)
    {
        // New atom D bonded to A, angle D-A-B = theta, dihedral D-A-B-C = phi.
        var bc = (b - c);
        var ab = (a - b);
        if (ab.Length == 0) throw new OrbitariumInputException("reference atoms coincide.", lineNo);
        var abn = ab.Normalized();
        var n = Vector3D.Cross(bc, abn);
        if (n.Length < 1e-10)
            throw new OrbitariumInputException("the three reference atoms are collinear, so the dihedral is undefined; pick another reference.", lineNo);
        n = n.Normalized();
        var m = Vector3D.Cross(n, abn);
        var d2 = new Vector3D(-r * Math.Cos(theta), r * Math.Sin(theta) * Math.Cos(phi), r * Math.Sin(theta) * Math.Sin(phi));
        return a + d2.X * abn + d2.Y * m + d2.Z * n;
    }

    private static int Reference(string field, int current, int lineNo)
    {
        if (!int.TryParse(field, NumberStyles.Integer, CultureInfo.InvariantCulture, out int k) || k < 1 || k > current)
            throw new OrbitariumInputException($"'{field}' is not an earlier atom (give a number from 1 to {current}).", lineNo);
        return k - 1;
    }

    private static double Value(string field, Dictionary<string, double> variables, int lineNo, string what)
    {
        if (double.TryParse(field, NumberStyles.Float, CultureInfo.InvariantCulture, out double v))
        {
            if (!double.IsFinite(v)) throw new OrbitariumInputException($"{what} '{field}' is not finite.", lineNo);
            return v;
        }
        bool negate = field.StartsWith('-');
        string name = negate ? field[1..] : field;
        if (variables.TryGetValue(name, out v)) return negate ? -v : v;
        throw new OrbitariumInputException($"{what} '{field}' is neither a number nor a variable defined below the atoms.", lineNo);
    }

    private static string Describe(int n) => n switch
    {
        0 => "symbol",
        1 => "symbol, bonded atom, length",
        2 => "symbol, bonded atom, length, angle atom, angle",
        _ => "symbol, bonded atom, length, angle atom, angle, dihedral atom, dihedral",
    };
}
