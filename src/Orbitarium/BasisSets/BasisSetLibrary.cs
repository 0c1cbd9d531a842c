using System.Collections.Concurrent;
using System.Collections.Frozen;
using System.Reflection;

namespace Orbitarium.BasisSets;

/// <summary>
/// The built-in basis sets, found by name (case-insensitive, with the usual aliases such as
/// 6-31G(d) = 6-31G*). Sets stored as text live in <c>BasisSets/Library/*.basis</c> (embedded resources in
/// Orbitarium's own format, see <see cref="BasisSetText"/>); the STO-nG sets are generated on first use by
/// <see cref="StoNGBasis"/>.
/// </summary>
public static class BasisSetLibrary
{
    private const string ResourcePrefix = "Orbitarium.BasisSets.Library.";

    private static readonly Lazy<Catalogue> Entries = new(BuildCatalogue);
    private static readonly ConcurrentDictionary<string, Lazy<BasisSet>> Loaded = new(StringComparer.Ordinal);

    private sealed record Catalogue(FrozenDictionary<string, string> CanonicalByKey, IReadOnlyList<string> Names,
        FrozenDictionary<string, Func<BasisSet>> Loaders);

    /// <summary>Canonical names of all built-in sets, in library order.</summary>
    public static IReadOnlyList<string> Names => Entries.Value.Names;

    /// <summary>The built-in set called <paramref name="name"/> (case-insensitive; aliases such as
    /// 6-31G(d), 6-31G(d,p), 6-311G(d,p) accepted).</summary>
    /// <exception cref="OrbitariumInputException">No built-in set has that name; the message lists the names.</exception>
    public static BasisSet Get(string name)
    {
        if (TryGet(name, out var set)) return set;
        throw new OrbitariumInputException(
            $"Unknown basis set '{name}'. Built-in sets: {string.Join(", ", Names)}. " +
            "Read your own with BasisSet.FromFile(path) or build one in code with BasisSet.Create(name).");
    }

    /// <summary>Looks a built-in set up by name; false when there is none.</summary>
    public static bool TryGet(string name, out BasisSet set)
    {
        set = null!;
        if (string.IsNullOrWhiteSpace(name)) return false;
        var cat = Entries.Value;
        if (!cat.CanonicalByKey.TryGetValue(Key(name), out var canonical)) return false;
        set = Loaded.GetOrAdd(canonical, c => new Lazy<BasisSet>(cat.Loaders[c])).Value;
        return true;
    }

    internal static string Key(string name) => name.Trim().Replace(" ", "", StringComparison.Ordinal).ToUpperInvariant();

    private static Catalogue BuildCatalogue()
    {
        var byKey = new Dictionary<string, string>(StringComparer.Ordinal);
        var names = new List<string>();
        var loaders = new Dictionary<string, Func<BasisSet>>(StringComparer.Ordinal);

        void Add(string canonical, IEnumerable<string> aliases, Func<BasisSet> loader)
        {
            names.Add(canonical);
            loaders[canonical] = loader;
            byKey[Key(canonical)] = canonical;
            foreach (var a in aliases) byKey[Key(a)] = canonical;
        }

        foreach (int n in StoNGBasis.LibraryGaussianCounts)
        {
            int count = n;
            Add($"STO-{count}G", [], () => StoNGBasis.Create(count));
        }

        var assembly = typeof(BasisSetLibrary).Assembly;
        var files = assembly.GetManifestResourceNames()
            .Where(r => r.StartsWith(ResourcePrefix, StringComparison.Ordinal) && r.EndsWith(BasisSetText.FileExtension, StringComparison.Ordinal))
            .Order(StringComparer.Ordinal);
        foreach (var resource in files)
        {
            string text = ReadResource(assembly, resource);
            var (name, aliases) = ReadHeader(text, resource);
            string res = resource;
            Add(name, aliases, () =>
            {
                try
                {
                    return BasisSetText.Parse(ReadResource(assembly, res), Get);
                }
                catch (OrbitariumInputException e)
                {
                    throw new InvalidOperationException($"Built-in basis file {res[ResourcePrefix.Length..]} is corrupt: {e.Message}", e);
                }
            });
        }
        // Present the sets from small to large; sets not in this list follow in file order.
        string[] preferred = ["STO-3G", "STO-6G", "3-21G", "6-31G", "6-31G*", "6-31G**", "6-311G**", "cc-pVDZ", "cc-pVTZ"];
        var ordered = names.OrderBy(n => Array.IndexOf(preferred, n) is int i && i >= 0 ? i : preferred.Length).ToList();
        return new Catalogue(byKey.ToFrozenDictionary(StringComparer.Ordinal), ordered, loaders.ToFrozenDictionary(StringComparer.Ordinal));
    }

    private static (string Name, List<string> Aliases) ReadHeader(string text, string resource)
    {
        string? name = null;
        var aliases = new List<string>();
        foreach (var raw in text.Split('\n'))
        {
            string line = raw;
            int hash = line.IndexOf('#');
            if (hash >= 0) line = line[..hash];
            line = line.Trim();
            if (line.StartsWith("element", StringComparison.Ordinal)) break;
            if (line.StartsWith("basis ", StringComparison.Ordinal)) name = line[6..].Trim();
            else if (line.StartsWith("alias ", StringComparison.Ordinal)) aliases.Add(line[6..].Trim());
        }
        return (name ?? throw new InvalidOperationException($"Built-in basis file {resource} has no 'basis' line."), aliases);
    }

    private static string ReadResource(Assembly assembly, string resource)
    {
        using var stream = assembly.GetManifestResourceStream(resource)
            ?? throw new InvalidOperationException($"Missing embedded resource {resource}.");
        using var reader = new StreamReader(stream);
        return reader.ReadToEnd();
    }
}
