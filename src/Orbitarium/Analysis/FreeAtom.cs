using Orbitarium.BasisSets;
using Orbitarium.Chemistry;
using Orbitarium.Scf;

namespace Orbitarium.Analysis;

/// <summary>Free neutral atoms computed with the same basis functions, method and options as a molecule: the reference
/// for deformation densities and the fragment levels of orbital diagrams.</summary>
public static class FreeAtom
{
    /// <summary>Computes atom <paramref name="atomIndex"/> of the molecule alone, at its molecular position, with its
    /// own basis functions, in its ground multiplicity (<see cref="FreeAtomMultiplicity"/>): RHF/RKS for singlets,
    /// UHF/UKS otherwise, with the molecule's options (functional, thresholds).</summary>
    /// <param name="molecule">The molecule's SCF result.</param>
    /// <param name="atomIndex">Atom (0-based).</param>
    /// <param name="cancellationToken">Stops the calculation.</param>
    /// <exception cref="OrbitariumInputException">The atom index is unknown or the atom's SCF does not converge.</exception>
    public static ScfResult Compute(ScfResult molecule, int atomIndex, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(molecule);
        GridChecks.AtomIndex(molecule.Molecule, atomIndex);
        var source = molecule.Molecule.Atoms[atomIndex];
        int multiplicity = FreeAtomMultiplicity.Of(source.NuclearCharge);
        var atom = Molecule.Empty.AddAtom(source).WithMultiplicity(multiplicity);
        var shells = molecule.Basis.Shells.Where(s => s.AtomIndex == atomIndex).Select(s => new Shell(s.Definition, source.PositionBohr, 0, s.IsPure));
        var basis = MolecularBasis.FromShells(atom, shells, molecule.Basis.Name);
        var options = molecule.Options with { Guess = ScfGuess.AtomicDensities, InitialOrbitals = null, BreakSpinSymmetry = false };
        var reference = multiplicity == 1 ? ScfReference.Restricted : ScfReference.Unrestricted;
        var r = SelfConsistentField.Run(basis, reference, options, null, cancellationToken);
        if (!r.Converged)
            throw new OrbitariumInputException($"The free {source.Element.Name} atom's SCF did not converge ({r.StopReason}); try more iterations or damping in the options.");
        return r;
    }
}
