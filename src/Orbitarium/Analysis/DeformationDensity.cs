using MathNet.Numerics.LinearAlgebra;
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
            string key = molecule.Atoms[a].Symbol + "|" + string.Join(";", shells.Select(s =>
                $"{s.AngularMomentum}:{s.IsPure}:{string.Join(",", s.Exponents)}:{string.Join(",", s.Definition.Coefficients)}"));
            if (!cache.TryGetValue(key, out var density))
            {
                var atom = FreeAtom.Compute(result, a, cancellationToken);
                density = SphericalAtom.Average(atom.Basis, atom.DensityTotal);
                cache[key] = density;
            }
            list.Add((a, density, indices));
        }
        return list;
    }
}
