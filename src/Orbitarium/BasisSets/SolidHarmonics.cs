namespace Orbitarium.BasisSets;

/// <summary>
/// Real solid harmonics as combinations of Cartesian Gaussian components: the matrix that turns
/// integrals over a shell's Cartesian components into integrals over its pure (spherical) components.
/// </summary>
/// <remarks>
/// Coefficients from the closed form of T. Helgaker, P. Jørgensen, J. Olsen, <i>Molecular Electronic-Structure
/// Theory</i> (Wiley, 2000), eqs. 6.4.47–6.4.50, with m &gt; 0 the cos(mφ) and m &lt; 0 the sin(|m|φ) harmonic.
/// Each row is then normalised exactly (with the Gaussian monomial metric) so that, applied to Cartesian
/// components that share the normalisation of x^L, it yields normalised pure functions.
/// </remarks>
public static class SolidHarmonics
{
    private static readonly double[][,] PureTables = BuildAll(pure: true);
    private static readonly double[][,] CartesianTables = BuildAll(pure: false);

    /// <summary>
    /// The (2L+1) × (L+1)(L+2)/2 matrix of pure component m = −L..L (rows) over Cartesian components
    /// (columns, in <see cref="AngularMomentum.CartesianComponents"/> order), for Cartesian functions
    /// normalised like x^L. Do not modify the returned array.
    /// </summary>
    public static double[,] CartesianToPure(int l) => PureTables[l];

    /// <summary>
    /// The diagonal (L+1)(L+2)/2 square matrix that rescales Cartesian components normalised like x^L into
    /// individually normalised Cartesian functions: factor √((2L−1)!! / ((2lx−1)!!(2ly−1)!!(2lz−1)!!)).
    /// Do not modify the returned array.
    /// </summary>
    public static double[,] CartesianNormalisation(int l) => CartesianTables[l];

    /// <summary>The transform for a shell: <see cref="CartesianToPure"/> when pure and L ≥ 2,
    /// otherwise <see cref="CartesianNormalisation"/>.</summary>
    public static double[,] ShellTransform(int l, bool pure) => pure && l >= 2 ? PureTables[l] : CartesianTables[l];

    /// <summary>Overlap of monomials x^a y^b z^c and x^d y^e z^f with the same Gaussian radial part,
    /// up to a common factor: (a+d−1)!!(b+e−1)!!(c+f−1)!! when every sum is even, else 0.</summary>
    internal static double MonomialMetric((int X, int Y, int Z) p, (int X, int Y, int Z) q)
    {
        int sx = p.X + q.X, sy = p.Y + q.Y, sz = p.Z + q.Z;
        if ((sx & 1) != 0 || (sy & 1) != 0 || (sz & 1) != 0) return 0;
        return AngularMomentum.DoubleFactorial(sx - 1) * AngularMomentum.DoubleFactorial(sy - 1) * AngularMomentum.DoubleFactorial(sz - 1);
    }

    private static double[][,] BuildAll(bool pure)
    {
        var tables = new double[AngularMomentum.MaxL + 3][,];
        for (int l = 0; l < tables.Length; l++) tables[l] = pure && l >= 2 ? BuildPure(l) : BuildCartesian(l);
        return tables;
    }

    private static double[,] BuildCartesian(int l)
    {
        var comps = AngularMomentum.CartesianComponents(l);
        var t = new double[comps.Count, comps.Count];
        double axis = AngularMomentum.DoubleFactorial(2 * l - 1);
        for (int i = 0; i < comps.Count; i++)
        {
            var (x, y, z) = comps[i];
            t[i, i] = Math.Sqrt(axis / (AngularMomentum.DoubleFactorial(2 * x - 1) * AngularMomentum.DoubleFactorial(2 * y - 1) * AngularMomentum.DoubleFactorial(2 * z - 1)));
        }
        return t;
    }

    private static double[,] BuildPure(int l)
    {
        var comps = AngularMomentum.CartesianComponents(l);
        var index = new Dictionary<(int, int, int), int>();
        for (int i = 0; i < comps.Count; i++) index[comps[i]] = i;
        var t = new double[2 * l + 1, comps.Count];
        for (int m = -l; m <= l; m++)
        {
            int am = Math.Abs(m);
            int row = m + l;
            int sStart = m >= 0 ? 0 : 1;
            for (int tt = 0; tt <= (l - am) / 2; tt++)
                for (int u = 0; u <= tt; u++)
                    for (int s = sStart; s <= am; s += 2)
                    {
                        int sign = ((tt + (s - sStart) / 2) & 1) == 0 ? 1 : -1;
                        double c = sign * Math.Pow(0.25, tt) * Binomial(l, tt) * Binomial(l - tt, am + tt) * Binomial(tt, u) * Binomial(am, s);
                        int px = 2 * tt + am - 2 * u - s, py = 2 * u + s, pz = l - 2 * tt - am;
                        t[row, index[(px, py, pz)]] += c;
                    }
            // Normalise with the monomial metric so the row has the norm of x^L, (2L−1)!!.
            double norm2 = 0;
            for (int a = 0; a < comps.Count; a++)
                for (int b = 0; b < comps.Count; b++)
                    norm2 += t[row, a] * t[row, b] * MonomialMetric(comps[a], comps[b]);
            double scale = Math.Sqrt(AngularMomentum.DoubleFactorial(2 * l - 1) / norm2);
            for (int a = 0; a < comps.Count; a++) t[row, a] *= scale;
        }
        return t;
    }

    private static double Binomial(int n, int k)
    {
        if (k < 0 || k > n) return 0;
        double r = 1;
        for (int i = 1; i <= k; i++) r = r * (n - k + i) / i;
        return r;
    }
}
