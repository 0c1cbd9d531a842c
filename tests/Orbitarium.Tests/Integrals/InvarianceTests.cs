using MathNet.Numerics.LinearAlgebra;
using Orbitarium.Chemistry;
using Orbitarium.Integrals;

namespace Orbitarium.Tests.Integrals;

/// <summary>
/// Translating a molecule leaves every integral unchanged; rotating it mixes the functions of each shell by an
/// orthogonal matrix (pure shells), so spectra of S, T, V and the trace and norm of the ERI supermatrix (μν|λσ) are unchanged
/// (common practice: the Hamiltonian is invariant under rigid motions).
/// </summary>
public class InvarianceTests
{
    private static double[] SortedEigenvalues(Matrix<double> m)
    {
        var values = m.Evd(Symmetricity.Symmetric).EigenValues.Select(c => c.Real).ToArray();
        Array.Sort(values);
        return values;
    }

    private static void AssertClose(double[] expected, double[] actual, double tolerance)
    {
        Assert.Equal(expected.Length, actual.Length);
        for (int i = 0; i < expected.Length; i++)
            Assert.True(Math.Abs(expected[i] - actual[i]) <= tolerance, $"element {i}: {expected[i]:R} vs {actual[i]:R}");
    }

    [Fact]
    public void Translation_changes_no_integral()
    {
        var basis = TestBases.WaterSpdf(pure: true, withF: true);
        var moved = basis.WithMolecule(basis.Molecule.TranslatedBohr(new Vector3D(3.7, -12.1, 0.9)));
        Assert.True((OneElectronIntegrals.Overlap(basis) - OneElectronIntegrals.Overlap(moved)).InfinityNorm() < 1e-12);
        Assert.True((OneElectronIntegrals.Kinetic(basis) - OneElectronIntegrals.Kinetic(moved)).InfinityNorm() < 1e-11);
        Assert.True((OneElectronIntegrals.NuclearAttraction(basis) - OneElectronIntegrals.NuclearAttraction(moved)).InfinityNorm() < 1e-11);
        var g1 = ElectronRepulsionTensor.Compute(basis, 0.0).ToDense();
        var g2 = ElectronRepulsionTensor.Compute(moved, 0.0).ToDense();
        for (int i = 0; i < g1.Length; i++) Assert.True(Math.Abs(g1[i] - g2[i]) < 1e-11, $"element {i}");
    }

    [Fact]
    public void Rotation_keeps_the_spectra_of_one_and_two_electron_integrals()
    {
        var basis = TestBases.WaterSpdf(pure: true, withF: true);
        var rotated = basis.WithMolecule(basis.Molecule.RotatedAboutAxis(new Vector3D(0.3, -0.5, 0.8), 37.0));
        AssertClose(SortedEigenvalues(OneElectronIntegrals.Overlap(basis)), SortedEigenvalues(OneElectronIntegrals.Overlap(rotated)), 1e-12);
        AssertClose(SortedEigenvalues(OneElectronIntegrals.Kinetic(basis)), SortedEigenvalues(OneElectronIntegrals.Kinetic(rotated)), 1e-11);
        AssertClose(SortedEigenvalues(OneElectronIntegrals.NuclearAttraction(basis)), SortedEigenvalues(OneElectronIntegrals.NuclearAttraction(rotated)), 1e-11);
        int n = basis.FunctionCount;
        var g1 = ElectronRepulsionTensor.Compute(basis, 0.0).ToDense();
        var g2 = ElectronRepulsionTensor.Compute(rotated, 0.0).ToDense();
        var m1 = Matrix<double>.Build.Dense(n * n, n * n, (r, c) => g1[r * n * n + c]);
        var m2 = Matrix<double>.Build.Dense(n * n, n * n, (r, c) => g2[r * n * n + c]);
        Assert.Equal(m1.Trace(), m2.Trace(), 1e-10);
        Assert.Equal(m1.FrobeniusNorm(), m2.FrobeniusNorm(), 1e-10);
    }

    [Fact]
    public void Rotation_keeps_the_generalised_kinetic_spectrum_of_a_Cartesian_basis()
    {
        // Cartesian d and f components do not rotate orthogonally, but they span a rotation-invariant space, so the
        // eigenvalues of T c = λ S c are invariant.
        var basis = TestBases.WaterSpdf(pure: false, withF: true);
        var rotated = basis.WithMolecule(basis.Molecule.RotatedAboutAxis(new Vector3D(1, 1, 0.2), -71.0));
        double[] Spectrum(Orbitarium.BasisSets.MolecularBasis b)
        {
            var s = OneElectronIntegrals.Overlap(b);
            var l = s.Cholesky().Factor;
            var li = l.Inverse();
            return SortedEigenvalues(li * OneElectronIntegrals.Kinetic(b) * li.Transpose());
        }
        var e1 = Spectrum(basis);
        var e2 = Spectrum(rotated);
        for (int i = 0; i < e1.Length; i++) Assert.True(Math.Abs(e1[i] - e2[i]) <= 1e-9 * Math.Max(1, Math.Abs(e1[i])), $"eigenvalue {i}");
    }
}
