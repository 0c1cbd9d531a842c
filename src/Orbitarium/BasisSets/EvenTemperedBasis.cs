namespace Orbitarium.BasisSets;

/// <summary>
/// Even-tempered Gaussian exponents α·β^k (k = 0…count−1), a geometric series that approaches a complete
/// set as count grows and β → 1: K. Ruedenberg, R. C. Raffenetti and R. D. Bardo, in <i>Energy, Structure and
/// Reactivity</i> (Wiley, 1973); M. W. Schmidt and K. Ruedenberg, J. Chem. Phys. 71, 3951 (1979).
/// </summary>
public static class EvenTemperedBasis
{
    /// <summary>The exponents α·β^k in bohr⁻², k = 0…count−1.</summary>
    /// <param name="alpha">Smallest (β &gt; 1) or first exponent α in bohr⁻², positive.</param>
    /// <param name="beta">Ratio β between successive exponents, positive and not 1.</param>
    /// <param name="count">Number of exponents, 1 to 100.</param>
    /// <exception cref="OrbitariumInputException">A parameter is out of range.</exception>
    public static double[] Exponents(double alpha, double beta, int count)
    {
        if (!(alpha > 0) || !double.IsFinite(alpha))
            throw new OrbitariumInputException($"Even-tempered α = {alpha} must be a positive exponent (bohr⁻²).");
        if (!(beta > 0) || !double.IsFinite(beta) || beta == 1)
            throw new OrbitariumInputException($"Even-tempered β = {beta} must be a positive ratio other than 1 (typically 2–4).");
        if (count < 1 || count > 100)
            throw new OrbitariumInputException($"Even-tempered sets need 1 to 100 exponents; {count} was asked for.");
        var e = new double[count];
        for (int k = 0; k < count; k++) e[k] = alpha * Math.Pow(beta, k);
        if (!double.IsFinite(e[^1]) || e[^1] <= 0)
            throw new OrbitariumInputException($"α·β^k overflows for α = {alpha}, β = {beta}, {count} terms; use fewer terms or a smaller β.");
        return e;
    }

    /// <summary>Uncontracted shells of angular momentum <paramref name="angularMomentum"/> with exponents α·β^k,
    /// largest exponent first.</summary>
    public static IReadOnlyList<ShellDefinition> Shells(int angularMomentum, double alpha, double beta, int count)
    {
        var e = Exponents(alpha, beta, count);
        Array.Sort(e);
        Array.Reverse(e);
        var list = new List<ShellDefinition>(count);
        foreach (double a in e) list.Add(ShellDefinition.Primitive(angularMomentum, a));
        return list;
    }

    /// <summary>A basis set for one element made of even-tempered shells, e.g.
    /// <c>EvenTemperedBasis.Create("et-Ne", "Ne", [(0, 0.1, 2.5, 14), (1, 0.15, 2.5, 8)])</c>.</summary>
    /// <param name="name">Name of the set.</param>
    /// <param name="symbol">Element symbol.</param>
    /// <param name="shells">Per angular momentum L: α (bohr⁻²), β and the number of terms.</param>
    /// <param name="pure">Whether d and higher shells are pure by default (true).</param>
    public static BasisSet Create(string name, string symbol, IEnumerable<(int L, double Alpha, double Beta, int Count)> shells, bool pure = true)
    {
        ArgumentNullException.ThrowIfNull(shells);
        var list = new List<ShellDefinition>();
        foreach (var (l, a, b, n) in shells) list.AddRange(Shells(l, a, b, n));
        return BasisSet.Create(name, pure, "Even-tempered α·β^k (Ruedenberg, Raffenetti and Bardo 1973)").WithElement(symbol, list);
    }

    /// <summary>Adds even-tempered shells for one element to an existing set (fluent).</summary>
    public static BasisSet WithEvenTemperedShells(this BasisSet set, string symbol, int angularMomentum, double alpha, double beta, int count)
    {
        ArgumentNullException.ThrowIfNull(set);
        return set.WithShellsAdded(symbol, Shells(angularMomentum, alpha, beta, count));
    }
}
