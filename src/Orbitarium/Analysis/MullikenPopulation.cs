using System.Collections.Immutable;
using MathNet.Numerics.LinearAlgebra;
using Orbitarium.Scf;

namespace Orbitarium.Analysis;

/// <summary>Mulliken population analysis: each basis function's gross population is (DS)_μμ, summed over the
/// functions of each atom.</summary>
/// <remarks>R. S. Mulliken, J. Chem. Phys. 23, 1833 (1955); Szabo &amp; Ostlund, <i>Modern Quantum Chemistry</i>, eq. 3.196.
/// Strongly basis-dependent; compare charges only within one basis.</remarks>
public static class MullikenPopulation
{
    /// <summary>Mulliken charges of an SCF result.</summary>
    public static AtomicCharges Charges(ScfResult result)
    {
        ArgumentNullException.ThrowIfNull(result);
        return Analyse("Mulliken", result, d => d * result.Overlap);
    }

    internal static AtomicCharges Analyse(string method, ScfResult result, Func<Matrix<double>, Matrix<double>> weighted)
    {
        var basis = result.Basis;
        int atoms = result.Molecule.AtomCount;
        var pa = weighted(result.DensityAlpha);
        var pb = ReferenceEquals(result.DensityAlpha, result.DensityBeta) ? pa : weighted(result.DensityBeta);
        var pop = new double[atoms];
        var spin = new double[atoms];
        for (int mu = 0; mu < basis.FunctionCount; mu++)
        {
            int a = basis.FunctionAtoms[mu];
            if (a < 0) continue;
            pop[a] += pa[mu, mu] + pb[mu, mu];
            spin[a] += pa[mu, mu] - pb[mu, mu];
        }
        var charges = new double[atoms];
        for (int a = 0; a < atoms; a++) charges[a] = result.Molecule.Atoms[a].NuclearCharge - pop[a];
        return new AtomicCharges(method, result.Molecule, [.. charges], [.. pop], [.. spin]);
    }
}
