using Orbitarium.Chemistry;
using Orbitarium.Correlation;
using Orbitarium.Scf;

namespace Orbitarium.Tests.Correlation;

public class ClosedShellCcsdTests
{
    // Water at the geometry of T. D. Crawford's programming projects (bohr): published STO-3G worked example.
    private static Molecule CrawfordWater() => Molecule.Empty
        .AddAtom("O", 0, -0.143225816552, 0, LengthUnit.Bohr)
        .AddAtom("H", 1.638036840407, 1.136548822547, 0, LengthUnit.Bohr)
        .AddAtom("H", -1.638036840407, 1.136548822547, 0, LengthUnit.Bohr);

    private static readonly CorrelationOptions Tight = CorrelationOptions.Default.WithThresholds(1e-11, 1e-10);

    public class Residuals
    {
        [Theory]
        [InlineData("STO-3G", 0)]
        [InlineData("6-31G", 1)]
        public void Equal_the_alpha_beta_block_of_the_spin_orbital_equations_at_arbitrary_amplitudes(string basis, int frozenCore)
        {
            // The spin-adapted equations are the αβ block of the spin-orbital ones (Stanton et al. 1991) once
            // t_{iα jβ}^{aα bβ} = t_ij^ab, t_{iα jα}^{aα bα} = t_ij^ab − t_ij^ba, t_{iα}^{aα} = t_{iβ}^{aβ} = t_i^a
            // (common practice). Random amplitudes of realistic size make every term, quadratic and cubic ones
            // included, show; the frozen core exercises the frozen-core part of the dressed Fock matrix.
            // Same integrals on both sides: round-off only.
            var h = CrawfordWater().WithBasis(basis).RunRhf().ToMolecularOrbitalHamiltonian(CorrelationOptions.Default);
            var closed = new ClosedShellCcsdSolver(h, frozenCore, dressInPlace: false, default);
            int o = closed.Occupied, v = closed.Virtual;
            var rng = new Random(7);
            var t1 = new double[o * v];
            for (int x = 0; x < t1.Length; x++) t1[x] = 0.05 * (rng.NextDouble() - 0.5);
            var t2 = new double[o * o * v * v];
            for (int i = 0; i < o; i++)
                for (int j = 0; j <= i; j++)
                    for (int a = 0; a < v; a++)
                        for (int b = 0; b < v; b++)
                        {
                            double value = 0.05 * (rng.NextDouble() - 0.5);
                            t2[((i * o + j) * v + a) * v + b] = value;
                            t2[((j * o + i) * v + b) * v + a] = value;
                        }
            closed.T1 = t1;
            closed.T2 = t2;
            closed.Dress(t1);
            var (r1, r2) = closed.Residual(default);

            var system = SpinOrbitalSystem.Build(h, frozenCore, default);
            var spin = new CcsdAmplitudeSolver(system);
            int so = 2 * o, sv = 2 * v, n = system.Count;
            int At(int i, int j, int a, int b) => ((i * so + j) * sv + a) * sv + b;
            var s1 = new double[so * sv];
            var s2 = new double[so * so * sv * sv];
            for (int i = 0; i < o; i++)
                for (int a = 0; a < v; a++)
                {
                    s1[i * sv + a] = t1[i * v + a];
                    s1[(o + i) * sv + v + a] = t1[i * v + a];
                }
            for (int i = 0; i < o; i++)
                for (int j = 0; j < o; j++)
                    for (int a = 0; a < v; a++)
                        for (int b = 0; b < v; b++)
                        {
                            double mixed = t2[((i * o + j) * v + a) * v + b];
                            double same = mixed - t2[((i * o + j) * v + b) * v + a];
                            s2[At(i, o + j, a, v + b)] = mixed;
                            s2[At(i, o + j, v + b, a)] = -mixed;
                            s2[At(o + j, i, v + b, a)] = mixed;
                            s2[At(o + j, i, a, v + b)] = -mixed;
                            s2[At(i, j, a, b)] = same;
                            s2[At(o + i, o + j, v + a, v + b)] = same;
                        }
            spin.T1 = s1;
            spin.T2 = s2;
            var d1 = new double[so * sv];
            for (int i = 0; i < so; i++)
                for (int a = 0; a < sv; a++)
                    d1[i * sv + a] = system.Fock[i * n + i] - system.Fock[(so + a) * n + so + a];
            // The spin-orbital update is t' = t + Ω / D, so Ω = (t' − t) D.
            var (n1, n2) = spin.Iterate(d1, default);

            double worst = 0, scale = 0;
            for (int i = 0; i < o; i++)
                for (int a = 0; a < v; a++)
                {
                    double omega = (n1[i * sv + a] - s1[i * sv + a]) * d1[i * sv + a];
                    worst = Math.Max(worst, Math.Abs(omega - r1[i * v + a]));
                    scale = Math.Max(scale, Math.Abs(omega));
                }
            for (int i = 0; i < o; i++)
                for (int j = 0; j < o; j++)
                    for (int a = 0; a < v; a++)
                        for (int b = 0; b < v; b++)
                        {
                            int at = At(i, o + j, a, v + b);
                            double omega = (n2[at] - s2[at]) * (d1[i * sv + a] + d1[(o + j) * sv + v + b]);
                            worst = Math.Max(worst, Math.Abs(omega - r2[((i * o + j) * v + a) * v + b]));
                            scale = Math.Max(scale, Math.Abs(omega));
                        }
            Assert.True(scale > 0.1, $"residuals too small to test anything ({scale})");
            Assert.True(worst < 1e-12, $"largest difference {worst:E2} (residuals up to {scale:E2})");
        }
    }

    public class Energies
    {
        [Theory]
        [InlineData("6-31G", 0)]
        [InlineData("6-31G*", 1)]
        public void Of_CCSD_and_triples_equal_the_spin_orbital_code(string basis, int frozenCore)
        {
            // Two independent formulations of the same equations (spin-orbital: Stanton et al. 1991 and
            // Raghavachari et al. 1989; closed-shell: Helgaker et al. §13.7 with Rendell et al. 1991 triples).
            // Converged to 1e-11 Eh, so they agree to well under 1e-9.
            var options = Tight.WithFrozenCore(frozenCore);
            var h = CrawfordWater().WithBasis(basis).RunRhf().ToMolecularOrbitalHamiltonian(options);
            var closed = Ccsd.ComputeWithTriples(h, options);
            var spin = Ccsd.ComputeSpinOrbital(h, withTriples: true, options);
            Assert.True(closed.Converged && spin.Converged, closed.StopReason + " / " + spin.StopReason);
            Assert.Equal(spin.CcsdCorrelationEnergyHartree, closed.CcsdCorrelationEnergyHartree, 1e-9);
            Assert.Equal(spin.TriplesCorrectionHartree!.Value, closed.TriplesCorrectionHartree!.Value, 1e-10);
            Assert.Equal(spin.Mp2CorrelationEnergyHartree, closed.Mp2CorrelationEnergyHartree, 1e-12);
            Assert.Equal(spin.T1Diagnostic, closed.T1Diagnostic, 1e-8);
        }

        [Fact]
        public void Of_a_non_canonical_reference_equal_the_spin_orbital_code()
        {
            // Off-diagonal Fock elements (occupied–virtual included) enter the dressed Fock matrix and the energy.
            var h = TestHamiltonians.Random(7, 3, 3, seed: 31);
            var closed = Ccsd.ComputeWithTriples(h, Tight);
            var spin = Ccsd.ComputeSpinOrbital(h, withTriples: true, Tight);
            Assert.Equal(spin.CcsdTotalEnergyHartree, closed.CcsdTotalEnergyHartree, 1e-9);
            Assert.Equal(spin.TriplesCorrectionHartree!.Value, closed.TriplesCorrectionHartree!.Value, 1e-10);
        }

        [Fact]
        public void Of_water_in_STO_3G_match_the_published_worked_example()
        {
            // T. D. Crawford, programming projects #4–#6 (water, STO-3G, geometry above), from memory:
            // E(SCF) = −74.942079928192, E(MP2) corr. = −0.049149636120, E(CCSD) corr. = −0.070680088376,
            // E(T) = −0.000099877272 Eh. That SCF energy is 1.9e-6 Eh below ours, which points to slightly different
            // STO-3G contraction digits; the correlation energies respond to that at the 1e-8 level. Tolerances:
            // 3e-6 on SCF, 5e-8 on MP2 and CCSD, 1e-9 on (T).
            var rhf = CrawfordWater().WithBasis("STO-3G").RunRhf();
            var cc = rhf.CcsdT(Tight);
            Assert.Equal(-74.942079928192, rhf.TotalEnergyHartree, 3e-6);
            Assert.Equal(-0.049149636120, cc.Mp2CorrelationEnergyHartree, 5e-8);
            Assert.Equal(-0.070680088376, cc.CcsdCorrelationEnergyHartree, 5e-8);
            Assert.Equal(-0.000099877272, cc.TriplesCorrectionHartree!.Value, 1e-9);
        }
    }

    public class Reproducibility
    {
        [Fact]
        public void Repeats_to_the_last_bit()
        {
            // Every parallel step writes each element from one thread in a fixed order (TransposedProduct, the
            // ladder over virtuals) or reduces in set order (FixedOrderParallel in (T)).
            var rhf = CrawfordWater().WithBasis("6-31G*").RunRhf();
            var first = rhf.CcsdT();
            var second = rhf.CcsdT();
            Assert.Equal(BitConverter.DoubleToInt64Bits(first.TotalEnergyHartree), BitConverter.DoubleToInt64Bits(second.TotalEnergyHartree));
            Assert.Equal(first.Iterations, second.Iterations);
        }
    }

    public class InPlaceDressing
    {
        [Fact]
        public void Leaves_the_integrals_as_they_were_even_when_cancelled()
        {
            // The private-Hamiltonian route dresses the integral array itself and must undress it on every exit.
            var h = CrawfordWater().WithBasis("6-31G").RunRhf().ToMolecularOrbitalHamiltonian(CorrelationOptions.Default);
            var before = h.RepulsionAlphaAlpha.ToArray();

            var finished = new ClosedShellCcsdSolver(h, 0, dressInPlace: true, default);
            Assert.True(finished.Solve(Tight, null, default).Converged);
            Assert.True(MaxDifference(before, h.RepulsionAlphaAlpha) < 1e-13, "not restored after convergence");

            using var cts = new CancellationTokenSource();
            var cancelled = new ClosedShellCcsdSolver(h, 0, dressInPlace: true, default);
            var stopAfterTwo = new SynchronousProgress(p => { if (p.Iteration == 2) cts.Cancel(); });
            Assert.Throws<OperationCanceledException>(() => cancelled.Solve(Tight, stopAfterTwo, cts.Token));
            Assert.True(MaxDifference(before, h.RepulsionAlphaAlpha) < 1e-13, "not restored after cancellation");
        }

        private static double MaxDifference(double[] a, ReadOnlySpan<double> b)
        {
            double worst = 0;
            for (int x = 0; x < a.Length; x++) worst = Math.Max(worst, Math.Abs(a[x] - b[x]));
            return worst;
        }

        private sealed class SynchronousProgress(Action<CorrelationProgress> report) : IProgress<CorrelationProgress>
        {
            public void Report(CorrelationProgress value) => report(value);
        }
    }
}
