using Orbitarium.BasisSets;
using Orbitarium.Chemistry;

namespace Orbitarium.Integrals;

/// <summary>
/// A contracted Cartesian shell in the raw form the low-level integral routines take:
/// φ_{lx,ly,lz}(r) = Σᵢ cᵢ (x−Aₓ)^lx (y−A_y)^ly (z−A_z)^lz exp(−αᵢ|r−A|²) for every lx+ly+lz = L,
/// with no further normalisation applied.
/// </summary>
/// <remarks>
/// The coefficients multiply the bare monomial Gaussians, so a geometric derivative is again a sum of raw shells:
/// ∂/∂Aₓ of the primitive with power lx is 2α·(lx+1 term) − lx·(lx−1 term), i.e. raw shells of L+1 with coefficients
/// 2αᵢcᵢ and of L−1 with coefficients cᵢ (weighted per component by lx). Angular momentum 0..<see cref="MaxL"/>.
/// </remarks>
internal sealed class RawShell
{
    /// <summary>Highest angular momentum the raw routines accept (h, for gradients of g shells).</summary>
    public const int MaxL = 5;

    /// <summary>Creates a raw shell; the arrays are used as given (not copied).</summary>
    public RawShell(int angularMomentum, Vector3D centerBohr, double[] exponents, double[] coefficients)
    {
        if ((uint)angularMomentum > MaxL)
            throw new ArgumentOutOfRangeException(nameof(angularMomentum), angularMomentum, $"Raw integral routines support L = 0..{MaxL}.");
        ArgumentNullException.ThrowIfNull(exponents);
        ArgumentNullException.ThrowIfNull(coefficients);
        if (exponents.Length != coefficients.Length || exponents.Length == 0)
            throw new ArgumentException($"A raw shell needs matching non-empty exponent and coefficient arrays (got {exponents.Length} and {coefficients.Length}).");
        AngularMomentum = angularMomentum;
        CenterBohr = centerBohr;
        Exponents = exponents;
        Coefficients = coefficients;
    }

    /// <summary>The raw form of a placed shell: its exponents and <see cref="Shell.NormalizedCoefficients"/>
    /// (which normalise the x^L component). Apply <see cref="Shell.Transform"/> to the raw block to get basis functions.</summary>
    public static RawShell FromShell(Shell shell)
    {
        ArgumentNullException.ThrowIfNull(shell);
        return new RawShell(shell.AngularMomentum, shell.CenterBohr, shell.ExponentArray, shell.CoefficientArray);
    }

    /// <summary>Angular momentum L.</summary>
    public int AngularMomentum { get; }

    /// <summary>Centre A in bohr.</summary>
    public Vector3D CenterBohr { get; }

    /// <summary>Primitive exponents αᵢ in bohr⁻².</summary>
    public double[] Exponents { get; }

    /// <summary>Coefficients cᵢ of the bare monomial Gaussians.</summary>
    public double[] Coefficients { get; }

    /// <summary>Number of Cartesian components, (L+1)(L+2)/2.</summary>
    public int CartesianCount => CartesianIndex.Count(AngularMomentum);

    /// <summary>Number of primitives.</summary>
    public int PrimitiveCount => Exponents.Length;
}
