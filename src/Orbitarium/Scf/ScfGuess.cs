namespace Orbitarium.Scf;

/// <summary>How the self-consistent field obtains its starting density.</summary>
public enum ScfGuess
{
    /// <summary>Diagonalise the core Hamiltonian (kinetic energy + nuclear attraction) and fill the lowest orbitals.
    /// Simple and deterministic, but poor for molecules with many electrons.</summary>
    CoreHamiltonian,

    /// <summary>Superposition of atomic densities: each atom's spherically averaged density from a small
    /// fractional-occupation atomic SCF in its own basis functions (Almlöf, Faegri &amp; Korsell, J. Comput. Chem. 3, 385 (1982)).
    /// The default.</summary>
    AtomicDensities,

    /// <summary>The orbitals of an earlier result (<see cref="ScfOptions.InitialOrbitals"/>), re-orthonormalised in
    /// the current overlap: for scans along a coordinate and restarts. The basis must have the same functions.</summary>
    PreviousOrbitals,
}
