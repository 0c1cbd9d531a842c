using Orbitarium.BasisSets;
using Orbitarium.Chemistry;

namespace Orbitarium.Scf;

/// <summary>The fluent start of a calculation: <c>molecule.WithBasis("cc-pVDZ").RunRhf()</c>.</summary>
public static class MoleculeCalculationExtensions
{
    /// <summary>Places a built-in basis set, found by name (see <see cref="BasisSetLibrary"/>), on the molecule and
    /// returns the set-up to run, e.g. <c>molecule.WithBasis("6-31G*").RunRhf()</c>.</summary>
    /// <param name="molecule">The molecule.</param>
    /// <param name="basisSetName">Name of a built-in set, e.g. "STO-3G", "6-31G*", "cc-pVDZ" (case-insensitive).</param>
    /// <param name="pure">True for pure d/f/g, false for Cartesian, null for the set's default.</param>
    /// <exception cref="OrbitariumInputException">The name is unknown, or the set lacks an element of the molecule.</exception>
    public static Calculation WithBasis(this Molecule molecule, string basisSetName, bool? pure = null) =>
        Calculation.Create(molecule, BasisSetLibrary.Get(basisSetName), pure);

    /// <summary>Places a basis set on the molecule and returns the set-up to run.</summary>
    /// <param name="molecule">The molecule.</param>
    /// <param name="basisSet">The basis set.</param>
    /// <param name="pure">True for pure d/f/g, false for Cartesian, null for the set's default.</param>
    /// <exception cref="OrbitariumInputException">The set lacks an element of the molecule.</exception>
    public static Calculation WithBasis(this Molecule molecule, BasisSet basisSet, bool? pure = null) =>
        Calculation.Create(molecule, basisSet, pure);
}
