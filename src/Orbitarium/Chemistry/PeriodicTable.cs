using System.Collections.Frozen;

namespace Orbitarium.Chemistry;

/// <summary>Element data for H–Kr (Z = 1–36).</summary>
/// <remarks>
/// Sources, column by column (values transcribed from memory of the tables named; the test suite checks
/// internal consistency, e.g. that isotope masses lie within 0.6 u of the atomic weight):
/// <list type="bullet">
/// <item>Standard atomic weights: IUPAC CIAAW, "Standard atomic weights of the elements 2013/2017"
/// (Pure Appl. Chem. 88, 265 (2016)), conventional values for elements with an interval.</item>
/// <item>Isotope masses of the most abundant isotope: AME2016 atomic mass evaluation
/// (Wang et al., Chin. Phys. C 41, 030003 (2017)) as tabulated by NIST "Atomic Weights and Isotopic
/// Compositions".</item>
/// <item>Covalent radii: B. Cordero et al., "Covalent radii revisited", Dalton Trans. 2832 (2008)
/// (sp³ carbon; low-spin values for Mn, Fe, Co).</item>
/// </list>
/// </remarks>
public static class PeriodicTable
{
    private static readonly Element[] Elements =
    [
        new(1, "H", "hydrogen", 1.008, 1.00782503223, 1, 0.31),
        new(2, "He", "helium", 4.002602, 4.00260325413, 4, 0.28),
        new(3, "Li", "lithium", 6.94, 7.0160034366, 7, 1.28),
        new(4, "Be", "beryllium", 9.0121831, 9.012183065, 9, 0.96),
        new(5, "B", "boron", 10.81, 11.00930536, 11, 0.84),
        new(6, "C", "carbon", 12.011, 12.0, 12, 0.76),
        new(7, "N", "nitrogen", 14.007, 14.00307400443, 14, 0.71),
        new(8, "O", "oxygen", 15.999, 15.99491461957, 16, 0.66),
        new(9, "F", "fluorine", 18.998403163, 18.99840316273, 19, 0.57),
        new(10, "Ne", "neon", 20.1797, 19.9924401762, 20, 0.58),
        new(11, "Na", "sodium", 22.98976928, 22.9897692820, 23, 1.66),
        new(12, "Mg", "magnesium", 24.305, 23.985041697, 24, 1.41),
        new(13, "Al", "aluminium", 26.9815385, 26.98153853, 27, 1.21),
        new(14, "Si", "silicon", 28.085, 27.97692653465, 28, 1.11),
        new(15, "P", "phosphorus", 30.973761998, 30.97376199842, 31, 1.07),
        new(16, "S", "sulfur", 32.06, 31.9720711744, 32, 1.05),
        new(17, "Cl", "chlorine", 35.45, 34.968852682, 35, 1.02),
        new(18, "Ar", "argon", 39.948, 39.9623831237, 40, 1.06),
        new(19, "K", "potassium", 39.0983, 38.9637064864, 39, 2.03),
        new(20, "Ca", "calcium", 40.078, 39.962590863, 40, 1.76),
        new(21, "Sc", "scandium", 44.955908, 44.95590828, 45, 1.70),
        new(22, "Ti", "titanium", 47.867, 47.94794198, 48, 1.60),
        new(23, "V", "vanadium", 50.9415, 50.94395704, 51, 1.53),
        new(24, "Cr", "chromium", 51.9961, 51.94050623, 52, 1.39),
        new(25, "Mn", "manganese", 54.938044, 54.93804391, 55, 1.39),
        new(26, "Fe", "iron", 55.845, 55.93493633, 56, 1.32),
        new(27, "Co", "cobalt", 58.933194, 58.93319429, 59, 1.26),
        new(28, "Ni", "nickel", 58.6934, 57.93534241, 58, 1.24),
        new(29, "Cu", "copper", 63.546, 62.92959772, 63, 1.32),
        new(30, "Zn", "zinc", 65.38, 63.92914201, 64, 1.22),
        new(31, "Ga", "gallium", 69.723, 68.9255735, 69, 1.22),
        new(32, "Ge", "germanium", 72.630, 73.921177761, 74, 1.20),
        new(33, "As", "arsenic", 74.921595, 74.92159457, 75, 1.19),
        new(34, "Se", "selenium", 78.971, 79.9165218, 80, 1.20),
        new(35, "Br", "bromine", 79.904, 78.9183376, 79, 1.20),
        new(36, "Kr", "krypton", 83.798, 83.9114977282, 84, 1.16),
    ];

    private static readonly FrozenDictionary<string, Element> BySymbolLower =
        Elements.ToFrozenDictionary(e => e.Symbol.ToLowerInvariant());

    /// <summary>All elements with data, in order of atomic number.</summary>
    public static IReadOnlyList<Element> All => Elements;

    /// <summary>The highest atomic number with data (36, krypton).</summary>
    public static int MaxAtomicNumber => Elements.Length;

    /// <summary>Finds an element by symbol, ignoring case ("cl", "CL" and "Cl" all give chlorine).</summary>
    /// <exception cref="OrbitariumInputException">The symbol is not an element from H to Kr.</exception>
    public static Element BySymbol(string symbol)
    {
        ArgumentNullException.ThrowIfNull(symbol);
        if (TryBySymbol(symbol, out var element)) return element;
        throw new OrbitariumInputException(
            $"Unknown element symbol '{symbol}': Orbitarium knows H to Kr (Z = 1–{MaxAtomicNumber}).");
    }

    /// <summary>Finds an element by symbol, ignoring case; false when the symbol is unknown.</summary>
    public static bool TryBySymbol(string symbol, out Element element)
    {
        ArgumentNullException.ThrowIfNull(symbol);
        return BySymbolLower.TryGetValue(symbol.Trim().ToLowerInvariant(), out element!);
    }

    /// <summary>Finds an element by atomic number Z (1–36).</summary>
    /// <exception cref="OrbitariumInputException">Z is outside 1–36.</exception>
    public static Element ByAtomicNumber(int atomicNumber)
    {
        if (atomicNumber < 1 || atomicNumber > Elements.Length)
            throw new OrbitariumInputException(
                $"Atomic number {atomicNumber} is outside the elements Orbitarium knows (1–{MaxAtomicNumber}).");
        return Elements[atomicNumber - 1];
    }
}
