namespace Orbitarium.BasisSets;

/// <summary>Angular-momentum bookkeeping for Gaussian shells: letters, component counts and the
/// Cartesian component order used everywhere in Orbitarium.</summary>
/// <remarks>
/// Cartesian order (common practice, "alphabetical"): for lx = L..0, for ly = L−lx..0, lz = L−lx−ly;
/// e.g. d: xx, xy, xz, yy, yz, zz. Pure (spherical-harmonic) order for L ≥ 2 is m = −L..+L;
/// s and p shells are identical in both forms (p ordered x, y, z).
/// </remarks>
public static class AngularMomentum
{
    /// <summary>Highest angular momentum in the data model (g, L = 4). Integrals are implemented up to it.</summary>
    public const int MaxL = 4;

    private const string Letters = "spdfghik";

    /// <summary>The shell letter for L (0 → 's', 1 → 'p', … 4 → 'g').</summary>
    public static char Letter(int l) =>
        l >= 0 && l < Letters.Length ? Letters[l] : throw new ArgumentOutOfRangeException(nameof(l), l, "L must be 0..7.");

    /// <summary>The L for a shell letter (case-insensitive).</summary>
    /// <exception cref="OrbitariumInputException">The letter is not s, p, d, f or g.</exception>
    public static int FromLetter(char letter)
    {
        int l = Letters.IndexOf(char.ToLowerInvariant(letter));
        if (l < 0 || l > MaxL)
            throw new OrbitariumInputException($"Unknown shell letter '{letter}': use s, p, d, f or g.");
        return l;
    }

    /// <summary>Number of Cartesian components, (L+1)(L+2)/2.</summary>
    public static int CartesianCount(int l) => (l + 1) * (l + 2) / 2;

    /// <summary>Number of pure (spherical-harmonic) components, 2L+1.</summary>
    public static int PureCount(int l) => 2 * l + 1;

    /// <summary>The Cartesian exponents (lx, ly, lz) of each component of a shell, in Orbitarium's order.</summary>
    public static IReadOnlyList<(int X, int Y, int Z)> CartesianComponents(int l) => ComponentsTable[l];

    private static readonly (int, int, int)[][] ComponentsTable = BuildComponents();

    private static (int, int, int)[][] BuildComponents()
    {
        var table = new (int, int, int)[MaxL + 3][];
        for (int l = 0; l < table.Length; l++)
        {
            var list = new List<(int, int, int)>();
            for (int x = l; x >= 0; x--)
                for (int y = l - x; y >= 0; y--)
                    list.Add((x, y, l - x - y));
            table[l] = [.. list];
        }
        return table;
    }

    /// <summary>Human-readable label of Cartesian component (lx, ly, lz), e.g. "xy" or "s".</summary>
    public static string CartesianLabel(int lx, int ly, int lz)
    {
        if (lx + ly + lz == 0) return "s";
        return new string('x', lx) + new string('y', ly) + new string('z', lz);
    }

    /// <summary>Label of pure component m of a shell with angular momentum L, e.g. "d-2", "d0", "f+3"; p uses x, y, z.</summary>
    public static string PureLabel(int l, int m)
    {
        if (l == 0) return "s";
        if (l == 1) return m switch { -1 => "px", 0 => "py", _ => "pz" };
        return $"{Letter(l)}{(m > 0 ? "+" : "")}{m}";
    }

    /// <summary>Double factorial n!! with (−1)!! = 0!! = 1.</summary>
    public static double DoubleFactorial(int n)
    {
        double r = 1;
        for (int k = n; k > 1; k -= 2) r *= k;
        return r;
    }
}
