using Orbitarium.Integrals;

namespace Orbitarium.Tests.Integrals;

/// <summary>
/// The production electron-repulsion engine (Head-Gordon–Pople over Obara–Saika, J. Chem. Phys. 89, 5777 (1988))
/// against an independent algorithm (McMurchie–Davidson, J. Comput. Phys. 26, 218 (1978)) on seeded random quartets.
/// Both are exact in exact arithmetic; 1e-12 relative to the block's largest element allows for rounding.
/// </summary>
public class EriAlgorithmAgreementTests
{
    public static TheoryData<int, int, int, int> Classes() => new()
    {
        { 0, 0, 0, 0 }, { 1, 0, 0, 0 }, { 0, 1, 0, 0 }, { 0, 0, 1, 0 }, { 0, 0, 0, 1 },
        { 1, 1, 1, 1 }, { 2, 0, 1, 0 }, { 0, 2, 0, 2 }, { 2, 1, 0, 2 }, { 2, 2, 2, 2 },
        { 3, 0, 0, 0 }, { 0, 3, 3, 0 }, { 3, 1, 2, 0 }, { 3, 2, 1, 3 }, { 3, 3, 2, 2 }, { 3, 3, 3, 3 },
        { 4, 0, 0, 0 }, { 4, 1, 0, 2 }, { 4, 4, 0, 0 }, { 4, 2, 4, 1 },
    };

    [Theory]
    [MemberData(nameof(Classes))]
    public void Head_Gordon_Pople_agrees_with_McMurchie_Davidson(int la, int lb, int lc, int ld)
    {
        var rng = new Random(1000 * la + 100 * lb + 10 * lc + ld);
        int primitives = la + lb + lc + ld >= 10 ? 1 : 2;
        var a = RandomShells.Create(rng, la, primitives);
        var b = RandomShells.Create(rng, lb, primitives);
        var c = RandomShells.Create(rng, lc, primitives);
        var d = RandomShells.Create(rng, ld, primitives);
        int n = a.CartesianCount * b.CartesianCount * c.CartesianCount * d.CartesianCount;
        var hgp = new double[n];
        var md = new double[n];
        new HeadGordonPople().Compute(new ShellPairData(a, b), new ShellPairData(c, d), hgp);
        McMurchieDavidson.ElectronRepulsion(a, b, c, d, md);
        double scale = 0;
        foreach (double v in md) scale = Math.Max(scale, Math.Abs(v));
        Assert.True(scale > 0);
        for (int i = 0; i < n; i++)
            Assert.True(Math.Abs(hgp[i] - md[i]) <= 1e-12 * scale, $"element {i}: HGP {hgp[i]:R} vs MD {md[i]:R} (scale {scale:G3})");
    }

    [Theory]
    [InlineData(0, 0)]
    [InlineData(1, 0)]
    [InlineData(2, 1)]
    [InlineData(3, 3)]
    [InlineData(4, 2)]
    [InlineData(5, 4)]
    public void Obara_Saika_potential_agrees_with_McMurchie_Davidson(int la, int lb)
    {
        var rng = new Random(10 * la + lb);
        var a = RandomShells.Create(rng, la);
        var b = RandomShells.Create(rng, lb);
        var charges = new (Orbitarium.Chemistry.Vector3D, double)[] { (new(0.3, -0.2, 0.7), 1.5), (new(-1, 0.5, 0.1), -0.7) };
        int n = a.CartesianCount * b.CartesianCount;
        var os = new double[n];
        var md = new double[n];
        ObaraSaikaOneElectron.Potential(a, b, charges, os);
        McMurchieDavidson.Potential(a, b, charges, md);
        double scale = 0;
        foreach (double v in md) scale = Math.Max(scale, Math.Abs(v));
        for (int i = 0; i < n; i++)
            Assert.True(Math.Abs(os[i] - md[i]) <= 1e-12 * scale, $"element {i}: OS {os[i]:R} vs MD {md[i]:R}");
    }

    [Theory]
    [InlineData(0, 0)]
    [InlineData(2, 1)]
    [InlineData(4, 5)]
    public void Obara_Saika_overlap_agrees_with_McMurchie_Davidson(int la, int lb)
    {
        var rng = new Random(7 * la + lb);
        var a = RandomShells.Create(rng, la);
        var b = RandomShells.Create(rng, lb);
        int n = a.CartesianCount * b.CartesianCount;
        var os = new double[n];
        var md = new double[n];
        ObaraSaikaOneElectron.Overlap(a, b, os);
        McMurchieDavidson.Overlap(a, b, md);
        double scale = 0;
        foreach (double v in md) scale = Math.Max(scale, Math.Abs(v));
        for (int i = 0; i < n; i++)
            Assert.True(Math.Abs(os[i] - md[i]) <= 1e-13 * scale, $"element {i}: OS {os[i]:R} vs MD {md[i]:R}");
    }
}
