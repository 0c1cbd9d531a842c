using MathNet.Numerics;
using Orbitarium.BasisSets;
using Orbitarium.Chemistry;
using GaussianShell = Orbitarium.BasisSets.Shell;

namespace Orbitarium.Tests.BasisSets;

public class BuiltInBasisSetTests
{
    public static TheoryData<string> LibraryNames()
    {
        var data = new TheoryData<string>();
        foreach (var n in BasisSetLibrary.Names) data.Add(n);
        return data;
    }

    // ∫ x^{2k} e^{−p x²} dx over the real line = Γ(k + 1/2) / p^{k+1/2} (standard Gaussian integral).
    private static double Moment(int twoK, double p) => twoK % 2 != 0 ? 0 : SpecialFunctions.Gamma(twoK / 2 + 0.5) / Math.Pow(p, twoK / 2 + 0.5);

    // Overlap of x^a y^b z^c and x^d y^e z^f contracted with the same coefficients and exponents, at one centre.
    private static double ContractedOverlap(GaussianShell shell, (int X, int Y, int Z) u, (int X, int Y, int Z) v)
    {
        var c = shell.NormalizedCoefficients;
        var a = shell.Exponents;
        double s = 0;
        for (int i = 0; i < c.Length; i++)
            for (int j = 0; j < c.Length; j++)
            {
                double p = a[i] + a[j];
                s += c[i] * c[j] * Moment(u.X + v.X, p) * Moment(u.Y + v.Y, p) * Moment(u.Z + v.Z, p);
            }
        return s;
    }

    [Theory]
    [MemberData(nameof(LibraryNames))]
    public void Every_contracted_function_is_normalised_to_1e_12(string name)
    {
        // Definition of a normalised basis function: ⟨χ|χ⟩ = 1, with the self-overlap computed here from
        // one-dimensional Gaussian moments, independently of Shell's own normalisation code.
        var set = BasisSetLibrary.Get(name);
        Assert.NotEmpty(set.AtomicNumbers);
        foreach (int z in set.AtomicNumbers)
            foreach (var def in set.ShellsFor(PeriodicTable.ByAtomicNumber(z)))
                foreach (bool pure in new[] { false, true })
                {
                    var shell = new GaussianShell(def, Vector3D.Zero, 0, pure);
                    var comps = AngularMomentum.CartesianComponents(def.AngularMomentum);
                    var t = shell.Transform;
                    for (int f = 0; f < shell.FunctionCount; f++)
                    {
                        double s = 0;
                        for (int a = 0; a < comps.Count; a++)
                            for (int b = 0; b < comps.Count; b++)
                                if (t[f, a] != 0 && t[f, b] != 0)
                                    s += t[f, a] * t[f, b] * ContractedOverlap(shell, comps[a], comps[b]);
                        Assert.True(Math.Abs(s - 1) < 1e-12, $"{name} Z={z} L={def.AngularMomentum} function {f}: ⟨χ|χ⟩ = {s:R}");
                    }
                }
    }

    [Theory]
    [MemberData(nameof(LibraryNames))]
    public void Published_contractions_are_normalised_as_printed(string name)
    {
        // Published contraction coefficients multiply normalised primitives and give a normalised function
        // (Hehre et al. 1969-1972; Dunning 1989): Σ cᵢcⱼ (2√(αᵢαⱼ)/(αᵢ+αⱼ))^{L+3/2} = 1 up to the rounding
        // of the printed digits. A transcription slip in an exponent or coefficient shows up here.
        // Tolerance 2e-4: rounding of 6-7 printed digits gives about 1e-6, while a slip in one of the first four
        // digits of a coefficient gives 1e-4 to 1e-2 (the recalled Ne 3-21G core failed by 1.6e-3, Ne 6-31G 2sp by
        // 1.0e-4; both are corrected in their files). Exception (from memory): the distributed He 6-31G
        // contraction is not normalised as printed; Orbitarium renormalises every contraction exactly.
        var set = BasisSetLibrary.Get(name);
        foreach (int z in set.AtomicNumbers)
            foreach (var def in set.ShellsFor(PeriodicTable.ByAtomicNumber(z)))
            {
                if (def.PrimitiveCount == 1 || (z == 2 && name.StartsWith("6-31G", StringComparison.Ordinal))) continue;
                double s = 0;
                for (int i = 0; i < def.PrimitiveCount; i++)
                    for (int j = 0; j < def.PrimitiveCount; j++)
                    {
                        double ai = def.Exponents[i], aj = def.Exponents[j];
                        s += def.Coefficients[i] * def.Coefficients[j] * Math.Pow(2 * Math.Sqrt(ai * aj) / (ai + aj), def.AngularMomentum + 1.5);
                    }
                Assert.True(Math.Abs(s - 1) < 2e-4, $"{name} Z={z} L={def.AngularMomentum}: printed norm {s:F6}");
            }
    }

    [Theory]
    // Default forms, common practice: Pople sets Cartesian d (6D) except 6-311G** (5D/7F); cc-pVXZ pure.
    [InlineData("STO-3G", false)]
    [InlineData("3-21G", false)]
    [InlineData("6-31G", false)]
    [InlineData("6-31G*", false)]
    [InlineData("6-31G**", false)]
    [InlineData("6-311G**", true)]
    [InlineData("cc-pVDZ", true)]
    [InlineData("cc-pVTZ", true)]
    public void Each_set_has_its_conventional_default_form(string name, bool pure) =>
        Assert.Equal(pure, BasisSetLibrary.Get(name).DefaultPure);

    [Theory]
    // Function counts, common practice: water 6-31G* (6D) 19, 6-31G** 25, cc-pVDZ 24, cc-pVTZ 58,
    // STO-3G 7, 3-21G 13, 6-31G 13, 6-311G** (5D) 30.
    [InlineData("STO-3G", 7)]
    [InlineData("3-21G", 13)]
    [InlineData("6-31G", 13)]
    [InlineData("6-31G*", 19)]
    [InlineData("6-31G**", 25)]
    [InlineData("6-311G**", 30)]
    [InlineData("cc-pVDZ", 24)]
    [InlineData("cc-pVTZ", 58)]
    public void Water_has_the_conventional_number_of_basis_functions(string name, int count)
    {
        var water = Molecule.FromXyz("3\nwater\nO 0 0 0.1173\nH 0 0.7572 -0.4692\nH 0 -0.7572 -0.4692\n");
        Assert.Equal(count, MolecularBasis.Create(water, BasisSetLibrary.Get(name)).FunctionCount);
    }

    [Fact]
    public void Generated_STO_3G_reproduces_published_carbon_exponents()
    {
        // STO-3G carbon as published (Hehre, Stewart & Pople 1969 with ζ(1s) = 5.67, ζ(2sp) = 1.72; values from
        // memory of the distributed set): 1s 71.6168370, 13.0450960, 3.5305122; 2sp 2.9412494, 0.6834831, 0.2222899.
        var c = BasisSetLibrary.Get("STO-3G").ShellsFor(PeriodicTable.BySymbol("C"));
        double[] core = [71.6168370, 13.0450960, 3.5305122];
        double[] valence = [2.9412494, 0.6834831, 0.2222899];
        for (int i = 0; i < 3; i++)
        {
            Assert.Equal(core[i], c[0].Exponents[i], 1e-4 * core[i]);
            Assert.Equal(valence[i], c[1].Exponents[i], 1e-4 * valence[i]);
            Assert.Equal(valence[i], c[2].Exponents[i], 1e-4 * valence[i]);
        }
    }

    [Fact]
    public void STO_3G_covers_hydrogen_to_argon_without_d_shells()
    {
        // Common practice: minimal STO-3G has no d functions for H–Ar.
        var set = BasisSetLibrary.Get("STO-3G");
        Assert.Equal(Enumerable.Range(1, 18), set.AtomicNumbers);
        var cl = set.ShellsFor(PeriodicTable.BySymbol("Cl"));
        Assert.Equal([0, 0, 1, 0, 1], cl.Select(s => s.AngularMomentum));
        Assert.All(set.AtomicNumbers, z => Assert.All(set.ShellsFor(PeriodicTable.ByAtomicNumber(z)), s => Assert.True(s.AngularMomentum <= 1)));
    }

    [Fact]
    public void STO_6G_1s_has_six_primitives_scaled_by_zeta_squared()
    {
        var h = BasisSetLibrary.Get("STO-6G").ShellsFor(PeriodicTable.BySymbol("H"))[0];
        var fit = StoNGFit.Fit(6, SlaterOrbital.S1);
        Assert.Equal(6, h.PrimitiveCount);
        for (int i = 0; i < 6; i++) Assert.Equal(fit.Exponents[i] * 1.24 * 1.24, h.Exponents[i], 1e-12);
    }
}
