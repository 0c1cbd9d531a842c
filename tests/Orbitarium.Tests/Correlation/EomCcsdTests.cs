using Orbitarium.Chemistry;
using Orbitarium.Correlation;
using Orbitarium.Scf;

namespace Orbitarium.Tests.Correlation;

public class EomCcsdTests
{
    private static readonly CorrelationOptions Tight = CorrelationOptions.Default.WithThresholds(1e-10, 1e-8);

    private static Molecule Water() => Molecule.FromXyz("3\nTG-1 water\nO 0 0 0.1173\nH 0 0.7572 -0.4692\nH 0 -0.7572 -0.4692\n");

    [Fact]
    public void Equals_full_CI_for_the_singlets_of_two_electrons()
    {
        // EOM-CCSD is exact for two electrons, like CCSD for the ground state (Stanton & Bartlett, J. Chem. Phys. 98,
        // 7029 (1993); common practice). H2 in 6-31G** has a doubly excited singlet among its lowest four, which CIS
        // misses and EOM-CCSD must find. Same integrals on both sides: round-off and convergence only.
        var rhf = Molecule.Empty.AddAtom("H", 0, 0, 0).AddAtom("H", 0, 0, 0.74).WithBasis("6-31G**").RunRhf();
        var eom = rhf.EomCcsd(4, options: Tight);
        var fci = rhf.Fci(12, Tight);
        var singlets = new List<double>();
        for (int r = 1; r < fci.RootEnergiesHartree.Length; r++)
            if (Math.Abs(fci.SpinSquared[r]) < 1e-6) singlets.Add(fci.RootEnergiesHartree[r] - fci.RootEnergiesHartree[0]);
        Assert.True(singlets.Count >= 4, $"only {singlets.Count} FCI singlets");
        for (int k = 0; k < 4; k++) Assert.Equal(singlets[k], eom.ExcitationEnergiesHartree[k], 1e-7);
        Assert.Equal("EOM-CCSD", eom.Method);
    }

    [Fact]
    public void Finds_every_singlet_of_minimal_basis_H2_and_refuses_more()
    {
        // H2/STO-3G has exactly two excited singlets (σ→σ* and the double excitation): both must come out, equal
        // to full CI (common practice), and a third cannot exist.
        var rhf = Molecule.Empty.AddAtom("H", 0, 0, 0).AddAtom("H", 0, 0, 0.74).WithBasis("STO-3G").RunRhf();
        var eom = rhf.EomCcsd(2, options: Tight);
        var fci = rhf.Fci(4, Tight);
        var singlets = Enumerable.Range(1, fci.RootEnergiesHartree.Length - 1).Where(r => Math.Abs(fci.SpinSquared[r]) < 1e-6)
            .Select(r => fci.RootEnergiesHartree[r] - fci.RootEnergiesHartree[0]).ToArray();
        Assert.Equal(singlets[0], eom.ExcitationEnergiesHartree[0], 1e-7);
        Assert.Equal(singlets[1], eom.ExcitationEnergiesHartree[1], 1e-7);
        var e = Assert.Throws<OrbitariumInputException>(() => rhf.EomCcsd(3));
        Assert.Contains("at most 2", e.Message);
    }

    [Fact]
    public void Of_water_in_STO_3G_lies_within_a_few_hundredths_of_an_eV_of_full_CI()
    {
        // EOM-CCSD misses triples; for singly excited valence states its error is typically below 0.1 eV (common
        // practice). In a minimal basis the three lowest singlets come out within 0.03 eV of FCI here; 0.05 eV
        // tolerance. Each is compared with the nearest FCI singlet.
        var rhf = Water().WithBasis("STO-3G").RunRhf();
        var eom = rhf.EomCcsd(3);
        var fci = rhf.Fci(8);
        var singlets = new List<double>();
        for (int r = 1; r < fci.RootEnergiesHartree.Length; r++)
            if (Math.Abs(fci.SpinSquared[r]) < 1e-3) singlets.Add((fci.RootEnergiesHartree[r] - fci.RootEnergiesHartree[0]) * PhysicalConstants.HartreeToElectronVolt);
        foreach (double e in eom.ExcitationEnergiesElectronVolt)
        {
            double nearest = singlets.MinBy(s => Math.Abs(s - e));
            Assert.True(Math.Abs(nearest - e) < 0.05, $"EOM-CCSD {e:F4} eV, nearest FCI singlet {nearest:F4} eV");
        }
    }

    [Fact]
    public void Jacobian_products_are_exactly_linear()
    {
        // The stencil is exact for the polynomial residual, so A(2x + y) = 2Ax + Ay to round-off; a truncated finite
        // difference (step tied to the vector's size) would break this at about 1e-6.
        var h = Water().WithBasis("6-31G").RunRhf().ToMolecularOrbitalHamiltonian();
        var solver = new ClosedShellCcsdSolver(h, 0, dressInPlace: false, default);
        Assert.True(solver.Solve(Tight, null, default).Converged);
        int o = solver.Occupied, v = solver.Virtual, n = o * v + o * o * v * v;
        var rng = new Random(3);
        double[] Random()
        {
            var x = new double[n];
            for (int i = 0; i < o * v; i++) x[i] = rng.NextDouble() - 0.5;
            for (int i = 0; i < o; i++)
                for (int j = 0; j <= i; j++)
                    for (int a = 0; a < v; a++)
                        for (int b = 0; b < v; b++)
                        {
                            double value = rng.NextDouble() - 0.5;
                            x[o * v + ((i * o + j) * v + a) * v + b] = value;
                            x[o * v + ((j * o + i) * v + b) * v + a] = value;
                        }
            return x;
        }
        var x = Random();
        var y = Random();
        var combined = new double[n];
        for (int i = 0; i < n; i++) combined[i] = 2 * x[i] + y[i];
        var ax = new double[n];
        var ay = new double[n];
        var ac = new double[n];
        solver.JacobianTimes(x, ax, default);
        solver.JacobianTimes(y, ay, default);
        solver.JacobianTimes(combined, ac, default);
        double worst = 0, scale = 0;
        for (int i = 0; i < n; i++)
        {
            worst = Math.Max(worst, Math.Abs(ac[i] - 2 * ax[i] - ay[i]));
            scale = Math.Max(scale, Math.Abs(ac[i]));
        }
        Assert.True(worst < 1e-10 * scale, $"nonlinearity {worst:E2} against products of size {scale:E2}");
    }

    [Fact]
    public void Triplets_equal_full_CI_for_two_electrons()
    {
        // Same exactness for the triplets of H2 (common practice), here through the spin-orbital equations with the
        // part odd under α↔β.
        var rhf = Molecule.Empty.AddAtom("H", 0, 0, 0).AddAtom("H", 0, 0, 0.74).WithBasis("6-31G**").RunRhf();
        var eom = rhf.EomCcsd(3, triplets: true, Tight);
        var fci = rhf.Fci(8, Tight);
        var triplets = Enumerable.Range(1, fci.RootEnergiesHartree.Length - 1).Where(r => Math.Abs(fci.SpinSquared[r] - 2) < 1e-6)
            .Select(r => fci.RootEnergiesHartree[r] - fci.RootEnergiesHartree[0]).ToArray();
        for (int k = 0; k < 3; k++) Assert.Equal(triplets[k], eom.ExcitationEnergiesHartree[k], 1e-7);
        Assert.Equal("triplet", eom.Manifold);
    }

    [Fact]
    public void On_a_closed_shell_the_unrestricted_states_are_the_singlets_and_triplets_together()
    {
        // The spin-orbital Jacobian on the S_z = 0 space holds the singlets and the M_s = 0 triplets (common
        // practice), so its lowest roots are the merged lists of the spin-adapted singlets and the triplets: two
        // independent routes to the same numbers.
        var calc = Water().WithBasis("STO-3G");
        var rhf = calc.RunRhf();
        var merged = rhf.EomCcsd(3, options: Tight).ExcitationEnergiesHartree
            .Concat(rhf.EomCcsd(3, triplets: true, Tight).ExcitationEnergiesHartree).Order().Take(4).ToArray();
        var unrestricted = calc.RunUhf().EomCcsd(4, options: Tight).ExcitationEnergiesHartree;
        for (int k = 0; k < 4; k++) Assert.Equal(merged[k], unrestricted[k], 1e-6);
    }

    [Fact]
    public void Of_the_hydroxyl_radical_on_UHF_lies_close_to_full_CI()
    {
        // TG-2 OH (²Π) in STO-3G. The first root is the other component of the degenerate Π ground state (0 eV);
        // the next, the lowest excited doublet, within 0.1 eV of FCI (EOM-CCSD errors for valence excitations of
        // radicals are typically a few tenths of an eV at most; common practice). Here the difference is 0.02 eV.
        var oh = Molecule.FromXyzFile(Path.Combine(Orbitarium.Tests.Shell.Repl.TestConsoles.RepositoryRoot(), "examples", "tg2-hydroxyl.xyz"));
        var uhf = oh.WithBasis("STO-3G").RunUhf();
        var eom = uhf.EomCcsd(2);
        var fci = uhf.Fci(3);
        double excited = (fci.RootEnergiesHartree[2] - fci.RootEnergiesHartree[0]) * PhysicalConstants.HartreeToElectronVolt;
        Assert.Equal("unrestricted", eom.Manifold);
        Assert.Equal(0.0, eom.ExcitationEnergiesElectronVolt[0], 1e-4);
        Assert.Equal(excited, eom.ExcitationEnergiesElectronVolt[1], 0.1);
    }

    [Fact]
    public void Refuses_a_restricted_open_shell_and_says_what_to_run()
    {
        var rohf = Molecule.Empty.AddAtom("O", 0, 0, 0).AddAtom("H", 0, 0, 0.97).WithBasis("STO-3G").RunRohf();
        var e = Assert.Throws<OrbitariumInputException>(() => rohf.EomCcsd(2));
        Assert.Contains("UHF", e.Message);
    }
}
