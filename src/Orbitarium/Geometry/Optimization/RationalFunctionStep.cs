using MathNet.Numerics.LinearAlgebra;

namespace Orbitarium.Geometry.Optimization;

/// <summary>
/// Rational-function (RFO) steps towards a minimum, and partitioned RFO (eigenvector-following) steps towards a
/// first-order saddle point, each shortened to a trust radius.
/// </summary>
/// <remarks>Sources: A. Banerjee, N. Adams, J. Simons and R. Shepard, J. Phys. Chem. 89, 52 (1985);
/// J. Baker, J. Comput. Chem. 7, 385 (1986).</remarks>
public static class RationalFunctionStep
{
    /// <summary>The RFO step −(H − λ)⁻¹ g with λ the lowest eigenvalue of the augmented Hessian [[H, g], [gᵀ, 0]],
    /// scaled down to <paramref name="trustRadius"/> if longer.</summary>
    /// <param name="hessian">Symmetric Hessian (m × m).</param>
    /// <param name="gradient">Gradient (m).</param>
    /// <param name="trustRadius">Largest allowed step length (Euclidean).</param>
    public static Vector<double> Minimum(Matrix<double> hessian, Vector<double> gradient, double trustRadius)
    {
        ArgumentNullException.ThrowIfNull(hessian);
        ArgumentNullException.ThrowIfNull(gradient);
        int m = gradient.Count;
        if (m == 0) return Vector<double>.Build.Dense(0);
        var aug = Matrix<double>.Build.Dense(m + 1, m + 1);
        aug.SetSubMatrix(0, 0, hessian);
        for (int i = 0; i < m; i++) { aug[i, m] = gradient[i]; aug[m, i] = gradient[i]; }
        var evd = aug.Evd(Symmetricity.Symmetric);
        int low = 0;
        for (int k = 1; k <= m; k++) if (evd.EigenValues[k].Real < evd.EigenValues[low].Real) low = k;
        var v = evd.EigenVectors.Column(low);
        Vector<double> step;
        if (Math.Abs(v[m]) > 1e-10) step = v.SubVector(0, m) / v[m];
        else step = -gradient.Normalize(2) * trustRadius;
        return Scale(step, trustRadius);
    }

    /// <summary>
    /// The partitioned-RFO step: uphill along one Hessian eigenvector, downhill along all others.
    /// </summary>
    /// <param name="hessian">Symmetric Hessian (m × m); directions with eigenvalues ≥ <paramref name="ignoreAbove"/> are inactive.</param>
    /// <param name="gradient">Gradient (m).</param>
    /// <param name="trustRadius">Largest allowed step length.</param>
    /// <param name="followed">The mode followed at the previous step (the new mode is the one overlapping it most),
    /// or null to follow the lowest mode. On return, the mode followed now.</param>
    /// <param name="ignoreAbove">Eigenvalue marking inactive (projected-out) directions.</param>
    /// <returns>The step and the eigenvalue of the followed mode.</returns>
    public static (Vector<double> Step, double FollowedEigenvalue) Saddle(Matrix<double> hessian, Vector<double> gradient,
        double trustRadius, ref Vector<double>? followed, double ignoreAbove = 999)
    {
        ArgumentNullException.ThrowIfNull(hessian);
        ArgumentNullException.ThrowIfNull(gradient);
        int m = gradient.Count;
        var evd = hessian.Evd(Symmetricity.Symmetric);
        var vecs = evd.EigenVectors;
        var vals = new double[m];
        for (int i = 0; i < m; i++) vals[i] = evd.EigenValues[i].Real;
        int k = -1;
        double bestOverlap = -1;
        for (int i = 0; i < m; i++)
        {
            if (vals[i] >= ignoreAbove) continue;
            if (followed is null)
            {
                if (k < 0 || vals[i] < vals[k]) k = i;
            }
            else
            {
                double o = Math.Abs(vecs.Column(i).DotProduct(followed));
                if (o > bestOverlap) { bestOverlap = o; k = i; }
            }
        }
        if (k < 0) return (Vector<double>.Build.Dense(m), 0);
        var gbar = vecs.Transpose() * gradient;
        var step = Vector<double>.Build.Dense(m);
        double lp = 0.5 * vals[k] + 0.5 * Math.Sqrt(vals[k] * vals[k] + 4 * gbar[k] * gbar[k]);
        if (Math.Abs(gbar[k]) > 1e-14 && Math.Abs(vals[k] - lp) > 1e-14)
            step -= gbar[k] / (vals[k] - lp) * vecs.Column(k);
        // Lowest eigenvalue of the augmented matrix over the remaining modes.
        var others = new List<int>();
        for (int i = 0; i < m; i++) if (i != k) others.Add(i);
        int r = others.Count;
        var aug = Matrix<double>.Build.Dense(r + 1, r + 1);
        for (int a = 0; a < r; a++)
        {
            aug[a, a] = vals[others[a]];
            aug[a, r] = gbar[others[a]];
            aug[r, a] = gbar[others[a]];
        }
        double ln = 0;
        if (r > 0)
        {
            var ae = aug.Evd(Symmetricity.Symmetric);
            ln = double.MaxValue;
            foreach (var e in ae.EigenValues) ln = Math.Min(ln, e.Real);
            ln = Math.Min(ln, 0);
        }
        foreach (int i in others)
        {
            double d = vals[i] - ln;
            if (Math.Abs(gbar[i]) > 1e-14 && Math.Abs(d) > 1e-12) step -= gbar[i] / d * vecs.Column(i);
        }
        followed = vecs.Column(k);
        return (Scale(step, trustRadius), vals[k]);
    }

    /// <summary>The second-order predicted energy change gᵀs + ½ sᵀHs.</summary>
    public static double PredictedChange(Matrix<double> hessian, Vector<double> gradient, Vector<double> step)
    {
        ArgumentNullException.ThrowIfNull(hessian);
        ArgumentNullException.ThrowIfNull(gradient);
        ArgumentNullException.ThrowIfNull(step);
        return gradient.DotProduct(step) + 0.5 * step.DotProduct(hessian * step);
    }

    private static Vector<double> Scale(Vector<double> step, double trust)
    {
        double n = step.L2Norm();
        return n > trust && n > 0 ? step * (trust / n) : step;
    }
}
