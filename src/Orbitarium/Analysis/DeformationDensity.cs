using MathNet.Numerics.LinearAlgebra;
using Orbitarium.BasisSets;
using Orbitarium.Chemistry;
using Orbitarium.Scf;

namespace Orbitarium.Analysis;

/// <summary>
/// The deformation density Δρ = ρ(molecule) − Σ_A ρ̄_A: the molecule's density minus the superposition of spherically
/// averaged free neutral atoms, each computed with the same basis functions (placed at its nucleus) and the same
/// method and options as the molecule.
/// </summary>
/// <remarks>
/// Each distinct element is computed once: a UHF (or unrestricted Kohn–Sham, when the molecule's options carry a
/// functional) calculation of the neutral atom in its ground multiplicity (<see cref="FreeAtomMultiplicity"/>), or
/// restricted for closed-shell atoms; its total density matrix is averaged over rotations
/// (<see cref="SphericalAtom"/>). Because every atom's functions are a subset of the molecular basis, the superposition
/// is a block-diagonal density matrix and Δρ is the density of ΔD = D(molecule) − ⊕_A D̄_A. The picture goes back to
/// K. Ruedenberg's analysis of the chemical bond (Rev. Mod. Phys. 34, 326 (1962)).
/// </remarks>
public static class DeformationDensity
{
    /// <summary>The AO matrix ΔD whose density is the deformation density.</summary>
    /// <param name="result">The molecule's SCF result.</param>
    /// <param name="cancellationToken">Stops the atom calculations.</param>
    public static Matrix<double> Matrix(ScfResult result, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(result);
        var delta = result.DensityTotal.Clone();
        foreach (var (atom, block, indices) in AtomBlocks(result, cancellationToken))
        {
            _ = atom;
            for (int i = 0; i < indices.Length; i++)
                for (int j = 0; j < indices.Length; j++)
                    delta[indices[i], indices[j]] -= block[i, j];
        }
        return delta;
    }

    /// <summary>The spherically averaged free-atom density matrix of each atom, with the molecular basis-function
    /// indices it occupies.</summary>
    /// <param name="result">The molecule's SCF result.</param>
    /// <param name="cancellationToken">Stops the atom calculations.</param>
    public static IReadOnlyList<(int Atom, Matrix<double> Density, int[] FunctionIndices)> AtomBlocks(ScfResult result, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(result);
        var basis = result.Basis;
        var molecule = result.Molecule;
        var cache = new Dictionary<string, Matrix<double>>();
        var list = new List<(int, Matrix<double>, int[])>();
        for (int a = 0; a < molecule.AtomCount; a++)
        {
            var indices = Enumerable.Range(0, basis.FunctionCount).Where(mu => basis.FunctionAtoms[mu] == a).ToArray();
            var shells = basis.Shells.Where(s => s.AtomIndex == a).ToList();
            string key = molecule.Atoms[a].Symbol + "|" + string.Join(";", shells.Select(s => $"{s.AngularMomentum}:{s.IsPure}:{string.Join(",", s.Exponents)}:{string.Join(",", s.Definition.Coefficients)}"));
            if (!cache.TryGetValue(key, out var density))
            {
                density = FreeAtomDensity(molecule.Atoms[a].Element, shells, result.Options, cancellationToken);
                cache[key] = density;
            }
            list.Add((a, density, indices));
        }
        return list;
    }

    private static Matrix<double> FreeAtomDensity(Element element, IReadOnlyList<Shell> shells, ScfOptions moleculeOptions, CancellationToken cancellationToken)
    {
        int multiplicity = FreeAtomMultiplicity.Of(element.AtomicNumber);
        var atom = Molecule.Empty.AddAtom(new Atom(element, Vector3D.Zero)).WithMultiplicity(multiplicity);
        var atomBasis = MolecularBasis.FromShells(atom, shells.Select(s => new Shell(s.Definition, Vector3D.Zero, 0, s.IsPure)), "free atom");
        var options = moleculeOptions with { Guess = ScfGuess.AtomicDensities, InitialOrbitals = null, BreakSpinSymmetry = false };
        var reference = multiplicity == 1 ? ScfReference.Restricted : ScfReference.Unrestricted;
        var r = SelfConsistentField.Run(atomBasis, reference, options, null, cancellationToken);
        if (!r.Converged)
            throw new OrbitariumInputException($"The free {element.Name} atom's SCF did not converge ({r.StopReason}); the deformation density needs it. Try more iterations or damping in the options.");
        return SphericalAtom.Average(atomBasis, r.DensityTotal);
    }
}
