using MathNet.Numerics.LinearAlgebra;
using Orbitarium.BasisSets;
using Orbitarium.Chemistry;
using Orbitarium.Scf;

namespace Orbitarium.Tests.BasisSets;

/// <summary>
/// The cc-pVXZ contractions are the Hartree–Fock atomic orbitals of the atom expanded in the set's primitives
/// (T. H. Dunning, Jr., J. Chem. Phys. 90, 1007 (1989)): 1s and 2s for the two contracted s functions, 2p for the
/// contracted p. Recomputing them with Orbitarium's ROHF in the uncontracted primitive set checks every recalled
/// exponent and coefficient of the library files at once.
/// </summary>
public class CorrelationConsistentContractionTests
{
    // Ground-state multiplicities (common practice): B ²P, C ³P, N ⁴S, Ne ¹S. The printed coefficients have 6
    // decimals: agreement within 1.5e-6 (rounding plus SCF convergence). O (p⁴) and F (p⁵) are not checked this way:
    // their single-determinant ROHF orbitals differ from the paper's spherically averaged ones by up to 2e-4.
    public static TheoryData<string, string, int, double> Atoms() => new()
    {
        { "cc-pVDZ", "B", 2, 1.5e-6 }, { "cc-pVDZ", "C", 3, 1.5e-6 }, { "cc-pVDZ", "N", 4, 1.5e-6 }, { "cc-pVDZ", "Ne", 1, 1.5e-6 },
        { "cc-pVTZ", "B", 2, 1.5e-6 }, { "cc-pVTZ", "C", 3, 1.5e-6 }, { "cc-pVTZ", "N", 4, 1.5e-6 }, { "cc-pVTZ", "Ne", 1, 1.5e-6 },
    };

    [Theory]
    [MemberData(nameof(Atoms))]
    public void Contractions_are_the_atomic_orbitals_in_the_primitive_set(string setName, string symbol, int multiplicity, double tolerance)
    {
        var shells = BasisSetLibrary.Get(setName).ShellsFor(PeriodicTable.BySymbol(symbol));
        var sContracted = shells.Where(s => s.AngularMomentum == 0 && s.PrimitiveCount > 1).ToArray();
        var pContracted = shells.Single(s => s.AngularMomentum == 1 && s.PrimitiveCount > 1);
        Assert.Equal(2, sContracted.Length);
        var sExp = sContracted[0].Exponents;
        var pExp = pContracted.Exponents;

        var primitives = BasisSet.Create("primitives", false);
        foreach (double a in sExp) primitives = primitives.WithShell(symbol, 's', (a, 1.0));
        foreach (double a in pExp) primitives = primitives.WithShell(symbol, 'p', (a, 1.0));
        var atom = Molecule.Empty.AddAtom(symbol, 0, 0, 0).WithMultiplicity(multiplicity);
        var result = atom.WithBasis(primitives).RunRohf();
        Assert.True(result.Converged);
        var c = result.CoefficientsAlpha;
        int ns = sExp.Length;

        for (int orbital = 0; orbital < 2; orbital++)
        {
            var computed = Enumerable.Range(0, ns).Select(i => c[i, orbital]).ToArray();
            AssertSameUpToSign(sContracted[orbital].Coefficients.ToArray(), computed, tolerance, $"{setName} {symbol} {orbital + 1}s");
        }

        // 2p: the occupied orbital after 1s and 2s; take its largest Cartesian direction and normalise the radial part.
        var radial = Enumerable.Range(0, 3)
            .Select(d => Enumerable.Range(0, pExp.Length).Select(k => c[ns + 3 * k + d, 2]).ToArray())
            .OrderByDescending(v => v.Sum(x => x * x)).First();
        double norm = 0;
        for (int i = 0; i < pExp.Length; i++)
            for (int j = 0; j < pExp.Length; j++)
                norm += radial[i] * radial[j] * Math.Pow(2 * Math.Sqrt(pExp[i] * pExp[j]) / (pExp[i] + pExp[j]), 2.5);
        AssertSameUpToSign(pContracted.Coefficients.ToArray(), [.. radial.Select(x => x / Math.Sqrt(norm))], tolerance, $"{setName} {symbol} 2p");
    }

    private static void AssertSameUpToSign(double[] printed, double[] computed, double tolerance, string what)
    {
        double dot = Vector<double>.Build.DenseOfArray(printed).DotProduct(Vector<double>.Build.DenseOfArray(computed));
        double sign = Math.Sign(dot);
        for (int i = 0; i < printed.Length; i++)
            Assert.True(Math.Abs(printed[i] - sign * computed[i]) < tolerance,
                $"{what}, primitive {i + 1}: printed {printed[i]:F6}, computed {sign * computed[i]:F6}");
    }
}
