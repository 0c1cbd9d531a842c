using MathNet.Numerics.LinearAlgebra;
using Orbitarium.Scf;

namespace Orbitarium.Tests.Scf;

public class DiisTests
{
    private static Matrix<double> M(params double[] values) => Matrix<double>.Build.Dense(1, values.Length, values);

    [Fact]
    public void Two_opposite_errors_give_equal_weights()
    {
        // Pulay (1980): minimise |Σ cᵢ eᵢ|² with Σ cᵢ = 1; for e₁ = −e₂ the minimum is c = (½, ½), error zero.
        var diis = new Diis(4);
        diis.Add([M(2.0)], [M(1.0)]);
        diis.Add([M(4.0)], [M(-1.0)]);
        Assert.Equal(3.0, diis.Extrapolate()[0][0, 0], 12);
    }

    [Fact]
    public void Extrapolation_of_a_linear_error_model_lands_on_its_zero()
    {
        // If the error is linear in the Fock matrix, e(F) = A(F − F*), DIIS recovers F* exactly from two points (identity).
        var diis = new Diis(8);
        double fStar = 1.7;
        foreach (double f in new[] { 0.3, 2.9 }) diis.Add([M(f, 2 * f)], [M(3 * (f - fStar), -(f - fStar))]);
        var x = diis.Extrapolate()[0];
        Assert.Equal(fStar, x[0, 0], 12);
        Assert.Equal(2 * fStar, x[0, 1], 12);
    }

    [Fact]
    public void The_oldest_entry_leaves_when_the_subspace_is_full()
    {
        var diis = new Diis(2);
        diis.Add([M(1.0)], [M(1.0)]);
        diis.Add([M(2.0)], [M(0.5)]);
        diis.Add([M(3.0)], [M(0.25)]);
        Assert.Equal(2, diis.Count);
    }

    [Fact]
    public void Identical_errors_do_not_break_the_solver()
    {
        var diis = new Diis(4);
        diis.Add([M(1.0)], [M(0.5)]);
        diis.Add([M(1.0)], [M(0.5)]);
        Assert.True(double.IsFinite(diis.Extrapolate()[0][0, 0]));
    }
}
