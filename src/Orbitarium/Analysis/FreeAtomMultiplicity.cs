namespace Orbitarium.Analysis;

/// <summary>Ground-state spin multiplicities of free neutral atoms H–Kr, from Hund's rules and the observed ground
/// terms (common practice; ground levels as tabulated in the NIST Atomic Spectra Database).</summary>
public static class FreeAtomMultiplicity
{
    private static readonly int[] Table =
    [
        0,
        2, 1,                                   // H, He
        2, 1, 2, 3, 4, 3, 2, 1,                 // Li–Ne
        2, 1, 2, 3, 4, 3, 2, 1,                 // Na–Ar
        2, 1, 2, 3, 4, 7, 6, 5, 4, 3, 2, 1,     // K–Zn (Cr 3d⁵4s¹, Cu 3d¹⁰4s¹)
        2, 3, 4, 3, 2, 1,                       // Ga–Kr
    ];

    /// <summary>The ground-state multiplicity 2S+1 of the neutral atom with atomic number <paramref name="atomicNumber"/> (1..36).</summary>
    /// <param name="atomicNumber">Atomic number Z.</param>
    /// <exception cref="OrbitariumInputException">Z is outside 1..36.</exception>
    public static int Of(int atomicNumber)
    {
        if (atomicNumber < 1 || atomicNumber >= Table.Length)
            throw new OrbitariumInputException($"Free-atom ground states are tabulated for H to Kr (Z = 1..36); Z = {atomicNumber} is not covered.");
        return Table[atomicNumber];
    }
}
