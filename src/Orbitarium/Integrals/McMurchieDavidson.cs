using Orbitarium.Chemistry;

namespace Orbitarium.Integrals;

/// <summary>
/// A second, independent integral algorithm: the McMurchie–Davidson Hermite-Gaussian expansion
/// (L. E. McMurchie and E. R. Davidson, J. Comput. Phys. 26, 218 (1978)), written plainly for clarity rather
/// than speed. It serves as the reference the production Head-Gordon–Pople engine is tested against.
/// </summary>
/// <remarks>
/// Overlap distributions are expanded in Hermite Gaussians with the coefficients
/// E^{i+1,j}_t = E^{ij}_{t−1}/(2p) + X_PA E^{ij}_t + (t+1) E^{ij}_{t+1} (and the same with X_PB for j),
/// E^{00}_0 = exp(−μX_AB²); Coulomb integrals over Hermite Gaussians follow from
/// R^n_{t+1,u,v} = t R^{n+1}_{t−1,u,v} + X_PC R^{n+1}_{t,u,v}, R^n_{000} = (−2a)^n F_n(a R²)
/// (Helgaker, Jørgensen, Olsen, <i>Molecular Electronic-Structure Theory</i>, sections 9.5 and 9.9).
/// </remarks>
internal static class McMurchieDavidson
{
    /// <summary>Raw Cartesian block (ab|cd) laid out [((ia·nb + ib)·nc + ic)·nd + id].</summary>
    public static void ElectronRepulsion(RawShell a, RawShell b, RawShell c, RawShell d, Span<double> result)
    {
        int la = a.AngularMomentum, lb = b.AngularMomentum, lc = c.AngularMomentum, ld = d.AngularMomentum;
        int na = a.CartesianCount, nb = b.CartesianCount, nc = c.CartesianCount, nd = d.CartesianCount;
        int lab = la + lb, lcd = lc + ld, lt = lab + lcd;
        result[..(na * nb * nc * nd)].Clear();
        int[] pa = CartesianIndex.Power[la], pb = CartesianIndex.Power[lb], pc = CartesianIndex.Power[lc], pd = CartesianIndex.Power[ld];
        var boys = new double[lt + 1];
        for (int i = 0; i < a.PrimitiveCount; i++)
            for (int j = 0; j < b.PrimitiveCount; j++)
            {
                var (p, pCenter, eab) = Hermite(a, i, b, j);
                double cab = a.Coefficients[i] * b.Coefficients[j];
                for (int k = 0; k < c.PrimitiveCount; k++)
                    for (int l = 0; l < d.PrimitiveCount; l++)
                    {
                        var (q, qCenter, ecd) = Hermite(c, k, d, l);
                        double ccd = c.Coefficients[k] * d.Coefficients[l];
                        double alpha = p * q / (p + q);
                        var r = HermiteCoulomb(lt, alpha, pCenter - qCenter, boys);
                        double pre = 2 * Math.Pow(Math.PI, 2.5) / (p * q * Math.Sqrt(p + q)) * cab * ccd;
                        for (int ia = 0; ia < na; ia++)
                            for (int ib = 0; ib < nb; ib++)
                                for (int ic = 0; ic < nc; ic++)
                                    for (int id = 0; id < nd; id++)
                                    {
                                        double sum = 0;
                                        int ax = pa[3 * ia], ay = pa[3 * ia + 1], az = pa[3 * ia + 2];
                                        int bx = pb[3 * ib], by = pb[3 * ib + 1], bz = pb[3 * ib + 2];
                                        int cx = pc[3 * ic], cy = pc[3 * ic + 1], cz = pc[3 * ic + 2];
                                        int dx = pd[3 * id], dy = pd[3 * id + 1], dz = pd[3 * id + 2];
                                        for (int t = 0; t <= ax + bx; t++)
                                        for (int u = 0; u <= ay + by; u++)
                                        for (int v = 0; v <= az + bz; v++)
                                        {
                                            double e1 = eab[0][ax, bx, t] * eab[1][ay, by, u] * eab[2][az, bz, v];
                                            if (e1 == 0) continue;
                                            for (int tau = 0; tau <= cx + dx; tau++)
                                            for (int nu = 0; nu <= cy + dy; nu++)
                                            for (int phi = 0; phi <= cz + dz; phi++)
                                            {
                                                double e2 = ecd[0][cx, dx, tau] * ecd[1][cy, dy, nu] * ecd[2][cz, dz, phi];
                                                double sign = ((tau + nu + phi) & 1) == 0 ? 1 : -1;
                                                sum += e1 * sign * e2 * r[t + tau, u + nu, v + phi];
                                            }
                                        }
                                        result[((ia * nb + ib) * nc + ic) * nd + id] += pre * sum;
                                    }
                    }
            }
    }

    /// <summary>Raw potential block Σ_C q_C ⟨a|1/|r−C||b⟩, laid out [ia·nb + ib].</summary>
    public static void Potential(RawShell a, RawShell b, IReadOnlyList<(Vector3D PositionBohr, double Charge)> charges, Span<double> result)
    {
        int la = a.AngularMomentum, lb = b.AngularMomentum, na = a.CartesianCount, nb = b.CartesianCount;
        result[..(na * nb)].Clear();
        int[] pa = CartesianIndex.Power[la], pb = CartesianIndex.Power[lb];
        var boys = new double[la + lb + 1];
        for (int i = 0; i < a.PrimitiveCount; i++)
            for (int j = 0; j < b.PrimitiveCount; j++)
            {
                var (p, pCenter, e) = Hermite(a, i, b, j);
                double cab = a.Coefficients[i] * b.Coefficients[j];
                foreach (var (pos, q) in charges)
                {
                    var r = HermiteCoulomb(la + lb, p, pCenter - pos, boys);
                    double pre = 2 * Math.PI / p * cab * q;
                    for (int ia = 0; ia < na; ia++)
                        for (int ib = 0; ib < nb; ib++)
                        {
                            int ax = pa[3 * ia], ay = pa[3 * ia + 1], az = pa[3 * ia + 2];
                            int bx = pb[3 * ib], by = pb[3 * ib + 1], bz = pb[3 * ib + 2];
                            double sum = 0;
                            for (int t = 0; t <= ax + bx; t++)
                                for (int u = 0; u <= ay + by; u++)
                                    for (int v = 0; v <= az + bz; v++)
                                        sum += e[0][ax, bx, t] * e[1][ay, by, u] * e[2][az, bz, v] * r[t, u, v];
                            result[ia * nb + ib] += pre * sum;
                        }
                }
            }
    }

    /// <summary>Raw overlap block ⟨a|b⟩ = Σ E^x_0 E^y_0 E^z_0 (π/p)^{3/2}.</summary>
    public static void Overlap(RawShell a, RawShell b, Span<double> result)
    {
        int na = a.CartesianCount, nb = b.CartesianCount;
        result[..(na * nb)].Clear();
        int[] pa = CartesianIndex.Power[a.AngularMomentum], pb = CartesianIndex.Power[b.AngularMomentum];
        for (int i = 0; i < a.PrimitiveCount; i++)
            for (int j = 0; j < b.PrimitiveCount; j++)
            {
                var (p, _, e) = Hermite(a, i, b, j);
                double pre = Math.Pow(Math.PI / p, 1.5) * a.Coefficients[i] * b.Coefficients[j];
                for (int ia = 0; ia < na; ia++)
                    for (int ib = 0; ib < nb; ib++)
                        result[ia * nb + ib] += pre * e[0][pa[3 * ia], pb[3 * ib], 0] * e[1][pa[3 * ia + 1], pb[3 * ib + 1], 0] * e[2][pa[3 * ia + 2], pb[3 * ib + 2], 0];
            }
    }

    private static (double P, Vector3D Center, double[][,,] E) Hermite(RawShell a, int i, RawShell b, int j)
    {
        double alpha = a.Exponents[i], beta = b.Exponents[j], p = alpha + beta, mu = alpha * beta / p;
        var A = a.CenterBohr; var B = b.CenterBohr;
        var P = (alpha * A + beta * B) / p;
        int la = a.AngularMomentum, lb = b.AngularMomentum;
        var e = new double[3][,,];
        for (int axis = 0; axis < 3; axis++)
        {
            double xab = A[axis] - B[axis], xpa = P[axis] - A[axis], xpb = P[axis] - B[axis];
            var t = new double[la + 1, lb + 1, la + lb + 2];
            t[0, 0, 0] = Math.Exp(-mu * xab * xab);
            for (int ii = 0; ii <= la; ii++)
                for (int jj = 0; jj <= lb; jj++)
                {
                    if (ii == 0 && jj == 0) continue;
                    for (int tt = 0; tt <= ii + jj; tt++)
                    {
                        double v;
                        if (ii > 0)
                            v = (tt > 0 ? t[ii - 1, jj, tt - 1] / (2 * p) : 0) + xpa * t[ii - 1, jj, tt] + (tt + 1) * t[ii - 1, jj, tt + 1];
                        else
                            v = (tt > 0 ? t[ii, jj - 1, tt - 1] / (2 * p) : 0) + xpb * t[ii, jj - 1, tt] + (tt + 1) * t[ii, jj - 1, tt + 1];
                        t[ii, jj, tt] = v;
                    }
                }
            e[axis] = t;
        }
        return (p, P, e);
    }

    private static double[,,] HermiteCoulomb(int lmax, double alpha, Vector3D pc, double[] boys)
    {
        double t = alpha * pc.LengthSquared;
        BoysFunction.Evaluate(lmax, t, boys);
        // r[n][t,u,v]
        var r = new double[lmax + 1][,,];
        for (int n = 0; n <= lmax; n++) r[n] = new double[lmax + 1, lmax + 1, lmax + 1];
        for (int n = lmax; n >= 0; n--)
        {
            r[n][0, 0, 0] = Math.Pow(-2 * alpha, n) * boys[n];
            int top = lmax - n;
            for (int tt = 0; tt <= top; tt++)
                for (int u = 0; u <= top - tt; u++)
                    for (int v = 0; v <= top - tt - u; v++)
                    {
                        if (tt + u + v == 0) continue;
                        var up = r[n + 1];
                        double val;
                        if (tt > 0) val = (tt > 1 ? (tt - 1) * up[tt - 2, u, v] : 0) + pc.X * up[tt - 1, u, v];
                        else if (u > 0) val = (u > 1 ? (u - 1) * up[tt, u - 2, v] : 0) + pc.Y * up[tt, u - 1, v];
                        else val = (v > 1 ? (v - 1) * up[tt, u, v - 2] : 0) + pc.Z * up[tt, u, v - 1];
                        r[n][tt, u, v] = val;
                    }
        }
        return r[0];
    }
}
