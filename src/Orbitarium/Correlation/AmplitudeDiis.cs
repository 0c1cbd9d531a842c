using MathNet.Numerics.LinearAlgebra;

namespace Orbitarium.Correlation;

/// <summary>
/// Direct inversion in the iterative subspace (DIIS) for amplitude equations: keeps the last few amplitude vectors
/// and their changes, and returns the combination with the smallest change.
/// </summary>
/// <remarks>P. Pulay, Chem. Phys. Lett. 73, 393 (1980); applied to coupled-cluster amplitudes by G. E. Scuseria,
/// T. J. Lee and H. F. Schaefer, Chem. Phys. Lett. 130, 236 (1986).</remarks>
internal sealed class AmplitudeDiis
{
    private readonly int _capacity;
    private readonly List<double[]> _vectors = [];
    private readonly List<double[]> _errors = [];

    public AmplitudeDiis(int capacity) => _capacity = capacity;

    /// <summary>Adds a vector and its error (change), and overwrites <paramref name="vector"/> with the extrapolation.</summary>
    public void Extrapolate(double[] vector, double[] error)
    {
        if (_capacity < 2) return;
        double[]? oldVector = null, oldError = null;
        if (_vectors.Count == _capacity)
        {
            oldVector = _vectors[0];
            oldError = _errors[0];
            _vectors.RemoveAt(0);
            _errors.RemoveAt(0);
        }
        // The oldest pair's arrays are reused once the subspace is full, so a long run allocates nothing here.
        _vectors.Add(CopyInto(oldVector, vector));
        _errors.Add(CopyInto(oldError, error));
        int k = _vectors.Count;
        if (k < 2) return;
        var b = Matrix<double>.Build.Dense(k + 1, k + 1);
        for (int i = 0; i < k; i++)
            for (int j = 0; j <= i; j++)
            {
                double d = Dot(_errors[i], _errors[j]);
                b[i, j] = d;
                b[j, i] = d;
            }
        double scale = 0;
        for (int i = 0; i < k; i++) scale = Math.Max(scale, b[i, i]);
        if (scale <= 0) return;
        for (int i = 0; i < k; i++)
        {
            for (int j = 0; j < k; j++) b[i, j] /= scale;
            b[i, k] = -1;
            b[k, i] = -1;
        }
        var rhs = Vector<double>.Build.Dense(k + 1);
        rhs[k] = -1;
        Vector<double> c;
        try
        {
            c = b.Svd().Solve(rhs);
        }
        catch (Exception)
        {
            return;
        }
        for (int i = 0; i < c.Count; i++)
            if (!double.IsFinite(c[i])) return;
        Array.Clear(vector);
        for (int i = 0; i < k; i++)
        {
            double ci = c[i];
            var v = _vectors[i];
            for (int p = 0; p < vector.Length; p++) vector[p] += ci * v[p];
        }
    }

    private static double[] CopyInto(double[]? target, double[] source)
    {
        if (target is null || target.Length != source.Length) return (double[])source.Clone();
        Array.Copy(source, target, source.Length);
        return target;
    }

    private static double Dot(double[] a, double[] b)
    {
        double s = 0;
        for (int i = 0; i < a.Length; i++) s += a[i] * b[i];
        return s;
    }
}
