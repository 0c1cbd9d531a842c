using MathNet.Numerics.LinearAlgebra;
using Orbitarium.BasisSets;

namespace Orbitarium.Analysis;

/// <summary>
/// Mayer bond orders B_AB = 2 Σ_{μ∈A} Σ_{ν∈B} [(P^α S)_μν (P^α S)_νμ + (P^β S)_μν (P^β S)_νμ]
/// (I. Mayer, Chem. Phys. Lett. 97, 270 (1983)); for a closed shell this is Σ (PS)_μν (PS)_νμ with P = P^α + P^β.
/// </summary>
public static class MayerBondOrder
{
    /// <summary>Computes Mayer bond orders from the α and β AO density matrices.</summary>
    /// <param name="basis">The basis.</param>
    /// <param name="overlap">AO overlap matrix S.</param>
    /// <param name="densityAlpha">α AO density matrix.</param>
    /// <param name="densityBeta">β AO density matrix (equal to α for a closed shell).</param>
    public static BondOrderTable Compute(MolecularBasis basis, Matrix<double> overlap, Matrix<double> densityAlpha, Matrix<double> densityBeta)
    {
        ArgumentNullException.ThrowIfNull(basis);
        ArgumentNullException.ThrowIfNull(overlap);
        ArgumentNullException.ThrowIfNull(densityAlpha);
        ArgumentNullException.ThrowIfNull(densityBeta);
        int n = basis.FunctionCount;
        foreach (var (m, what) in new[] { (overlap, "overlap"), (densityAlpha, "α density"), (densityBeta, "β density") })
            if (m.RowCount != n || m.ColumnCount != n)
                throw new OrbitariumInputException($"The {what} matrix is {m.RowCount}x{m.ColumnCount} but the basis has {n} functions.");
        var pa = densityAlpha * overlap;
        var pb = densityBeta * overlap;
        int atoms = basis.Molecule.AtomCount;
        var b = new double[atoms, atoms];
        for (int mu = 0; mu < n; mu++)
        {
            int a = basis.FunctionAtoms[mu];
            for (int nu = 0; nu < n; nu++)
            {
                int c = basis.FunctionAtoms[nu];
                if (a == c || a < 0 || c < 0) continue;
                b[a, c] += 2 * (pa[mu, nu] * pa[nu, mu] + pb[mu, nu] * pb[nu, mu]);
            }
        }
        return new BondOrderTable(basis.Molecule, b, "Mayer");
    }
}
