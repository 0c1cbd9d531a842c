using Orbitarium.BasisSets;
using Orbitarium.Chemistry;

namespace Orbitarium.Scf;

/// <summary>The fluent start of a calculation: <c>molecule.WithBasis("cc-pVDZ").RunRhf()</c>.</summary>
public static class MoleculeCalculationExtensions
{
    /// <summary>Places a basis set on the molecule and returns the set-up to run.</summary>
    /// <param name="molecule">The molecule.</param>
    /// <param name="basisSet">The basis set.</param>
    /// <param name="pure">True for pure d/f/g, false for Cartesian, null for the set's default.</param>
    /// <exception cref="OrbitariumInputException">The set lacks an element of the molecule.</exception>
    public static Calculation WithBasis(this Molecule molecule, BasisSet basisSet, bool? pure = null) =>
        Calculation.Create(molecule, basisSet, pure);
}
