using System.Diagnostics;
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
        var clock = Stopwatch.StartNew();
        var s = OneElectronIntegrals.Overlap(basis);
        cancellationToken.ThrowIfCancellationRequested();
        var h = OneElectronIntegrals.CoreHamiltonian(basis);
        cancellationToken.ThrowIfCancellationRequested();
        var kernel = CoulombExchangeKernel.Create(basis, memoryBudgetBytes, forceDirect, null, cancellationToken);
        return new ScfIntegrals { Overlap = s, CoreHamiltonian = h, Kernel = kernel, Seconds = clock.Elapsed.TotalSeconds };
    }
}
