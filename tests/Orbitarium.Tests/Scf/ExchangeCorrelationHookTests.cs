using MathNet.Numerics.LinearAlgebra;
using Orbitarium.BasisSets;
using Orbitarium.Chemistry;
using Orbitarium.Scf;
using static Orbitarium.Tests.Scf.ScfTestSystems;

namespace Orbitarium.Tests.Scf;

/// <summary>The Kohn–Sham hook of the driver, checked with trivial potentials whose effect is known exactly.</summary>
public class ExchangeCorrelationHookTests
{
    /// <summary>E_xc = c (a constant) and V_xc = 0, with a chosen exact-exchange fraction.</summary>
    private sealed class ConstantPotential(double exactExchange, double energy) : IExchangeCorrelationPotential
    {
        public string Name => "constant";
        public double ExactExchangeFraction => exactExchange;
        public ExchangeCorrelationContribution Evaluate(MolecularBasis basis, Matrix<double> densityAlpha, Matrix<double> densityBeta,
            bool spinPolarized, CancellationToken cancellationToken = default)
        {
            int n = basis.FunctionCount;
            return new ExchangeCorrelationContribution(energy, Matrix<double>.Build.Dense(n, n), Matrix<double>.Build.Dense(n, n), 0, "constant test potential");
        }
    }

    [Fact]
    public void Full_exact_exchange_and_a_constant_energy_reproduce_Hartree_Fock_shifted_by_the_constant()
    {
        // Identity: with x = 1 and V_xc = 0 the Kohn–Sham equations are the Hartree–Fock equations; E_xc adds as given.
        var calc = Molecule.FromXyzFile(Example("tg1-water.xyz")).WithBasis("STO-3G");
        var hf = calc.RunRhf();
        var ks = calc.WithOptions(o => o with { ExchangeCorrelation = new ConstantPotential(1.0, -0.25) }).RunRhf();
        Assert.Equal(hf.TotalEnergyHartree - 0.25, ks.TotalEnergyHartree, 1e-9);
        Assert.Equal("RKS/constant", ks.MethodName);
        Assert.Equal(-0.25, ks.ExchangeCorrelationEnergyHartree);
    }

    [Fact]
    public void Without_exact_exchange_the_driver_solves_the_Hartree_problem()
    {
        // Identity: x = 0 and V_xc = 0 leave the Hartree (Coulomb-only) energy, which lies above Hartree–Fock
        // because exchange lowers the energy of same-spin pairs.
        var calc = H2().WithBasis("STO-3G");
        var hartree = calc.WithOptions(o => o with { ExchangeCorrelation = new ConstantPotential(0.0, 0.0) }).RunUhf();
        var hf = calc.RunUhf();
        Assert.True(hartree.Converged);
        Assert.True(hartree.TotalEnergyHartree > hf.TotalEnergyHartree + 0.1);
    }

    [Fact]
    public void Hartree_Fock_refuses_options_that_carry_a_functional()
    {
        var options = ScfOptions.Default with { ExchangeCorrelation = new ConstantPotential(0.2, 0) };
        Assert.Throws<OrbitariumInputException>(() => HartreeFock.Run(MolecularBasis.Create(H2(), BasisSetLibrary.Get("STO-3G")), options: options));
    }

    [Fact]
    public void ROHF_and_UHF_agree_for_one_electron()
    {
        // Identity: with a single electron there is no spin coupling to constrain; both give the H atom energy.
        var calc = Molecule.Empty.AddAtom("H", 0, 0, 0).WithBasis("6-31G");
        Assert.Equal(calc.RunUhf().TotalEnergyHartree, calc.RunRohf().TotalEnergyHartree, 1e-10);
    }
}
