using Orbitarium.BasisSets;

namespace Orbitarium.Integrals;

/// <summary>Chooses a J/K kernel for a basis: in-core when the packed integral tensor fits the memory budget,
/// integral-direct otherwise.</summary>
public static class CoulombExchangeKernel
{
    /// <summary>Creates the kernel for <paramref name="basis"/>.</summary>
    /// <param name="basis">The basis.</param>
    /// <param name="memoryBudgetBytes">Memory allowed for stored integrals, in bytes (compare <see cref="ElectronRepulsionTensor.EstimateBytes"/>).</param>
    /// <param name="forceDirect">Use the integral-direct kernel whatever the budget.</param>
    /// <param name="progress">Receives the completed fraction while the in-core tensor is computed.</param>
    /// <param name="cancellationToken">Stops the tensor computation.</param>
    /// <returns>An <see cref="InCoreCoulombExchangeKernel"/> or a <see cref="DirectCoulombExchangeKernel"/>; its
    /// <see cref="ICoulombExchangeKernel.Mode"/> says which.</returns>
    public static ICoulombExchangeKernel Create(MolecularBasis basis, long memoryBudgetBytes, bool forceDirect = false,
        IProgress<double>? progress = null, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(basis);
        if (memoryBudgetBytes < 0)
            throw new OrbitariumInputException($"The memory budget {memoryBudgetBytes} bytes is negative; give a size ≥ 0.");
        int n = basis.FunctionCount;
        if (!forceDirect && n <= ElectronRepulsionTensor.MaxFunctionCount && ElectronRepulsionTensor.EstimateBytes(n) <= memoryBudgetBytes)
            return new InCoreCoulombExchangeKernel(ElectronRepulsionTensor.Compute(basis, progress, cancellationToken));
        return new DirectCoulombExchangeKernel(basis);
    }
}
