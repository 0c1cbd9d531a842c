using Orbitarium.Chemistry;

namespace Orbitarium.BasisSets;

/// <summary>
/// Generates STO-nG basis sets: each Slater orbital of an element replaced by its n-Gaussian least-squares
/// expansion (<see cref="StoNGFit"/>), scaled to the orbital's Slater exponent. The method of W. J. Hehre,
/// R. F. Stewart and J. A. Pople, J. Chem. Phys. 51, 2657 (1969).
/// </summary>
public static class StoNGBasis
{
    /// <summary>The n of the STO-nG sets offered by <see cref="BasisSetLibrary"/> (2 to 6).</summary>
    public static IReadOnlyList<int> LibraryGaussianCounts { get; } = [3, 6, 2, 4, 5];

    /// <summary>STO-nG for H–Ar with the standard molecular Slater exponents (<see cref="StandardSlaterExponents"/>).</summary>
    /// <param name="gaussianCount">n, 1 to 12 (the published sets are n = 2…6).</param>
    public static BasisSet Create(int gaussianCount)
    {
        var set = BasisSet.Create($"STO-{gaussianCount}G", defaultPure: false,
            $"Generated: {gaussianCount}-Gaussian least-squares fits to Slater orbitals (Hehre, Stewart and Pople, J. Chem. Phys. 51, 2657 (1969)) " +
            "with the standard molecular exponents (Hehre et al. 1969, 1970)");
        foreach (int z in StandardSlaterExponents.AtomicNumbers)
        {
            var el = PeriodicTable.ByAtomicNumber(z);
            var shells = new List<ShellDefinition>();
            foreach (var (shell, zeta) in StandardSlaterExponents.For(el))
                shells.AddRange(ShellsFor(shell, zeta, gaussianCount));
            set = set.WithElement(el, shells);
        }
        return set;
    }

    /// <summary>The STO-nG shells of one Slater shell: "1s", "2s", "2p", "2sp", "3s", "3p", "3sp", "3d", "4s", "4p" or "4sp"
    /// with exponent ζ (bohr⁻¹). "sp" shells share exponents between their s and p parts, as in the paper.</summary>
    /// <exception cref="OrbitariumInputException">Unknown shell label or a non-positive ζ.</exception>
    public static IReadOnlyList<ShellDefinition> ShellsFor(string slaterShell, double zeta, int gaussianCount)
    {
        ArgumentNullException.ThrowIfNull(slaterShell);
        string s = slaterShell.Trim().ToLowerInvariant();
        if (s.Length < 2 || !char.IsDigit(s[0]))
            throw new OrbitariumInputException($"'{slaterShell}' is not a Slater shell; write e.g. 1s, 2sp, 3d.");
        int n = s[0] - '0';
        var orbitals = new List<SlaterOrbital>();
        foreach (char c in s[1..])
        {
            int l = "spdf".IndexOf(c);
            if (l < 0) throw new OrbitariumInputException($"'{slaterShell}' is not a Slater shell; write e.g. 1s, 2sp, 3d.");
            orbitals.Add(new SlaterOrbital(n, l));
        }
        var fit = StoNGFit.Fit(gaussianCount, [.. orbitals]);
        var result = new List<ShellDefinition>();
        for (int k = 0; k < orbitals.Count; k++) result.Add(fit.ShellFor(k, zeta));
        return result;
    }
}
