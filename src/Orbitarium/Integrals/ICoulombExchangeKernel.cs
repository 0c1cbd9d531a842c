using MathNet.Numerics.LinearAlgebra;
using Orbitarium.BasisSets;

namespace Orbitarium.Integrals;

/// <summary>
/// The Fock-build kernel: Coulomb and exchange matrices contracted from electron-repulsion integrals
/// with one or more AO density matrices.
/// </summary>
/// <remarks>
/// For a symmetric density D: J[D]_μν = Σ_λσ (μν|λσ) D_λσ and K[D]_μν = Σ_λσ (μλ|νσ) D_λσ
/// (chemists' notation). Implementations: in-core (from a stored tensor) and integral-direct
/// (recomputed each call, with density-weighted screening).
/// </remarks>
public interface ICoulombExchangeKernel
{
    /// <summary>The basis the kernel works in.</summary>
    MolecularBasis Basis { get; }

    /// <summary>A short description of how integrals are handled, e.g. "in-core (12.3 MB)" or "integral-direct".</summary>
    string Mode { get; }

    /// <summary>Computes J (and K when <paramref name="withExchange"/>) for each density.</summary>
    /// <param name="densities">Symmetric AO density matrices, each N×N.</param>
    /// <param name="withExchange">Whether to build exchange matrices too.</param>
    /// <param name="cancellationToken">Stops the build.</param>
    CoulombExchangeMatrices Build(IReadOnlyList<Matrix<double>> densities, bool withExchange = true, CancellationToken cancellationToken = default);
}

/// <summary>Coulomb and (optionally) exchange matrices, one per density given to the kernel.</summary>
/// <param name="Coulomb">J[Dᵢ] for each density Dᵢ.</param>
/// <param name="Exchange">K[Dᵢ] for each density, or null when exchange was not requested.</param>
public sealed record CoulombExchangeMatrices(IReadOnlyList<Matrix<double>> Coulomb, IReadOnlyList<Matrix<double>>? Exchange);
