using MathNet.Numerics.LinearAlgebra;
using Orbitarium.BasisSets;
using Orbitarium.Chemistry;
using Orbitarium.Dft;
using Orbitarium.Dft.Functionals;
using Orbitarium.Dft.Grids;
using Orbitarium.Parallelism;
using Orbitarium.Scf;

namespace Orbitarium.Geometry.Gradients;

/// <summary>
/// The analytic nuclear gradient of a converged RKS or UKS energy (grid functional, <see cref="GridExchangeCorrelation"/>):
/// dE/dX = Σ D ∂h/∂X + ∂E_J/∂X − x ∂E_K/∂X − Σ W ∂S/∂X + ∂V_nn/∂X + ∂E_xc/∂X, with x the functional's exact-exchange
/// fraction and W built from the Kohn–Sham orbital energies.
/// </summary>
/// <remarks>
/// The exchange–correlation term is integrated on the SCF's own grid with the points held fixed in space: the basis
/// functions move with their atom, but the grid weights (Becke partition) and the atom-centred points are not
/// differentiated. Per spin σ, with X_μ = Σ_ν D^σ_μν φ_ν, Y_μk = Σ_ν D^σ_μν ∂_kφ_ν and G^σ = 2 ∂e/∂σ_σσ ∇ρ_σ + ∂e/∂σ_αβ ∇ρ_σ'
/// (closed shell: total D, G = 2 v_σ ∇ρ):
/// ∂E_xc/∂R_Aj = −2 Σ_p w_p Σ_{μ∈A} [v_ρσ ∂_jφ_μ X_μ + Σ_k G_k (∂_j∂_kφ_μ X_μ + ∂_jφ_μ Y_μk)]
/// (Johnson, Gill &amp; Pople, J. Chem. Phys. 98, 5612 (1993), without their weight-derivative terms).
/// The neglected weight derivatives make the result differ from the derivative of the grid energy by a grid-dependent
/// amount, and make Σ_A g_A deviate slightly from zero. Measured against central finite differences (h = 1e-3 bohr) on
/// the <see cref="GridLevel.Fine"/> grid, 6-31G (tests KohnShamGradientTests): distorted water, largest component error
/// 2.4e-7 (SVWN5), 1.8e-7 (PBE; also in 6-31G* with Cartesian d), 1.7e-7 (B3LYP) Eh/bohr, net force ≤ 2.9e-7 Eh/bohr;
/// UKS/B3LYP distorted triplet CH2 1.6e-7 Eh/bohr, net force 9e-8 Eh/bohr. These include the finite-difference
/// truncation (~1e-7); the weight-derivative error is expected to grow on coarser grids (not measured here).
/// Source for the rest: J. A. Pople, P. M. W. Gill and B. G. Johnson, Chem. Phys. Lett. 199, 557 (1992).
/// </remarks>
public static class KohnShamGradient
{
    /// <summary>Whether an analytic gradient is available for this result: an RKS or UKS run with a grid functional.</summary>
    public static bool IsAvailable(ScfResult result)
    {
        ArgumentNullException.ThrowIfNull(result);
        return result.Options.ExchangeCorrelation is GridExchangeCorrelation && result.Reference is ScfReference.Restricted or ScfReference.Unrestricted;
    }

    /// <summary>The gradient (3·N values, x₁ y₁ z₁ x₂ …) in hartree/bohr.</summary>
    /// <exception cref="InvalidOperationException">The result is not converged, or is not RKS/UKS with a grid functional.</exception>
    public static double[] Compute(ScfResult result, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(result);
        if (!result.Converged)
            throw new InvalidOperationException("The SCF is not converged; a gradient of an unconverged energy would be meaningless. Converge it first.");
        if (!IsAvailable(result) || result.Options.ExchangeCorrelation is not GridExchangeCorrelation xc)
            throw new InvalidOperationException($"No analytic Kohn–Sham gradient for {result.MethodName}; use finite differences (FiniteDifferenceGradient).");
        var g = HartreeFockGradient.SelfConsistentFieldTerms(result, xc.ExactExchangeFraction, cancellationToken);
        var exchangeCorrelation = ExchangeCorrelation(xc, result.Basis, result.DensityAlpha, result.DensityBeta,
            result.Reference == ScfReference.Unrestricted, cancellationToken);
        for (int i = 0; i < g.Length; i++) g[i] += exchangeCorrelation[i];
        return g;
    }

    /// <summary>The exchange–correlation part ∂E_xc/∂X (3·N values, hartree/bohr) with fixed grid points and weights
    /// (see the class remarks).</summary>
    /// <param name="xc">The grid functional (its grid for <paramref name="basis"/> is built or reused).</param>
    /// <param name="basis">The basis at the molecule's geometry.</param>
    /// <param name="densityAlpha">α density matrix.</param>
    /// <param name="densityBeta">β density matrix.</param>
    /// <param name="spinPolarized">Evaluate the functional spin-polarised (UKS) or on the total density (RKS).</param>
    /// <param name="cancellationToken">Stops the integration.</param>
    public static double[] ExchangeCorrelation(GridExchangeCorrelation xc, MolecularBasis basis, Matrix<double> densityAlpha,
        Matrix<double> densityBeta, bool spinPolarized, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(xc);
        ArgumentNullException.ThrowIfNull(basis);
        ArgumentNullException.ThrowIfNull(densityAlpha);
        ArgumentNullException.ThrowIfNull(densityBeta);
        var grid = xc.GridFor(basis, cancellationToken);
        var batchBases = BatchBasis.ForGrid(basis, grid);
        var da = densityAlpha.ToArray();
        var db = densityBeta.ToArray();
        int maxFunctions = 1;
        foreach (var bb in batchBases) maxFunctions = Math.Max(maxFunctions, bb.Functions.Length);
        int atoms = basis.Molecule.AtomCount;
        var total = new double[3 * atoms];
        var functional = xc.Functional;
        var partials = FixedOrderParallel.For(grid.Batches.Length, FixedOrderParallel.MaxSets,
            () => new XcGradientWorkspace(atoms, maxFunctions, spinPolarized, functional.IsGradientCorrected),
            (b, ws) =>
            {
                var bb = batchBases[b];
                if (bb.Basis is not null) ws.Process(grid, grid.Batches[b], bb, basis, functional, da, db);
            }, cancellationToken);
        foreach (var ws in partials)
            for (int i = 0; i < total.Length; i++) total[i] += ws.Gradient[i];
        return total;
    }
}
