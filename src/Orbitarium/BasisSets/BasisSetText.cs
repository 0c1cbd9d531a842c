using System.Globalization;
using System.Text;
using Orbitarium.Chemistry;

namespace Orbitarium.BasisSets;

/// <summary>
/// Reads and writes Orbitarium's own plain-text basis-set format (files ending in <c>.basis</c>).
/// </summary>
/// <remarks>
/// <para>The format is line based; <c>#</c> starts a comment, blank lines and indentation are ignored,
/// keywords are lower case. Header lines, before the first <c>element</c>:</para>
/// <code>
/// basis 6-31G*                 # the set's name (required)
/// alias 6-31G(d)               # other names it is found by (any number)
/// form cartesian               # cartesian or pure: the default form of d, f and g shells (required)
/// source Hehre, Ditchfield and Pople, J. Chem. Phys. 56, 2257 (1972)   # any number; joined into the description
/// based-on 6-31G               # optional: start from every shell of a built-in set, then add the shells below
/// </code>
/// <para>Then one block per element; a <c>shell</c> line names the angular momentum (s, p, d, f, g, or
/// sp for an s and a p shell sharing exponents) and is followed by one primitive per line: the exponent in
/// bohr⁻², then one coefficient per letter (coefficients multiply normalised primitives):</para>
/// <code>
/// element C
///   shell s
///     172.2560000   0.0617669
///     25.9109000    0.3587940
///   shell sp
///     3.6649800    -0.3958970   0.2364600
///   shell d
///     0.8           1.0
/// </code>
/// <para>Numbers use the invariant culture ('.' decimal separator; 1.5e-3 and 1.5D-03 are both accepted).</para>
/// </remarks>
public static class BasisSetText
{
    /// <summary>File extension of Orbitarium basis files.</summary>
    public const string FileExtension = ".basis";

    /// <summary>Parses a basis set from text in Orbitarium's basis format.</summary>
    /// <param name="text">The text.</param>
    /// <param name="resolveBase">Looks up the set named by a <c>based-on</c> line; defaults to <see cref="BasisSetLibrary.Get"/>.</param>
    /// <exception cref="OrbitariumInputException">The text is malformed; the message names the line.</exception>
    public static BasisSet Parse(string text, Func<string, BasisSet>? resolveBase = null) => Parse(text, resolveBase, out _);

    internal static BasisSet Parse(string text, Func<string, BasisSet>? resolveBase, out IReadOnlyList<string> aliases)
    {
        ArgumentNullException.ThrowIfNull(text);
        resolveBase ??= BasisSetLibrary.Get;
        var lines = text.Replace("\r\n", "\n").Split('\n');
        string? name = null;
        bool? pure = null;
        var sources = new List<string>();
        var aliasList = new List<string>();
        BasisSet? baseSet = null;
        var elements = new List<(Element Element, List<ShellDefinition> Shells, int Line)>();
        List<ShellDefinition>? currentShells = null;
        string? shellLetters = null;
        int shellLine = 0;
        var exps = new List<double>();
        var coefs = new List<double[]>();

        void FlushShell()
        {
            if (shellLetters == null) return;
            if (exps.Count == 0)
                throw new OrbitariumInputException($"shell '{shellLetters}' has no primitives; list 'exponent coefficient' lines after it.", shellLine);
            for (int k = 0; k < shellLetters.Length; k++)
            {
                int l = AngularMomentum.FromLetter(shellLetters[k]);
                try
                {
                    currentShells!.Add(new ShellDefinition(l, exps, coefs.Select(c => c[k])));
                }
                catch (OrbitariumInputException e)
                {
                    throw new OrbitariumInputException(e.Message, shellLine);
                }
            }
            shellLetters = null;
            exps.Clear();
            coefs.Clear();
        }

        for (int i = 0; i < lines.Length; i++)
        {
            int lineNo = i + 1;
            string line = lines[i];
            int hash = line.IndexOf('#');
            if (hash >= 0) line = line[..hash];
            line = line.Trim();
            if (line.Length == 0) continue;
            var parts = line.Split((char[]?)null, StringSplitOptions.RemoveEmptyEntries);
            string keyword = parts[0];
            string rest = line[keyword.Length..].Trim();

            if (IsNumber(keyword))
            {
                if (shellLetters == null)
                    throw new OrbitariumInputException($"a primitive line '{line}' outside a shell; put a 'shell s' (or p, d, sp, …) line before it.", lineNo);
                int want = shellLetters.Length + 1;
                if (parts.Length != want)
                    throw new OrbitariumInputException(
                        $"shell '{shellLetters}' needs {want} numbers per primitive (exponent and {shellLetters.Length} coefficient(s)), found {parts.Length}.", lineNo);
                var values = new double[parts.Length];
                for (int k = 0; k < parts.Length; k++)
                    if (!TryNumber(parts[k], out values[k]))
                        throw new OrbitariumInputException($"'{parts[k]}' is not a number.", lineNo);
                if (!(values[0] > 0) || !double.IsFinite(values[0]))
                    throw new OrbitariumInputException($"exponent {parts[0]} must be a positive number (bohr⁻²).", lineNo);
                exps.Add(values[0]);
                coefs.Add(values[1..]);
                continue;
            }

            switch (keyword)
            {
                case "basis":
                case "alias":
                case "source":
                case "form":
                case "based-on":
                    if (elements.Count > 0)
                        throw new OrbitariumInputException($"'{keyword}' belongs in the header, before the first 'element' line.", lineNo);
                    if (rest.Length == 0)
                        throw new OrbitariumInputException($"'{keyword}' needs a value.", lineNo);
                    if (keyword == "basis")
                    {
                        if (name != null) throw new OrbitariumInputException($"the set is already named '{name}'; use 'alias' for other names.", lineNo);
                        name = rest;
                    }
                    else if (keyword == "alias") aliasList.Add(rest);
                    else if (keyword == "source") sources.Add(rest);
                    else if (keyword == "form")
                    {
                        pure = rest.ToLowerInvariant() switch
                        {
                            "pure" => true,
                            "cartesian" => false,
                            _ => throw new OrbitariumInputException($"form must be 'pure' or 'cartesian', found '{rest}'.", lineNo),
                        };
                    }
                    else
                    {
                        try { baseSet = resolveBase(rest); }
                        catch (OrbitariumInputException e) { throw new OrbitariumInputException($"based-on: {e.Message}", lineNo); }
                    }
                    break;
                case "element":
                    FlushShell();
                    if (parts.Length != 2)
                        throw new OrbitariumInputException("write 'element' and one element symbol, e.g. 'element C'.", lineNo);
                    if (!PeriodicTable.TryBySymbol(parts[1], out var element))
                        throw new OrbitariumInputException($"unknown element symbol '{parts[1]}'; Orbitarium knows H to Kr.", lineNo);
                    if (elements.Any(e => e.Element == element))
                        throw new OrbitariumInputException($"element {element.Symbol} appears twice (first on line {elements.First(e => e.Element == element).Line}); merge the blocks.", lineNo);
                    currentShells = [];
                    elements.Add((element, currentShells, lineNo));
                    break;
                case "shell":
                    FlushShell();
                    if (currentShells == null)
                        throw new OrbitariumInputException("a 'shell' line before any 'element' line; start the block with e.g. 'element H'.", lineNo);
                    if (parts.Length != 2 || parts[1].Length == 0 || parts[1].Length > 2)
                        throw new OrbitariumInputException("write 'shell' and its letters: s, p, d, f, g or sp.", lineNo);
                    string letters = parts[1].ToLowerInvariant();
                    foreach (char ch in letters)
                        if ("spdfg".IndexOf(ch) < 0)
                            throw new OrbitariumInputException($"unknown shell letter '{ch}'; use s, p, d, f, g or sp.", lineNo);
                    if (letters.Length == 2 && letters != "sp")
                        throw new OrbitariumInputException($"'{letters}' is not a shell; the only combined shell is sp.", lineNo);
                    shellLetters = letters;
                    shellLine = lineNo;
                    break;
                default:
                    throw new OrbitariumInputException(
                        $"unknown keyword '{keyword}'; expected basis, alias, form, source, based-on, element, shell or a primitive line.", lineNo);
            }
        }
        FlushShell();
        if (name == null)
            throw new OrbitariumInputException("The basis text has no 'basis NAME' line; name the set in its header.");
        if (pure == null && baseSet == null)
            throw new OrbitariumInputException($"Basis '{name}' does not say its form; add 'form cartesian' or 'form pure' to the header.");
        if (elements.Count == 0 && baseSet == null)
            throw new OrbitariumInputException($"Basis '{name}' has no 'element' blocks.");
        foreach (var (element, shells, line) in elements)
            if (shells.Count == 0)
                throw new OrbitariumInputException($"element {element.Symbol} has no shells.", line);

        var set = BasisSet.Create(name, pure ?? baseSet!.DefaultPure, string.Join("; ", sources));
        if (baseSet != null)
            foreach (int z in baseSet.AtomicNumbers)
            {
                var el = PeriodicTable.ByAtomicNumber(z);
                set = set.WithElement(el, baseSet.ShellsFor(el));
            }
        foreach (var (element, shells, _) in elements)
        {
            var all = set.Covers(element) ? set.ShellsFor(element).Concat(shells) : shells;
            set = set.WithElement(element, all);
        }
        aliases = aliasList;
        return set;
    }

    /// <summary>Writes a basis set in Orbitarium's basis format (s and p shells with identical exponents
    /// are written together as one sp shell). <see cref="Parse(string, Func{string, BasisSet}?)"/> reads the text back to an equal set.</summary>
    public static string Write(BasisSet set)
    {
        ArgumentNullException.ThrowIfNull(set);
        var sb = new StringBuilder();
        sb.Append("# Orbitarium basis set\n");
        sb.Append("basis ").Append(set.Name).Append('\n');
        sb.Append("form ").Append(set.DefaultPure ? "pure" : "cartesian").Append('\n');
        foreach (var s in set.Description.Split("; ", StringSplitOptions.RemoveEmptyEntries))
            sb.Append("source ").Append(s.Replace('\n', ' ').Replace('#', ' ')).Append('\n');
        foreach (int z in set.AtomicNumbers)
        {
            var el = PeriodicTable.ByAtomicNumber(z);
            sb.Append('\n').Append("element ").Append(el.Symbol).Append('\n');
            var shells = set.ShellsFor(el);
            for (int k = 0; k < shells.Length; k++)
            {
                var sh = shells[k];
                bool sp = sh.AngularMomentum == 0 && k + 1 < shells.Length && shells[k + 1].AngularMomentum == 1
                          && shells[k + 1].Exponents.SequenceEqual(sh.Exponents);
                sb.Append("  shell ").Append(sp ? "sp" : AngularMomentum.Letter(sh.AngularMomentum).ToString()).Append('\n');
                for (int p = 0; p < sh.PrimitiveCount; p++)
                {
                    sb.Append("    ").Append(Format(sh.Exponents[p]).PadRight(24)).Append(' ').Append(Format(sh.Coefficients[p]).PadLeft(24));
                    if (sp) sb.Append(' ').Append(Format(shells[k + 1].Coefficients[p]).PadLeft(24));
                    sb.Append('\n');
                }
                if (sp) k++;
            }
        }
        return sb.ToString();
    }

    /// <summary>Reads a basis file (see <see cref="Parse(string, Func{string, BasisSet}?)"/>).</summary>
    /// <exception cref="OrbitariumInputException">The file cannot be read or is malformed.</exception>
    public static BasisSet ReadFile(string path)
    {
        string text;
        try
        {
            text = File.ReadAllText(path);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException or ArgumentException or NotSupportedException)
        {
            throw new OrbitariumInputException($"Cannot read the basis file '{path}': {e.Message}", e);
        }
        try
        {
            return Parse(text);
        }
        catch (OrbitariumInputException e)
        {
            throw new OrbitariumInputException($"{path}: {e.Message}", e);
        }
    }

    /// <summary>Writes a basis set to a file atomically (temporary file, then rename).</summary>
    public static void WriteFile(BasisSet set, string path)
    {
        ArgumentNullException.ThrowIfNull(set);
        ArgumentException.ThrowIfNullOrWhiteSpace(path);
        string full = Path.GetFullPath(path);
        string tmp = full + ".tmp-" + Guid.NewGuid().ToString("N");
        File.WriteAllText(tmp, Write(set));
        File.Move(tmp, full, overwrite: true);
    }

    private static string Format(double v) => v.ToString("R", CultureInfo.InvariantCulture);

    private static bool IsNumber(string token) =>
        token.Length > 0 && (char.IsDigit(token[0]) || token[0] is '.' or '-' or '+');

    private static bool TryNumber(string token, out double value) =>
        double.TryParse(token.Replace('D', 'E').Replace('d', 'e'), NumberStyles.Float, CultureInfo.InvariantCulture, out value)
        && double.IsFinite(value);
}
