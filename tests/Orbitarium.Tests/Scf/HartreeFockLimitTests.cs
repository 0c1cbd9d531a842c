using Orbitarium.BasisSets;
using Orbitarium.Chemistry;
using Orbitarium.Scf;

namespace Orbitarium.Tests.Scf;

/// <summary>Large even-tempered bases approach the numerical Hartree–Fock limit. For closed-shell atoms whose
/// occupied orbitals are s (He, Be) or s and p (Ne), the RHF orbitals are pure s and p by spherical symmetry, so
/// s (and p) functions alone reach the limit (common practice).</summary>
public class HartreeFockLimitTests
{
    private static ScfResult Atom(string symbol, params (int L, double Alpha, double Beta, int Count)[] shells)
    {
        var basis = EvenTemperedBasis.Create($"even-tempered {symbol}", symbol, shells);
        // The core-Hamiltonian guess avoids repeating the whole atomic calculation inside the atomic-density guess.
        return Molecule.Empty.AddAtom(symbol, 0, 0, 0).WithBasis(basis)
            .WithOptions(o => o with { Guess = ScfGuess.CoreHamiltonian }).RunRhf();
    }

    [Fact]
    public void Helium_reaches_its_Hartree_Fock_limit()
    {
        // He HF limit −2.8616800 Eh: Clementi & Roetti, At. Data Nucl. Data Tables 14, 177 (1974);
        // Bunge, Barrientos & Bunge, At. Data Nucl. Data Tables 53, 113 (1993).
        var r = Atom("He", (0, 0.02, 2.0, 20));
        Assert.True(r.Converged);
        Assert.Equal(-2.8616800, r.TotalEnergyHartree, 1e-5);
    }

    [Fact]
    public void Beryllium_reaches_its_Hartree_Fock_limit()
    {
        // Be HF limit −14.5730232 Eh (Clementi & Roetti 1974; Bunge et al. 1993).
        var r = Atom("Be", (0, 0.01, 2.0, 24));
        Assert.True(r.Converged);
        Assert.Equal(-14.5730232, r.TotalEnergyHartree, 1e-5);
    }

    [Fact]
    public void Neon_reaches_its_Hartree_Fock_limit()
    {
        // Ne HF limit −128.5470981 Eh (Clementi & Roetti 1974; Bunge et al. 1993).
        var r = Atom("Ne", (0, 0.03, 1.8, 32), (1, 0.05, 1.9, 19));
        Assert.True(r.Converged);
        Assert.Equal(-128.5470981, r.TotalEnergyHartree, 1e-5);
    }

    [Fact]
    public void Hydrogen_molecular_ion_approaches_the_exact_energy()
    {
        // H2+ at R = 2.0 bohr: exact −0.6026342 Eh (Bates, Ledsham & Stewart, Phil. Trans. R. Soc. A 246, 215 (1953));
        // a one-electron system, so UHF in a near-complete basis is exact. Within 1e-4 Eh.
        // (9s4p1d) per atom leaves about 6e-5 Eh; enough for the 1e-4 check while keeping the test to seconds.
        var set = EvenTemperedBasis.Create("even-tempered H", "H", [(0, 0.05, 2.5, 9), (1, 0.2, 2.5, 4), (2, 1.0, 2.5, 1)]);
        var ion = ScfTestSystems.H2(2.0).WithCharge(1);
        var r = ion.WithBasis(set).RunUhf();
        Assert.True(r.Converged);
        Assert.Equal(-0.6026342, r.TotalEnergyHartree, 1e-4);
        Assert.True(r.TotalEnergyHartree > -0.6026342 - 1e-7, "variational: never below the exact energy");
    }
}
