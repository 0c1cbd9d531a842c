namespace Orbitarium.Correlation;

/// <summary>
/// The random-phase approximation (time-dependent Hartree–Fock) for excitation energies: the positive roots of
/// [[A, B], [B, A]] (X, Y) = ω [[1, 0], [0, −1]] (X, Y), solved as (A − B)^{1/2}(A + B)(A − B)^{1/2} Z = ω² Z.
/// </summary>
/// <remarks>
/// A and B as in <c>ExcitationMatrices</c> (closed-shell singlet/triplet or unrestricted). D. J. Rowe, Rev. Mod. Phys. 40,
/// 153 (1968);  Transition dipoles from X + Y
/// normalised to (X+Y)·(X−Y) = 1. RPA satisfies the Thomas–Reiche–Kuhn sum rule Σf = N in the complete-basis limit.
/// An unstable reference (A − B not positive definite) is reported as an input problem.
/// </remarks>
public static class Rpa
{
    /// <summary>Lowest singlet RPA states of a closed-shell RHF reference.</summary>
    /// <param name="hamiltonian">MO Hamiltonian of a closed-shell RHF reference (with dipole integrals for f).</param>
    /// <param name="states">Number of states (default 5).</param>
    /// <param name="options">Frozen core and memory budget.</param>
    /// <param name="progress">Receives one report (iteration 0, lowest excitation energy, residual 0) when done.</param>
    /// <param name="cancellationToken">Stops the calculation.</param>
    public static ExcitedStatesResult Singlets(MolecularOrbitalHamiltonian hamiltonian, int states = 5, CorrelationOptions? options = null,
        IProgress<CorrelationProgress>? progress = null, CancellationToken cancellationToken = default) =>
        Cis.Run("RPA", "singlet", hamiltonian, states, options, progress, cancellationToken);

    /// <summary>Lowest triplet RPA states of a closed-shell RHF reference.</summary>
    /// <param name="hamiltonian">MO Hamiltonian of a closed-shell RHF reference.</param>
    /// <param name="states">Number of states (default 5).</param>
    /// <param name="options">Frozen core and memory budget.</param>
    /// <param name="progress">Receives one report (iteration 0, lowest excitation energy, residual 0) when done.</param>
    /// <param name="cancellationToken">Stops the calculation.</param>
    public static ExcitedStatesResult Triplets(MolecularOrbitalHamiltonian hamiltonian, int states = 5, CorrelationOptions? options = null,
        IProgress<CorrelationProgress>? progress = null, CancellationToken cancellationToken = default) =>
        Cis.Run("RPA", "triplet", hamiltonian, states, options, progress, cancellationToken);

    /// <summary>Lowest RPA states over α and β excitations of a UHF (or closed-shell) reference.</summary>
    /// <param name="hamiltonian">MO Hamiltonian of a UHF or RHF reference.</param>
    /// <param name="states">Number of states (default 5).</param>
    /// <param name="options">Frozen core and memory budget.</param>
    /// <param name="progress">Receives one report (iteration 0, lowest excitation energy, residual 0) when done.</param>
    /// <param name="cancellationToken">Stops the calculation.</param>
    public static ExcitedStatesResult Unrestricted(MolecularOrbitalHamiltonian hamiltonian, int states = 5, CorrelationOptions? options = null,
        IProgress<CorrelationProgress>? progress = null, CancellationToken cancellationToken = default) =>
        Cis.Run("RPA", "unrestricted", hamiltonian, states, options, progress, cancellationToken);
}
