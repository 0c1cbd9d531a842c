using MathNet.Numerics.LinearAlgebra;

namespace Orbitarium.Scf;

/// <summary>
/// Pulay's direct inversion in the iterative subspace: extrapolates the Fock matrix as the combination of earlier
/// Fock matrices whose error vectors (the commutators FDS − SDF) combine to the smallest norm, with coefficients summing to one.
/// </summary>
/// <remarks>P. Pulay, Chem. Phys. Lett. 73, 393 (1980); J. Comput. Chem. 3, 556 (1982). Several matrices
/// per entry (α and β for an unrestricted reference) share one set of coefficients; their error norms add.
/// When the subspace is full the oldest entry is dropped; when the DIIS equations are singular the oldest
/// entries are dropped until they are not.</remarks>
public sealed class Diis
{
    private readonly int _capacity;
    private readonly List<(Matrix<double>[] Focks, Matrix<double>[] Errors)> _entries = [];

    /// <summary>Creates a DIIS extrapolator keeping at most <paramref name="subspaceSize"/> entries.</summary>
    /// <exception cref="ArgumentOutOfRangeException">The size is less than 1.</exception>
    public Diis(int subspaceSize)
    {
        ArgumentOutOfRangeException.ThrowIfLessThan(subspaceSize, 1);
        _capacity = subspaceSize;
    }

    /// <summary>Number of entries currently in the subspace.</summary>
    public int Count => _entries.Count;

    /// <summary>Largest number of entries kept.</summary>
    public int Capacity => _capacity;

    /// <summary>Forgets every entry.</summary>
    public void Clear() => _entries.Clear();

    /// <summary>Adds Fock matrices and their error matrices (same count, e.g. one for RHF, two for UHF).</summary>
    public void Add(IReadOnlyList<Matrix<double>> focks, IReadOnlyList<Matrix<double>> errors)
    {
        ArgumentNullException.ThrowIfNull(focks);
        ArgumentNullException.ThrowIfNull(errors);
        if (focks.Count == 0 || focks.Count != errors.Count)
            throw new ArgumentException($"Give one error matrix per Fock matrix: {focks.Count} Fock, {errors.Count} error.", nameof(errors));
        if (_entries.Count == _capacity) _entries.RemoveAt(0);
        _entries.Add(([.. focks.Select(f => f.Clone())], [.. errors.Select(e => e.Clone())]));
    }

    /// <summary>The extrapolated Fock matrices Σᵢ cᵢ Fᵢ, where c minimises |Σᵢ cᵢ eᵢ|² subject to Σᵢ cᵢ = 1.</summary>
    /// <exception cref="InvalidOperationException">The subspace is empty.</exception>
    public Matrix<double>[] Extrapolate()
    {
        if (_entries.Count == 0)
            throw new InvalidOperationException("DIIS has no entries yet; add a Fock matrix and its error first.");
        while (true)
        {
            double[]? c = Coefficients();
            if (c is not null)
            {
                int parts = _entries[0].Focks.Length;
                var result = new Matrix<double>[parts];
                for (int p = 0; p < parts; p++)
                {
                    var f = Matrix<double>.Build.Dense(_entries[0].Focks[p].RowCount, _entries[0].Focks[p].ColumnCount);
                    for (int i = 0; i < _entries.Count; i++) f.Add(_entries[i].Focks[p].Multiply(c[i]), f);
                    result[p] = f;
                }
                return result;
            }
            _entries.RemoveAt(0);
        }
    }

    private double[]? Coefficients()
    {
        int m = _entries.Count;
        if (m == 1) return [1.0];
        var b = Matrix<double>.Build.Dense(m + 1, m + 1);
        for (int i = 0; i < m; i++)
            for (int j = 0; j <= i; j++)
            {
                double dot = 0;
                var ei = _entries[i].Errors;
                var ej = _entries[j].Errors;
                for (int p = 0; p < ei.Length; p++) dot += Frobenius(ei[p], ej[p]);
                b[i, j] = dot;
                b[j, i] = dot;
            }
        // Symmetric diagonal scaling d_i = 1/sqrt(B_ii) keeps the equations well conditioned when the error norms
        // span many orders of magnitude: with c = d∘y, solve [dBd, −d; −dᵀ, 0][y; λ] = [0; −1].
        var d = new double[m];
        for (int i = 0; i < m; i++)
        {
            if (!(b[i, i] > 0)) return null;
            d[i] = 1 / Math.Sqrt(b[i, i]);
        }
        for (int i = 0; i < m; i++)
            for (int j = 0; j < m; j++) b[i, j] *= d[i] * d[j];
        for (int i = 0; i < m; i++) { b[i, m] = -d[i]; b[m, i] = -d[i]; }
        var rhs = Vector<double>.Build.Dense(m + 1);
        rhs[m] = -1;
        var svd = b.Svd(true);
        double smax = svd.S[0], smin = svd.S[m];
        if (!(smin > 1e-12 * smax)) return null;
        var x = svd.Solve(rhs);
        var c = new double[m];
        double sum = 0;
        for (int i = 0; i < m; i++)
        {
            c[i] = x[i] * d[i];
            if (!double.IsFinite(c[i])) return null;
            sum += c[i];
        }
        if (Math.Abs(sum - 1) > 1e-6) return null;
        return c;
    }

    private static double Frobenius(Matrix<double> a, Matrix<double> b)
    {
        var x = a.AsColumnMajorArray() ?? a.ToColumnMajorArray();
        var y = b.AsColumnMajorArray() ?? b.ToColumnMajorArray();
        double s = 0;
        for (int k = 0; k < x.Length; k++) s += x[k] * y[k];
        return s;
    }
}
