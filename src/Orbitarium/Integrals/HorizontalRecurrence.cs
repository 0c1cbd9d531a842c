namespace Orbitarium.Integrals;

/// <summary>
/// The horizontal recurrence relation (HRR) of Head-Gordon and Pople, J. Chem. Phys. 89, 5777 (1988), eq. 18:
/// (a, b+1ᵢ| = (a+1ᵢ, b| + (A−B)ᵢ (a, b|, which moves angular momentum from centre A to centre B after contraction.
/// It holds for any operator that does not act on the electron's coordinate through A or B, so the same routine
/// serves overlap-like, nuclear-attraction and electron-repulsion integrals.
/// </summary>
internal static class HorizontalRecurrence
{
    /// <summary>Number of components in the source blocks L = la..la+lb (per outer row and inner element).</summary>
    public static int SourceCount(int la, int lb) => CartesianIndex.CountBelow(la + lb + 1) - CartesianIndex.CountBelow(la);

    /// <summary>Scratch length <see cref="Apply"/> needs for one outer row.</summary>
    public static int ScratchLength(int la, int lb, int inner)
    {
        int max = 0;
        for (int lbb = 1; lbb < lb; lbb++)
        {
            int size = (CartesianIndex.CountBelow(la + lb - lbb + 1) - CartesianIndex.CountBelow(la)) * CartesianIndex.Count(lbb) * inner;
            max = Math.Max(max, size);
        }
        return 2 * max;
    }

    /// <summary>
    /// Transforms (e, 0| for e in shells la..la+lb into (a, b| with L(a) = la, L(b) = lb.
    /// </summary>
    /// <param name="la">Angular momentum of a.</param>
    /// <param name="lb">Angular momentum of b.</param>
    /// <param name="abx">(A − B)ₓ in bohr.</param>
    /// <param name="aby">(A − B)_y in bohr.</param>
    /// <param name="abz">(A − B)_z in bohr.</param>
    /// <param name="outer">Number of independent rows.</param>
    /// <param name="inner">Number of contiguous elements carried along with each component (e.g. ket components).</param>
    /// <param name="source">[outer][e in blocks la..la+lb][inner].</param>
    /// <param name="target">[outer][a][b][inner].</param>
    /// <param name="scratch">At least <see cref="ScratchLength"/> elements.</param>
    public static void Apply(int la, int lb, double abx, double aby, double abz, int outer, int inner,
        ReadOnlySpan<double> source, Span<double> target, Span<double> scratch)
    {
        int sourceRow = SourceCount(la, lb) * inner;
        int na = CartesianIndex.Count(la), nb = CartesianIndex.Count(lb);
        int targetRow = na * nb * inner;
        if (lb == 0)
        {
            source[..(outer * sourceRow)].CopyTo(target);
            return;
        }
        int half = scratch.Length / 2;
        int below = CartesianIndex.CountBelow(la);
        Span<double> ab = [abx, aby, abz];
        for (int o = 0; o < outer; o++)
        {
            ReadOnlySpan<double> prev = source.Slice(o * sourceRow, sourceRow);
            for (int lbb = 1; lbb <= lb; lbb++)
            {
                Span<double> cur = lbb == lb ? target.Slice(o * targetRow, targetRow)
                    : scratch.Slice((lbb & 1) == 1 ? 0 : half, half);
                int nbb = CartesianIndex.Count(lbb), nbPrev = CartesianIndex.Count(lbb - 1);
                int[] axisOf = CartesianIndex.BuildAxis[lbb], minusOf = CartesianIndex.BuildMinus1[lbb];
                for (int laa = la; laa <= la + lb - lbb; laa++)
                {
                    int naa = CartesianIndex.Count(laa);
                    int curOff = (CartesianIndex.CountBelow(laa) - below) * nbb * inner;
                    int prevOffUp = (CartesianIndex.CountBelow(laa + 1) - below) * nbPrev * inner;
                    int prevOff = (CartesianIndex.CountBelow(laa) - below) * nbPrev * inner;
                    int[] plus = CartesianIndex.Plus[laa];
                    for (int b = 0; b < nbb; b++)
                    {
                        int axis = axisOf[b], b1 = minusOf[b];
                        double d = ab[axis];
                        for (int a = 0; a < naa; a++)
                        {
                            int a1 = plus[3 * a + axis];
                            var dst = cur.Slice(curOff + (a * nbb + b) * inner, inner);
                            var up = prev.Slice(prevOffUp + (a1 * nbPrev + b1) * inner, inner);
                            var same = prev.Slice(prevOff + (a * nbPrev + b1) * inner, inner);
                            for (int t = 0; t < inner; t++) dst[t] = up[t] + d * same[t];
                        }
                    }
                }
                prev = cur;
            }
        }
    }
}
