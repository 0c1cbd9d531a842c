using Orbitarium.BasisSets;
using Orbitarium.Chemistry;

namespace Orbitarium.Tests.BasisSets;

public class BasisFunctionEvaluatorTests
{
    private static MolecularBasis OneCentre(int l, bool pure, params double[] exponents)
    {
        var set = BasisSet.Create("test", pure).WithElement("He",
            new ShellDefinition(l, exponents, exponents.Select((_, i) => 1.0 / (i + 1)).ToArray()));
        var mol = Molecule.Empty.AddAtom("He", 0.1, -0.2, 0.3, LengthUnit.Bohr);
        return MolecularBasis.Create(mol, set);
    }

    [Theory]
    [InlineData(0, false)]
    [InlineData(1, false)]
    [InlineData(2, false)]
    [InlineData(2, true)]
    [InlineData(3, true)]
    [InlineData(3, false)]
    [InlineData(4, true)]
    public void Functions_are_normalised_and_pure_ones_orthogonal_by_quadrature(int l, bool pure)
    {
        // Gauss–Hermite product quadrature integrates polynomial × exp(−r²) exactly (common practice);
        // a single-primitive shell with α = 0.5 makes φ_μ φ_ν exactly such an integrand.
        var basis = OneCentre(l, pure, 0.5);
        var (nodes, weights) = GaussHermite(24);
        int n = basis.FunctionCount;
        var overlap = new double[n, n];
        var center = basis.Shells[0].CenterBohr;
        var values = new double[n];
        for (int i = 0; i < nodes.Length; i++)
            for (int j = 0; j < nodes.Length; j++)
                for (int k = 0; k < nodes.Length; k++)
                {
                    var p = center + new Vector3D(nodes[i], nodes[j], nodes[k]);
                    BasisFunctionEvaluator.EvaluateValues(basis, [p], values);
                    double w = weights[i] * weights[j] * weights[k] * Math.Exp(nodes[i] * nodes[i] + nodes[j] * nodes[j] + nodes[k] * nodes[k]);
                    for (int a = 0; a < n; a++)
                        for (int b = 0; b < n; b++)
                            overlap[a, b] += w * values[a] * values[b];
                }
        for (int a = 0; a < n; a++)
        {
            Assert.Equal(1.0, overlap[a, a], 10);
            if (pure || l <= 1)
                for (int b = 0; b < a; b++) Assert.Equal(0.0, overlap[a, b], 10);
        }
    }

    [Fact]
    public void Gradients_match_central_differences()
    {
        // Common practice: an analytic derivative agrees with a central difference to O(h²).
        var basis = OneCentre(3, true, 1.3, 0.4);
        int n = basis.FunctionCount;
        var point = new Vector3D(0.7, 0.2, -0.5);
        var v = new double[n]; var gx = new double[n]; var gy = new double[n]; var gz = new double[n];
        BasisFunctionEvaluator.EvaluateWithGradients(basis, [point], v, gx, gy, gz);
        Assert.Equal(BasisFunctionEvaluator.Evaluate(basis, point), v);
        const double h = 1e-5;
        var grads = new[] { gx, gy, gz };
        for (int axis = 0; axis < 3; axis++)
        {
            var d = new Vector3D(axis == 0 ? h : 0, axis == 1 ? h : 0, axis == 2 ? h : 0);
            var plus = BasisFunctionEvaluator.Evaluate(basis, point + d);
            var minus = BasisFunctionEvaluator.Evaluate(basis, point - d);
            for (int mu = 0; mu < n; mu++)
                Assert.Equal((plus[mu] - minus[mu]) / (2 * h), grads[axis][mu], 8);
        }
    }

    /// <summary>Gauss–Hermite nodes and weights by Golub–Welsch (eigenvalues of the Jacobi matrix).</summary>
    private static (double[] Nodes, double[] Weights) GaussHermite(int n)
    {
        var j = MathNet.Numerics.LinearAlgebra.Matrix<double>.Build.Dense(n, n);
        for (int i = 1; i < n; i++) j[i, i - 1] = j[i - 1, i] = Math.Sqrt(i / 2.0);
        var evd = j.Evd(MathNet.Numerics.LinearAlgebra.Symmetricity.Symmetric);
        var nodes = new double[n];
        var weights = new double[n];
        for (int i = 0; i < n; i++)
        {
            nodes[i] = evd.EigenValues[i].Real;
            double v0 = evd.EigenVectors[0, i];
            weights[i] = Math.Sqrt(Math.PI) * v0 * v0;
        }
        return (nodes, weights);
    }
}
