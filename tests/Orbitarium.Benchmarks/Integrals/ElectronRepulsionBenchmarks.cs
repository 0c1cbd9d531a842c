using BenchmarkDotNet.Attributes;
using MathNet.Numerics.LinearAlgebra;
using Orbitarium.BasisSets;
using Orbitarium.Chemistry;
using Orbitarium.Integrals;

namespace Orbitarium.Benchmarks.Integrals;

/// <summary>
/// Time to compute every unique screened electron-repulsion integral (packed tensor) and one integral-direct J/K
/// build, for TIDEGLASS demo molecules: TG-1 water / cc-pVDZ (24 functions), TG-B benzene / cc-pVDZ with pure d
/// (114 functions) and a cluster of four TG-1 water probes / 6-31G** (100 functions).
/// Run: <c>dotnet run -c Release --project tests/Orbitarium.Benchmarks -- --filter '*ElectronRepulsion*' --job short</c>.
/// </summary>
[MemoryDiagnoser]
public class ElectronRepulsionBenchmarks
{
    private const string Water = """
        3
        TG-1 water probe (TIDEGLASS demo geometry)
        O    0.000000    0.000000    0.117300
        H    0.000000    0.757200   -0.469200
        H    0.000000   -0.757200   -0.469200
        """;

    private const string Benzene = """
        12
        TG-B aromatic spacer (TIDEGLASS demo geometry)
        C      1.397000     0.000000     0.000000
        C      0.698500     1.209837     0.000000
        C     -0.698500     1.209837     0.000000
        C     -1.397000     0.000000     0.000000
        C     -0.698500    -1.209837     0.000000
        C      0.698500    -1.209837     0.000000
        H      2.481000     0.000000     0.000000
        H      1.240500     2.148609     0.000000
        H     -1.240500     2.148609     0.000000
        H     -2.481000     0.000000     0.000000
        H     -1.240500    -2.148609     0.000000
        H      1.240500    -2.148609     0.000000
        """;

    private MolecularBasis _basis = null!;

    /// <summary>The system timed.</summary>
    [Params("water/cc-pVDZ", "benzene/cc-pVDZ", "4 water/6-31G**")]
    public string System { get; set; } = "water/cc-pVDZ";

    [GlobalSetup]
    public void Setup()
    {
        var water = Molecule.FromXyz(Water);
        _basis = System switch
        {
            "water/cc-pVDZ" => MolecularBasis.Create(water, BasisSetLibrary.Get("cc-pVDZ")),
            "benzene/cc-pVDZ" => MolecularBasis.Create(Molecule.FromXyz(Benzene), BasisSetLibrary.Get("cc-pVDZ"), pure: true),
            _ => MolecularBasis.Create(Cluster(water, 4), BasisSetLibrary.Get("6-31G**")),
        };
    }

    private static Molecule Cluster(Molecule water, int count)
    {
        var m = Molecule.Empty;
        for (int k = 0; k < count; k++)
            foreach (var atom in water.TranslatedAngstrom(3.0 * k, 0.4 * k, 0).Atoms) m = m.AddAtom(atom);
        return m;
    }

    /// <summary>All unique screened quartets into the packed 8-fold tensor (both cores).</summary>
    [Benchmark]
    public long Tensor() => ElectronRepulsionTensor.Compute(_basis).ComputedShellQuartetCount;

    /// <summary>One integral-direct J and K build with a model density (0.1 × identity).</summary>
    [Benchmark]
    public double DirectCoulombExchange()
    {
        var kernel = new DirectCoulombExchangeKernel(_basis);
        var d = Matrix<double>.Build.DenseIdentity(_basis.FunctionCount) * 0.1;
        return kernel.Build([d]).Coulomb[0][0, 0];
    }
}
