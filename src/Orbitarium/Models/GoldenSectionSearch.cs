namespace Orbitarium.Models;

/// <summary>Golden-section search for the minimum of a unimodal function on an interval
/// (J. Kiefer, Proc. Am. Math. Soc. 4, 502 (1953)).</summary>
internal static class GoldenSectionSearch
{
    private static readonly double InverseGolden = (Math.Sqrt(5) - 1) / 2;

    /// <summary>Returns the abscissa of the minimum of <paramref name="f"/> on [a, b] to within <paramref name="tolerance"/>.</summary>
    public static double Minimize(Func<double, double> f, double a, double b, double tolerance = 1e-9)
    {
        double c = b - InverseGolden * (b - a), d = a + InverseGolden * (b - a);
        double fc = f(c), fd = f(d);
        while (b - a > tolerance)
        {
            if (fc < fd)
            {
                b = d; d = c; fd = fc;
                c = b - InverseGolden * (b - a); fc = f(c);
            }
            else
            {
                a = c; c = d; fc = fd;
                d = a + InverseGolden * (b - a); fd = f(d);
            }
        }
        return 0.5 * (a + b);
    }
}
