using MathNet.Numerics.LinearAlgebra;

namespace Orbitarium.Geometry.Optimization;

/// <summary>Bofill's update of an approximate Hessian, used for transition-state searches: a blend of the symmetric
/// rank-one (SR1) and Powell-symmetric-Broyden (PSB) updates that keeps negative curvature.</summary>
/// <remarks>With ξ = y − H s: H' = H + φ ξξᵀ/(ξᵀs) + (1 − φ)[(ξsᵀ + sξᵀ)/(sᵀs) − (ξᵀs) s sᵀ/(sᵀs)²],
/// φ = (ξᵀs)²/((ξᵀξ)(sᵀs)). Source: J. M. Bofill, J. Comput. Chem. 15, 1 (1994).</remarks>
public static class BofillUpdate
{
    /// <summary>Returns the updated Hessian (unchanged when the step or the residual vanishes).</summary>
    public static Matrix<double> Apply(Matrix<double> hessian, Vector<double> step, Vector<double> gradientChange)
    {
        ArgumentNullException.ThrowIfNull(hessian);
        ArgumentNullException.ThrowIfNull(step);
        ArgumentNullException.ThrowIfNull(gradientChange);
        var xi = gradientChange - hessian * step;
        double ss = step.DotProduct(step), xs = xi.DotProduct(step), xx = xi.DotProduct(xi);
        if (ss < 1e-16 || xx < 1e-20) return hessian;
        double phi = xs * xs / (xx * ss);
        var psb = (xi.OuterProduct(step) + step.OuterProduct(xi)) / ss - step.OuterProduct(step) * (xs / (ss * ss));
        var result = hessian + (1 - phi) * psb;
        if (Math.Abs(xs) > 1e-12) result += phi * xi.OuterProduct(xi) / xs;
        return result;
    }
}
