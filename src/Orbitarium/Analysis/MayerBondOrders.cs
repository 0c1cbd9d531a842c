using MathNet.Numerics.LinearAlgebra;
using Orbitarium.Scf;

namespace Orbitarium.Analysis;

/// <summary>Mayer bond orders B_AB = 2 Σ_{μ∈A} Σ_{ν∈B} [(D^αS)_μν (D^αS)_νμ + (D^βS)_μν (D^βS)_νμ], which reduce to
/// Σ (DS)_μν (DS)_νμ for a closed shell.</summary>
/// <remarks>I. Mayer, Chem. Phys. Lett. 97, 270 (1983); Int. J. Quantum Chem. 29, 477 (1986). Close to 1, 2 and 3 for
/// single, double and triple bonds in small bases; exactly 1 for H₂ in a minimal basis.</remarks>
public static class MayerBondOrders
{
    /// <summary>The symmetric atom × atom matrix of bond orders (diagonal left zero).</summary>
    public static Matrix<double> Compute(ScfResult result)
    {
        ArgumentNullException.ThrowIfNull(result);
        var basis = result.Basis;
        int atoms = result.Molecule.AtomCount, n = basis.FunctionCount;
        var pa = result.DensityAlpha * result.Overlap;
        var pb = result.DensityBeta * result.Overlap;
        var b = Matrix<double>.Build.Dense(atoms, atoms);
        for (int mu = 0; mu < n; mu++)
        {
            int a = basis.FunctionAtoms[mu];
            if (a < 0) continue;
            for (int nu = 0; nu < n; nu++)
            {
                int c = basis.FunctionAtoms[nu];
                if (c < 0 || c == a) continue;
                b[a, c] += 2 * (pa[mu, nu] * pa[nu, mu] + pb[mu, nu] * pb[nu, mu]);
            }
        }
        return b;
    }

    /// <summary>Bonds with an order above <paramref name="threshold"/> (default 0.1), as (atom i, atom j, order) with i &lt; j.</summary>
    public static IReadOnlyList<(int I, int J, double Order)> Bonds(ScfResult result, double threshold = 0.1)
    {
        var b = Compute(result);
        var list = new List<(int, int, double)>();
        for (int i = 0; i < b.RowCount; i++)
            for (int j = i + 1; j < b.ColumnCount; j++)
                if (b[i, j] > threshold) list.Add((i, j, b[i, j]));
        return list;
    }
}
