using MathNet.Numerics.LinearAlgebra;

namespace Orbitarium.Geometry.Vibrations;

/// <summary>Translations and infinitesimal rotations of a molecule as vectors in (optionally mass-weighted) Cartesian
/// space, and the projector that removes them.</summary>
/// <remarks>Common practice (Eckart conditions); see E. B. Wilson, J. C. Decius and P. C. Cross,
/// <i>Molecular Vibrations</i> (1955), §11-2. A linear molecule has 5 such modes, a single atom 3.</remarks>
public static class RigidBodyModes
{
    /// <summary>An orthonormal basis (3N × k columns) of the rigid-body motions at <paramref name="positionsBohr"/>;
    /// with <paramref name="massesDalton"/> the vectors are mass-weighted (√m scaling, rotations about the centre of mass).</summary>
    public static Matrix<double> Basis(ReadOnlySpan<double> positionsBohr, ReadOnlySpan<double> massesDalton = default)
    {
        int n = positionsBohr.Length / 3;
        bool weighted = !massesDalton.IsEmpty;
        var w = new double[n];
        double total = 0;
        var com = new double[3];
        for (int a = 0; a < n; a++)
        {
            double m = weighted ? massesDalton[a] : 1.0;
            w[a] = Math.Sqrt(m);
            total += m;
            for (int k = 0; k < 3; k++) com[k] += m * positionsBohr[3 * a + k];
        }
        for (int k = 0; k < 3; k++) com[k] /= Math.Max(total, 1e-300);
        var candidates = new List<Vector<double>>();
        for (int k = 0; k < 3; k++)
        {
            var v = Vector<double>.Build.Dense(3 * n);
            for (int a = 0; a < n; a++) v[3 * a + k] = w[a];
            candidates.Add(v);
        }
        for (int k = 0; k < 3; k++)
        {
            var v = Vector<double>.Build.Dense(3 * n);
            for (int a = 0; a < n; a++)
            {
                double rx = positionsBohr[3 * a] - com[0], ry = positionsBohr[3 * a + 1] - com[1], rz = positionsBohr[3 * a + 2] - com[2];
                // e_k × r
                double cx = k == 0 ? 0 : k == 1 ? rz : -ry;
                double cy = k == 0 ? -rz : k == 1 ? 0 : rx;
                double cz = k == 0 ? ry : k == 1 ? -rx : 0;
                v[3 * a] = w[a] * cx; v[3 * a + 1] = w[a] * cy; v[3 * a + 2] = w[a] * cz;
            }
            candidates.Add(v);
        }
        var basis = new List<Vector<double>>();
        foreach (var c in candidates)
        {
            var v = c.Clone();
            foreach (var b in basis) v -= v.DotProduct(b) * b;
            foreach (var b in basis) v -= v.DotProduct(b) * b;
            double norm = v.L2Norm();
            if (norm > 1e-6 * Math.Max(c.L2Norm(), 1e-300) && norm > 1e-8) basis.Add(v / norm);
        }
        var result = Matrix<double>.Build.Dense(3 * n, basis.Count);
        for (int i = 0; i < basis.Count; i++) result.SetColumn(i, basis[i]);
        return result;
    }

    /// <summary>The projector 1 − Σ tᵢtᵢᵀ onto the complement of the rigid-body motions.</summary>
    public static Matrix<double> Projector(ReadOnlySpan<double> positionsBohr, ReadOnlySpan<double> massesDalton = default)
    {
        var t = Basis(positionsBohr, massesDalton);
        return Matrix<double>.Build.DenseIdentity(positionsBohr.Length) - t * t.Transpose();
    }

    /// <summary>An orthonormal basis (3N × (3N − k)) of the complement of the rigid-body motions: the internal
    /// (vibrational) space.</summary>
    public static Matrix<double> ComplementBasis(ReadOnlySpan<double> positionsBohr, ReadOnlySpan<double> massesDalton = default)
    {
        var t = Basis(positionsBohr, massesDalton);
        int n3 = positionsBohr.Length;
        var p = Matrix<double>.Build.DenseIdentity(n3) - t * t.Transpose();
        var evd = p.Evd(Symmetricity.Symmetric);
        var cols = new List<Vector<double>>();
        for (int i = 0; i < n3; i++)
            if (evd.EigenValues[i].Real > 0.5) cols.Add(evd.EigenVectors.Column(i));
        var d = Matrix<double>.Build.Dense(n3, cols.Count);
        for (int i = 0; i < cols.Count; i++) d.SetColumn(i, cols[i]);
        return d;
    }
}
