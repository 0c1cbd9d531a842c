using Orbitarium.Integrals;

namespace Orbitarium.Tests.Integrals;

/// <summary>Integrals over s functions against closed forms and tabulated textbook values.</summary>
public class ClosedFormIntegralTests
{
    public class H2Sto3G
    {
        // Szabo and Ostlund, Modern Quantum Chemistry (Dover 1996), section 3.5.2: H2, STO-3G with ζ = 1.24, R = 1.4 bohr.
        // Their tables print 4 decimals, so the tolerance is 5e-5.
        private readonly Orbitarium.BasisSets.MolecularBasis _basis = TestBases.H2Sto3G();

        [Fact]
        public void Overlap_matches_the_tabulated_value()
        {
            var s = OneElectronIntegrals.Overlap(_basis);
            Assert.Equal(1.0, s[0, 0], 12);
            Assert.Equal(0.6593, s[0, 1], 4);
        }

        [Fact]
        public void Kinetic_and_core_Hamiltonian_match_the_tabulated_values()
        {
            var t = OneElectronIntegrals.Kinetic(_basis);
            Assert.Equal(0.7600, t[0, 0], 4);
            Assert.Equal(0.2365, t[0, 1], 4); // Szabo and Ostlund eq. 3.229 (from memory)
            var h = OneElectronIntegrals.CoreHamiltonian(_basis);
            Assert.Equal(-1.1204, h[0, 0], 4); // Szabo and Ostlund eq. 3.232 (from memory)
            Assert.Equal(-0.9584, h[0, 1], 4);
        }

        [Fact]
        public void Two_electron_integrals_match_the_tabulated_values()
        {
            var g = ElectronRepulsionTensor.Compute(_basis);
            Assert.Equal(0.7746, g[0, 0, 0, 0], 4);
            Assert.Equal(0.7746, g[1, 1, 1, 1], 4);
            Assert.Equal(0.5697, g[0, 0, 1, 1], 4);
            Assert.Equal(0.2970, g[0, 1, 0, 1], 4);
            Assert.Equal(0.4441, g[0, 0, 0, 1], 4);
            Assert.Equal(g[0, 0, 0, 1], g[1, 0, 0, 0], 15);
        }
    }
}
