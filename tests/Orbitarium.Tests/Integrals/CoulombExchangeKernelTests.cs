using MathNet.Numerics.LinearAlgebra;
using Orbitarium.Integrals;

namespace Orbitarium.Tests.Integrals;

/// <summary>J and K from the in-core and integral-direct kernels against the definition applied to the dense tensor
/// (J_μν = Σ (μν|λσ) D_λσ, K_μν = Σ (μλ|νσ) D_λσ; common practice).</summary>
public class CoulombExchangeKernelTests
{
    private static Matrix<double> RandomSymmetric(int n, int seed)
    {
        var rng = new Random(seed);
        var m = Matrix<double>.Build.Dense(n, n, (_, _) => rng.NextDouble() - 0.5);
        return m + m.Transpose();
    }

    [Theory]
    [InlineData(true)]
    [InlineData(false)]
    public void In_core_and_direct_kernels_reproduce_the_definition(bool pure)
    {
        var basis = TestBases.WaterSpdf(pure);
        int n = basis.FunctionCount;
        var tensor = ElectronRepulsionTensor.Compute(basis, 0.0);
        var dense = tensor.ToDense();
        var d1 = RandomSymmetric(n, 1);
        var d2 = RandomSymmetric(n, 2);
        var expectedJ = Matrix<double>.Build.Dense(n, n);
        var expectedK = Matrix<double>.Build.Dense(n, n);
        for (int i = 0; i < n; i++)
            for (int j = 0; j < n; j++)
            {
                double jv = 0, kv = 0;
                for (int k = 0; k < n; k++)
                    for (int l = 0; l < n; l++)
                    {
                        jv += dense[((i * n + j) * n + k) * n + l] * d1[k, l];
                        kv += dense[((i * n + k) * n + j) * n + l] * d1[k, l];
                    }
                expectedJ[i, j] = jv;
                expectedK[i, j] = kv;
            }
        ICoulombExchangeKernel[] kernels = [new InCoreCoulombExchangeKernel(tensor), new DirectCoulombExchangeKernel(basis, 0.0)];
        foreach (var kernel in kernels)
        {
            var r = kernel.Build([d1, d2]);
            Assert.Equal(2, r.Coulomb.Count);
            Assert.NotNull(r.Exchange);
            Assert.True((r.Coulomb[0] - expectedJ).InfinityNorm() < 1e-11, kernel.Mode);
            Assert.True((r.Exchange![0] - expectedK).InfinityNorm() < 1e-11, kernel.Mode);
        }
    }

    [Fact]
    public void Factory_chooses_in_core_when_the_tensor_fits_and_direct_otherwise()
    {
        var basis = TestBases.H2Sto3G();
        Assert.StartsWith("in-core", CoulombExchangeKernel.Create(basis, 1 << 20).Mode);
        Assert.StartsWith("integral-direct", CoulombExchangeKernel.Create(basis, 10).Mode);
        Assert.StartsWith("integral-direct", CoulombExchangeKernel.Create(basis, 1 << 20, forceDirect: true).Mode);
    }
}
