using Orbitarium.BasisSets;
using Orbitarium.Integrals;

namespace Orbitarium.Tests.Integrals;

public class ElectronRepulsionTensorTests
{
    /// <summary>Basis-function integrals from the independent McMurchie–Davidson routine, transformed with each shell's
    /// <c>Shell.Transform</c> (definition of the basis functions; common practice).</summary>
    private static double Reference(MolecularBasis basis, int i, int j, int k, int l)
    {
        int[] f = [i, j, k, l];
        var shells = new Orbitarium.BasisSets.Shell[4];
        var local = new int[4];
        for (int x = 0; x < 4; x++)
        {
            int s = basis.FunctionShells[f[x]];
            shells[x] = basis.Shells[s];
            local[x] = f[x] - basis.ShellOffsets[s];
        }
        var raw = new RawShell[4];
        for (int x = 0; x < 4; x++) raw[x] = RawShell.FromShell(shells[x]);
        int na = raw[0].CartesianCount, nb = raw[1].CartesianCount, nc = raw[2].CartesianCount, nd = raw[3].CartesianCount;
        var block = new double[na * nb * nc * nd];
        McMurchieDavidson.ElectronRepulsion(raw[0], raw[1], raw[2], raw[3], block);
        double sum = 0;
        for (int a = 0; a < na; a++)
            for (int b = 0; b < nb; b++)
                for (int c = 0; c < nc; c++)
                    for (int d = 0; d < nd; d++)
                        sum += shells[0].Transform[local[0], a] * shells[1].Transform[local[1], b] * shells[2].Transform[local[2], c]
                             * shells[3].Transform[local[3], d] * block[((a * nb + b) * nc + c) * nd + d];
        return sum;
    }

    [Theory]
    [InlineData(true)]
    [InlineData(false)]
    public void Tensor_elements_match_the_independent_algorithm_for_s_to_f_functions(bool pure)
    {
        var basis = TestBases.WaterSpdf(pure, withF: true);
        var tensor = ElectronRepulsionTensor.Compute(basis, 0.0);
        int n = basis.FunctionCount;
        var rng = new Random(pure ? 11 : 12);
        for (int trial = 0; trial < 150; trial++)
        {
            int i = rng.Next(n), j = rng.Next(n), k = rng.Next(n), l = rng.Next(n);
            double expected = Reference(basis, i, j, k, l);
            Assert.True(Math.Abs(tensor[i, j, k, l] - expected) < 1e-12 * Math.Max(1, Math.Abs(expected)),
                $"({i}{j}|{k}{l}) = {tensor[i, j, k, l]:R}, independent {expected:R}");
        }
    }

    [Fact]
    public void Eight_fold_symmetry_and_packed_size_hold()
    {
        var basis = TestBases.WaterSpdf(true);
        var tensor = ElectronRepulsionTensor.Compute(basis);
        int n = basis.FunctionCount;
        long m = (long)n * (n + 1) / 2;
        Assert.Equal(m * (m + 1) / 2, tensor.UniqueCount);
        Assert.Equal(8 * tensor.UniqueCount, ElectronRepulsionTensor.EstimateBytes(n));
        Assert.Equal(tensor[3, 7, 1, 12], tensor[12, 1, 7, 3]);
        Assert.Equal(tensor[3, 7, 1, 12], tensor[7, 3, 12, 1]);
        Assert.True(tensor.ShellQuartetCount > tensor.ScreenedShellQuartetCount);
    }

    [Fact]
    public void Screening_skips_quartets_of_distant_fragments_without_changing_kept_values()
    {
        // Two H2 molecules 60 bohr apart: exchange-type quartets between them vanish (Cauchy–Schwarz bound ~e^{−μR²}).
        var mol = Orbitarium.Chemistry.Molecule.Empty
            .AddAtom("H", 0, 0, 0, Orbitarium.Chemistry.LengthUnit.Bohr).AddAtom("H", 0, 0, 1.4, Orbitarium.Chemistry.LengthUnit.Bohr)
            .AddAtom("H", 60, 0, 0, Orbitarium.Chemistry.LengthUnit.Bohr).AddAtom("H", 60, 0, 1.4, Orbitarium.Chemistry.LengthUnit.Bohr);
        var set = BasisSet.Create("sto").WithElement("H", TestBases.Sto3G1s(1.24));
        var basis = MolecularBasis.Create(mol, set);
        var screened = ElectronRepulsionTensor.Compute(basis);
        var full = ElectronRepulsionTensor.Compute(basis, 0.0);
        Assert.True(screened.ScreenedShellQuartetCount > 0);
        Assert.Equal(0.0, full.ScreenedShellQuartetCount);
        // Coulomb between the fragments ≈ 1/R survives: (11|33) ≈ 1/60 (point-charge limit; common practice).
        Assert.Equal(1 / 60.0, screened[0, 0, 2, 2], 4);
        var d = full.ToDense();
        var e = screened.ToDense();
        for (int x = 0; x < d.Length; x++) Assert.True(Math.Abs(d[x] - e[x]) < 1e-12);
    }

    [Fact]
    public void Cancellation_is_honoured()
    {
        using var cts = new CancellationTokenSource();
        cts.Cancel();
        Assert.ThrowsAny<OperationCanceledException>(() => ElectronRepulsionTensor.Compute(TestBases.WaterSpdf(true), null, cts.Token));
    }
}
