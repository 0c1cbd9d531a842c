using MathNet.Numerics;
using MathNet.Numerics.LinearAlgebra;
using Orbitarium.BasisSets;
using Orbitarium.Chemistry;
using Orbitarium.Integrals;

namespace Orbitarium.Tests.Integrals;

/// <summary>
/// The overlap of two 1s Slater functions (ζ = 1), S(R) = e^{−R}(1 + R + R²/3) (textbooks, e.g. Szabo and Ostlund
/// section 3.5; listed in /work/shared/REFERENCES.md), approached by least-squares Gaussian fits (STO-nG with
/// even-tempered exponents) of growing n. The error of the fitted overlap is bounded by 2‖g − φ‖ (Cauchy–Schwarz),
/// so each fit is checked against its own bound, and the fits must converge.
/// </summary>
public class SlaterOverlapTests
{
    private static double SlaterOverlap(double r) => Math.Exp(-r) * (1 + r + r * r / 3);

    /// <summary>Least-squares fit of n normalised s Gaussians to φ = e^{−r}/√π; returns the shell and ‖g − φ‖ for the
    /// normalised fit g.</summary>
    private static (ShellDefinition Shell, double Distance) Fit(int n)
    {
        var alpha = new double[n];
        for (int k = 0; k < n; k++) alpha[k] = 0.02 * Math.Pow(1e6, k / (double)(n - 1));
        var s = Matrix<double>.Build.Dense(n, n, (i, j) => Math.Pow(2 * Math.Sqrt(alpha[i] * alpha[j]) / (alpha[i] + alpha[j]), 1.5));
        var b = Vector<double>.Build.Dense(n, i =>
        {
            double a = alpha[i], norm = Math.Pow(2 * a / Math.PI, 0.75);
            // ⟨g|φ⟩ = 4π N/√π ∫₀^∞ r² e^{−αr² − r} dr, by double-exponential quadrature.
            double radial = Integrate.DoubleExponential(r => r * r * Math.Exp(-a * r * r - r), 0, 60, 1e-15);
            return 4 * Math.PI * norm / Math.Sqrt(Math.PI) * radial;
        });
        var c = s.Cholesky().Solve(b);
        double gNorm = Math.Sqrt(c * (s * c));
        double distance = Math.Sqrt(Math.Max(0, 2 - 2 * (b * c) / gNorm));
        return (new ShellDefinition(0, alpha, c), distance);
    }

    [Fact]
    public void Gaussian_fits_converge_to_the_Slater_overlap_formula()
    {
        double previous = double.MaxValue;
        foreach (int n in new[] { 4, 8, 16 })
        {
            var (shell, distance) = Fit(n);
            Assert.True(distance < previous, $"n = {n}: the fit must improve with n");
            previous = distance;
            foreach (double r in new[] { 0.5, 1.4, 2.0, 4.0 })
            {
                var mol = Molecule.Empty.AddAtom("H", 0, 0, 0, LengthUnit.Bohr).AddAtom("H", 0, 0, r, LengthUnit.Bohr);
                var basis = MolecularBasis.Create(mol, BasisSet.Create($"STO-{n}G fit").WithElement("H", shell));
                double s = OneElectronIntegrals.Overlap(basis)[0, 1];
                Assert.True(Math.Abs(s - SlaterOverlap(r)) <= 2 * distance + 1e-12,
                    $"n = {n}, R = {r}: fitted {s:R}, Slater {SlaterOverlap(r):R}, bound {2 * distance:G3}");
            }
        }
        Assert.True(previous < 3e-3, $"the 16-term fit should be close: ‖g − φ‖ = {previous:G3}");
        // With the best fit the overlap is right to better than 1e-4 at R = 1.4 bohr.
        var best = Fit(16).Shell;
        var h2 = Molecule.Empty.AddAtom("H", 0, 0, 0, LengthUnit.Bohr).AddAtom("H", 0, 0, 1.4, LengthUnit.Bohr);
        double s16 = OneElectronIntegrals.Overlap(MolecularBasis.Create(h2, BasisSet.Create("fit").WithElement("H", best)))[0, 1];
        Assert.Equal(SlaterOverlap(1.4), s16, 1e-4);
    }
}
