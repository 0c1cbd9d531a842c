namespace Orbitarium.Integrals;

/// <summary>
/// The Boys function F_m(T) = ∫₀¹ t^{2m} exp(−T t²) dt, the kernel of every Gaussian Coulomb integral.
/// </summary>
/// <remarks>
/// <para>Method (common practice; T. Helgaker, P. Jørgensen, J. Olsen, <i>Molecular Electronic-Structure Theory</i>,
/// Wiley 2000, section 9.8): for T below <see cref="AsymptoticThreshold"/> the highest order requested is taken from a
/// table of F_m(T_k) on a grid of spacing 1/16 by an 8-term Taylor expansion
/// F_m(T) = Σ_j F_{m+j}(T_k) (T_k − T)^j / j! (truncation error below 3e-17 relative), and the lower orders follow by the
/// stable downward recursion F_{m} = (2T F_{m+1} + e^{−T}) / (2m+1). Above the threshold F₀ = √(π/T)/2 exactly
/// (erfc(√T) &lt; 1e-21) and the orders follow by the upward recursion
/// F_{m+1} = ((2m+1) F_m − e^{−T}) / (2T), which is stable there because 2T &gt; 2m+1.</para>
/// <para>The table is filled at start-up from the convergent positive series
/// F_m(T) = e^{−T} Σ_i (2T)^i / ((2m+1)(2m+3)…(2m+2i+1)) at the top order, then downward recursion.
/// Accuracy: about 1e-15 relative for all T ≥ 0 and m ≤ <see cref="MaxOrder"/> (tested against 28-digit references).</para>
/// </remarks>
public static class BoysFunction
{
    /// <summary>Highest order m supported (enough for geometric derivatives of (hh|hh) quartets: 4·5 + 2 = 22, with margin).</summary>
    public const int MaxOrder = 32;

    /// <summary>Argument T above which the asymptotic start and upward recursion are used.</summary>
    public const double AsymptoticThreshold = 60.0;

    private const int TaylorTerms = 8;
    private const double GridStep = 1.0 / 16.0;
    private const double InverseGridStep = 16.0;
    private const int TableOrders = MaxOrder + TaylorTerms + 1;
    private const int GridPoints = (int)(AsymptoticThreshold * InverseGridStep) + 2;

    // Row k holds F_0..F_{TableOrders−1} at T_k = k·GridStep.
    private static readonly double[] Table = BuildTable();

    private static readonly double[] InverseOddNumber = BuildInverseOdd();

    /// <summary>F_m(T) for a single order.</summary>
    /// <param name="m">Order, 0 ≤ m ≤ <see cref="MaxOrder"/>.</param>
    /// <param name="t">Argument T ≥ 0 (dimensionless).</param>
    /// <exception cref="ArgumentOutOfRangeException">m or T outside the supported range.</exception>
    public static double Evaluate(int m, double t)
    {
        Span<double> values = stackalloc double[MaxOrder + 1];
        Evaluate(m, t, values);
        return values[m];
    }

    /// <summary>Fills <paramref name="values"/>[0..<paramref name="maxOrder"/>] with F_0(T)..F_maxOrder(T).</summary>
    /// <param name="maxOrder">Highest order, 0 ≤ maxOrder ≤ <see cref="MaxOrder"/>.</param>
    /// <param name="t">Argument T ≥ 0 (dimensionless).</param>
    /// <param name="values">Destination with room for maxOrder + 1 values.</param>
    /// <exception cref="ArgumentOutOfRangeException">maxOrder or T outside the supported range, or the span too short.</exception>
    public static void Evaluate(int maxOrder, double t, Span<double> values)
    {
        if ((uint)maxOrder > MaxOrder)
            throw new ArgumentOutOfRangeException(nameof(maxOrder), maxOrder, $"The Boys function order must be 0..{MaxOrder}.");
        if (!(t >= 0) || double.IsPositiveInfinity(t))
            throw new ArgumentOutOfRangeException(nameof(t), t, "The Boys function argument must be a finite number ≥ 0.");
        if (values.Length <= maxOrder)
            throw new ArgumentOutOfRangeException(nameof(values), $"The destination needs {maxOrder + 1} elements, it has {values.Length}.");
        EvaluateUnchecked(maxOrder, t, values);
    }

    /// <summary>The hot-path form without argument checks (0 ≤ maxOrder ≤ MaxOrder, finite t ≥ 0).</summary>
    internal static unsafe void EvaluateUnchecked(int maxOrder, double t, Span<double> values)
    {
        fixed (double* v = values) EvaluateUnchecked(maxOrder, t, v);
    }

    /// <summary>The hot-path form writing through a pointer (room for maxOrder + 1 values).</summary>
    internal static unsafe void EvaluateUnchecked(int maxOrder, double t, double* values)
    {
        if (t < AsymptoticThreshold)
        {
            int k = (int)(t * InverseGridStep + 0.5);
            double d = k * GridStep - t;
            fixed (double* table = Table)
            {
                double* row = table + k * TableOrders + maxOrder;
                // Horner form of Σ_j row[j] d^j / j!
                double f = row[7] * (1.0 / 5040);
                f = f * d + row[6] * (1.0 / 720);
                f = f * d + row[5] * (1.0 / 120);
                f = f * d + row[4] * (1.0 / 24);
                f = f * d + row[3] * (1.0 / 6);
                f = f * d + row[2] * 0.5;
                f = f * d + row[1];
                f = f * d + row[0];
                values[maxOrder] = f;
                if (maxOrder > 0)
                {
                    double e = Math.Exp(-t);
                    double twoT = 2 * t;
                    fixed (double* inv = InverseOddNumber)
                        for (int m = maxOrder - 1; m >= 0; m--)
                        {
                            f = (twoT * f + e) * inv[m];
                            values[m] = f;
                        }
                }
            }
        }
        else
        {
            double f = 0.5 * Math.Sqrt(Math.PI / t);
            values[0] = f;
            if (maxOrder > 0)
            {
                double e = Math.Exp(-t);
                double half = 0.5 / t;
                for (int m = 0; m < maxOrder; m++)
                {
                    f = ((2 * m + 1) * f - e) * half;
                    values[m + 1] = f;
                }
            }
        }
    }

    private static double[] BuildInverseOdd()
    {
        var r = new double[TableOrders + 1];
        for (int m = 0; m < r.Length; m++) r[m] = 1.0 / (2 * m + 1);
        return r;
    }

    private static double[] BuildTable()
    {
        var table = new double[GridPoints * TableOrders];
        int top = TableOrders - 1;
        for (int k = 0; k < GridPoints; k++)
        {
            double t = k * GridStep;
            // Series at the top order: all terms positive, so it is accurate to a few ulp.
            double term = 1.0 / (2 * top + 1), sum = term;
            for (int i = 1; i < 10000; i++)
            {
                term *= 2 * t / (2 * top + 2 * i + 1);
                sum += term;
                if (term < 1e-18 * sum) break;
            }
            double e = Math.Exp(-t);
            double f = e * sum;
            table[k * TableOrders + top] = f;
            for (int m = top - 1; m >= 0; m--)
            {
                f = (2 * t * f + e) / (2 * m + 1);
                table[k * TableOrders + m] = f;
            }
        }
        return table;
    }
}
