using System.Collections.Immutable;

namespace Orbitarium.Correlation;

/// <summary>Outcome of <see cref="DavidsonSolver.Solve"/>. Immutable.</summary>
/// <param name="Eigenvalues">The lowest eigenvalues, ascending.</param>
/// <param name="Eigenvectors">Normalised eigenvectors, one per eigenvalue.</param>
/// <param name="ResidualNorms">‖H·x − θx‖ of each root at the end.</param>
/// <param name="Iterations">Iterations done.</param>
/// <param name="Converged">Whether every root met the thresholds.</param>
/// <param name="StopReason">Why the solver stopped, in words.</param>
/// <param name="LowestEigenvalueHistory">Lowest eigenvalue after each iteration.</param>
/// <param name="ResidualHistory">Largest residual norm after each iteration.</param>
public sealed record DavidsonResult(ImmutableArray<double> Eigenvalues, ImmutableArray<double[]> Eigenvectors,
    ImmutableArray<double> ResidualNorms, int Iterations, bool Converged, string StopReason,
    ImmutableArray<double> LowestEigenvalueHistory, ImmutableArray<double> ResidualHistory);
