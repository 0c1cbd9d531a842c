namespace Orbitarium.Integrals;

/// <summary>
/// Index tables for Cartesian Gaussian components used by the recurrences: the position of each component
/// (lx, ly, lz) inside its shell (Orbitarium's order lx = L..0, ly = L−lx..0), and the neighbours reached by
/// adding or removing one power of x, y or z.
/// </summary>
internal static class CartesianIndex
{
    /// <summary>Highest total angular momentum tabulated (ERI recurrences for h-shell quartets reach 20).</summary>
    public const int MaxL = 24;

    /// <summary>Number of components of angular momentum l.</summary>
    public static int Count(int l) => (l + 1) * (l + 2) / 2;

    /// <summary>Number of components with angular momentum below l: l(l+1)(l+2)/6.</summary>
    public static int CountBelow(int l) => l * (l + 1) * (l + 2) / 6;

    /// <summary>Position of (lx, ly, lz) within its shell.</summary>
    public static int Index(int lx, int ly, int lz)
    {
        int r = ly + lz;
        return r * (r + 1) / 2 + lz;
    }

    /// <summary>Powers: [l][3k + axis].</summary>
    public static readonly int[][] Power = new int[MaxL + 2][];

    /// <summary>Index in shell l−1 of component k minus one power along axis: [l][3k + axis], −1 when impossible.</summary>
    public static readonly int[][] Minus = new int[MaxL + 2][];

    /// <summary>Index in shell l+1 of component k plus one power along axis: [l][3k + axis].</summary>
    public static readonly int[][] Plus = new int[MaxL + 2][];

    /// <summary>The axis used to build component k of shell l ≥ 1 from shell l−1 (first axis with a nonzero power).</summary>
    public static readonly int[][] BuildAxis = new int[MaxL + 2][];

    /// <summary>Index in shell l−1 of component k minus one power along <see cref="BuildAxis"/>.</summary>
    public static readonly int[][] BuildMinus1 = new int[MaxL + 2][];

    /// <summary>Index in shell l−2 of component k minus two powers along <see cref="BuildAxis"/>, −1 when the power is 1.</summary>
    public static readonly int[][] BuildMinus2 = new int[MaxL + 2][];

    /// <summary>Power along <see cref="BuildAxis"/> of the component minus one power (l_axis − 1).</summary>
    public static readonly int[][] BuildPowerMinus1 = new int[MaxL + 2][];

    static CartesianIndex()
    {
        for (int l = 0; l <= MaxL + 1; l++)
        {
            int n = Count(l);
            Power[l] = new int[3 * n];
            Minus[l] = new int[3 * n];
            Plus[l] = new int[3 * n];
            BuildAxis[l] = new int[n];
            BuildMinus1[l] = new int[n];
            BuildMinus2[l] = new int[n];
            BuildPowerMinus1[l] = new int[n];
            int k = 0;
            for (int x = l; x >= 0; x--)
                for (int y = l - x; y >= 0; y--, k++)
                {
                    int z = l - x - y;
                    Span<int> p = [x, y, z];
                    for (int axis = 0; axis < 3; axis++)
                    {
                        Power[l][3 * k + axis] = p[axis];
                        p[axis]++;
                        Plus[l][3 * k + axis] = Index(p[0], p[1], p[2]);
                        p[axis] -= 2;
                        Minus[l][3 * k + axis] = p[axis] >= 0 ? Index(p[0], p[1], p[2]) : -1;
                        p[axis]++;
                    }
                    if (l > 0)
                    {
                        int axis = x > 0 ? 0 : y > 0 ? 1 : 2;
                        BuildAxis[l][k] = axis;
                        p[axis]--;
                        BuildMinus1[l][k] = Index(p[0], p[1], p[2]);
                        BuildPowerMinus1[l][k] = p[axis];
                        p[axis]--;
                        BuildMinus2[l][k] = p[axis] >= 0 ? Index(p[0], p[1], p[2]) : -1;
                    }
                }
        }
    }
}
