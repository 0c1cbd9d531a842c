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
/// integral once the buffers have grown to the largest quartet class seen. The recurrence steps of each class come
/// precomputed from <see cref="EriClassPlan"/>; (ss|ss), (ps|ss), (ss|ps) and (ps|ps) have hand-written paths.
/// <para>Vertical recurrence used (W = (pP+qQ)/(p+q), ρ = pq/(p+q)):
/// [e+1ᵢ,0|00]^(m) = (P−A)ᵢ[e0|00]^(m) + (W−P)ᵢ[e0|00]^(m+1) + eᵢ/(2p)([e−1ᵢ]^(m) − ρ/p [e−1ᵢ]^(m+1));
/// [e0|f+1ᵢ,0]^(m) = (Q−C)ᵢ[e0|f0]^(m) + (W−Q)ᵢ[e0|f0]^(m+1) + fᵢ/(2q)([e0|f−1ᵢ]^(m) − ρ/q [e0|f−1ᵢ]^(m+1))
/// + eᵢ/(2(p+q)) [e−1ᵢ,0|f0]^(m+1); [00|00]^(m) = 2π^{5/2}/(pq√(p+q)) K_ab K_cd F_m(ρ|P−Q|²).</para>
/// </remarks>
internal sealed class HeadGordonPople
{
    /// <summary>Primitive quartets whose prefactor 2π^{5/2}/(pq√(p+q)) K_ab K_cd |c c c c| (the bound on their
    /// [00|00]^(0)) is below this are skipped: 1e-18, far below the 1e-12 Schwarz threshold of the tensor and the
    /// rounding of a sum of a few thousand terms.</summary>
    public const double PrimitiveCutoff = 1e-18;

    private double[] _vrr = new double[256];
    private double[] _contracted = new double[256];
    private double[] _braDone = new double[256];
    private double[] _scratch = new double[256];
    private readonly double[] _boys = new double[BoysFunction.MaxOrder + 1];

    /// <summary>Number of Cartesian integrals of the quartet: na·nb·nc·nd.</summary>
    public static int ResultLength(ShellPairData ab, ShellPairData cd) =>
        ab.A.CartesianCount * ab.B.CartesianCount * cd.A.CartesianCount * cd.B.CartesianCount;

    /// <summary>Computes the raw Cartesian block (ab|cd) into <paramref name="result"/>[((ia·nb + ib)·nc + ic)·nd + id].</summary>
    public unsafe void Compute(ShellPairData ab, ShellPairData cd, Span<double> result)
    {
        int la = ab.A.AngularMomentum, lb = ab.B.AngularMomentum, lc = cd.A.AngularMomentum, ld = cd.B.AngularMomentum;
        int lt = la + lb + lc + ld;
        if (lt == 0)
        {
            result[0] = SsSs(ab, cd);
            return;
        }
        if (lt == 1 && lb == 0 && ld == 0)
        {
            PsSs(ab, cd, la == 1, result);
            return;
        }
        if (la == 1 && lb == 0 && lc == 1 && ld == 0)
        {
            PsPs(ab, cd, result);
            return;
        }
        var plan = EriClassPlan.For(la, lb, lc, ld);
        int braCount = plan.BraCount, ketCount = plan.KetCount, contractedCount = braCount * ketCount;
        int na = CartesianIndex.Count(la), nb = CartesianIndex.Count(lb), nc = CartesianIndex.Count(lc), nd = CartesianIndex.Count(ld);
        Ensure(ref _vrr, plan.VrrSize);
        Ensure(ref _contracted, contractedCount);
        _contracted.AsSpan(0, contractedCount).Clear();
        int n1 = plan.Stage1Count.Length, n2 = plan.Stage2Count.Length / 2;

        fixed (double* v = _vrr, contracted = _contracted, boys = _boys)
        fixed (double* abP = ab.Exponent, abC = ab.Center, abPA = ab.CenterMinusA, abF = ab.Factor)
        fixed (double* cdP = cd.Exponent, cdC = cd.Center, cdQC = cd.CenterMinusA, cdF = cd.Factor)
        fixed (int* s1 = plan.Stage1, s2 = plan.Stage2, map = plan.ContractionMap)
        fixed (double* s1n = plan.Stage1Count, s2n = plan.Stage2Count)
        {
            double* pa = stackalloc double[3];
            double* wp = stackalloc double[3];
            double* qc = stackalloc double[3];
            double* wq = stackalloc double[3];
            for (int ip = 0; ip < ab.Count; ip++)
            {
                double p = abP[ip];
                double px = abC[3 * ip], py = abC[3 * ip + 1], pz = abC[3 * ip + 2];
                pa[0] = abPA[3 * ip]; pa[1] = abPA[3 * ip + 1]; pa[2] = abPA[3 * ip + 2];
                double fab = abF[ip];
                double inv2p = 0.5 / p;
                for (int iq = 0; iq < cd.Count; iq++)
                {
                    double q = cdP[iq];
                    double qx = cdC[3 * iq], qy = cdC[3 * iq + 1], qz = cdC[3 * iq + 2];
                    double pq = p + q, invpq = 1 / pq, rho = p * q * invpq;
                    double dx = px - qx, dy = py - qy, dz = pz - qz;
                    double t = rho * (dx * dx + dy * dy + dz * dz);
                    double pre = fab * cdF[iq] * Math.Sqrt(invpq);
                    if (Math.Abs(pre) < PrimitiveCutoff) continue;
                    BoysFunction.EvaluateUnchecked(lt, t, boys);
                    for (int m = 0; m <= lt; m++) v[m] = pre * boys[m];
                    double wx = (p * px + q * qx) * invpq, wy = (p * py + q * qy) * invpq, wz = (p * pz + q * qz) * invpq;
                    wp[0] = wx - px; wp[1] = wy - py; wp[2] = wz - pz;
                    // Stage 1: [e0|00]^(m)
                    double rhoOverP = q * invpq;
                    for (int k = 0; k < n1; k++)
                    {
                        int* op = s1 + 5 * k;
                        double* dst = v + op[0];
                        double* e1 = v + op[1];
                        double c1 = pa[op[3]], c2 = wp[op[3]];
                        int mm = op[4];
                        if (op[2] >= 0)
                        {
                            double* e2 = v + op[2];
                            double nn = s1n[k] * inv2p, nr = nn * rhoOverP;
                            for (int m = 0; m < mm; m++)
                                dst[m] = c1 * e1[m] + c2 * e1[m + 1] + nn * e2[m] - nr * e2[m + 1];
                        }
                        else
                        {
                            for (int m = 0; m < mm; m++)
                                dst[m] = c1 * e1[m] + c2 * e1[m + 1];
                        }
                    }
                    // Stage 2: [e0|f0]^(m)
                    if (n2 > 0)
                    {
                        qc[0] = cdQC[3 * iq]; qc[1] = cdQC[3 * iq + 1]; qc[2] = cdQC[3 * iq + 2];
                        wq[0] = wx - qx; wq[1] = wy - qy; wq[2] = wz - qz;
                        double inv2q = 0.5 / q, rhoOverQ = p * invpq, inv2pq = 0.5 * invpq;
                        for (int k = 0; k < n2; k++)
                        {
                            int* op = s2 + 6 * k;
                            double* dst = v + op[0];
                            double* f1 = v + op[1];
                            int axis = op[4], mm = op[5];
                            double c1 = qc[axis], c2 = wq[axis];
                            int o2 = op[2], o3 = op[3];
                            if (mm == 1)
                            {
                                double val = c1 * f1[0] + c2 * f1[1];
                                if (o2 >= 0) val += s2n[2 * k] * inv2q * (v[o2] - rhoOverQ * v[o2 + 1]);
                                if (o3 >= 0) val += s2n[2 * k + 1] * inv2pq * v[o3 + 1];
                                dst[0] = val;
                            }
                            else if (o2 >= 0 && o3 >= 0)
                            {
                                double* f2 = v + o2;
                                double* e1 = v + o3;
                                double nn = s2n[2 * k] * inv2q, nr = nn * rhoOverQ, g = s2n[2 * k + 1] * inv2pq;
                                for (int m = 0; m < mm; m++)
                                    dst[m] = c1 * f1[m] + c2 * f1[m + 1] + nn * f2[m] - nr * f2[m + 1] + g * e1[m + 1];
                            }
                            else if (o2 >= 0)
                            {
                                double* f2 = v + o2;
                                double nn = s2n[2 * k] * inv2q, nr = nn * rhoOverQ;
                                for (int m = 0; m < mm; m++)
                                    dst[m] = c1 * f1[m] + c2 * f1[m + 1] + nn * f2[m] - nr * f2[m + 1];
                            }
                            else if (o3 >= 0)
                            {
                                double* e1 = v + o3;
                                double g = s2n[2 * k + 1] * inv2pq;
                                for (int m = 0; m < mm; m++)
                                    dst[m] = c1 * f1[m] + c2 * f1[m + 1] + g * e1[m + 1];
                            }
                            else
                            {
                                for (int m = 0; m < mm; m++)
                                    dst[m] = c1 * f1[m] + c2 * f1[m + 1];
                            }
                        }
                    }
                    for (int i = 0; i < contractedCount; i++) contracted[i] += v[map[i]];
                }
            }
        }

        // Horizontal recurrences: bra (carrying all ket components), then ket.
        if (lb == 0 && ld == 0)
        {
            _contracted.AsSpan(0, contractedCount).CopyTo(result);
            return;
        }
        int braLength = na * nb * ketCount;
        Ensure(ref _braDone, braLength);
        Ensure(ref _scratch, Math.Max(HorizontalRecurrence.ScratchLength(la, lb, ketCount), HorizontalRecurrence.ScratchLength(lc, ld, 1)));
        if (ld == 0)
        {
            HorizontalRecurrence.Apply(la, lb, ab.AbX, ab.AbY, ab.AbZ, 1, ketCount, _contracted.AsSpan(0, contractedCount), result[..braLength], _scratch);
            return;
        }
        if (lb == 0)
        {
            HorizontalRecurrence.Apply(lc, ld, cd.AbX, cd.AbY, cd.AbZ, na, 1, _contracted.AsSpan(0, contractedCount), result[..(na * nc * nd)], _scratch);
            return;
        }
        HorizontalRecurrence.Apply(la, lb, ab.AbX, ab.AbY, ab.AbZ, 1, ketCount, _contracted.AsSpan(0, contractedCount), _braDone.AsSpan(0, braLength), _scratch);
        HorizontalRecurrence.Apply(lc, ld, cd.AbX, cd.AbY, cd.AbZ, na * nb, 1, _braDone.AsSpan(0, braLength), result[..(na * nb * nc * nd)], _scratch);
    }

    /// <summary>(ss|ss): the contracted sum of prefactor × F₀.</summary>
    private unsafe double SsSs(ShellPairData ab, ShellPairData cd)
    {
        double sum = 0;
        double* f0 = stackalloc double[1];
        fixed (double* abP = ab.Exponent, abC = ab.Center, abF = ab.Factor)
        fixed (double* cdP = cd.Exponent, cdC = cd.Center, cdF = cd.Factor)
        {
            for (int ip = 0; ip < ab.Count; ip++)
            {
                double p = abP[ip], px = abC[3 * ip], py = abC[3 * ip + 1], pz = abC[3 * ip + 2], fab = abF[ip];
                double inner = 0;
                for (int iq = 0; iq < cd.Count; iq++)
                {
                    double q = cdP[iq];
                    double pq = p + q, invpq = 1 / pq;
                    double dx = px - cdC[3 * iq], dy = py - cdC[3 * iq + 1], dz = pz - cdC[3 * iq + 2];
                    double t = p * q * invpq * (dx * dx + dy * dy + dz * dz);
                    double w = cdF[iq] * Math.Sqrt(invpq);
                    if (Math.Abs(fab * w) < PrimitiveCutoff) continue;
                    BoysFunction.EvaluateUnchecked(0, t, f0);
                    inner += w * f0[0];
                }
                sum += fab * inner;
            }
        }
        return sum;
    }

    /// <summary>(ps|ss) when <paramref name="braP"/>, else (ss|ps): Σ pre·((P−A)ᵢF₀ + (W−P)ᵢF₁), resp. with Q−C and W−Q.</summary>
    private static unsafe void PsSs(ShellPairData ab, ShellPairData cd, bool braP, Span<double> result)
    {
        double rx = 0, ry = 0, rz = 0;
        double* f = stackalloc double[2];
        fixed (double* abP = ab.Exponent, abC = ab.Center, abPA = ab.CenterMinusA, abF = ab.Factor)
        fixed (double* cdP = cd.Exponent, cdC = cd.Center, cdQC = cd.CenterMinusA, cdF = cd.Factor)
        {
            for (int ip = 0; ip < ab.Count; ip++)
            {
                double p = abP[ip], px = abC[3 * ip], py = abC[3 * ip + 1], pz = abC[3 * ip + 2], fab = abF[ip];
                for (int iq = 0; iq < cd.Count; iq++)
                {
                    double q = cdP[iq];
                    double pq = p + q, invpq = 1 / pq;
                    double dx = px - cdC[3 * iq], dy = py - cdC[3 * iq + 1], dz = pz - cdC[3 * iq + 2];
                    double t = p * q * invpq * (dx * dx + dy * dy + dz * dz);
                    double pre = fab * cdF[iq] * Math.Sqrt(invpq);
                    if (Math.Abs(pre) < PrimitiveCutoff) continue;
                    BoysFunction.EvaluateUnchecked(1, t, f);
                    double f0 = pre * f[0];
                    if (braP)
                    {
                        // W − P = q/(p+q) (Q − P)
                        double g = -q * invpq * pre * f[1];
                        rx += abPA[3 * ip] * f0 + g * dx;
                        ry += abPA[3 * ip + 1] * f0 + g * dy;
                        rz += abPA[3 * ip + 2] * f0 + g * dz;
                    }
                    else
                    {
                        // W − Q = p/(p+q) (P − Q)
                        double g = p * invpq * pre * f[1];
                        rx += cdQC[3 * iq] * f0 + g * dx;
                        ry += cdQC[3 * iq + 1] * f0 + g * dy;
                        rz += cdQC[3 * iq + 2] * f0 + g * dz;
                    }
                }
            }
        }
        result[0] = rx; result[1] = ry; result[2] = rz;
    }

    /// <summary>(ps|ps): [pᵢ|pⱼ] = (Q−C)ⱼ[pᵢ|s]^(0) + (W−Q)ⱼ[pᵢ|s]^(1) + δᵢⱼ/(2(p+q)) [s|s]^(1), with
    /// [pᵢ|s]^(m) = (P−A)ᵢF_m + (W−P)ᵢF_{m+1} (times the prefactor).</summary>
    private static unsafe void PsPs(ShellPairData ab, ShellPairData cd, Span<double> result)
    {
        double* r = stackalloc double[9];
        for (int i = 0; i < 9; i++) r[i] = 0;
        double* f = stackalloc double[3];
        double* a0 = stackalloc double[3];
        double* a1 = stackalloc double[3];
        double* qcw = stackalloc double[6];
        fixed (double* abP = ab.Exponent, abC = ab.Center, abPA = ab.CenterMinusA, abF = ab.Factor)
        fixed (double* cdP = cd.Exponent, cdC = cd.Center, cdQC = cd.CenterMinusA, cdF = cd.Factor)
        {
            for (int ip = 0; ip < ab.Count; ip++)
            {
                double p = abP[ip], px = abC[3 * ip], py = abC[3 * ip + 1], pz = abC[3 * ip + 2], fab = abF[ip];
                double pax = abPA[3 * ip], pay = abPA[3 * ip + 1], paz = abPA[3 * ip + 2];
                for (int iq = 0; iq < cd.Count; iq++)
                {
                    double q = cdP[iq];
                    double pq = p + q, invpq = 1 / pq;
                    double dx = px - cdC[3 * iq], dy = py - cdC[3 * iq + 1], dz = pz - cdC[3 * iq + 2];
                    double t = p * q * invpq * (dx * dx + dy * dy + dz * dz);
                    double pre = fab * cdF[iq] * Math.Sqrt(invpq);
                    if (Math.Abs(pre) < PrimitiveCutoff) continue;
                    BoysFunction.EvaluateUnchecked(2, t, f);
                    double f0 = pre * f[0], f1 = pre * f[1], f2 = pre * f[2];
                    double wpScale = -q * invpq, wqScale = p * invpq; // W−P = −q/(p+q)(P−Q), W−Q = p/(p+q)(P−Q)
                    double wpx = wpScale * dx, wpy = wpScale * dy, wpz = wpScale * dz;
                    a0[0] = pax * f0 + wpx * f1; a0[1] = pay * f0 + wpy * f1; a0[2] = paz * f0 + wpz * f1;
                    a1[0] = pax * f1 + wpx * f2; a1[1] = pay * f1 + wpy * f2; a1[2] = paz * f1 + wpz * f2;
                    qcw[0] = cdQC[3 * iq]; qcw[1] = cdQC[3 * iq + 1]; qcw[2] = cdQC[3 * iq + 2];
                    qcw[3] = wqScale * dx; qcw[4] = wqScale * dy; qcw[5] = wqScale * dz;
                    double d = 0.5 * invpq * f1;
                    for (int i = 0; i < 3; i++)
                    {
                        double x0 = a0[i], x1 = a1[i];
                        r[3 * i] += qcw[0] * x0 + qcw[3] * x1;
                        r[3 * i + 1] += qcw[1] * x0 + qcw[4] * x1;
                        r[3 * i + 2] += qcw[2] * x0 + qcw[5] * x1;
                        r[4 * i] += d;
                    }
                }
            }
        }
        for (int i = 0; i < 9; i++) result[i] = r[i];
    }

    private static void Ensure(ref double[] buffer, int length)
    {
        if (buffer.Length < length) buffer = new double[Math.Max(length, 2 * buffer.Length)];
    }
}
