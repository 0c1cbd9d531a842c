using Orbitarium.BasisSets;
using Orbitarium.Chemistry;
using Orbitarium.Geometry;
using Orbitarium.Scf;

namespace Orbitarium.Tests.Geometry.Gradients;

public class HartreeFockGradientTests
{
    public static TheoryData<string, string, int, ScfReference> Cases => new()
    {
        // Distorted geometries (no gradient component vanishes); several bases incl. d functions; RHF and UHF.
        { "3\n\nO 0.02 -0.01 0.11\nH 0.05 0.78 -0.45\nH -0.03 -0.74 -0.50", "STO-3G", 1, ScfReference.Restricted },
        { "3\n\nO 0.02 -0.01 0.11\nH 0.05 0.78 -0.45\nH -0.03 -0.74 -0.50", "6-31G*", 1, ScfReference.Restricted },
        { "4\n\nN 0.0 0.05 0.1\nH 0.95 0.0 -0.2\nH -0.5 0.85 -0.3\nH -0.45 -0.8 -0.25", "3-21G", 1, ScfReference.Restricted },
        { "3\n\nC 0.0 0.0 0.1\nH 0.0 1.0 -0.5\nH 0.1 -1.1 -0.4", "STO-3G", 3, ScfReference.Unrestricted },
    };

    [Theory]
    [MemberData(nameof(Cases))]
    public void Analytic_gradients_match_finite_differences_to_1e_6(string xyz, string basisName, int multiplicity, ScfReference reference)
    {
        // Identity: analytic dE/dX vs central differences of converged SCF energies (h = 1e-3 bohr: truncation
        // ~1e-7 Eh/bohr; SCF converged to 1e-10 Eh adds ~1e-7). Cartesian d functions as in 6-31G*'s definition.
        var molecule = Molecule.FromXyz(xyz, multiplicity: multiplicity);
        var options = ScfOptions.Default with { EnergyThresholdHartree = 1e-12, CommutatorThreshold = 1e-10 };
        var calc = Calculation.Create(molecule, BasisSetLibrary.Get(basisName), pure: false, options);
        var surface = calc.AsSurface(reference);
        var analytic = surface.Evaluate(molecule, true);
        Assert.Equal(GradientSource.Analytic, analytic.GradientSource);
        var numeric = FiniteDifferenceGradient.Compute(new DelegateSurface("energy", m => surface.Evaluate(m, false).EnergyHartree), molecule, 1e-3);
        for (int i = 0; i < analytic.GradientHartreePerBohr.Length; i++)
            Assert.True(Math.Abs(analytic.GradientHartreePerBohr[i] - numeric.GradientHartreePerBohr[i]) < 1e-6,
                $"component {i}: analytic {analytic.GradientHartreePerBohr[i]:E10}, numeric {numeric.GradientHartreePerBohr[i]:E10}");
    }

    [Fact]
    public void Gradients_sum_to_zero_and_carry_no_torque()
    {
        // Translational and rotational invariance of the energy (common practice): Σ_A g_A = 0 and Σ_A R_A × g_A = 0.
        var molecule = Molecule.FromXyz("4\n\nN 0.0 0.05 0.1\nH 0.95 0.0 -0.2\nH -0.5 0.85 -0.3\nH -0.45 -0.8 -0.25");
        var p = molecule.WithBasis("6-31G*").Gradient();
        Vector3D force = Vector3D.Zero, torque = Vector3D.Zero;
        for (int a = 0; a < molecule.AtomCount; a++)
        {
            force += p.AtomGradient(a);
            torque += Vector3D.Cross(molecule.Atoms[a].PositionBohr, p.AtomGradient(a));
        }
        Assert.True(force.Length < 1e-8, $"net force {force}");
        Assert.True(torque.Length < 1e-7, $"net torque {torque}");
        Assert.True(p.MaxGradientComponent > 1e-3);
    }
}
