namespace Orbitarium.Integrals;

/// <summary>
/// Electron-repulsion integrals (ab|cd) over raw Cartesian shells by the Head-Gordon–Pople scheme
/// (M. Head-Gordon and J. A. Pople, J. Chem. Phys. 89, 5777 (1988)): the Obara–Saika vertical recurrence
/// (S. Obara and A. Saika, J. Chem. Phys. 84, 3963 (1986), eq. 39) builds [e0|f0]^(0) for
/// la ≤ L(e) ≤ la+lb and lc ≤ L(f) ≤ lc+ld per primitive quartet; these are contracted, and the horizontal
/// recurrence then moves angular momentum to centres B and D.
/// </summary>
/// <remarks>
/// One instance owns its work buffers (it is not thread-safe: use one per thread). No allocation happens per
/// integral once the buffers have grown to the largest quartet class seen.
/// <para>Vertical recurrence used (W = (pP+qQ)/(p+q), ρ = pq/(p+q)):
/// [e+1ᵢ,0|00]^(m) = (P−A)ᵢ[e0|00]^(m) + (W−P)ᵢ[e0|00]^(m+1) + eᵢ/(2p)([e−1ᵢ]^(m) − ρ/p [e−1ᵢ]^(m+1));
/// [e0|f+1ᵢ,0]^(m) = (Q−C)ᵢ[e0|f0]^(m) + (W−Q)ᵢ[e0|f0]^(m+1) + fᵢ/(2q)([e0|f−1ᵢ]^(m) − ρ/q [e0|f−1ᵢ]^(m+1))
/// + eᵢ/(2(p+q)) [e−1ᵢ,0|f0]^(m+1); [00|00]^(m) = 2π^{5/2}/(pq√(p+q)) K_ab K_cd F_m(ρ|P−Q|²).</para>
/// </remarks>
internal sealed class HeadGordonPople
{
    private double[] _vrr = new double[256];
    private double[] _contracted = new double[256];
    private double[] _braDone = new double[256];
    private double[] _scratch = new double[256];
    private readonly double[] _boys = new double[BoysFunction.MaxOrder + 1];
    private readonly int[] _offsets = new int[(2 * RawShell.MaxL + 1) * (2 * RawShell.MaxL + 1)];

    /// <summary>Number of Cartesian integrals of the quartet: na·nb·nc·nd.</summary>
    public static int ResultLength(ShellPairData ab, ShellPairData cd) =>
        ab.A.CartesianCount * ab.B.CartesianCount * cd.A.CartesianCount * cd.B.CartesianCount;

    /// <summary>Computes the raw Cartesian block (ab|cd) into <paramref name="result"/>[((ia·nb + ib)·nc + ic)·nd + id].</summary>
    public void Compute(ShellPairData ab, ShellPairData cd, Span<double> result)
    {
        int la = ab.A.AngularMomentum, lb = ab.B.AngularMomentum, lc = cd.A.AngularMomentum, ld = cd.B.AngularMomentum;
        int lab = la + lb, lcd = lc + ld, lt = lab + lcd;
        int braCount = HorizontalRecurrence.SourceCount(la, lb), ketCount = HorizontalRecurrence.SourceCount(lc, ld);
        int na = CartesianIndex.Count(la), nb = CartesianIndex.Count(lb), nc = CartesianIndex.Count(lc), nd = CartesianIndex.Count(ld);
        int braBelow = CartesianIndex.CountBelow(la), ketBelow = CartesianIndex.CountBelow(lc);

        // Block layout of the vertical-recurrence buffer: block (Le, Lf) = [f][e][m], m = 0..lt−Le−Lf.
        int stride = lab + 1;
        int size = 0;
        for (int lf = 0; lf <= lcd; lf++)
        {
            int lo = ELow(lf, la, lcd);
            for (int le = lo; le <= lab; le++)
            {
                _offsets[lf * stride + le] = size;
                size += CartesianIndex.Count(lf) * CartesianIndex.Count(le) * (lt - le - lf + 1);
            }
        }
        Ensure(ref _vrr, size);
        Ensure(ref _contracted, braCount * ketCount);
        var vrr = _vrr.AsSpan();
        var contracted = _contracted.AsSpan(0, braCount * ketCount);
        contracted.Clear();
        var boys = _boys.AsSpan();

        for (int ip = 0; ip < ab.Count; ip++)
        {
            double p = ab.Exponent[ip];
            double px = ab.Center[3 * ip], py = ab.Center[3 * ip + 1], pz = ab.Center[3 * ip + 2];
            double pax = ab.CenterMinusA[3 * ip], pay = ab.CenterMinusA[3 * ip + 1], paz = ab.CenterMinusA[3 * ip + 2];
            double fab = ab.Factor[ip];
            for (int iq = 0; iq < cd.Count; iq++)
            {
                double q = cd.Exponent[iq];
                double qx = cd.Center[3 * iq], qy = cd.Center[3 * iq + 1], qz = cd.Center[3 * iq + 2];
                double pq = p + q, rho = p * q / pq;
                double dx = px - qx, dy = py - qy, dz = pz - qz;
                double t = rho * (dx * dx + dy * dy + dz * dz);
                double pre = fab * cd.Factor[iq] / Math.Sqrt(pq);
                BoysFunction.EvaluateUnchecked(lt, t, boys);
                var b00 = vrr.Slice(_offsets[0], lt + 1);
                for (int m = 0; m <= lt; m++) b00[m] = pre * boys[m];
                if (lt > 0)
                {
                    double wx = (p * px + q * qx) / pq, wy = (p * py + q * qy) / pq, wz = (p * pz + q * qz) / pq;
                    // Stage 1: [e0|00]^(m)
                    if (lab > 0)
                    {
                        Span<double> paxis = [pax, pay, paz];
                        Span<double> wpaxis = [wx - px, wy - py, wz - pz];
                        double inv2p = 0.5 / p, rhoOverP = rho / p;
                        for (int le = 1; le <= lab; le++)
                        {
                            int mmax = lt - le;
                            int mm = mmax + 1, mm1 = mmax + 2, mm2 = mmax + 3;
                            int off = _offsets[le], off1 = _offsets[le - 1], off2 = le >= 2 ? _offsets[le - 2] : 0;
                            int[] axisOf = CartesianIndex.BuildAxis[le], m1Of = CartesianIndex.BuildMinus1[le], m2Of = CartesianIndex.BuildMinus2[le], nOf = CartesianIndex.BuildPowerMinus1[le];
                            int ne = CartesianIndex.Count(le);
                            for (int k = 0; k < ne; k++)
                            {
                                int axis = axisOf[k];
                                double c1 = paxis[axis], c2 = wpaxis[axis];
                                var dst = vrr.Slice(off + k * mm, mm);
                                var e1 = vrr.Slice(off1 + m1Of[k] * mm1, mm1);
                                if (m2Of[k] >= 0)
                                {
                                    var e2 = vrr.Slice(off2 + m2Of[k] * mm2, mm2);
                                    double n = nOf[k] * inv2p, nr = n * rhoOverP;
                                    for (int m = 0; m < mm; m++)
                                        dst[m] = c1 * e1[m] + c2 * e1[m + 1] + n * e2[m] - nr * e2[m + 1];
                                }
                                else
                                {
                                    for (int m = 0; m < mm; m++)
                                        dst[m] = c1 * e1[m] + c2 * e1[m + 1];
                                }
                            }
                        }
                    }
                    // Stage 2: [e0|f0]^(m)
                    if (lcd > 0)
                    {
                        double qcx = cd.CenterMinusA[3 * iq], qcy = cd.CenterMinusA[3 * iq + 1], qcz = cd.CenterMinusA[3 * iq + 2];
                        Span<double> qaxis = [qcx, qcy, qcz];
                        Span<double> wqaxis = [wx - qx, wy - qy, wz - qz];
                        double inv2q = 0.5 / q, rhoOverQ = rho / q, inv2pq = 0.5 / pq;
                        for (int lf = 1; lf <= lcd; lf++)
                        {
                            int nf = CartesianIndex.Count(lf);
                            int nf1 = CartesianIndex.Count(lf - 1);
                            int nf2 = lf >= 2 ? CartesianIndex.Count(lf - 2) : 0;
                            int[] axisOf = CartesianIndex.BuildAxis[lf], m1Of = CartesianIndex.BuildMinus1[lf], m2Of = CartesianIndex.BuildMinus2[lf], nOf = CartesianIndex.BuildPowerMinus1[lf];
                            for (int le = ELow(lf, la, lcd); le <= lab; le++)
                            {
                                int ne = CartesianIndex.Count(le);
                                int mm = lt - le - lf + 1;        // m count at (le, lf)
                                int mmF1 = mm + 1;                // at (le, lf−1)
                                int mmF2 = mm + 2;                // at (le, lf−2)
                                int mmE1 = mm + 2;                // at (le−1, lf−1)
                                int off = _offsets[lf * stride + le];
                                int offF1 = _offsets[(lf - 1) * stride + le];
                                int offF2 = lf >= 2 ? _offsets[(lf - 2) * stride + le] : 0;
                                int offE1 = le >= 1 ? _offsets[(lf - 1) * stride + le - 1] : 0;
                                int neE1 = le >= 1 ? CartesianIndex.Count(le - 1) : 0;
                                int[] minusE = CartesianIndex.Minus[le], powE = CartesianIndex.Power[le];
                                for (int f = 0; f < nf; f++)
                                {
                                    int axis = axisOf[f];
                                    double c1 = qaxis[axis], c2 = wqaxis[axis];
                                    int f1 = m1Of[f], f2 = m2Of[f];
                                    double n = f2 >= 0 ? nOf[f] * inv2q : 0, nr = n * rhoOverQ;
                                    for (int e = 0; e < ne; e++)
                                    {
                                        var dst = vrr.Slice(off + (f * ne + e) * mm, mm);
                                        var s1 = vrr.Slice(offF1 + (f1 * ne + e) * mmF1, mmF1);
                                        for (int m = 0; m < mm; m++) dst[m] = c1 * s1[m] + c2 * s1[m + 1];
                                        if (f2 >= 0)
                                        {
                                            var s2 = vrr.Slice(offF2 + (f2 * ne + e) * mmF2, mmF2);
                                            for (int m = 0; m < mm; m++) dst[m] += n * s2[m] - nr * s2[m + 1];
                                        }
                                        int pe = powE[3 * e + axis];
                                        if (pe > 0)
                                        {
                                            int em = minusE[3 * e + axis];
                                            double g = pe * inv2pq;
                                            var s3 = vrr.Slice(offE1 + (f1 * neE1 + em) * mmE1, mmE1);
                                            for (int m = 0; m < mm; m++) dst[m] += g * s3[m + 1];
                                        }
                                    }
                                }
                            }
                        }
                    }
                }
                // Contract the [e0|f0]^(0) needed by the horizontal recurrence.
                for (int lf = lc; lf <= lcd; lf++)
                {
                    int nf = CartesianIndex.Count(lf);
                    int fBase = CartesianIndex.CountBelow(lf) - ketBelow;
                    for (int le = la; le <= lab; le++)
                    {
                        int ne = CartesianIndex.Count(le);
                        int mm = lt - le - lf + 1;
                        int off = _offsets[lf * stride + le];
                        int eBase = CartesianIndex.CountBelow(le) - braBelow;
                        for (int f = 0; f < nf; f++)
                            for (int e = 0; e < ne; e++)
                                contracted[(eBase + e) * ketCount + fBase + f] += vrr[off + (f * ne + e) * mm];
                    }
                }
            }
        }

        // Horizontal recurrences: bra (carrying all ket components), then ket.
        int braLength = na * nb * ketCount;
        Ensure(ref _braDone, braLength);
        Ensure(ref _scratch, Math.Max(HorizontalRecurrence.ScratchLength(la, lb, ketCount), HorizontalRecurrence.ScratchLength(lc, ld, 1)));
        HorizontalRecurrence.Apply(la, lb, ab.AbX, ab.AbY, ab.AbZ, 1, ketCount, contracted, _braDone.AsSpan(0, braLength), _scratch);
        HorizontalRecurrence.Apply(lc, ld, cd.AbX, cd.AbY, cd.AbZ, na * nb, 1, _braDone.AsSpan(0, braLength), result[..(na * nb * nc * nd)], _scratch);
    }

    /// <summary>Lowest L(e) needed at ket level lf: the ket recurrence lowers e by one per level.</summary>
    private static int ELow(int lf, int la, int lcd) => lf == 0 ? 0 : Math.Max(0, la - (lcd - lf));

    private static void Ensure(ref double[] buffer, int length)
    {
        if (buffer.Length < length) buffer = new double[Math.Max(length, 2 * buffer.Length)];
    }
}
