using BenchmarkDotNet.Attributes;
using Orbitarium.Chemistry;
using Orbitarium.Dft;
using Orbitarium.Scf;

namespace Orbitarium.Benchmarks.Dft;

/// <summary>B3LYP/6-31G* single points at the default grid: water and benzene (TIDEGLASS demo geometries).
/// Run with <c>--filter *KohnSham* --job short</c>.</summary>
[MemoryDiagnoser]
public class KohnShamBenchmarks
{
    private Calculation _water = null!, _benzene = null!;

    [GlobalSetup]
    public void Setup()
    {
        string folder = FindExamples();
        _water = Molecule.FromXyzFile(Path.Combine(folder, "tg1-water.xyz")).WithBasis("6-31G*");
        _benzene = Molecule.FromXyzFile(Path.Combine(folder, "tgb-benzene.xyz")).WithBasis("6-31G*");
    }

    internal static string FindExamples()
    {
        var dir = new DirectoryInfo(AppContext.BaseDirectory);
        while (dir is not null && !Directory.Exists(Path.Combine(dir.FullName, "examples"))) dir = dir.Parent;
        return dir is null ? throw new DirectoryNotFoundException("examples/ not found above the benchmark binary") : Path.Combine(dir.FullName, "examples");
    }

    [Benchmark]
    public double WaterB3lyp631gStar() => _water.RunRks("b3lyp").TotalEnergyHartree;

    [Benchmark]
    public double BenzeneB3lyp631gStar() => _benzene.RunRks("b3lyp").TotalEnergyHartree;
}
