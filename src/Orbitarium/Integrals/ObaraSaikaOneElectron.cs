using Orbitarium.Chemistry;

namespace Orbitarium.Integrals;

/// <summary>
/// One-electron integrals over raw Cartesian shells by the Obara–Saika recurrences
/// (S. Obara and A. Saika, J. Chem. Phys. 84, 3963 (1986)): overlap, kinetic energy and multipole moments
/// from the one-dimensional overlap recurrence, and the Coulomb potential of point charges from the
/// auxiliary-index recurrence (their eq. 31) followed by the horizontal recurrence.
/// </summary>
/// <remarks>
/// Results are raw blocks: element [ia·nb + ib] pairs Cartesian component ia of shell a with ib of shell b
/// (Orbitarium's component order), with the shells' coefficients applied as given (see <see cref="RawShell"/>).
/// </remarks>
internal static class ObaraSaikaOneElectron
{
    /// <summary>Overlap ⟨a|b⟩.</summary>
    public static void Overlap(RawShell a, RawShell b, Span<double> result) => OneDimensional(a, b, Operator.Overlap, default, 0, result);

    /// <summary>Kinetic energy ⟨a|−½∇²|b⟩ in hartree.</summary>
    public static void Kinetic(RawShell a, RawShell b, Span<double> result) => OneDimensional(a, b, Operator.Kinetic, default, 0, result);

    /// <summary>Cartesian multipole moments ⟨a|(x−Oₓ)^kx (y−O_y)^ky (z−O_z)^kz|b⟩ for every kx+ky+kz = <paramref name="order"/>
    /// (components in Orbitarium's Cartesian order: x, y, z for 1; xx, xy, xz, yy, yz, zz for 2).</summary>
    /// <param name="a">Bra shell.</param>
    /// <param name="b">Ket shell.</param>
    /// <param name="originBohr">Origin O in bohr.</param>
    /// <param name="order">Moment order (0, 1, 2, …).</param>
    /// <param name="result">[component][ia·nb + ib].</param>
    public static void Multipole(RawShell a, RawShell b, Vector3D originBohr, int order, Span<double> result) =>
        OneDimensional(a, b, Operator.Multipole, originBohr, order, result);

    private enum Operator { Overlap, Kinetic, Multipole }

    private static void OneDimensional(RawShell sa, RawShell sb, Operator op, Vector3D origin, int order, Span<double> result)
    {
        int la = sa.AngularMomentum, lb = sb.AngularMomentum;
        int na = CartesianIndex.Count(la), nb = CartesianIndex.Count(lb);
        int ncomp = op == Operator.Multipole ? CartesianIndex.Count(order) : 1;
        int extra = op == Operator.Kinetic ? 2 : op == Operator.Multipole ? order : 0;
        int imax = la, jmax = lb + extra;
        int stride = jmax + 1;
        int size = (imax + 1) * stride;
        result[..(ncomp * na * nb)].Clear();
        Span<double> s = stackalloc double[3 * size];
        // Per-axis operator tables: [axis][power or kinetic][i][j]
        int kinds = op == Operator.Multipole ? order + 1 : op == Operator.Kinetic ? 2 : 1;
        int isz = (la + 1) * (lb + 1);
        Span<double> ops = stackalloc double[3 * kinds * isz];
        var A = sa.CenterBohr; var B = sb.CenterBohr;
        Span<double> ac = [A.X, A.Y, A.Z];
        Span<double> bc = [B.X, B.Y, B.Z];
        Span<double> oc = [origin.X, origin.Y, origin.Z];
        int[] pa = CartesianIndex.Power[la], pb = CartesianIndex.Power[lb];
        int[] pk = CartesianIndex.Power[order];
        for (int i = 0; i < sa.PrimitiveCount; i++)
        {
            double alpha = sa.Exponents[i];
            for (int j = 0; j < sb.PrimitiveCount; j++)
            {
                double beta = sb.Exponents[j];
                double p = alpha + beta, mu = alpha * beta / p, inv2p = 0.5 / p;
                double coef = sa.Coefficients[i] * sb.Coefficients[j];
                for (int axis = 0; axis < 3; axis++)
                {
                    double px = (alpha * ac[axis] + beta * bc[axis]) / p;
                    double xab = ac[axis] - bc[axis];
                    var t = s.Slice(axis * size, size);
                    Fill(px - ac[axis], px - bc[axis], inv2p, Math.Sqrt(Math.PI / p) * Math.Exp(-mu * xab * xab), imax, jmax, t);
                    var o = ops.Slice(axis * kinds * isz, kinds * isz);
                    for (int ia = 0; ia <= la; ia++)
                        for (int jb = 0; jb <= lb; jb++)
                        {
                            double sij = t[ia * stride + jb];
                            o[ia * (lb + 1) + jb] = sij;
                            if (op == Operator.Kinetic)
                            {
                                double lower = jb >= 2 ? jb * (jb - 1) * t[ia * stride + jb - 2] : 0;
                                o[isz + ia * (lb + 1) + jb] = -0.5 * (lower - 2 * beta * (2 * jb + 1) * sij + 4 * beta * beta * t[ia * stride + jb + 2]);
                            }
                            else if (op == Operator.Multipole)
                            {
                                // (x−O)^k = Σ_t C(k,t) (x−B)^t (B−O)^{k−t}
                                double bo = bc[axis] - oc[axis];
                                for (int k = 1; k <= order; k++)
                                {
                                    double sum = 0, binom = 1;
                                    for (int tt = 0; tt <= k; tt++)
                                    {
                                        sum += binom * IntegerPower(bo, k - tt) * t[ia * stride + jb + tt];
                                        binom = binom * (k - tt) / (tt + 1);
                                    }
                                    o[k * isz + ia * (lb + 1) + jb] = sum;
                                }
                            }
                        }
                }
                var ox = ops[..(kinds * isz)];
                var oy = ops.Slice(kinds * isz, kinds * isz);
                var oz = ops.Slice(2 * kinds * isz, kinds * isz);
                for (int a = 0; a < na; a++)
                {
                    int ax = pa[3 * a], ay = pa[3 * a + 1], az = pa[3 * a + 2];
                    for (int b = 0; b < nb; b++)
                    {
                        int ix = ax * (lb + 1) + pb[3 * b], iy = ay * (lb + 1) + pb[3 * b + 1], iz = az * (lb + 1) + pb[3 * b + 2];
                        switch (op)
                        {
                            case Operator.Overlap:
                                result[a * nb + b] += coef * ox[ix] * oy[iy] * oz[iz];
                                break;
                            case Operator.Kinetic:
                                result[a * nb + b] += coef * (ox[isz + ix] * oy[iy] * oz[iz] + ox[ix] * oy[isz + iy] * oz[iz] + ox[ix] * oy[iy] * oz[isz + iz]);
                                break;
                            default:
                                for (int c = 0; c < ncomp; c++)
                                    result[c * na * nb + a * nb + b] += coef * ox[pk[3 * c] * isz + ix] * oy[pk[3 * c + 1] * isz + iy] * oz[pk[3 * c + 2] * isz + iz];
                                break;
                        }
                    }
                }
            }
        }
    }

    private static double IntegerPower(double x, int n)
    {
        double r = 1;
        for (int i = 0; i < n; i++) r *= x;
        return r;
    }

    /// <summary>One-dimensional Obara–Saika overlap table S_ij, i ≤ imax, j ≤ jmax (their eq. 27).</summary>
    private static void Fill(double xpa, double xpb, double inv2p, double s00, int imax, int jmax, Span<double> s)
    {
        int stride = jmax + 1;
        s[0] = s00;
        for (int i = 0; i < imax; i++)
            s[(i + 1) * stride] = xpa * s[i * stride] + (i > 0 ? i * inv2p * s[(i - 1) * stride] : 0);
        for (int j = 0; j < jmax; j++)
            for (int i = 0; i <= imax; i++)
            {
                double v = xpb * s[i * stride + j];
                if (i > 0) v += i * inv2p * s[(i - 1) * stride + j];
                if (j > 0) v += j * inv2p * s[i * stride + j - 1];
                s[i * stride + j + 1] = v;
            }
    }

    /// <summary>
    /// Coulomb potential integrals Σ_C q_C ⟨a| 1/|r − C| |b⟩ (positive for positive q; multiply by −Z for nuclear attraction).
    /// </summary>
    /// <param name="sa">Bra shell.</param>
    /// <param name="sb">Ket shell.</param>
    /// <param name="charges">Point charges: positions (bohr) and charges q (atomic units).</param>
    /// <param name="result">Raw block [ia·nb + ib].</param>
    public static void Potential(RawShell sa, RawShell sb, ReadOnlySpan<(Vector3D PositionBohr, double Charge)> charges, Span<double> result)
    {
        int la = sa.AngularMomentum, lb = sb.AngularMomentum, lt = la + lb;
        int na = CartesianIndex.Count(la), nb = CartesianIndex.Count(lb);
        int ncomp = CartesianIndex.CountBelow(lt + 1);
        int m1 = lt + 1;
        Span<double> v = stackalloc double[ncomp * m1];
        Span<double> boys = stackalloc double[m1];
        int srcCount = HorizontalRecurrence.SourceCount(la, lb);
        int below = CartesianIndex.CountBelow(la);
        Span<double> contracted = stackalloc double[srcCount];
        contracted.Clear();
        var A = sa.CenterBohr; var B = sb.CenterBohr;
        Span<double> pa = stackalloc double[3];
        Span<double> pc = stackalloc double[3];
        for (int i = 0; i < sa.PrimitiveCount; i++)
        {
            double alpha = sa.Exponents[i];
            for (int j = 0; j < sb.PrimitiveCount; j++)
            {
                double beta = sb.Exponents[j];
                double p = alpha + beta, mu = alpha * beta / p, inv2p = 0.5 / p;
                double px = (alpha * A.X + beta * B.X) / p, py = (alpha * A.Y + beta * B.Y) / p, pz = (alpha * A.Z + beta * B.Z) / p;
                double kab = Math.Exp(-mu * (A - B).LengthSquared);
                double pre = 2 * Math.PI / p * kab * sa.Coefficients[i] * sb.Coefficients[j];
                pa[0] = px - A.X; pa[1] = py - A.Y; pa[2] = pz - A.Z;
                foreach (var (c, q) in charges)
                {
                    if (q == 0) continue;
                    pc[0] = px - c.X; pc[1] = py - c.Y; pc[2] = pz - c.Z;
                    double t = p * (pc[0] * pc[0] + pc[1] * pc[1] + pc[2] * pc[2]);
                    BoysFunction.EvaluateUnchecked(lt, t, boys);
                    double f = pre * q;
                    for (int m = 0; m <= lt; m++) v[m] = f * boys[m];
                    for (int l = 1; l <= lt; l++)
                    {
                        int off = CartesianIndex.CountBelow(l) * m1, off1 = CartesianIndex.CountBelow(l - 1) * m1, off2 = l >= 2 ? CartesianIndex.CountBelow(l - 2) * m1 : 0;
                        int[] axisOf = CartesianIndex.BuildAxis[l], m1Of = CartesianIndex.BuildMinus1[l], m2Of = CartesianIndex.BuildMinus2[l], nOf = CartesianIndex.BuildPowerMinus1[l];
                        int mmax = lt - l;
                        for (int k = 0; k < CartesianIndex.Count(l); k++)
                        {
                            int axis = axisOf[k];
                            double xa = pa[axis], xc = pc[axis];
                            int e1 = off1 + m1Of[k] * m1;
                            int dst = off + k * m1;
                            if (m2Of[k] >= 0)
                            {
                                int e2 = off2 + m2Of[k] * m1;
                                double nn = nOf[k] * inv2p;
                                for (int m = 0; m <= mmax; m++)
                                    v[dst + m] = xa * v[e1 + m] - xc * v[e1 + m + 1] + nn * (v[e2 + m] - v[e2 + m + 1]);
                            }
                            else
                            {
                                for (int m = 0; m <= mmax; m++)
                                    v[dst + m] = xa * v[e1 + m] - xc * v[e1 + m + 1];
                            }
                        }
                    }
                    for (int e = below; e < ncomp; e++) contracted[e - below] += v[e * m1];
                }
            }
        }
        Span<double> scratch = stackalloc double[HorizontalRecurrence.ScratchLength(la, lb, 1)];
        var ab = A - B;
        HorizontalRecurrence.Apply(la, lb, ab.X, ab.Y, ab.Z, 1, 1, contracted, result[..(na * nb)], scratch);
    }
}
