using MathNet.Numerics.LinearAlgebra;
using Orbitarium.BasisSets;
using Orbitarium.Chemistry;
using Orbitarium.Integrals;
using Orbitarium.Scf;

namespace Orbitarium.Tests.Scf;

public class IncrementalCoulombExchangeTests
{
    [Fact]
    public void An_incremental_build_equals_a_full_build_of_the_new_density()
    {
        // J and K are linear in D: J[D₂] = J[D₁] + J[D₂ − D₁] (definition of J and K, Szabo & Ostlund eq. 3.154).
        // Two SCF densities of water (the converged one and its first-iteration one) play D₁ and D₂; the direct
        // kernel screens at 1e-12 Eh, so the two routes agree to about 1e-10.
        var water = Molecule.FromXyz("3\nwater\nO 0 0 0.1173\nH 0 0.7572 -0.4692\nH 0 -0.7572 -0.4692\n");
        var calc = water.WithBasis("6-31G*");
        var converged = calc.RunRhf();
        var early = calc.WithOptions(o => o with { MaxIterations = 2 }).RunRhf();
        var kernel = new DirectCoulombExchangeKernel(converged.Basis);
        Matrix<double> d1 = 0.5 * early.DensityTotal, d2 = 0.5 * converged.DensityTotal;

        var incremental = new IncrementalCoulombExchange(kernel, incremental: true);
        incremental.Build([d1], true, default);
        Assert.False(incremental.LastBuildWasIncremental);
        var viaIncrement = incremental.Build([d2], true, default);
        Assert.True(incremental.LastBuildWasIncremental);
        var direct = kernel.Build([d2], true);

        Assert.True((viaIncrement.Coulomb[0] - direct.Coulomb[0]).Enumerate().Max(Math.Abs) < 1e-10);
        Assert.True((viaIncrement.Exchange![0] - direct.Exchange![0]).Enumerate().Max(Math.Abs) < 1e-10);

        incremental.RequestFullBuild();
        incremental.Build([d2], true, default);
        Assert.False(incremental.LastBuildWasIncremental);
    }
}
