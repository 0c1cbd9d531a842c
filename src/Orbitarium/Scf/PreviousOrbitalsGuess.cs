using MathNet.Numerics.LinearAlgebra;
using Orbitarium.BasisSets;

namespace Orbitarium.Scf;

/// <summary>
/// Starts an SCF from an earlier result (a neighbouring point of a scan, or a restart): the earlier α and β densities
/// give the first Fock matrices, whose eigenvectors in the current overlap are the first orbitals.
/// </summary>
/// <remarks>The basis must have the same functions on the same atoms (the geometry may differ). A restricted
/// result can start an unrestricted run and vice versa. Common practice for scans and restarts.</remarks>
public static class PreviousOrbitalsGuess
{
    /// <summary>The α and β densities of <paramref name="previous"/>, checked against <paramref name="basis"/>.</summary>
    /// <exception cref="OrbitariumInputException">The earlier result used a different basis.</exception>
    public static (Matrix<double> Alpha, Matrix<double> Beta) Densities(MolecularBasis basis, ScfResult previous)
    {
        ArgumentNullException.ThrowIfNull(basis);
        ArgumentNullException.ThrowIfNull(previous);
        var old = previous.Basis;
        bool same = old.FunctionCount == basis.FunctionCount;
        for (int i = 0; same && i < basis.FunctionCount; i++)
            same = old.FunctionLabels[i] == basis.FunctionLabels[i];
        if (!same)
            throw new OrbitariumInputException(
                $"The starting orbitals come from a different basis ({old.Name}, {old.FunctionCount} functions on {old.Molecule.Formula}) than this run ({basis.Name}, {basis.FunctionCount} functions on {basis.Molecule.Formula}); start from a result with the same basis and atoms, or use another guess.");
        return (previous.DensityAlpha, previous.DensityBeta);
    }
}
