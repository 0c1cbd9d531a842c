namespace Orbitarium.Scf;

/// <summary>One self-consistent-field iteration, as reported through <see cref="IProgress{T}"/> and kept in
/// <see cref="ScfResult.History"/>.</summary>
/// <param name="Iteration">1-based iteration number.</param>
/// <param name="EnergyHartree">Total energy (electronic + nuclear repulsion) of the density of this iteration, hartree.</param>
/// <param name="EnergyChangeHartree">Change from the previous iteration, hartree (the energy itself on the first iteration).</param>
/// <param name="CommutatorNorm">Largest absolute element of the orbital gradient FDS − SDF in the orthonormal basis, hartree.</param>
/// <param name="DiisSubspaceSize">Number of Fock matrices in the DIIS subspace after this iteration (0 without DIIS).</param>
/// <param name="ElapsedSeconds">Wall time since the start of the iterations, seconds.</param>
public sealed record ScfIteration(
    int Iteration,
    double EnergyHartree,
    double EnergyChangeHartree,
    double CommutatorNorm,
    int DiisSubspaceSize,
    double ElapsedSeconds)
{
    /// <inheritdoc />
    public override string ToString() => FormattableString.Invariant(
        $"iter {Iteration,3}  E = {EnergyHartree,18:F10} Eh  ΔE = {EnergyChangeHartree,10:E2}  |FDS−SDF| = {CommutatorNorm,9:E2}  DIIS {DiisSubspaceSize}");
}
