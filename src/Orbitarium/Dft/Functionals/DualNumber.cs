namespace Orbitarium.Dft.Functionals;

/// <summary>
/// A forward-mode dual number carrying a value and its first derivatives with respect to five inputs
/// (ρα, ρβ, σαα, σαβ, σββ). Functionals are written once in terms of these numbers and their exact first
/// derivatives (vrho, vsigma) follow by the chain rule, with no hand-derived derivative formulas to get wrong.
/// </summary>
/// <remarks>Forward-mode automatic differentiation: Griewank &amp; Walther, <i>Evaluating Derivatives</i>
/// (SIAM, 2nd ed. 2008), ch. 3. The derivatives are exact to rounding, not finite differences.</remarks>
internal readonly struct DualNumber
{
    public readonly double V, D0, D1, D2, D3, D4;

    public DualNumber(double v, double d0 = 0, double d1 = 0, double d2 = 0, double d3 = 0, double d4 = 0)
    {
        V = v; D0 = d0; D1 = d1; D2 = d2; D3 = d3; D4 = d4;
    }

    /// <summary>A constant (all derivatives zero).</summary>
    public static implicit operator DualNumber(double v) => new(v);

    /// <summary>f(this) with f' = <paramref name="slope"/>: value <paramref name="value"/>, derivatives scaled by slope.</summary>
    private DualNumber Chain(double value, double slope) =>
        new(value, slope * D0, slope * D1, slope * D2, slope * D3, slope * D4);

    public static DualNumber operator +(DualNumber a, DualNumber b) =>
        new(a.V + b.V, a.D0 + b.D0, a.D1 + b.D1, a.D2 + b.D2, a.D3 + b.D3, a.D4 + b.D4);

    public static DualNumber operator -(DualNumber a, DualNumber b) =>
        new(a.V - b.V, a.D0 - b.D0, a.D1 - b.D1, a.D2 - b.D2, a.D3 - b.D3, a.D4 - b.D4);

    public static DualNumber operator -(DualNumber a) => new(-a.V, -a.D0, -a.D1, -a.D2, -a.D3, -a.D4);

    public static DualNumber operator *(DualNumber a, DualNumber b) =>
        new(a.V * b.V, a.D0 * b.V + a.V * b.D0, a.D1 * b.V + a.V * b.D1, a.D2 * b.V + a.V * b.D2,
            a.D3 * b.V + a.V * b.D3, a.D4 * b.V + a.V * b.D4);

    public static DualNumber operator *(double s, DualNumber a) => new(s * a.V, s * a.D0, s * a.D1, s * a.D2, s * a.D3, s * a.D4);

    public static DualNumber operator *(DualNumber a, double s) => s * a;

    public static DualNumber operator /(DualNumber a, DualNumber b)
    {
        double q = a.V / b.V, r = 1 / b.V;
        return new(q, (a.D0 - q * b.D0) * r, (a.D1 - q * b.D1) * r, (a.D2 - q * b.D2) * r, (a.D3 - q * b.D3) * r, (a.D4 - q * b.D4) * r);
    }

    public static DualNumber operator /(DualNumber a, double s) => (1 / s) * a;

    public static DualNumber operator /(double s, DualNumber b)
    {
        double q = s / b.V;
        return b.Chain(q, -q / b.V);
    }

    public static DualNumber operator +(DualNumber a, double s) => new(a.V + s, a.D0, a.D1, a.D2, a.D3, a.D4);

    public static DualNumber operator +(double s, DualNumber a) => a + s;

    public static DualNumber operator -(DualNumber a, double s) => new(a.V - s, a.D0, a.D1, a.D2, a.D3, a.D4);

    public static DualNumber operator -(double s, DualNumber a) => new(s - a.V, -a.D0, -a.D1, -a.D2, -a.D3, -a.D4);

    public static DualNumber Sqrt(DualNumber a)
    {
        double s = Math.Sqrt(a.V);
        return a.Chain(s, 0.5 / s);
    }

    public static DualNumber Cbrt(DualNumber a)
    {
        double c = Math.Cbrt(a.V);
        return a.Chain(c, c / (3 * a.V));
    }

    /// <summary>aᵖ for a &gt; 0.</summary>
    public static DualNumber Pow(DualNumber a, double p)
    {
        double v = Math.Pow(a.V, p);
        return a.Chain(v, p * v / a.V);
    }

    public static DualNumber Log(DualNumber a) => a.Chain(Math.Log(a.V), 1 / a.V);

    public static DualNumber Log1P(DualNumber a) => a.Chain(Math.Log(1 + a.V), 1 / (1 + a.V));

    public static DualNumber Exp(DualNumber a)
    {
        double e = Math.Exp(a.V);
        return a.Chain(e, e);
    }

    public static DualNumber Atan(DualNumber a) => a.Chain(Math.Atan(a.V), 1 / (1 + a.V * a.V));

    public static DualNumber Asinh(DualNumber a) => a.Chain(Math.Asinh(a.V), 1 / Math.Sqrt(1 + a.V * a.V));

    public static DualNumber Square(DualNumber a) => a * a;
}
