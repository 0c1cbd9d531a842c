using Orbitarium.BasisSets;
using Orbitarium.Chemistry;
using Orbitarium.Scf;
using static Orbitarium.Tests.Scf.ScfTestSystems;

namespace Orbitarium.Tests.Scf;

public class SelfConsistentFieldTests
{
    private static Calculation WaterCalc() =>
        Molecule.FromXyzFile(Example("tg1-water.xyz")).WithBasis(BasisSetLibrary.Get("6-31G"));

    public class Convergence
    {
        [Fact]
        public void A_run_stopped_by_the_iteration_limit_is_flagged_not_converged_with_its_last_energy()
        {
            var r = WaterCalc().WithOptions(o => o with { MaxIterations = 2, Guess = ScfGuess.CoreHamiltonian }).RunRhf();
            Assert.False(r.Converged);
            Assert.Equal(ScfStopReason.MaximumIterationsReached, r.StopReason);
            Assert.Equal(2, r.Iterations);
            Assert.Equal(r.History[^1].EnergyHartree, r.TotalEnergyHartree, 1e-10);
            Assert.Contains("NOT CONVERGED", r.ToString());
        }

        [Fact]
        public void A_converged_run_meets_both_thresholds_and_reports_every_iteration()
        {
            var seen = new List<ScfIteration>();
            var r = WaterCalc().RunRhf(new SynchronousProgress<ScfIteration>(seen.Add));
            Assert.True(r.Converged);
            Assert.Equal(r.Iterations, seen.Count);
            Assert.True(Math.Abs(r.History[^1].EnergyChangeHartree) < 1e-10);
            Assert.True(r.History[^1].CommutatorNorm < 1e-8);
            Assert.True(seen[^1].DiisSubspaceSize > 0);
        }

        [Fact]
        public void Damping_and_level_shifting_converge_to_the_same_energy()
        {
            double plain = WaterCalc().RunRhf().TotalEnergyHartree;
            var damped = WaterCalc().WithOptions(o => o with { Damping = 0.3 }).RunRhf();
            var shifted = WaterCalc().WithOptions(o => o with { LevelShiftHartree = 0.5 }).RunRhf();
            Assert.True(damped.Converged && shifted.Converged);
            Assert.Equal(plain, damped.TotalEnergyHartree, 1e-9);
            Assert.Equal(plain, shifted.TotalEnergyHartree, 1e-9);
        }

        [Fact]
        public void Every_starting_guess_reaches_the_same_energy_and_a_restart_converges_at_once()
        {
            var sad = WaterCalc().RunRhf();
            var core = WaterCalc().WithOptions(o => o with { Guess = ScfGuess.CoreHamiltonian }).RunRhf();
            var restart = WaterCalc().WithOptions(o => o.WithInitialOrbitals(sad)).RunRhf();
            Assert.Equal(sad.TotalEnergyHartree, core.TotalEnergyHartree, 1e-9);
            Assert.Equal(sad.TotalEnergyHartree, restart.TotalEnergyHartree, 1e-9);
            Assert.True(restart.Iterations <= 3, $"restart took {restart.Iterations} iterations");
        }

        [Fact]
        public void Symmetry_breaking_lets_stretched_H2_find_a_lower_UHF_singlet()
        {
            // Common practice (Coulson–Fischer): beyond about 2.3 bohr the UHF singlet of H2 breaks spin symmetry
            // and lies below RHF, with ⟨S²⟩ between 0 and 1.
            var calc = H2(4.0).WithBasis(BasisSetLibrary.Get("6-31G"));
            var rhf = calc.RunRhf();
            var plain = calc.RunUhf();
            var broken = calc.WithOptions(o => o with { BreakSpinSymmetry = true }).RunUhf();
            Assert.Equal(rhf.TotalEnergyHartree, plain.TotalEnergyHartree, 1e-8);
            Assert.True(broken.TotalEnergyHartree < rhf.TotalEnergyHartree - 1e-3);
            Assert.InRange(broken.SpinSquared, 0.1, 1.0);
        }
    }

    public class IntegralModes
    {
        [Fact]
        public void Integral_direct_and_in_core_Fock_builds_give_the_same_energy_and_say_which_ran()
        {
            var inCore = WaterCalc().RunRhf();
            var direct = WaterCalc().WithOptions(o => o with { ForceDirect = true }).RunRhf();
            var noMemory = WaterCalc().WithOptions(o => o with { MemoryBudgetBytes = 0 }).RunRhf();
            Assert.Contains("in-core", inCore.IntegralMode);
            Assert.Contains("direct", direct.IntegralMode);
            Assert.Contains("direct", noMemory.IntegralMode);
            Assert.Equal(inCore.TotalEnergyHartree, direct.TotalEnergyHartree, 1e-9);
        }

        [Fact]
        public void Incremental_direct_Fock_builds_reach_the_energy_of_full_builds()
        {
            // J and K are linear in D, so adding J[ΔD], K[ΔD] each iteration must give the same converged energy as
            // full builds (Almlöf, Faegri & Korsell 1982); the driver confirms convergence on a full build, so the
            // energies agree to the SCF convergence (1e-9 Eh), for closed and open shells alike.
            var radical = Molecule.FromXyz("2\nhydroxyl\nO 0 0 0\nH 0 0 0.97\n").WithMultiplicity(2).WithBasis("6-31G*");
            foreach (var (calc, reference) in new[] { (WaterCalc(), ScfReference.Restricted), (radical, ScfReference.Unrestricted) })
            {
                var inCore = calc.Run(reference);
                var incremental = calc.WithOptions(o => o with { ForceDirect = true }).Run(reference);
                var full = calc.WithOptions(o => o with { ForceDirect = true, IncrementalDirectFock = false }).Run(reference);
                Assert.True(incremental.Converged && full.Converged);
                Assert.Contains("incremental", incremental.IntegralMode);
                Assert.DoesNotContain("incremental", full.IntegralMode);
                Assert.Equal(inCore.TotalEnergyHartree, incremental.TotalEnergyHartree, 1e-9);
                Assert.Equal(full.TotalEnergyHartree, incremental.TotalEnergyHartree, 1e-9);
            }
        }
    }

    public class Cancellation
    {
        [Fact]
        public void A_cancelled_token_stops_the_run()
        {
            using var cts = new CancellationTokenSource();
            cts.Cancel();
            Assert.ThrowsAny<OperationCanceledException>(() => WaterCalc().RunRhf(cancellationToken: cts.Token));
        }

        [Fact]
        public void Cancelling_during_the_iterations_stops_the_run()
        {
            using var cts = new CancellationTokenSource();
            var progress = new SynchronousProgress<ScfIteration>(i => { if (i.Iteration == 2) cts.Cancel(); });
            Assert.ThrowsAny<OperationCanceledException>(() => WaterCalc().RunRhf(progress, cts.Token));
        }
    }

    public class Input
    {
        [Fact]
        public void RHF_refuses_an_open_shell_and_names_the_remedy()
        {
            var e = Assert.Throws<OrbitariumInputException>(() => Hydroxyl().WithBasis(BasisSetLibrary.Get("STO-3G")).RunRhf());
            Assert.Contains("UHF or ROHF", e.Message);
        }

        [Fact]
        public void Near_linear_dependencies_are_dropped_and_counted()
        {
            // Two s functions with exponents 1.0 and 1.0001 are almost identical: one combination has an overlap
            // eigenvalue of order 1e-9 and is removed by canonical orthogonalisation.
            var set = BasisSet.Create("nearly dependent", false).WithElement("H",
                ShellDefinition.Primitive(0, 1.0), ShellDefinition.Primitive(0, 1.0001), ShellDefinition.Primitive(0, 0.2));
            var r = H2().WithBasis(set).RunRhf();
            Assert.True(r.Converged);
            Assert.Equal(OrthogonalizationKind.Canonical, r.OrthogonalizationUsed);
            Assert.True(r.DroppedLinearDependencies >= 2, $"dropped {r.DroppedLinearDependencies}");
            Assert.Equal(r.Basis.FunctionCount - r.DroppedLinearDependencies, r.OrbitalCount);
        }

        [Fact]
        public void Invalid_options_are_refused_with_the_value_and_its_range()
        {
            var e = Assert.Throws<OrbitariumInputException>(() => WaterCalc().WithOptions(o => o with { Damping = 1.5 }).RunRhf());
            Assert.Contains("Damping", e.Message);
        }
    }

    public class Results
    {
        [Fact]
        public void Energy_parts_add_up_and_the_density_holds_every_electron()
        {
            var r = WaterCalc().RunRhf();
            Assert.Equal(r.TotalEnergyHartree,
                r.NuclearRepulsionHartree + r.OneElectronEnergyHartree + r.TwoElectronEnergyHartree, 1e-12);
            double electrons = 0;
            var ds = r.DensityTotal * r.Overlap;
            for (int i = 0; i < ds.RowCount; i++) electrons += ds[i, i];
            Assert.Equal(10, electrons, 1e-9);
            Assert.True(r.GapHartree > 0);
            Assert.Equal(r.OrbitalEnergiesAlphaHartree[4], r.HomoEnergyHartree!.Value, 12);
        }

        [Fact]
        public void Orbital_energies_satisfy_the_Roothaan_Hall_equations()
        {
            var r = WaterCalc().RunRhf();
            var c = r.CoefficientsAlpha;
            var residual = r.FockAlpha * c - r.Overlap * c * MathNet.Numerics.LinearAlgebra.Matrix<double>.Build.DenseOfDiagonalArray([.. r.OrbitalEnergiesAlphaHartree]);
            Assert.True(residual.InfinityNorm() < 1e-6, $"|FC − SCε| = {residual.InfinityNorm()}");
        }
    }

    /// <summary>Calls back on the reporting thread (Progress&lt;T&gt; posts asynchronously).</summary>
    private sealed class SynchronousProgress<T>(Action<T> action) : IProgress<T>
    {
        public void Report(T value) => action(value);
    }
}
