namespace Orbitarium.Dft.Functionals;

/// <summary>
/// One exchange or correlation functional of the local-density or generalised-gradient kind (Slater, VWN5,
/// B88, LYP, PBE, …): its energy density and first derivatives, restricted and spin-polarised.
/// Combine components with weights in an <see cref="ExchangeCorrelationFunctional"/>.
/// </summary>
/// <remarks>
/// Inputs follow the usual convention: spin densities ρα, ρβ (bohr⁻³) and the gradient invariants
/// σαα = |∇ρα|², σαβ = ∇ρα·∇ρβ, σββ = |∇ρβ|² (bohr⁻⁸). The closed-shell form takes ρ = ρα + ρβ and
/// σ = |∇ρ|², and is evaluated as the polarised form at ρα = ρβ = ρ/2. Points where the density is below
/// <see cref="DensityThreshold"/> contribute nothing. The built-in components are written in C# and never
/// need a native library.
/// </remarks>
public abstract class FunctionalComponent
{
    /// <summary>Total densities below this (bohr⁻³) are treated as vacuum: 1e-14.</summary>
    public const double DensityThreshold = 1e-14;

    /// <summary>Floor applied to σ inside the formulas (bohr⁻⁸), so that √σ stays differentiable: 1e-40.</summary>
    internal const double SigmaFloor = 1e-40;

    /// <summary>Floor applied to a single spin density inside the formulas (bohr⁻³): 1e-30.</summary>
    internal const double SpinDensityFloor = 1e-30;

    private protected FunctionalComponent() { }

    /// <summary>Short registry name, e.g. "b88".</summary>
    public abstract string Name { get; }

    /// <summary>Whether the component depends on the density gradient (GGA) rather than only the density (LDA).</summary>
    public abstract bool IsGradientCorrected { get; }

    /// <summary>The published source of the form implemented.</summary>
    public abstract string Source { get; }

    /// <summary>Energy density e(ρα, ρβ, σαα, σαβ, σββ) in hartree·bohr⁻³, written with dual numbers. Built-in
    /// components override it; a component backed by an external library overrides the evaluation methods instead.</summary>
    internal virtual DualNumber EnergyDensity(DualNumber rhoA, DualNumber rhoB, DualNumber sigmaAA, DualNumber sigmaAB, DualNumber sigmaBB) =>
        throw new NotSupportedException($"The component {Name} is evaluated point-wise by its library, not with dual numbers.");

    /// <summary>Adds <paramref name="weight"/> × (energy density and derivatives) of every point of the batch to its outputs.</summary>
    internal virtual void Accumulate(XcPointBatch batch, double weight)
    {
        int n = batch.Count;
        bool gga = IsGradientCorrected;
        if (!batch.SpinPolarized)
        {
            for (int p = 0; p < n; p++)
            {
                var v = EvaluateUnpolarized(batch.RhoA[p], gga ? batch.SigmaAA[p] : 0);
                batch.EnergyDensity[p] += weight * v.EnergyDensity;
                batch.VRhoA[p] += weight * v.VRho;
                if (gga) batch.VSigmaAA[p] += weight * v.VSigma;
            }
            return;
        }
        for (int p = 0; p < n; p++)
        {
            var v = gga
                ? Evaluate(batch.RhoA[p], batch.RhoB[p], batch.SigmaAA[p], batch.SigmaAB[p], batch.SigmaBB[p])
                : Evaluate(batch.RhoA[p], batch.RhoB[p]);
            batch.EnergyDensity[p] += weight * v.EnergyDensity;
            batch.VRhoA[p] += weight * v.VRhoAlpha;
            batch.VRhoB[p] += weight * v.VRhoBeta;
            if (!gga) continue;
            batch.VSigmaAA[p] += weight * v.VSigmaAlphaAlpha;
            batch.VSigmaAB[p] += weight * v.VSigmaAlphaBeta;
            batch.VSigmaBB[p] += weight * v.VSigmaBetaBeta;
        }
    }

    /// <summary>Evaluates the spin-polarised energy density and derivatives at one point.</summary>
    /// <param name="rhoAlpha">ρα in bohr⁻³ (≥ 0).</param>
    /// <param name="rhoBeta">ρβ in bohr⁻³ (≥ 0).</param>
    /// <param name="sigmaAlphaAlpha">σαα = |∇ρα|² in bohr⁻⁸ (ignored by LDA components).</param>
    /// <param name="sigmaAlphaBeta">σαβ = ∇ρα·∇ρβ in bohr⁻⁸.</param>
    /// <param name="sigmaBetaBeta">σββ = |∇ρβ|² in bohr⁻⁸.</param>
    public virtual FunctionalPointValue Evaluate(double rhoAlpha, double rhoBeta, double sigmaAlphaAlpha = 0, double sigmaAlphaBeta = 0, double sigmaBetaBeta = 0)
    {
        if (rhoAlpha + rhoBeta < DensityThreshold) return default;
        ClampPolarized(ref rhoAlpha, ref rhoBeta, ref sigmaAlphaAlpha, ref sigmaAlphaBeta, ref sigmaBetaBeta);
        var e = EnergyDensity(new DualNumber(rhoAlpha, 1), new DualNumber(rhoBeta, 0, 1),
            new DualNumber(sigmaAlphaAlpha, 0, 0, 1), new DualNumber(sigmaAlphaBeta, 0, 0, 0, 1), new DualNumber(sigmaBetaBeta, 0, 0, 0, 0, 1));
        return IsGradientCorrected
            ? new FunctionalPointValue(e.V, e.D0, e.D1, e.D2, e.D3, e.D4)
            : new FunctionalPointValue(e.V, e.D0, e.D1, 0, 0, 0);
    }

    /// <summary>Evaluates the closed-shell energy density and derivatives at one point.</summary>
    /// <param name="rho">Total density ρ in bohr⁻³.</param>
    /// <param name="sigma">σ = |∇ρ|² in bohr⁻⁸ (ignored by LDA components).</param>
    public virtual UnpolarizedFunctionalPointValue EvaluateUnpolarized(double rho, double sigma = 0)
    {
        if (rho < DensityThreshold) return default;
        sigma = Math.Max(sigma, SigmaFloor);
        // ρα = ρβ = ρ/2 and σαα = σαβ = σββ = σ/4: seeding dρα/dρ = ½ and dσ../dσ = ¼ gives d/dρ and d/dσ directly.
        var half = new DualNumber(0.5 * rho, 0.5, 0);
        var quarter = new DualNumber(0.25 * sigma, 0, 0.25);
        var e = EnergyDensity(half, half, quarter, quarter, quarter);
        return new UnpolarizedFunctionalPointValue(e.V, e.D0, IsGradientCorrected ? e.D1 : 0);
    }

    internal static void ClampPolarized(ref double ra, ref double rb, ref double saa, ref double sab, ref double sbb)
    {
        ra = Math.Max(ra, SpinDensityFloor);
        rb = Math.Max(rb, SpinDensityFloor);
        saa = Math.Max(saa, SigmaFloor);
        sbb = Math.Max(sbb, SigmaFloor);
        // |∇ρα·∇ρβ| ≤ |∇ρα||∇ρβ| (Cauchy–Schwarz); rounding can break it slightly.
        double bound = Math.Sqrt(saa * sbb);
        sab = Math.Clamp(sab, -bound, bound);
    }

    /// <inheritdoc />
    public override string ToString() => Name;
}
