namespace Orbitarium.Correlation;

/// <summary>
/// Full configuration interaction: the exact solution of the electronic problem within the orbital basis, in the space
/// of all α/β string products, with a Davidson solver for several roots and ⟨S²⟩ of each.
/// </summary>
/// <remarks>
/// String-driven σ = H·c after P. J. Knowles and N. C. Handy, Chem. Phys. Lett. 111, 315 (1984); Davidson solver
/// (<see cref="DavidsonSolver"/>). All determinants with the reference's S_z are included, so roots of every spin
/// S ≥ |S_z| appear; ⟨S²⟩ tells them apart. Practical up to about 10 electrons in 10 orbitals (63 504 determinants)
/// on a workstation; larger spaces are refused up front with the memory they would need. Frozen core (default none)
/// folds the core orbitals into an effective one-electron operator.
/// </remarks>
public static class FullCi
{
    /// <summary>Computes the lowest <paramref name="roots"/> full-CI states.</summary>
    /// <param name="hamiltonian">MO Hamiltonian (any orthonormal orbitals; for UHF the α orbitals are used).</param>
    /// <param name="roots">Number of roots (default 1).</param>
    /// <param name="options">Thresholds, iteration limit, frozen core, memory budget.</param>
    /// <param name="progress">Receives (iteration, lowest total energy, largest residual norm).</param>
    /// <param name="cancellationToken">Stops the solver.</param>
    public static ConfigurationInteractionResult Compute(MolecularOrbitalHamiltonian hamiltonian, int roots = 1, CorrelationOptions? options = null,
        IProgress<CorrelationProgress>? progress = null, CancellationToken cancellationToken = default) =>
        DeterminantCi.Run("FCI", hamiltonian, roots, int.MaxValue, options, progress, cancellationToken);
}
