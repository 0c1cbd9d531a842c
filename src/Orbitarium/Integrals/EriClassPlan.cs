using System.Collections.Concurrent;

namespace Orbitarium.Integrals;

/// <summary>
/// The precomputed "program" of the Head-Gordon–Pople vertical recurrence for one angular-momentum class
/// (la lb|lc ld): flat lists of recurrence steps with buffer offsets, so the per-primitive-quartet loop does no
/// index arithmetic. Plans are built once per class and cached (thread-safe).
/// </summary>
internal sealed class EriClassPlan
{
    private static readonly ConcurrentDictionary<int, EriClassPlan> Cache = new();

    /// <summary>The cached plan of class (la lb|lc ld).</summary>
    public static EriClassPlan For(int la, int lb, int lc, int ld) =>
        Cache.GetOrAdd(((la * 16 + lb) * 16 + lc) * 16 + ld, _ => new EriClassPlan(la, lb, lc, ld));

    private EriClassPlan(int la, int lb, int lc, int ld)
    {
        La = la; Lb = lb; Lc = lc; Ld = ld;
        int lab = la + lb, lcd = lc + ld, lt = lab + lcd;
        Lt = lt;
        int stride = lab + 1;
        var offsets = new int[(lcd + 1) * stride];
        int size = 0;
        for (int lf = 0; lf <= lcd; lf++)
            for (int le = ELow(lf, la, lcd); le <= lab; le++)
            {
                offsets[lf * stride + le] = size;
                size += CartesianIndex.Count(lf) * CartesianIndex.Count(le) * (lt - le - lf + 1);
            }
        VrrSize = size;

        // Stage 1: [e0|00]^(m), block (le, 0) = [e][m].
        var s1 = new List<int>();
        var s1n = new List<double>();
        for (int le = 1; le <= lab; le++)
        {
            int mm = lt - le + 1;
            int off = offsets[le], off1 = offsets[le - 1], off2 = le >= 2 ? offsets[le - 2] : 0;
            for (int k = 0; k < CartesianIndex.Count(le); k++)
            {
                int m2 = CartesianIndex.BuildMinus2[le][k];
                s1.Add(off + k * mm);
                s1.Add(off1 + CartesianIndex.BuildMinus1[le][k] * (mm + 1));
                s1.Add(m2 >= 0 ? off2 + m2 * (mm + 2) : -1);
                s1.Add(CartesianIndex.BuildAxis[le][k]);
                s1.Add(mm);
                s1n.Add(CartesianIndex.BuildPowerMinus1[le][k]);
            }
        }
        Stage1 = [.. s1];
        Stage1Count = s1n.ToArray();

        // Stage 2: [e0|f0]^(m), block (le, lf) = [f][e][m].
        var s2 = new List<int>();
        var s2n = new List<double>();
        for (int lf = 1; lf <= lcd; lf++)
            for (int le = ELow(lf, la, lcd); le <= lab; le++)
            {
                int ne = CartesianIndex.Count(le);
                int mm = lt - le - lf + 1;
                int off = offsets[lf * stride + le];
                int offF1 = offsets[(lf - 1) * stride + le];
                int offF2 = lf >= 2 ? offsets[(lf - 2) * stride + le] : 0;
                int offE1 = le >= 1 ? offsets[(lf - 1) * stride + le - 1] : 0;
                int neE1 = le >= 1 ? CartesianIndex.Count(le - 1) : 0;
                for (int f = 0; f < CartesianIndex.Count(lf); f++)
                {
                    int axis = CartesianIndex.BuildAxis[lf][f], f1 = CartesianIndex.BuildMinus1[lf][f], f2 = CartesianIndex.BuildMinus2[lf][f];
                    for (int e = 0; e < ne; e++)
                    {
                        int pe = CartesianIndex.Power[le][3 * e + axis];
                        s2.Add(off + (f * ne + e) * mm);
                        s2.Add(offF1 + (f1 * ne + e) * (mm + 1));
                        s2.Add(f2 >= 0 ? offF2 + (f2 * ne + e) * (mm + 2) : -1);
                        s2.Add(pe > 0 ? offE1 + (f1 * neE1 + CartesianIndex.Minus[le][3 * e + axis]) * (mm + 2) : -1);
                        s2.Add(axis);
                        s2.Add(mm);
                        s2n.Add(f2 >= 0 ? CartesianIndex.BuildPowerMinus1[lf][f] : 0);
                        s2n.Add(pe);
                    }
                }
            }
        Stage2 = [.. s2];
        Stage2Count = s2n.ToArray();

        // Contraction map: vrr index of [e0|f0]^(0) → contracted [e][f] index.
        BraCount = HorizontalRecurrence.SourceCount(la, lb);
        KetCount = HorizontalRecurrence.SourceCount(lc, ld);
        var map = new int[BraCount * KetCount];
        int braBelow = CartesianIndex.CountBelow(la), ketBelow = CartesianIndex.CountBelow(lc);
        for (int lf = lc; lf <= lcd; lf++)
            for (int le = la; le <= lab; le++)
            {
                int ne = CartesianIndex.Count(le), mm = lt - le - lf + 1, off = offsets[lf * stride + le];
                int eBase = CartesianIndex.CountBelow(le) - braBelow, fBase = CartesianIndex.CountBelow(lf) - ketBelow;
                for (int f = 0; f < CartesianIndex.Count(lf); f++)
                    for (int e = 0; e < ne; e++)
                        map[(eBase + e) * KetCount + fBase + f] = off + (f * ne + e) * mm;
            }
        ContractionMap = map;
    }

    /// <summary>Angular momenta of the class.</summary>
    public int La { get; }

    /// <summary>L of b.</summary>
    public int Lb { get; }

    /// <summary>L of c.</summary>
    public int Lc { get; }

    /// <summary>L of d.</summary>
    public int Ld { get; }

    /// <summary>la+lb+lc+ld, the highest Boys order needed.</summary>
    public int Lt { get; }

    /// <summary>Doubles of vertical-recurrence buffer needed.</summary>
    public int VrrSize { get; }

    /// <summary>Stage-1 steps, 5 ints each: dst, e−1ᵢ source, e−2ᵢ source (−1: none), axis, m count.</summary>
    public int[] Stage1 { get; }

    /// <summary>Stage-1 occupation numbers (eᵢ − 1) per step.</summary>
    public double[] Stage1Count { get; }

    /// <summary>Stage-2 steps, 6 ints each: dst, f−1ᵢ source, f−2ᵢ source (−1), e−1ᵢ,f−1ᵢ source (−1), axis, m count.</summary>
    public int[] Stage2 { get; }

    /// <summary>Stage-2 numbers per step, 2 each: (fᵢ − 1) and eᵢ.</summary>
    public double[] Stage2Count { get; }

    /// <summary>Number of bra components L = la..la+lb.</summary>
    public int BraCount { get; }

    /// <summary>Number of ket components L = lc..lc+ld.</summary>
    public int KetCount { get; }

    /// <summary>For each contracted [e][f] element, its index in the vertical-recurrence buffer (m = 0).</summary>
    public int[] ContractionMap { get; }

    /// <summary>Lowest L(e) needed at ket level lf: the ket recurrence lowers e by one per level.</summary>
    private static int ELow(int lf, int la, int lcd) => lf == 0 ? 0 : Math.Max(0, la - (lcd - lf));
}
