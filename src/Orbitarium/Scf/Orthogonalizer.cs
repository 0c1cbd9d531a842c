using MathNet.Numerics.LinearAlgebra;

namespace Orbitarium.Scf;

/// <summary>
/// Builds the matrix X that turns the non-orthogonal AO basis into an orthonormal one (XᵀSX = 1), symmetrically
/// (X = S^(−1/2)) or canonically (X = U s^(−1/2), dropping near-null overlap eigenvectors).
/// </summary>
/// <remarks>Szabo &amp; Ostlund, <i>Modern Quantum Chemistry</i>, §3.4.5; Löwdin, J. Chem. Phys. 18, 365 (1950).
/// When a symmetric orthogonalisation is asked for but the overlap has eigenvalues below the threshold, the
/// canonical form is used instead and <see cref="KindUsed"/> says so.</remarks>
public sealed class Orthogonalizer
{
    private Orthogonalizer(Matrix<double> x, OrthogonalizationKind kindUsed, int dropped, double smallest)
    {
        Transform = x;
        KindUsed = kindUsed;
        DroppedCount = dropped;
        SmallestOverlapEigenvalue = smallest;
    }

    /// <summary>The N × M matrix X (M = N − <see cref="DroppedCount"/>) with XᵀSX = 1.</summary>
    public Matrix<double> Transform { get; }

    /// <summary>The orthogonalisation actually used.</summary>
    public OrthogonalizationKind KindUsed { get; }

    /// <summary>Number of overlap eigenvectors dropped as linear dependencies.</summary>
    public int DroppedCount { get; }

    /// <summary>Smallest eigenvalue of the overlap matrix (a measure of near-linear dependency).</summary>
    public double SmallestOverlapEigenvalue { get; }

    /// <summary>Number of orthonormal functions kept (molecular orbitals available).</summary>
    public int OrbitalCount => Transform.ColumnCount;

    /// <summary>Builds X from the overlap matrix.</summary>
    /// <param name="overlap">The AO overlap matrix S (symmetric positive definite up to linear dependencies).</param>
    /// <param name="kind">Requested orthogonalisation.</param>
    /// <param name="linearDependencyThreshold">Overlap eigenvalues below this are dropped (default 1e-7).</param>
    /// <exception cref="OrbitariumInputException">Every eigenvalue is below the threshold (the basis is unusable).</exception>
    public static Orthogonalizer Create(Matrix<double> overlap, OrthogonalizationKind kind = OrthogonalizationKind.Symmetric,
        double linearDependencyThreshold = 1e-7)
    {
        ArgumentNullException.ThrowIfNull(overlap);
        if (overlap.RowCount != overlap.ColumnCount)
            throw new ArgumentException($"The overlap must be square, got {overlap.RowCount}x{overlap.ColumnCount}.", nameof(overlap));
        int n = overlap.RowCount;
        var evd = overlap.Evd(Symmetricity.Symmetric);
        var u = evd.EigenVectors;
        var s = evd.EigenValues;
        double smallest = double.PositiveInfinity;
        int kept = 0;
        for (int i = 0; i < n; i++)
        {
            double v = s[i].Real;
            smallest = Math.Min(smallest, v);
            if (v >= linearDependencyThreshold) kept++;
        }
        if (kept == 0)
            throw new OrbitariumInputException(
                $"Every overlap eigenvalue is below the linear-dependency threshold {linearDependencyThreshold}; the basis is unusable. Check the geometry and basis.");
        int dropped = n - kept;
        if (kind == OrthogonalizationKind.Symmetric && dropped == 0)
        {
            var x = Matrix<double>.Build.Dense(n, n);
            var scaled = u.Clone();
            for (int k = 0; k < n; k++)
            {
                double f = 1 / Math.Sqrt(s[k].Real);
                for (int i = 0; i < n; i++) scaled[i, k] *= f;
            }
            scaled.TransposeAndMultiply(u, x);
            return new Orthogonalizer(x, OrthogonalizationKind.Symmetric, 0, smallest);
        }
        var xc = Matrix<double>.Build.Dense(n, kept);
        int col = 0;
        for (int k = 0; k < n; k++)
        {
            double v = s[k].Real;
            if (v < linearDependencyThreshold) continue;
            double f = 1 / Math.Sqrt(v);
            for (int i = 0; i < n; i++) xc[i, col] = u[i, k] * f;
            col++;
        }
        return new Orthogonalizer(xc, OrthogonalizationKind.Canonical, dropped, smallest);
    }
}
