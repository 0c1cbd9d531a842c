namespace Orbitarium.Dft.Grids;

/// <summary>
/// Treutler–Ahlrichs "M4" radial quadrature: Chebyshev (second kind) nodes x ∈ (−1, 1) mapped by
/// r = (ξ/ln 2)(1 + x)^{0.6} ln(2/(1 − x)).
/// </summary>
/// <remarks>O. Treutler &amp; R. Ahlrichs, J. Chem. Phys. 102, 346 (1995), eqs. 19 (mapping M4, α = 0.6) and the
/// Chebyshev T2 rule x_i = cos(iπ/(n+1)), ∫f dx ≈ Σ π/(n+1) sin(iπ/(n+1)) f(x_i). The element scaling ξ is from
/// table 1 of that paper (from memory; ξ = 1 for elements beyond krypton).</remarks>
public static class TreutlerAhlrichsRadialQuadrature
{
    // ξ for Z = 1..36 (Treutler & Ahlrichs 1995, table 1; from memory).
    private static readonly double[] s_xi =
    [
        0.8, 0.9,
        1.8, 1.4, 1.3, 1.1, 0.9, 0.9, 0.9, 0.9,
        1.4, 1.3, 1.3, 1.2, 1.1, 1.0, 1.0, 1.0,
        1.5, 1.4, 1.3, 1.2, 1.2, 1.2, 1.2, 1.2, 1.2, 1.1, 1.1, 1.1, 1.1, 1.0, 0.9, 0.9, 0.9, 0.9,
    ];

    /// <summary>The scaling ξ (bohr) for an element.</summary>
    public static double Scaling(int atomicNumber) =>
        atomicNumber >= 1 && atomicNumber <= s_xi.Length ? s_xi[atomicNumber - 1] : 1.0;

    /// <summary>Radial nodes (bohr) and weights including the r² Jacobian: ∫₀^∞ f(r) r² dr ≈ Σ wᵢ f(rᵢ).</summary>
    /// <param name="count">Number of radial points (≥ 2).</param>
    /// <param name="scaling">ξ in bohr.</param>
    public static (double[] RadiiBohr, double[] Weights) Create(int count, double scaling)
    {
        if (count < 2) throw new OrbitariumInputException($"A radial quadrature needs at least 2 points; {count} was asked.");
        var r = new double[count];
        var w = new double[count];
        double f = scaling / Math.Log(2);
        for (int i = 1; i <= count; i++)
        {
            double theta = i * Math.PI / (count + 1);
            double x = Math.Cos(theta);
            double onePlus = 1 + x, oneMinus = 1 - x;
            double lg = Math.Log(2 / oneMinus);
            double ri = f * Math.Pow(onePlus, 0.6) * lg;
            double dr = f * (0.6 * Math.Pow(onePlus, -0.4) * lg + Math.Pow(onePlus, 0.6) / oneMinus);
            r[i - 1] = ri;
            w[i - 1] = Math.PI / (count + 1) * Math.Sin(theta) * dr * ri * ri;
        }
        return (r, w);
    }
}
