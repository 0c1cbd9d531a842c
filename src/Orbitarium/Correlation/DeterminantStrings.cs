using System.Numerics;

namespace Orbitarium.Correlation;

/// <summary>
/// All occupation strings of k electrons of one spin in n orbitals (bit masks, ascending), with their single-replacement
/// lists: for each string J every (p, q) with E_pq|J⟩ = ±|I⟩ (including p = q).
/// </summary>
/// <remarks>The string-driven determinant CI of P. J. Knowles and N. C. Handy, Chem. Phys. Lett. 111, 315 (1984), and
/// J. Olsen, B. O. Roos, P. Jørgensen and H. J. Aa. Jensen, J. Chem. Phys. 89, 2185 (1988).</remarks>
internal sealed class DeterminantStrings
{
    public DeterminantStrings(int orbitals, int electrons)
    {
        Orbitals = orbitals;
        Electrons = electrons;
        var list = new List<int>();
        for (int mask = 0; mask < 1 << orbitals; mask++)
            if (BitOperations.PopCount((uint)mask) == electrons) list.Add(mask);
        Masks = [.. list];
        var address = new Dictionary<int, int>(Masks.Length);
        for (int i = 0; i < Masks.Length; i++) address[Masks[i]] = i;
        int per = electrons + electrons * (orbitals - electrons);
        PerString = per;
        Pq = new int[Masks.Length * per];
        Target = new int[Masks.Length * per];
        Sign = new double[Masks.Length * per];
        Lookup = new int[Masks.Length * orbitals * orbitals];
        Array.Fill(Lookup, -1);
        for (int j = 0; j < Masks.Length; j++)
        {
            int mask = Masks[j], k = 0;
            for (int q = 0; q < orbitals; q++)
            {
                if ((mask & (1 << q)) == 0) continue;
                int removed = mask & ~(1 << q);
                int s1 = BitOperations.PopCount((uint)(mask & ((1 << q) - 1)));
                for (int p = 0; p < orbitals; p++)
                {
                    if ((removed & (1 << p)) != 0) continue;
                    int s2 = BitOperations.PopCount((uint)(removed & ((1 << p) - 1)));
                    int target = address[removed | (1 << p)];
                    int e = j * per + k++;
                    Pq[e] = p * orbitals + q;
                    Target[e] = target;
                    Sign[e] = ((s1 + s2) & 1) == 0 ? 1 : -1;
                    Lookup[j * orbitals * orbitals + p * orbitals + q] = e;
                }
            }
        }
    }

    public int Orbitals { get; }
    public int Electrons { get; }
    public int Count => Masks.Length;
    public int[] Masks { get; }

    /// <summary>Replacements per string.</summary>
    public int PerString { get; }

    /// <summary>p·n + q of each replacement.</summary>
    public int[] Pq { get; }

    /// <summary>Index of the string E_pq|J⟩ is proportional to.</summary>
    public int[] Target { get; }

    /// <summary>The phase of E_pq|J⟩.</summary>
    public double[] Sign { get; }

    /// <summary>Entry of (J, pq) in the replacement arrays, or −1 when E_pq|J⟩ = 0.</summary>
    public int[] Lookup { get; }

    public static double Binomial(int n, int k)
    {
        if (k < 0 || k > n) return 0;
        double r = 1;
        for (int i = 1; i <= k; i++) r = r * (n - k + i) / i;
        return r;
    }
}
