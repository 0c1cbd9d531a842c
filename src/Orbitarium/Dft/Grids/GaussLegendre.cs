namespace Orbitarium.Dft.Grids;

/// <summary>Gauss–Legendre nodes and weights on [−1, 1], computed by Newton iteration on P_n.</summary>
/// <remarks>Exact for polynomials of degree 2n − 1. Abramowitz &amp; Stegun, <i>Handbook of Mathematical Functions</i>,
/// 25.4.29; initial guesses cos(π(i + ¾)/(n + ½)) (common practice).</remarks>
internal static class GaussLegendre
{
    public static (double[] Nodes, double[] Weights) Create(int n)
    {
        if (n < 1) throw new ArgumentOutOfRangeException(nameof(n), n, "Gauss–Legendre needs at least one node.");
        var x = new double[n];
        var w = new double[n];
        for (int i = 0; i < (n + 1) / 2; i++)
        {
            double z = Math.Cos(Math.PI * (i + 0.75) / (n + 0.5)), pp = 1;
            for (int iter = 0; iter < 100; iter++)
            {
                double p1 = 1, p2 = 0;
                for (int j = 1; j <= n; j++)
                {
                    double p3 = p2;
                    p2 = p1;
                    p1 = ((2 * j - 1) * z * p2 - (j - 1) * p3) / j;
                }
                pp = n * (z * p1 - p2) / (z * z - 1);
                double z1 = z;
                z = z1 - p1 / pp;
                if (Math.Abs(z - z1) < 1e-15) break;
            }
            x[i] = -z;
            x[n - 1 - i] = z;
            w[i] = w[n - 1 - i] = 2 / ((1 - z * z) * pp * pp);
        }
        return (x, w);
    }
}
