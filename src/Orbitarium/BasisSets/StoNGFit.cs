using System.Collections.Concurrent;
using System.Collections.Immutable;

namespace Orbitarium.BasisSets;

/// <summary>
/// Least-squares fit of n Gaussians to Slater functions: the STO-nG method of W. J. Hehre, R. F. Stewart and
/// J. A. Pople, J. Chem. Phys. 51, 2657 (1969).
/// </summary>
/// <remarks>
/// <para>For Slater exponent ζ = 1 the fit minimises, over the Gaussian exponents α₁…αₙ, the sum over the fitted
/// Slater functions of ε = ∫(φ_STO − Σᵢ cᵢ gᵢ)² dτ, where gᵢ are normalised Gaussians r^L e^(−αᵢr²) with the
/// Slater function's angular part. For fixed exponents the best coefficients solve S c = b (S the Gaussian
/// overlap matrix, bᵢ = ⟨gᵢ|φ_STO⟩), so ε = 1 − bᵀS⁻¹b; minimising ε is the same as maximising the overlap of
/// the normalised expansion with φ_STO. Several Slater functions may share one set of exponents (the 2sp, 3sp
/// and 4sp fits of the paper: 2s and 2p fitted together, the 2s with s-type Gaussians).</para>
/// <para>Overlaps ⟨g|φ_STO⟩ are computed with double-exponential quadrature (Takahasi–Mori) on r ∈ (0, ∞),
/// exact to about 1e-15; the exponents are optimised in ln α by BFGS with the analytic gradient, then polished
/// by Newton steps. Exponents for another ζ are α·ζ² (the expansion scales with the orbital).</para>
/// </remarks>
public static class StoNGFit
{
    private static readonly ConcurrentDictionary<string, SlaterExpansion> Cache = new();

    /// <summary>Fits <paramref name="gaussianCount"/> Gaussians with shared exponents to the given Slater functions
    /// (ζ = 1). Results are cached.</summary>
    /// <param name="gaussianCount">n of STO-nG, 1 to 12.</param>
    /// <param name="orbitals">One or more Slater functions, e.g. <c>SlaterOrbital.S2, SlaterOrbital.P2</c> for the 2sp fit.</param>
    /// <exception cref="OrbitariumInputException">n outside 1–12, no orbitals, or an impossible orbital (n ≤ L).</exception>
    public static SlaterExpansion Fit(int gaussianCount, params SlaterOrbital[] orbitals)
    {
        ArgumentNullException.ThrowIfNull(orbitals);
        if (gaussianCount < 1 || gaussianCount > 12)
            throw new OrbitariumInputException($"STO-nG needs 1 to 12 Gaussians per Slater function; {gaussianCount} was asked for.");
        if (orbitals.Length == 0)
            throw new OrbitariumInputException("Name at least one Slater function to fit (e.g. 1s, or 2s and 2p).");
        foreach (var o in orbitals)
            if (o.AngularMomentum < 0 || o.AngularMomentum > AngularMomentum.MaxL || o.PrincipalQuantumNumber <= o.AngularMomentum)
                throw new OrbitariumInputException($"Slater function n = {o.PrincipalQuantumNumber}, L = {o.AngularMomentum} does not exist: n must exceed L.");
        string key = gaussianCount + ":" + string.Join(",", orbitals);
        return Cache.GetOrAdd(key, _ => new Fitter(gaussianCount, orbitals).Run());
    }

    /// <summary>Overlap ⟨g|φ_STO⟩ of a normalised Gaussian r^L e^(−αr²) (exponent in bohr⁻²) with a normalised
    /// Slater function of exponent ζ = 1 and the same angular part.</summary>
    public static double Overlap(SlaterOrbital orbital, double gaussianExponent)
    {
        var q = Quadrature.Instance;
        double sum = 0;
        double lnNs = LnSlaterNorm(orbital.PrincipalQuantumNumber);
        double lnNg = LnGaussianNorm(orbital.AngularMomentum, gaussianExponent);
        int powr = orbital.PrincipalQuantumNumber - 1 + orbital.AngularMomentum + 2;
        for (int k = 0; k < q.R.Length; k++)
        {
            double r = q.R[k];
            double ln = lnNs + lnNg + powr * q.LnR[k] - r - gaussianExponent * r * r;
            sum += q.W[k] * Math.Exp(ln);
        }
        return sum;
    }

    internal static double LnSlaterNorm(int n)
    {
        // N = (2ζ)^{n+1/2} / √((2n)!), ζ = 1.
        double lnFact = 0;
        for (int k = 2; k <= 2 * n; k++) lnFact += Math.Log(k);
        return (n + 0.5) * Math.Log(2) - 0.5 * lnFact;
    }

    internal static double LnGaussianNorm(int l, double alpha)
    {
        // 1/N² = ∫ r^{2L+2} e^{−2αr²} dr = (2L+1)!! √π / (2^{L+2} (2α)^{L+3/2}).
        double inv = AngularMomentum.DoubleFactorial(2 * l + 1) * Math.Sqrt(Math.PI) / (Math.Pow(2, l + 2) * Math.Pow(2 * alpha, l + 1.5));
        return -0.5 * Math.Log(inv);
    }

    private sealed class Quadrature
    {
        public static readonly Quadrature Instance = new();
        public readonly double[] R, LnR, W;

        private Quadrature()
        {
            // Double-exponential map r = exp(π/2 · sinh t), step h, |t| ≤ 4.2 (r from ~1e-23 to ~1e15).
            const double h = 1.0 / 40, tMax = 4.2;
            int n = (int)(tMax / h);
            var r = new List<double>(); var lnr = new List<double>(); var w = new List<double>();
            for (int k = -n; k <= n; k++)
            {
                double t = k * h;
                double s = 0.5 * Math.PI * Math.Sinh(t);
                double x = Math.Exp(s);
                r.Add(x); lnr.Add(s); w.Add(h * 0.5 * Math.PI * Math.Cosh(t) * x);
            }
            R = [.. r]; LnR = [.. lnr]; W = [.. w];
        }
    }

    private sealed class Fitter(int n, SlaterOrbital[] orbitals)
    {
        public SlaterExpansion Run()
        {
            // Even-tempered starting guesses α_k = a·b^k; keep the best few and optimise each.
            var starts = new List<(double E, double[] X)>();
            for (int ia = 0; ia < 14; ia++)
                for (int ib = 0; ib < 12; ib++)
                {
                    double lnA = Math.Log(0.005) + ia * Math.Log(300.0) / 13;
                    double lnB = Math.Log(1.6) + ib * Math.Log(8.0 / 1.6) / 11;
                    var x = new double[n];
                    for (int k = 0; k < n; k++) x[k] = lnA + k * lnB;
                    if (n == 1) x[0] = lnA;
                    double e = Evaluate(x, null);
                    if (double.IsFinite(e)) starts.Add((e, x));
                    if (n == 1) break;
                }
            starts.Sort((p, q) => p.E.CompareTo(q.E));
            double best = double.PositiveInfinity;
            double[] bestX = starts[0].X;
            int iterations = 0;
            for (int s = 0; s < Math.Min(3, starts.Count); s++)
            {
                var (x, e, it) = Bfgs(starts[s].X);
                (x, e) = Newton(x, e);
                iterations += it;
                if (e < best) { best = e; bestX = x; }
            }
            return Build(bestX, iterations);
        }

        // ε(x) = Σ_orb (1 − bᵀS⁻¹b), x = ln α. Gradient w.r.t. x if grad != null.
        public double Evaluate(double[] x, double[]? grad)
        {
            var alpha = new double[n];
            for (int i = 0; i < n; i++) alpha[i] = Math.Exp(x[i]);
            if (grad != null) Array.Clear(grad);
            double total = 0;
            foreach (var orb in orbitals)
            {
                int l = orb.AngularMomentum;
                double p = l + 1.5;
                var S = new double[n, n];
                for (int i = 0; i < n; i++)
                    for (int j = 0; j < n; j++)
                        S[i, j] = Math.Pow(2 * Math.Sqrt(alpha[i] * alpha[j]) / (alpha[i] + alpha[j]), p);
                var (b, db) = Projections(orb, alpha);
                var c = SolveSymmetric(S, b);
                if (c == null) return double.PositiveInfinity;
                double bc = 0;
                for (int i = 0; i < n; i++) bc += b[i] * c[i];
                total += 1 - bc;
                if (grad != null)
                    for (int i = 0; i < n; i++)
                    {
                        double sk = 0;
                        for (int k = 0; k < n; k++)
                            if (k != i) sk += c[k] * S[i, k] * p * (0.5 / alpha[i] - 1 / (alpha[i] + alpha[k]));
                        double dEdA = -2 * c[i] * db[i] + 2 * c[i] * sk;
                        grad[i] += alpha[i] * dEdA;
                    }
            }
            return total;
        }

        private static (double[] B, double[] DB) Projections(SlaterOrbital orb, double[] alpha)
        {
            var q = Quadrature.Instance;
            int m = alpha.Length, l = orb.AngularMomentum;
            var b = new double[m];
            var db = new double[m];
            double lnNs = LnSlaterNorm(orb.PrincipalQuantumNumber);
            int powr = orb.PrincipalQuantumNumber - 1 + l + 2;
            for (int i = 0; i < m; i++)
            {
                double a = alpha[i], lnNg = LnGaussianNorm(l, a), dn = (l + 1.5) / (2 * a);
                double s = 0, ds = 0;
                for (int k = 0; k < q.R.Length; k++)
                {
                    double r = q.R[k];
                    double ar2 = a * r * r;
                    if (ar2 > 745) break;
                    double v = q.W[k] * Math.Exp(lnNs + lnNg + powr * q.LnR[k] - r - ar2);
                    s += v;
                    ds += v * (dn - r * r);
                }
                b[i] = s; db[i] = ds;
            }
            return (b, db);
        }

        private static double[]? SolveSymmetric(double[,] a, double[] b)
        {
            // Cholesky; null when not positive definite (coinciding exponents).
            int m = b.Length;
            var L = new double[m, m];
            for (int i = 0; i < m; i++)
                for (int j = 0; j <= i; j++)
                {
                    double s = a[i, j];
                    for (int k = 0; k < j; k++) s -= L[i, k] * L[j, k];
                    if (i == j)
                    {
                        if (!(s > 1e-15)) return null;
                        L[i, i] = Math.Sqrt(s);
                    }
                    else L[i, j] = s / L[j, j];
                }
            var y = new double[m];
            for (int i = 0; i < m; i++)
            {
                double s = b[i];
                for (int k = 0; k < i; k++) s -= L[i, k] * y[k];
                y[i] = s / L[i, i];
            }
            var x = new double[m];
            for (int i = m - 1; i >= 0; i--)
            {
                double s = y[i];
                for (int k = i + 1; k < m; k++) s -= L[k, i] * x[k];
                x[i] = s / L[i, i];
            }
            return x;
        }

        private (double[] X, double E, int Iterations) Bfgs(double[] x0)
        {
            var x = (double[])x0.Clone();
            var g = new double[n];
            double e = Evaluate(x, g);
            var H = Identity(n, 0.1);
            int it, stalls = 0;
            for (it = 0; it < 500; it++)
            {
                double gn = 0;
                foreach (double v in g) gn += v * v;
                if (Math.Sqrt(gn) < 1e-12) break;
                var d = new double[n];
                for (int i = 0; i < n; i++)
                    for (int j = 0; j < n; j++) d[i] -= H[i, j] * g[j];
                double slope = Dot(d, g);
                if (slope >= 0)
                {
                    H = Identity(n, 0.1);
                    for (int i = 0; i < n; i++) d[i] = -0.1 * g[i];
                    slope = Dot(d, g);
                }
                double step = 1;
                var xn = new double[n];
                var gnw = new double[n];
                double en = double.PositiveInfinity;
                for (int ls = 0; ls < 40; ls++)
                {
                    for (int i = 0; i < n; i++) xn[i] = x[i] + step * d[i];
                    en = Evaluate(xn, gnw);
                    if (en <= e + 1e-4 * step * slope) break;
                    step *= 0.5;
                }
                if (!(en <= e)) break;
                var sv = new double[n];
                var yv = new double[n];
                for (int i = 0; i < n; i++) { sv[i] = xn[i] - x[i]; yv[i] = gnw[i] - g[i]; }
                double sy = Dot(sv, yv);
                if (sy > 1e-300)
                {
                    var hy = new double[n];
                    for (int i = 0; i < n; i++)
                        for (int j = 0; j < n; j++) hy[i] += H[i, j] * yv[j];
                    double yhy = Dot(yv, hy);
                    for (int i = 0; i < n; i++)
                        for (int j = 0; j < n; j++)
                            H[i, j] += ((sy + yhy) * sv[i] * sv[j] / (sy * sy)) - (hy[i] * sv[j] + sv[i] * hy[j]) / sy;
                }
                stalls = e - en < 1e-15 * Math.Max(e, 1e-12) ? stalls + 1 : 0;
                x = xn; e = en; Array.Copy(gnw, g, n);
                if (stalls >= 3) break;
            }
            return (x, e, it);
        }

        private (double[] X, double E) Newton(double[] x, double e)
        {
            var g = new double[n];
            for (int iter = 0; iter < 8; iter++)
            {
                Evaluate(x, g);
                const double h = 1e-5;
                var hess = new double[n, n];
                var gp = new double[n];
                var gm = new double[n];
                for (int j = 0; j < n; j++)
                {
                    var xp = (double[])x.Clone(); xp[j] += h;
                    var xm = (double[])x.Clone(); xm[j] -= h;
                    Evaluate(xp, gp); Evaluate(xm, gm);
                    for (int i = 0; i < n; i++) hess[i, j] = (gp[i] - gm[i]) / (2 * h);
                }
                for (int i = 0; i < n; i++)
                    for (int j = 0; j < i; j++) hess[i, j] = hess[j, i] = 0.5 * (hess[i, j] + hess[j, i]);
                var neg = new double[n];
                for (int i = 0; i < n; i++) neg[i] = -g[i];
                var d = SolveSymmetric(hess, neg);
                if (d == null) break;
                var xn = new double[n];
                for (int i = 0; i < n; i++) xn[i] = x[i] + d[i];
                double en = Evaluate(xn, null);
                if (!(en <= e)) break;
                x = xn; e = en;
            }
            return (x, e);
        }

        private SlaterExpansion Build(double[] x, int iterations)
        {
            var order = Enumerable.Range(0, n).OrderByDescending(i => x[i]).ToArray();
            var alpha = new double[n];
            for (int i = 0; i < n; i++) alpha[i] = Math.Exp(x[order[i]]);
            var coefs = ImmutableArray.CreateBuilder<ImmutableArray<double>>();
            var residuals = ImmutableArray.CreateBuilder<double>();
            foreach (var orb in orbitals)
            {
                double p = orb.AngularMomentum + 1.5;
                var S = new double[n, n];
                for (int i = 0; i < n; i++)
                    for (int j = 0; j < n; j++)
                        S[i, j] = Math.Pow(2 * Math.Sqrt(alpha[i] * alpha[j]) / (alpha[i] + alpha[j]), p);
                var (b, _) = Projections(orb, alpha);
                var c = SolveSymmetric(S, b) ?? throw new InvalidOperationException("The STO-nG fit produced coinciding exponents.");
                double bc = 0, norm = 0;
                for (int i = 0; i < n; i++)
                {
                    bc += b[i] * c[i];
                    for (int j = 0; j < n; j++) norm += c[i] * c[j] * S[i, j];
                }
                double f = 1 / Math.Sqrt(norm);
                coefs.Add([.. c.Select(v => v * f)]);
                residuals.Add(1 - bc);
            }
            return new SlaterExpansion([.. orbitals], [.. alpha], coefs.ToImmutable(), residuals.ToImmutable(), iterations);
        }

        private static double Dot(double[] a, double[] b)
        {
            double s = 0;
            for (int i = 0; i < a.Length; i++) s += a[i] * b[i];
            return s;
        }

        private static double[,] Identity(int m, double scale)
        {
            var h = new double[m, m];
            for (int i = 0; i < m; i++) h[i, i] = scale;
            return h;
        }
    }
}
