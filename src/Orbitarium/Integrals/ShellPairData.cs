namespace Orbitarium.Integrals;

/// <summary>
/// Precomputed data of a pair of raw shells for the electron-repulsion recurrences: for every primitive pair
/// (i, j) kept, the combined exponent p = αᵢ + βⱼ, the Gaussian product centre P, P − A, and the prefactor
/// cᵢ cⱼ exp(−αᵢβⱼ/p |A−B|²) · √2 π^{5/4} / p, so that a primitive quartet's prefactor
/// 2π^{5/2}/(pq√(p+q)) K_ab K_cd c c c c is the product of two pair factors divided by √(p+q).
/// </summary>
/// <remarks>Primitive pairs whose overlap factor exp(−μR²) is below 1e-24 are dropped (their contribution is
/// far below double precision of any integral of the pair).</remarks>
internal sealed class ShellPairData
{
    private const double PrimitivePairCutoff = 1e-24;

    /// <summary>Builds the pair data of shells a and b (in that order).</summary>
    public ShellPairData(RawShell a, RawShell b)
    {
        A = a;
        B = b;
        var ca = a.CenterBohr; var cb = b.CenterBohr;
        AbX = ca.X - cb.X; AbY = ca.Y - cb.Y; AbZ = ca.Z - cb.Z;
        double r2 = AbX * AbX + AbY * AbY + AbZ * AbZ;
        int n = a.PrimitiveCount * b.PrimitiveCount;
        var p = new double[n]; var px = new double[3 * n]; var pa = new double[3 * n]; var factor = new double[n];
        int k = 0;
        double scale = Math.Sqrt(2) * Math.Pow(Math.PI, 1.25);
        for (int i = 0; i < a.PrimitiveCount; i++)
            for (int j = 0; j < b.PrimitiveCount; j++)
            {
                double al = a.Exponents[i], be = b.Exponents[j], pp = al + be;
                double kab = Math.Exp(-al * be / pp * r2);
                if (kab < PrimitivePairCutoff) continue;
                p[k] = pp;
                px[3 * k] = (al * ca.X + be * cb.X) / pp;
                px[3 * k + 1] = (al * ca.Y + be * cb.Y) / pp;
                px[3 * k + 2] = (al * ca.Z + be * cb.Z) / pp;
                pa[3 * k] = px[3 * k] - ca.X;
                pa[3 * k + 1] = px[3 * k + 1] - ca.Y;
                pa[3 * k + 2] = px[3 * k + 2] - ca.Z;
                factor[k] = a.Coefficients[i] * b.Coefficients[j] * kab * scale / pp;
                k++;
            }
        Count = k;
        Exponent = p; Center = px; CenterMinusA = pa; Factor = factor;
    }

    /// <summary>First shell (the recurrences build on its centre).</summary>
    public RawShell A { get; }

    /// <summary>Second shell.</summary>
    public RawShell B { get; }

    /// <summary>(A − B) components in bohr.</summary>
    public double AbX { get; }

    /// <summary>(A − B)_y.</summary>
    public double AbY { get; }

    /// <summary>(A − B)_z.</summary>
    public double AbZ { get; }

    /// <summary>Number of primitive pairs kept.</summary>
    public int Count { get; }

    /// <summary>p per primitive pair.</summary>
    public double[] Exponent { get; }

    /// <summary>P (x, y, z) per primitive pair.</summary>
    public double[] Center { get; }

    /// <summary>P − A (x, y, z) per primitive pair.</summary>
    public double[] CenterMinusA { get; }

    /// <summary>Pair prefactor per primitive pair (see the class remarks).</summary>
    public double[] Factor { get; }
}
