using BenchmarkDotNet.Attributes;
using BenchmarkDotNet.Configs;
using BenchmarkDotNet.Engines;
using BenchmarkDotNet.Jobs;
using BenchmarkDotNet.Toolchains.InProcess.Emit;
using MathNet.Numerics.LinearAlgebra;
using Orbitarium.Chemistry;
using Orbitarium.Correlation;
using Orbitarium.Integrals;
using Orbitarium.Scf;

namespace Orbitarium.Benchmarks.Correlation;

/// <summary>
/// MP2 (the (ia|jb) quarter-transformations plus the energy sum, O(N⁵)) and closed-shell CCSD / CCSD(T)
/// (O(N⁶) / O(N⁷)) on the TIDEGLASS water probe in growing basis sets, with the spin-orbital CCSD beside them where it
/// fits in memory. The RHF reference and the AO integrals are prepared in the set-up, so
/// only the correlated step is timed. Short single-shot runs: the monitoring strategy with two measured runs, in
/// process (the generated out-of-process project does not build within BenchmarkDotNet's time limit on a busy machine).
/// </summary>
[Config(typeof(ShortInProcessConfig))]
[MemoryDiagnoser]
public class CorrelationBenchmarks
{
    /// <summary>One short in-process job: monitoring strategy, no warm-up, two measured runs.</summary>
    public sealed class ShortInProcessConfig : ManualConfig
    {
        public ShortInProcessConfig() =>
            AddJob(Job.Default.WithStrategy(RunStrategy.Monitoring).WithLaunchCount(1).WithWarmupCount(0).WithIterationCount(2)
                .WithToolchain(InProcessEmitToolchain.Instance));
    }

    private ScfResult _rhf = null!;
    private double[] _ao = null!;
    private MolecularOrbitalHamiltonian _hamiltonian = null!;

    /// <summary>Basis sets of growing size (water: 13, 19, 24, 58 functions).</summary>
    [Params("6-31G", "6-31G*", "cc-pVDZ", "cc-pVTZ")]
    public string Basis { get; set; } = "cc-pVDZ";

    [GlobalSetup]
    public void Setup()
    {
        var water = Molecule.FromXyzFile(Example("tg1-water.xyz"));
        _rhf = water.WithBasis(Basis).RunRhf();
        _ao = ElectronRepulsionTensor.Compute(_rhf.Basis).ToDense();
        _hamiltonian = _rhf.ToMolecularOrbitalHamiltonian();
    }

    [Benchmark(Description = "MP2 (transform + energy)")]
    public double Mp2()
    {
        int n = _rhf.Basis.FunctionCount, m = _rhf.OrbitalCount, o = _rhf.AlphaElectronCount;
        var c = _rhf.CoefficientsAlpha;
        Matrix<double> occ = c.SubMatrix(0, n, 0, o), vir = c.SubMatrix(0, n, o, m - o);
        var iajb = MolecularIntegralTransformation.TransformRepulsion(_ao, occ, vir, occ, vir);
        return Orbitarium.Correlation.Mp2.Restricted(iajb, [.. _rhf.OrbitalEnergiesAlphaHartree], 0, o, m, _rhf.TotalEnergyHartree, default).CorrelationEnergyHartree;
    }

    [Benchmark(Description = "CCSD")]
    public double Ccsd() => Orbitarium.Correlation.Ccsd.Compute(_hamiltonian).CorrelationEnergyHartree;

    [Benchmark(Description = "CCSD(T)")]
    public double CcsdT() => Orbitarium.Correlation.Ccsd.ComputeWithTriples(_hamiltonian).CorrelationEnergyHartree;

    /// <summary>EOM-CCSD, three singlets (CCSD ground state included), with the water's O 1s frozen.</summary>
    [Benchmark(Description = "EOM-CCSD (3 singlets)")]
    public double EomCcsd() => Orbitarium.Correlation.EomCcsd.Singlets(_hamiltonian, 3, CorrelationOptions.Default.WithFrozenCore(1))
        .ExcitationEnergiesHartree[0];

    /// <summary>The spin-orbital route on the same closed shell (what UHF references take); cc-pVTZ would need
    /// (2·58)⁴ doubles and minutes, so it reports NaN there instead of running.</summary>
    [Benchmark(Description = "CCSD spin-orbital")]
    public double CcsdSpinOrbital() => _hamiltonian.OrbitalCount > 30
        ? double.NaN
        : Orbitarium.Correlation.Ccsd.ComputeSpinOrbital(_hamiltonian).CorrelationEnergyHartree;

    private static string Example(string name)
    {
        var dir = new DirectoryInfo(AppContext.BaseDirectory);
        while (dir is not null && !File.Exists(Path.Combine(dir.FullName, "Repl.sln"))) dir = dir.Parent;
        return Path.Combine(dir?.FullName ?? throw new InvalidOperationException("Repl.sln not found."), "examples", name);
    }
}
