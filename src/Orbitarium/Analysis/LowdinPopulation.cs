using MathNet.Numerics.LinearAlgebra;
using Orbitarium.Scf;

namespace Orbitarium.Analysis;

/// <summary>Löwdin population analysis: populations (S^(1/2) D S^(1/2))_μμ in the symmetrically orthogonalised basis,
/// summed over each atom's functions.</summary>
/// <remarks>P.-O. Löwdin, J. Chem. Phys. 18, 365 (1950); Szabo &amp; Ostlund, <i>Modern Quantum Chemistry</i>, eq. 3.200.</remarks>
public static class LowdinPopulation
{
    /// <summary>Löwdin charges of an SCF result.</summary>
    public static AtomicCharges Charges(ScfResult result)
    {
        ArgumentNullException.ThrowIfNull(result);
        var half = SquareRoot(result.Overlap);
        return MullikenPopulation.Analyse("Löwdin", result, d => half * d * half);
    }

    /// <summary>S^(1/2) of a symmetric positive semi-definite matrix (negative round-off eigenvalues set to zero).</summary>
    internal static Matrix<double> SquareRoot(Matrix<double> s)
    {
        var evd = s.Evd(Symmetricity.Symmetric);
        var u = evd.EigenVectors;
        var scaled = u.Clone();
        for (int k = 0; k < s.RowCount; k++)
        {
            double f = Math.Sqrt(Math.Max(0, evd.EigenValues[k].Real));
            for (int i = 0; i < s.RowCount; i++) scaled[i, k] *= f;
        }
        return scaled.TransposeAndMultiply(u);
    }
}
