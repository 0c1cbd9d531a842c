namespace Orbitarium.Analysis;

/// <summary>
/// Least-squares fit of a Morse potential E(R) = E_min + Dₑ(1 − e^{−a(R − Rₑ)})² to energies along a distance.
/// </summary>
/// <remarks>
/// Variable projection (G. H. Golub and V. Pereyra, SIAM J. Numer. Anal. 10, 413 (1973)): for given Rₑ and a the
/// model is linear in E_min and Dₑ, solved exactly; the sum of squared residuals is then minimised over (Rₑ, a) with the
/// Nelder–Mead simplex (J. A. Nelder and R. Mead, Comput. J. 7, 308 (1965)). The start comes from the lowest point
/// and a parabola through it and its neighbours.
/// </remarks>
public static class MorseFit
{
    /// <summary>Fits a Morse potential to energies at distances in ångström.</summary>
    /// <param name="distancesAngstrom">Distances R in Å (at least 4, not all equal).</param>
    /// <param name="energiesHartree">Energies in hartree, one per distance.</param>
    /// <param name="reducedMassDalton">Reduced mass for ωₑ in dalton (see <see cref="MorsePotential.ReducedMassDalton"/>); null skips ωₑ.</param>
    /// <param name="maxIterations">Simplex iteration limit (default 4000).</param>
    /// <exception cref="OrbitariumInputException">Too few points, mismatched lengths, non-finite values, or a curve with no interior minimum.</exception>
    public static MorseFitResult Fit(IReadOnlyList<double> distancesAngstrom, IReadOnlyList<double> energiesHartree,
        double? reducedMassDalton = null, int maxIterations = 4000)
    {
        ArgumentNullException.ThrowIfNull(distancesAngstrom);
        ArgumentNullException.ThrowIfNull(energiesHartree);
        int n = distancesAngstrom.Count;
        if (energiesHartree.Count != n)
            throw new OrbitariumInputException($"Give one energy per distance: {n} distances but {energiesHartree.Count} energies.");
        if (n < 4) throw new OrbitariumInputException($"A Morse fit needs at least 4 points, got {n}; scan more distances.");
        var r = new double[n];
        var e = new double[n];
        for (int i = 0; i < n; i++)
        {
            r[i] = distancesAngstrom[i] * PhysicalConstants.BohrPerAngstrom;
            e[i] = energiesHartree[i];
            if (!double.IsFinite(r[i]) || !double.IsFinite(e[i]))
                throw new OrbitariumInputException($"Point {i} of the curve is not a finite number; remove it before fitting.");
        }
        Array.Sort(r, e);
        int iMin = 0;
        for (int i = 1; i < n; i++) if (e[i] < e[iMin]) iMin = i;
        if (iMin == 0 || iMin == n - 1)
            throw new OrbitariumInputException("The lowest energy is at the end of the scanned range, so the curve has no minimum inside it; extend the scan to both sides of the minimum.");

        // Start: parabola through the lowest point and its neighbours.
        double x0 = r[iMin - 1], x1 = r[iMin], x2 = r[iMin + 1], y0 = e[iMin - 1], y1 = e[iMin], y2 = e[iMin + 1];
        double d1 = (y1 - y0) / (x1 - x0), d2 = (y2 - y1) / (x2 - x1);
        double aq = (d2 - d1) / (x2 - x0);
        double curvature = Math.Max(2 * aq, 1e-6);
        double re0 = aq > 0 ? Math.Clamp(-(d1 - aq * (x0 + x1)) / (2 * aq), x0, x2) : x1;
        double depth = Math.Max(e[^1] - y1, e[0] - y1);
        depth = Math.Max(depth, 1e-4);
        double a0 = Math.Sqrt(curvature / (2 * depth));

        double Objective(double re, double a, out double emin, out double de)
        {
            // Linear least squares for emin + de * g(R).
            double sg = 0, sgg = 0, se = 0, sge = 0;
            for (int i = 0; i < n; i++)
            {
                double x = 1 - Math.Exp(-a * (r[i] - re));
                double g = x * x;
                sg += g; sgg += g * g; se += e[i]; sge += g * e[i];
            }
            double det = n * sgg - sg * sg;
            if (Math.Abs(det) < 1e-300) { emin = y1; de = 0; return double.MaxValue; }
            de = (n * sge - sg * se) / det;
            emin = (se - de * sg) / n;
            double ssr = 0;
            for (int i = 0; i < n; i++)
            {
                double x = 1 - Math.Exp(-a * (r[i] - re));
                double res = e[i] - emin - de * x * x;
                ssr += res * res;
            }
            return ssr;
        }

        double F(double[] p) => p[1] <= 0 ? double.MaxValue : Objective(p[0], p[1], out _, out _);
        var (best, iterations, converged) = NelderMead(F, [re0, a0], [0.05 * Math.Max(re0, 0.5), 0.2 * a0], maxIterations);
        double ssrBest = Objective(best[0], best[1], out double eMin, out double dE);
        var potential = new MorsePotential(best[0], dE, best[1], eMin);
        double maxRes = 0;
        for (int i = 0; i < n; i++) maxRes = Math.Max(maxRes, Math.Abs(e[i] - potential.EnergyHartree(r[i])));
        double? omega = reducedMassDalton is double mu && dE > 0 ? potential.HarmonicWavenumber(mu) : null;
        return new MorseFitResult(potential, omega, reducedMassDalton, Math.Sqrt(ssrBest / n), maxRes, n, iterations, converged);
    }

    /// <summary>Fits a Morse potential to a bond-length scan, with ωₑ from the reduced mass of the scanned pair
    /// when the scan's coordinate is a bond between two atoms.</summary>
    /// <param name="scan">An energy scan whose coordinate is a distance in ångström.</param>
    public static MorseFitResult Fit(EnergyScanResult scan)
    {
        ArgumentNullException.ThrowIfNull(scan);
        if (scan.CoordinateUnit != "Å")
            throw new OrbitariumInputException($"A Morse fit needs a distance scan in Å; this scan's coordinate is in {scan.CoordinateUnit}.");
        double? mu = null;
        if (scan.BondAtoms is (int a, int b) && scan.Points.Count > 0)
        {
            var m = scan.Points[0].Molecule;
            mu = MorsePotential.ReducedMassDalton(m.Atoms[a].Element, m.Atoms[b].Element);
        }
        var pts = scan.Points.Where(p => double.IsFinite(p.EnergyHartree)).ToList();
        return Fit(pts.Select(p => p.Coordinate).ToList(), pts.Select(p => p.EnergyHartree).ToList(), mu);
    }

    private static (double[] Best, int Iterations, bool Converged) NelderMead(Func<double[], double> f, double[] start, double[] step, int maxIterations)
    {
        int dim = start.Length;
        var simplex = new double[dim + 1][];
        var values = new double[dim + 1];
        for (int i = 0; i <= dim; i++)
        {
            simplex[i] = (double[])start.Clone();
            if (i > 0) simplex[i][i - 1] += step[i - 1];
            values[i] = f(simplex[i]);
        }
        int it = 0;
        for (; it < maxIterations; it++)
        {
            Array.Sort(values, simplex);
            double spread = Math.Abs(values[dim] - values[0]);
            double size = 0;
            for (int i = 1; i <= dim; i++)
                for (int k = 0; k < dim; k++) size = Math.Max(size, Math.Abs(simplex[i][k] - simplex[0][k]));
            if (spread <= 1e-24 + 1e-14 * Math.Abs(values[0]) && size < 1e-10) return (simplex[0], it, true);
            var centroid = new double[dim];
            for (int i = 0; i < dim; i++)
                for (int k = 0; k < dim; k++) centroid[k] += simplex[i][k] / dim;
            double[] Along(double t)
            {
                var p = new double[dim];
                for (int k = 0; k < dim; k++) p[k] = centroid[k] + t * (simplex[dim][k] - centroid[k]);
                return p;
            }
            var xr = Along(-1); double fr = f(xr);
            if (fr < values[0])
            {
                var xe = Along(-2); double fe = f(xe);
                if (fe < fr) { simplex[dim] = xe; values[dim] = fe; } else { simplex[dim] = xr; values[dim] = fr; }
            }
            else if (fr < values[dim - 1]) { simplex[dim] = xr; values[dim] = fr; }
            else
            {
                var xc = fr < values[dim] ? Along(-0.5) : Along(0.5);
                double fc = f(xc);
                if (fc < Math.Min(fr, values[dim])) { simplex[dim] = xc; values[dim] = fc; }
                else
                {
                    for (int i = 1; i <= dim; i++)
                    {
                        for (int k = 0; k < dim; k++) simplex[i][k] = simplex[0][k] + 0.5 * (simplex[i][k] - simplex[0][k]);
                        values[i] = f(simplex[i]);
                    }
                }
            }
        }
        Array.Sort(values, simplex);
        return (simplex[0], it, false);
    }
}
