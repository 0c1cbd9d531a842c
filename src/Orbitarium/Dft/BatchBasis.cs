using Orbitarium.BasisSets;
using Orbitarium.Chemistry;
using Orbitarium.Dft.Grids;

namespace Orbitarium.Dft;

/// <summary>The basis functions that matter on one grid batch: the shells whose most diffuse primitive reaches the
/// batch's bounding sphere above <see cref="ValueThreshold"/>, placed as a small basis of their own.</summary>
internal sealed class BatchBasis
{
    /// <summary>Basis-function values below this (in the shell's normalisation) are treated as zero: 1e-11.</summary>
    public const double ValueThreshold = 1e-11;

    private BatchBasis(MolecularBasis? basis, int[] functions)
    {
        Basis = basis;
        Functions = functions;
    }

    /// <summary>The sub-basis (null when no shell reaches the batch).</summary>
    public MolecularBasis? Basis { get; }

    /// <summary>Global index of each function of <see cref="Basis"/>.</summary>
    public int[] Functions { get; }

    /// <summary>One sub-basis per batch of <paramref name="grid"/>.</summary>
    public static BatchBasis[] ForGrid(MolecularBasis basis, MolecularGrid grid)
    {
        var shells = basis.Shells;
        var extent = new double[shells.Length];
        for (int s = 0; s < shells.Length; s++) extent[s] = ExtentBohr(shells[s]);
        var result = new BatchBasis[grid.Batches.Length];
        Parallel.For(0, result.Length, b =>
        {
            var batch = grid.Batches[b];
            var chosen = new List<Shell>();
            var functions = new List<int>();
            for (int s = 0; s < shells.Length; s++)
            {
                double d = Vector3D.Distance(shells[s].CenterBohr, batch.CenterBohr) - batch.RadiusBohr;
                if (d > extent[s]) continue;
                chosen.Add(shells[s]);
                int off = basis.ShellOffsets[s];
                for (int f = 0; f < shells[s].FunctionCount; f++) functions.Add(off + f);
            }
            result[b] = chosen.Count == 0 ? new BatchBasis(null, [])
                : new BatchBasis(MolecularBasis.FromShells(basis.Molecule, chosen, basis.Name), [.. functions]);
        });
        return result;
    }

    /// <summary>Distance beyond which every function of the shell is below <see cref="ValueThreshold"/>: the largest r
    /// with |c_k| r^L exp(−α_k r²) ≥ threshold over the primitives (fixed-point iteration on r).</summary>
    internal static double ExtentBohr(Shell shell)
    {
        int l = shell.AngularMomentum;
        double best = 0;
        var a = shell.ExponentArray;
        var c = shell.CoefficientArray;
        for (int k = 0; k < a.Length; k++)
        {
            // Cartesian-to-pure transforms can add a factor of a few; allow 10.
            double logC = Math.Log(10 * Math.Abs(c[k]) + 1e-300) - Math.Log(ValueThreshold);
            if (logC <= 0) continue;
            double r = Math.Sqrt(logC / a[k]);
            for (int it = 0; it < 20; it++)
                r = Math.Sqrt(Math.Max(logC + l * Math.Log(Math.Max(r, 1e-3)), 0) / a[k]);
            best = Math.Max(best, r);
        }
        return best;
    }
}
