using System.Collections.Concurrent;
using System.Reflection;
using System.Text;
using System.Xml.Linq;

namespace Orbitarium.Shell.Repl;

/// <summary>
/// Reads the XML documentation files generated next to the library's assemblies (and MathNet's, when present)
/// and turns a member's comment into plain text sections for <c>#help</c>.
/// </summary>
public static class XmlDocumentation
{
    private static readonly ConcurrentDictionary<string, XElement?> FileCache = new(StringComparer.Ordinal);
    private static readonly Lazy<Dictionary<string, XElement>> Members = new(LoadAll);

    /// <summary>The documentation sections of a member, or null when it has none.</summary>
    /// <param name="documentationId">The member's documentation id, e.g. <c>T:Orbitarium.Chemistry.Molecule</c>.</param>
    public static DocumentationEntry? Find(string? documentationId)
    {
        if (documentationId is null || !Members.Value.TryGetValue(documentationId, out var member)) return null;
        string Section(string name) => member.Element(name) is { } e ? Flatten(e) : "";
        var parameters = member.Elements("param")
            .Select(p => (Name: (string?)p.Attribute("name") ?? "", Text: Flatten(p))).ToList();
        var exceptions = member.Elements("exception")
            .Select(p => (Name: ShortCref((string?)p.Attribute("cref") ?? ""), Text: Flatten(p))).ToList();
        return new DocumentationEntry(Section("summary"), Section("remarks"), Section("returns"), Section("value"), parameters, exceptions);
    }

    /// <summary>Number of documented members loaded (0 when no XML file was found).</summary>
    public static int Count => Members.Value.Count;

    private static Dictionary<string, XElement> LoadAll()
    {
        var map = new Dictionary<string, XElement>(StringComparer.Ordinal);
        foreach (var assembly in ScriptEnvironment.Assemblies)
        {
            var doc = LoadFor(assembly);
            if (doc is null) continue;
            foreach (var member in doc.Descendants("member"))
                if ((string?)member.Attribute("name") is { } name) map.TryAdd(name, member);
        }
        return map;
    }

    private static XElement? LoadFor(Assembly assembly)
    {
        string location = assembly.Location;
        if (string.IsNullOrEmpty(location)) return null;
        string xmlPath = Path.ChangeExtension(location, ".xml");
        return FileCache.GetOrAdd(xmlPath, p =>
        {
            try
            {
                return File.Exists(p) ? XDocument.Load(p).Root : null;
            }
            catch (Exception e) when (e is IOException or System.Xml.XmlException or UnauthorizedAccessException)
            {
                return null;
            }
        });
    }

    /// <summary>Plain text of a documentation element: <c>see</c> references become short names, paragraphs become lines.</summary>
    internal static string Flatten(XElement element)
    {
        var sb = new StringBuilder();
        Append(element, sb);
        var lines = sb.ToString().Split('\n').Select(l => string.Join(' ', l.Split([' ', '\t', '\r'], StringSplitOptions.RemoveEmptyEntries)));
        return string.Join('\n', lines.Where(l => l.Length > 0)).Trim();
    }

    private static void Append(XNode node, StringBuilder sb)
    {
        switch (node)
        {
            case XText text:
                sb.Append(text.Value.Replace('\n', ' '));
                break;
            case XElement e:
                switch (e.Name.LocalName)
                {
                    case "see" or "seealso":
                        sb.Append((string?)e.Attribute("langword") ?? ((string?)e.Attribute("cref") is { } cref ? ShortCref(cref) : e.Value));
                        break;
                    case "paramref" or "typeparamref":
                        sb.Append((string?)e.Attribute("name"));
                        break;
                    case "para" or "br":
                        sb.Append('\n');
                        foreach (var child in e.Nodes()) Append(child, sb);
                        sb.Append('\n');
                        break;
                    case "item":
                        sb.Append("\n• ");
                        foreach (var child in e.Nodes()) Append(child, sb);
                        break;
                    default:
                        foreach (var child in e.Nodes()) Append(child, sb);
                        break;
                }
                break;
        }
    }

    /// <summary><c>M:Orbitarium.Chemistry.Molecule.WithCharge(System.Int32)</c> → <c>Molecule.WithCharge</c>.</summary>
    internal static string ShortCref(string cref)
    {
        string s = cref.Length > 2 && cref[1] == ':' ? cref[2..] : cref;
        int paren = s.IndexOf('(', StringComparison.Ordinal);
        if (paren >= 0) s = s[..paren];
        var parts = s.Split('.');
        string result = parts.Length >= 2 && char.IsUpper(parts[^2].FirstOrDefault()) && cref.StartsWith("T:", StringComparison.Ordinal) is false
            ? parts[^2] + "." + parts[^1]
            : parts[^1];
        return result.Replace("`1", "<T>", StringComparison.Ordinal).Replace("#ctor", "new", StringComparison.Ordinal);
    }
}

/// <summary>The sections of one member's XML documentation, as plain text.</summary>
/// <param name="Summary">What it is or does.</param>
/// <param name="Remarks">Details: method, source, units.</param>
/// <param name="Returns">What a method returns.</param>
/// <param name="Value">What a property holds.</param>
/// <param name="Parameters">Parameter names and descriptions.</param>
/// <param name="Exceptions">Exceptions and when they are thrown.</param>
public sealed record DocumentationEntry(
    string Summary,
    string Remarks,
    string Returns,
    string Value,
    IReadOnlyList<(string Name, string Text)> Parameters,
    IReadOnlyList<(string Name, string Text)> Exceptions);
