using MathNet.Numerics.LinearAlgebra;
using Orbitarium.Scf;

namespace Orbitarium.Geometry.Gradients;

/// <summary>
/// The analytic nuclear gradient of a converged RHF or UHF energy:
/// dE/dX = Σ D ∂h/∂X + ½ Σ Γ ∂(μν|λσ)/∂X − Σ W ∂S/∂X + ∂V_nn/∂X, with the energy-weighted density
/// W = Σ_σ Σ_i n_iσ ε_iσ C_μiσ C_νiσ.
/// </summary>
/// <remarks>Source: J. A. Pople, R. Krishnan, H. B. Schlegel and J. S. Binkley, Int. J. Quantum Chem. Symp. 13, 225
/// (1979); P. Pulay, Mol. Phys. 17, 197 (1969). Valid for converged RHF and UHF (the orbitals make the energy stationary,
/// so no orbital response is needed); ROHF falls back to finite differences, and RKS/UKS use <see cref="KohnShamGradient"/>.</remarks>
public static class HartreeFockGradient
{
    /// <summary>Whether an analytic gradient is available for this result: a Hartree–Fock (no functional) RHF or UHF run.</summary>
    public static bool IsAvailable(ScfResult result)
    {
        ArgumentNullException.ThrowIfNull(result);
        return result.Options.ExchangeCorrelation is null && result.Reference is ScfReference.Restricted or ScfReference.Unrestricted;
    }

    /// <summary>The gradient (3·N values, x₁ y₁ z₁ x₂ …) in hartree/bohr.</summary>
    /// <exception cref="InvalidOperationException">The result is not converged, or is ROHF or Kohn–Sham.</exception>
    public static double[] Compute(ScfResult result, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(result);
        if (!result.Converged)
            throw new InvalidOperationException("The SCF is not converged; a gradient of an unconverged energy would be meaningless. Converge it first.");
        if (!IsAvailable(result))
            throw new InvalidOperationException($"No analytic gradient for {result.MethodName}; use finite differences (FiniteDifferenceGradient).");
        return SelfConsistentFieldTerms(result, 1.0, cancellationToken);
    }

    /// <summary>Every gradient term of an SCF energy except exchange–correlation: one-electron, Coulomb, the given
    /// fraction of exact exchange, nuclear repulsion and the energy-weighted-density (overlap) term; hartree/bohr.</summary>
    internal static double[] SelfConsistentFieldTerms(ScfResult result, double exactExchangeFraction, CancellationToken cancellationToken)
    {
        var basis = result.Basis;
        var d = result.DensityTotal;
        var kinetic = DerivativeIntegrals.Kinetic(basis, d);
        var nuclear = DerivativeIntegrals.NuclearAttraction(basis, d, cancellationToken);
        var twoElectron = DerivativeIntegrals.TwoElectron(basis, result.DensityAlpha, result.DensityBeta, exactExchangeFraction, cancellationToken);
        var repulsion = DerivativeIntegrals.NuclearRepulsion(result.Molecule);
        var overlap = DerivativeIntegrals.Overlap(basis, EnergyWeightedDensity(result));
        var g = new double[overlap.Length];
        for (int i = 0; i < g.Length; i++) g[i] = kinetic[i] + nuclear[i] + twoElectron[i] + repulsion[i] - overlap[i];
        return g;
    }

    /// <summary>W = Σ_σ C^σ diag(n^σ ε^σ) C^σᵀ in hartree.</summary>
    public static Matrix<double> EnergyWeightedDensity(ScfResult result)
    {
        ArgumentNullException.ThrowIfNull(result);
        return Weighted(result.CoefficientsAlpha, result.OccupationsAlpha, result.OrbitalEnergiesAlphaHartree)
             + Weighted(result.CoefficientsBeta, result.OccupationsBeta, result.OrbitalEnergiesBetaHartree);
    }

    private static Matrix<double> Weighted(Matrix<double> c, IReadOnlyList<double> occupations, IReadOnlyList<double> energies)
    {
        int n = c.RowCount;
        var w = Matrix<double>.Build.Dense(n, n);
        for (int i = 0; i < occupations.Count; i++)
        {
            double f = occupations[i] * energies[i];
            if (f == 0) continue;
            var col = c.Column(i);
            w += f * col.OuterProduct(col);
        }
        return w;
    }
}
