using MathNet.Numerics.LinearAlgebra;

namespace Orbitarium.Geometry.Optimization;

/// <summary>The Broyden–Fletcher–Goldfarb–Shanno update of an approximate Hessian, used for minimisation.</summary>
/// <remarks>H' = H + y yᵀ/(yᵀs) − (H s)(H s)ᵀ/(sᵀ H s), with step s and gradient change y; skipped when the curvature
/// condition yᵀs &gt; 0 fails, so H stays positive definite. Source: R. Fletcher, <i>Practical Methods of
/// Optimization</i>, 2nd ed. (Wiley, 1987), §3.2.</remarks>
public static class BfgsUpdate
{
    /// <summary>Returns the updated Hessian, or <paramref name="hessian"/> itself when the update is skipped.</summary>
    public static Matrix<double> Apply(Matrix<double> hessian, Vector<double> step, Vector<double> gradientChange)
    {
        ArgumentNullException.ThrowIfNull(hessian);
        ArgumentNullException.ThrowIfNull(step);
        ArgumentNullException.ThrowIfNull(gradientChange);
        double ys = gradientChange.DotProduct(step);
        var hs = hessian * step;
        double shs = step.DotProduct(hs);
        if (ys <= 1e-12 || shs <= 1e-12) return hessian;
        return hessian + gradientChange.OuterProduct(gradientChange) / ys - hs.OuterProduct(hs) / shs;
    }
}
