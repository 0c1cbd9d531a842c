using MathNet.Numerics.LinearAlgebra;
using Orbitarium.BasisSets;
using Orbitarium.Integrals;

namespace Orbitarium.Scf;

/// <summary>The integrals an SCF run needs: overlap, core Hamiltonian and the J/K kernel.</summary>
internal sealed class ScfIntegrals
{
    public required Matrix<double> Overlap { get; init; }
    public required Matrix<double> CoreHamiltonian { get; init; }
    public required ICoulombExchangeKernel Kernel { get; init; }
    public required double Seconds { get; init; }

    public static ScfIntegrals Compute(MolecularBasis basis, long memoryBudgetBytes, bool forceDirect, CancellationToken cancellationToken)
    {
        // Wired to OneElectronIntegrals and CoulombExchangeKernel when the integral engine lands.
        _ = basis; _ = memoryBudgetBytes; _ = forceDirect;
        cancellationToken.ThrowIfCancellationRequested();
        throw new NotSupportedException("The integral engine is not merged into this branch yet.");
    }
}
