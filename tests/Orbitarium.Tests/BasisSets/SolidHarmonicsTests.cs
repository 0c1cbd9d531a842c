using Orbitarium.BasisSets;

namespace Orbitarium.Tests.BasisSets;

public class SolidHarmonicsTests
{
    private static double Metric((int X, int Y, int Z) p, (int X, int Y, int Z) q)
    {
        // ∫ x^{a} y^{b} z^{c} e^{−r²} over all space ∝ (a−1)!!(b−1)!!(c−1)!! for even a, b, c (standard Gaussian moments).
        int sx = p.X + q.X, sy = p.Y + q.Y, sz = p.Z + q.Z;
        if (sx % 2 != 0 || sy % 2 != 0 || sz % 2 != 0) return 0;
        return AngularMomentum.DoubleFactorial(sx - 1) * AngularMomentum.DoubleFactorial(sy - 1) * AngularMomentum.DoubleFactorial(sz - 1);
    }

    [Theory]
    [InlineData(2)]
    [InlineData(3)]
    [InlineData(4)]
    public void Rows_are_orthonormal_under_the_monomial_metric(int l)
    {
        // Real solid harmonics of one L are orthogonal; each row is scaled to the norm of x^L, (2L−1)!!.
        var t = SolidHarmonics.CartesianToPure(l);
        var comps = AngularMomentum.CartesianComponents(l);
        double xl = AngularMomentum.DoubleFactorial(2 * l - 1);
        for (int m = 0; m < 2 * l + 1; m++)
            for (int n = 0; n < 2 * l + 1; n++)
            {
                double s = 0;
                for (int a = 0; a < comps.Count; a++)
                    for (int b = 0; b < comps.Count; b++)
                        s += t[m, a] * t[n, b] * Metric(comps[a], comps[b]);
                Assert.Equal(m == n ? 1.0 : 0.0, s / xl, 12);
            }
    }

    private static Dictionary<string, double> Row(int l, int m)
    {
        var t = SolidHarmonics.CartesianToPure(l);
        var comps = AngularMomentum.CartesianComponents(l);
        var d = new Dictionary<string, double>();
        for (int a = 0; a < comps.Count; a++)
            if (Math.Abs(t[m + l, a]) > 1e-14) d[AngularMomentum.CartesianLabel(comps[a].X, comps[a].Y, comps[a].Z)] = t[m + l, a];
        return d;
    }

    private static void AssertProportional(Dictionary<string, double> row, params (string Monomial, double Weight)[] form)
    {
        Assert.Equal(form.Length, row.Count);
        double scale = row[form[0].Monomial] / form[0].Weight;
        foreach (var (mono, w) in form) Assert.Equal(w * scale, row[mono], 12);
    }

    [Fact]
    public void D_functions_have_the_textbook_forms()
    {
        // Common practice (e.g. Helgaker, Jørgensen & Olsen, Table 6.3): d0 ∝ 2z² − x² − y², d+2 ∝ x² − y²,
        // d+1 ∝ xz, d−1 ∝ yz, d−2 ∝ xy.
        AssertProportional(Row(2, 0), ("zz", 2), ("xx", -1), ("yy", -1));
        AssertProportional(Row(2, 2), ("xx", 1), ("yy", -1));
        AssertProportional(Row(2, 1), ("xz", 1));
        AssertProportional(Row(2, -1), ("yz", 1));
        AssertProportional(Row(2, -2), ("xy", 1));
    }

    [Fact]
    public void F_functions_have_the_textbook_forms()
    {
        // Common practice: f0 ∝ z(2z² − 3x² − 3y²), f+1 ∝ x(4z² − x² − y²), f−1 ∝ y(4z² − x² − y²),
        // f+2 ∝ z(x² − y²), f−2 ∝ xyz, f+3 ∝ x(x² − 3y²), f−3 ∝ y(3x² − y²).
        AssertProportional(Row(3, 0), ("zzz", 2), ("xxz", -3), ("yyz", -3));
        AssertProportional(Row(3, 1), ("xzz", 4), ("xxx", -1), ("xyy", -1));
        AssertProportional(Row(3, -1), ("yzz", 4), ("xxy", -1), ("yyy", -1));
        AssertProportional(Row(3, 2), ("xxz", 1), ("yyz", -1));
        AssertProportional(Row(3, -2), ("xyz", 1));
        AssertProportional(Row(3, 3), ("xxx", 1), ("xyy", -3));
        AssertProportional(Row(3, -3), ("xxy", 3), ("yyy", -1));
    }

    [Fact]
    public void Signs_follow_the_cosine_convention_for_positive_m()
    {
        // d+2 = +(x² − y²) and d0 has a positive z² coefficient (common practice; Helgaker et al. eq. 6.4.47).
        Assert.True(Row(2, 2)["xx"] > 0);
        Assert.True(Row(2, 0)["zz"] > 0);
    }
}
