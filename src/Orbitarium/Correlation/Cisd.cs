namespace Orbitarium.Correlation;

/// <summary>
/// Configuration interaction with single and double excitations from the Hartree–Fock determinant (CISD), in the
/// determinant space of <see cref="FullCi"/> restricted to excitation level ≤ 2. Not size consistent (two separated
/// fragments do not give the sum of their energies) — the reason coupled cluster is preferred.
/// </summary>
/// <remarks>Szabo and Ostlund, <i>Modern Quantum Chemistry</i>, §4.6 (size consistency of truncated CI). The space is
/// built by projection from the full determinant space, so it is meant for small systems (same limits as FCI).</remarks>
public static class Cisd
{
    /// <summary>Computes the lowest CISD root(s).</summary>
    /// <param name="hamiltonian">MO Hamiltonian; the occupied orbitals define the reference determinant.</param>
    /// <param name="roots">Number of roots (default 1).</param>
    /// <param name="options">Thresholds, iteration limit, frozen core, memory budget.</param>
    /// <param name="progress">Receives (iteration, lowest total energy, largest residual norm).</param>
    /// <param name="cancellationToken">Stops the solver.</param>
    public static ConfigurationInteractionResult Compute(MolecularOrbitalHamiltonian hamiltonian, int roots = 1, CorrelationOptions? options = null,
        IProgress<CorrelationProgress>? progress = null, CancellationToken cancellationToken = default) =>
        DeterminantCi.Run("CISD", hamiltonian, roots, 2, options, progress, cancellationToken);
}
