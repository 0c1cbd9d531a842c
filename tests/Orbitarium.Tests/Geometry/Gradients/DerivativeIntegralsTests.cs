using MathNet.Numerics.LinearAlgebra;
using Orbitarium.BasisSets;
using Orbitarium.Chemistry;
using Orbitarium.Geometry.Gradients;
using Orbitarium.Integrals;

namespace Orbitarium.Tests.Geometry.Gradients;

public class DerivativeIntegralsTests
{
    // A bent, asymmetric water so that no gradient component vanishes by symmetry.
    private static readonly Molecule Water = Molecule.FromXyz("3\n\nO 0.02 -0.01 0.11\nH 0.05 0.78 -0.45\nH -0.03 -0.74 -0.50");

    private static Matrix<double> RandomSymmetric(int n, int seed)
    {
        var rng = new Random(seed);
        var m = Matrix<double>.Build.Dense(n, n, (_, _) => rng.NextDouble() - 0.5);
        return 0.5 * (m + m.Transpose());
    }

    /// <summary>E(X) with the AO matrices held fixed: the functional whose derivative the analytic routines return.</summary>
    private static double Functional(Molecule m, BasisSet set, Matrix<double> w, Matrix<double> d, Matrix<double> da, Matrix<double> db)
    {
        var basis = MolecularBasis.Create(m, set);
        double e = -w.PointwiseMultiply(OneElectronIntegrals.Overlap(basis)).Enumerate().Sum();
        e += d.PointwiseMultiply(OneElectronIntegrals.Kinetic(basis) + OneElectronIntegrals.NuclearAttraction(basis)).Enumerate().Sum();
        var eri = ElectronRepulsionTensor.Compute(basis);
        int n = basis.FunctionCount;
        double e2 = 0;
        for (int i = 0; i < n; i++)
            for (int j = 0; j < n; j++)
                for (int k = 0; k < n; k++)
                    for (int l = 0; l < n; l++)
                    {
                        double v = eri[i, j, k, l];
                        e2 += v * (d[i, j] * d[k, l] - da[i, k] * da[j, l] - db[i, k] * db[j, l]);
                    }
        return e + 0.5 * e2 + m.NuclearRepulsionEnergyHartree;
    }

    [Theory]
    [InlineData("STO-3G")]
    [InlineData("6-31G*")]
    public void Derivative_integral_contractions_match_central_differences(string basisName)
    {
        // Identity check: with the AO matrices fixed, the analytic contraction equals dE/dX by central differences
        // (h = 1e-4 bohr, truncation error ~1e-9). 6-31G* brings Cartesian/pure d functions (L + 1 = f blocks).
        var set = BasisSetLibrary.Get(basisName);
        var basis = MolecularBasis.Create(Water, set);
        int n = basis.FunctionCount;
        var da = RandomSymmetric(n, 1) * 0.2;
        var db = RandomSymmetric(n, 2) * 0.2;
        var d = da + db;
        var w = RandomSymmetric(n, 3);
        var analytic = new double[9];
        var parts = new[]
        {
            DerivativeIntegrals.Overlap(basis, w), DerivativeIntegrals.Kinetic(basis, d), DerivativeIntegrals.NuclearAttraction(basis, d),
            DerivativeIntegrals.TwoElectron(basis, da, db), DerivativeIntegrals.NuclearRepulsion(Water),
        };
        for (int i = 0; i < 9; i++) analytic[i] = -parts[0][i] + parts[1][i] + parts[2][i] + parts[3][i] + parts[4][i];
        var x = Water.PositionsBohr();
        foreach (int i in new[] { 0, 4, 8 })
        {
            var xp = (double[])x.Clone(); xp[i] += 1e-4;
            var xm = (double[])x.Clone(); xm[i] -= 1e-4;
            double fd = (Functional(Water.WithPositionsBohr(xp), set, w, d, da, db) - Functional(Water.WithPositionsBohr(xm), set, w, d, da, db)) / 2e-4;
            Assert.Equal(fd, analytic[i], 6);
        }
    }
}
