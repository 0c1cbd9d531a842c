using Orbitarium.Chemistry;

namespace Orbitarium.BasisSets;

/// <summary>
/// Values (and gradients) of every basis function of a <see cref="MolecularBasis"/> at a batch of points:
/// the kernel under density-functional grids, orbital pictures and density plots.
/// </summary>
/// <remarks>
/// Results are laid out point-major: entry [p · N + μ] is basis function μ at point p (N = FunctionCount).
/// A primitive with α·r² &gt; <see cref="ExponentCutoff"/> is skipped (its value is below e⁻⁵⁰ ≈ 2·10⁻²²
/// before the polynomial factor).
/// </remarks>
public static class BasisFunctionEvaluator
{
    /// <summary>Primitives with α·|r−A|² above this are treated as zero.</summary>
    public const double ExponentCutoff = 50.0;

    private const int MaxCartesian = 28; // (L+1)(L+2)/2 for L = 6

    /// <summary>Evaluates all basis functions at one point (bohr).</summary>
    public static double[] Evaluate(MolecularBasis basis, Vector3D pointBohr)
    {
        ArgumentNullException.ThrowIfNull(basis);
        var values = new double[basis.FunctionCount];
        EvaluateValues(basis, [pointBohr], values);
        return values;
    }

    /// <summary>Evaluates all basis functions at each point (bohr) into <paramref name="values"/> (length points × N).</summary>
    /// <exception cref="ArgumentException"><paramref name="values"/> is too short.</exception>
    public static void EvaluateValues(MolecularBasis basis, ReadOnlySpan<Vector3D> pointsBohr, Span<double> values)
    {
        ArgumentNullException.ThrowIfNull(basis);
        int n = basis.FunctionCount;
        if (values.Length < pointsBohr.Length * n)
            throw new ArgumentException($"Need {pointsBohr.Length * n} values ({pointsBohr.Length} points × {n} functions), got {values.Length}.", nameof(values));
        Span<double> cart = stackalloc double[MaxCartesian];
        Span<double> px = stackalloc double[8], py = stackalloc double[8], pz = stackalloc double[8];
        var shells = basis.Shells;
        for (int p = 0; p < pointsBohr.Length; p++)
        {
            var row = values.Slice(p * n, n);
            for (int s = 0; s < shells.Length; s++)
            {
                var sh = shells[s];
                int off = basis.ShellOffsets[s];
                double dx = pointsBohr[p].X - sh.CenterBohr.X, dy = pointsBohr[p].Y - sh.CenterBohr.Y, dz = pointsBohr[p].Z - sh.CenterBohr.Z;
                double r2 = dx * dx + dy * dy + dz * dz;
                double radial = 0;
                var a = sh.ExponentArray;
                var c = sh.CoefficientArray;
                for (int k = 0; k < a.Length; k++)
                {
                    double ar2 = a[k] * r2;
                    if (ar2 < ExponentCutoff) radial += c[k] * Math.Exp(-ar2);
                }
                int l = sh.AngularMomentum;
                int nf = sh.FunctionCount;
                if (radial == 0)
                {
                    row.Slice(off, nf).Clear();
                    continue;
                }
                Powers(dx, l, px); Powers(dy, l, py); Powers(dz, l, pz);
                var comps = AngularMomentum.CartesianComponents(l);
                for (int q = 0; q < comps.Count; q++)
                {
                    var (ix, iy, iz) = comps[q];
                    cart[q] = px[ix] * py[iy] * pz[iz] * radial;
                }
                ApplyTransform(sh.Transform, cart, row.Slice(off, nf));
            }
        }
    }

    /// <summary>Evaluates all basis functions and their Cartesian gradients at each point (bohr).</summary>
    /// <param name="basis">The basis.</param>
    /// <param name="pointsBohr">Points in bohr.</param>
    /// <param name="values">φ_μ(r_p) at [p·N + μ].</param>
    /// <param name="gradientX">∂φ_μ/∂x at [p·N + μ] (bohr⁻¹ units of the function).</param>
    /// <param name="gradientY">∂φ_μ/∂y.</param>
    /// <param name="gradientZ">∂φ_μ/∂z.</param>
    public static void EvaluateWithGradients(MolecularBasis basis, ReadOnlySpan<Vector3D> pointsBohr,
        Span<double> values, Span<double> gradientX, Span<double> gradientY, Span<double> gradientZ)
    {
        ArgumentNullException.ThrowIfNull(basis);
        int n = basis.FunctionCount;
        int need = pointsBohr.Length * n;
        if (values.Length < need || gradientX.Length < need || gradientY.Length < need || gradientZ.Length < need)
            throw new ArgumentException($"Each output needs {need} entries ({pointsBohr.Length} points × {n} functions).");
        Span<double> cv = stackalloc double[MaxCartesian], cx = stackalloc double[MaxCartesian];
        Span<double> cy = stackalloc double[MaxCartesian], cz = stackalloc double[MaxCartesian];
        Span<double> px = stackalloc double[9], py = stackalloc double[9], pz = stackalloc double[9];
        var shells = basis.Shells;
        for (int p = 0; p < pointsBohr.Length; p++)
        {
            int rowStart = p * n;
            for (int s = 0; s < shells.Length; s++)
            {
                var sh = shells[s];
                int off = rowStart + basis.ShellOffsets[s];
                int nf = sh.FunctionCount;
                double dx = pointsBohr[p].X - sh.CenterBohr.X, dy = pointsBohr[p].Y - sh.CenterBohr.Y, dz = pointsBohr[p].Z - sh.CenterBohr.Z;
                double r2 = dx * dx + dy * dy + dz * dz;
                double radial = 0, dradial = 0; // dradial = Σ −2α c e^{−αr²}
                var a = sh.ExponentArray;
                var c = sh.CoefficientArray;
                for (int k = 0; k < a.Length; k++)
                {
                    double ar2 = a[k] * r2;
                    if (ar2 < ExponentCutoff)
                    {
                        double e = c[k] * Math.Exp(-ar2);
                        radial += e;
                        dradial -= 2 * a[k] * e;
                    }
                }
                if (radial == 0 && dradial == 0)
                {
                    values.Slice(off, nf).Clear(); gradientX.Slice(off, nf).Clear();
                    gradientY.Slice(off, nf).Clear(); gradientZ.Slice(off, nf).Clear();
                    continue;
                }
                int l = sh.AngularMomentum;
                Powers(dx, l + 1, px); Powers(dy, l + 1, py); Powers(dz, l + 1, pz);
                var comps = AngularMomentum.CartesianComponents(l);
                for (int q = 0; q < comps.Count; q++)
                {
                    var (ix, iy, iz) = comps[q];
                    double mono = px[ix] * py[iy] * pz[iz];
                    cv[q] = mono * radial;
                    // ∂/∂x [x^i y^j z^k R(r²)] = i x^{i−1} y^j z^k R + x^{i+1} y^j z^k R' (R' includes −2α)
                    cx[q] = (ix > 0 ? ix * px[ix - 1] * py[iy] * pz[iz] * radial : 0) + px[ix + 1] * py[iy] * pz[iz] * dradial;
                    cy[q] = (iy > 0 ? iy * px[ix] * py[iy - 1] * pz[iz] * radial : 0) + px[ix] * py[iy + 1] * pz[iz] * dradial;
                    cz[q] = (iz > 0 ? iz * px[ix] * py[iy] * pz[iz - 1] * radial : 0) + px[ix] * py[iy] * pz[iz + 1] * dradial;
                }
                var t = sh.Transform;
                ApplyTransform(t, cv, values.Slice(off, nf));
                ApplyTransform(t, cx, gradientX.Slice(off, nf));
                ApplyTransform(t, cy, gradientY.Slice(off, nf));
                ApplyTransform(t, cz, gradientZ.Slice(off, nf));
            }
        }
    }

    private static void Powers(double x, int l, Span<double> p)
    {
        p[0] = 1;
        for (int k = 1; k <= l; k++) p[k] = p[k - 1] * x;
    }

    private static void ApplyTransform(double[,] t, ReadOnlySpan<double> cart, Span<double> output)
    {
        int nf = t.GetLength(0), nc = t.GetLength(1);
        for (int f = 0; f < nf; f++)
        {
            double sum = 0;
            for (int q = 0; q < nc; q++) sum += t[f, q] * cart[q];
            output[f] = sum;
        }
    }
}
