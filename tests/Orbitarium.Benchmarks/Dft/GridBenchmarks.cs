using BenchmarkDotNet.Attributes;
using MathNet.Numerics.LinearAlgebra;
using Orbitarium.BasisSets;
using Orbitarium.Chemistry;
using Orbitarium.Dft;
using Orbitarium.Dft.Functionals;
using Orbitarium.Dft.Grids;
using Orbitarium.Scf;

namespace Orbitarium.Benchmarks.Dft;

/// <summary>The two grid costs of a Kohn–Sham iteration for benzene/6-31G* (TIDEGLASS demo geometry) at the default
/// grid: building the grid (once per geometry) and one B3LYP evaluation of E_xc and V_xc from a fixed density (once
/// per SCF iteration; grid and per-batch screening reused). Run with <c>--filter *GridBenchmarks* --job short</c>.</summary>
[MemoryDiagnoser]
public class GridBenchmarks
{
    private Molecule _benzene = null!;
    private MolecularBasis _basis = null!;
    private Matrix<double> _density = null!;
    private GridExchangeCorrelation _b3lyp = null!;

    [GlobalSetup]
    public void Setup()
    {
        _benzene = Molecule.FromXyzFile(Path.Combine(KohnShamBenchmarks.FindExamples(), "tgb-benzene.xyz"));
        var rhf = _benzene.WithBasis("6-31G*").RunRhf();
        _basis = rhf.Basis;
        _density = 0.5 * rhf.DensityTotal;
        _b3lyp = new GridExchangeCorrelation(FunctionalRegistry.Get("b3lyp"));
        _b3lyp.GridFor(_basis);
    }

    [Benchmark]
    public int BenzeneDefaultGridBuild() => MolecularGrid.Create(_benzene).PointCount;

    [Benchmark]
    public double BenzeneB3lypEvaluation() => _b3lyp.Evaluate(_basis, _density, _density, false).EnergyHartree;
}
