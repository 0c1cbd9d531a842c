using MathNet.Numerics.LinearAlgebra;
using Orbitarium.Scf;

namespace Orbitarium.Tests.Scf;

public class OrthogonalizerTests
{
    private static Matrix<double> RandomOverlap(int n, int seed)
    {
        var a = Matrix<double>.Build.Random(n, n, seed);
        return a * a.Transpose() + Matrix<double>.Build.DenseIdentity(n);
    }

    [Theory]
    [InlineData(4, 1)]
    [InlineData(12, 2)]
    [InlineData(30, 3)]
    public void Both_forms_make_the_basis_orthonormal(int n, int seed)
    {
        // Identity (Szabo & Ostlund §3.4.5): XᵀSX = 1; the symmetric X is S^(−1/2), hence symmetric.
        var s = RandomOverlap(n, seed);
        foreach (var kind in new[] { OrthogonalizationKind.Symmetric, OrthogonalizationKind.Canonical })
        {
            var x = Orthogonalizer.Create(s, kind).Transform;
            var unit = x.TransposeThisAndMultiply(s) * x;
            Assert.True((unit - Matrix<double>.Build.DenseIdentity(n)).InfinityNorm() < 1e-10);
        }
        var sym = Orthogonalizer.Create(s).Transform;
        Assert.True((sym - sym.Transpose()).InfinityNorm() < 1e-10);
    }

    [Fact]
    public void Canonical_form_drops_near_null_directions_and_counts_them()
    {
        // Two identical functions: one overlap eigenvalue is exactly zero.
        var s = Matrix<double>.Build.DenseOfArray(new[,] { { 1.0, 1.0, 0.2 }, { 1.0, 1.0, 0.2 }, { 0.2, 0.2, 1.0 } });
        var o = Orthogonalizer.Create(s, OrthogonalizationKind.Symmetric);
        Assert.Equal(OrthogonalizationKind.Canonical, o.KindUsed);
        Assert.Equal(1, o.DroppedCount);
        Assert.Equal(2, o.OrbitalCount);
    }
}
