using Orbitarium.BasisSets;
using Orbitarium.Chemistry;

namespace Orbitarium.Scf;

/// <summary>
/// The Hartree–Fock facade: one call from a molecule and a basis set to a converged (or clearly flagged) result.
/// </summary>
/// <remarks>The algorithms live in <see cref="RestrictedHartreeFock"/>, <see cref="UnrestrictedHartreeFock"/> and
/// <see cref="RestrictedOpenShellHartreeFock"/>, sharing <see cref="SelfConsistentField"/>.
/// For a fluent set-up use <c>molecule.WithBasis("cc-pVDZ").RunRhf()</c>.</remarks>
public static class HartreeFock
{
    /// <summary>Runs Hartree–Fock with the given reference.</summary>
    /// <param name="molecule">The molecule.</param>
    /// <param name="basisSet">The basis set (must cover every element).</param>
    /// <param name="reference">RHF (default), UHF or ROHF.</param>
    /// <param name="options">Settings; <see cref="ScfOptions.Default"/> when null.</param>
    /// <param name="progress">Receives each iteration.</param>
    /// <param name="cancellationToken">Stops the run.</param>
    public static ScfResult Run(Molecule molecule, BasisSet basisSet, ScfReference reference = ScfReference.Restricted,
        ScfOptions? options = null, IProgress<ScfIteration>? progress = null, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(molecule);
        ArgumentNullException.ThrowIfNull(basisSet);
        return Run(MolecularBasis.Create(molecule, basisSet), reference, options, progress, cancellationToken);
    }

    /// <summary>Runs Hartree–Fock in a basis already placed on a molecule.</summary>
    /// <param name="basis">The placed basis.</param>
    /// <param name="reference">RHF (default), UHF or ROHF.</param>
    /// <param name="options">Settings; <see cref="ScfOptions.Default"/> when null. A functional in the options is refused
    /// here: Hartree–Fock means exact exchange only.</param>
    /// <param name="progress">Receives each iteration.</param>
    /// <param name="cancellationToken">Stops the run.</param>
    public static ScfResult Run(MolecularBasis basis, ScfReference reference = ScfReference.Restricted, ScfOptions? options = null,
        IProgress<ScfIteration>? progress = null, CancellationToken cancellationToken = default)
    {
        if (options?.ExchangeCorrelation is { } xc)
            throw new OrbitariumInputException($"Hartree–Fock was asked for with the functional {xc.Name} set; run DFT instead, or clear ExchangeCorrelation.");
        return SelfConsistentField.Run(basis, reference, options, progress, cancellationToken);
    }
}
