using Orbitarium.Dft.Functionals;
using Orbitarium.Dft.Libxc;

namespace Orbitarium.Tests.Dft.Functionals;

/// <summary>
/// Each built-in component and hybrid compared point by point with the reference library libxc 5 (Debian libxc9;
/// Lehtola et al., SoftwareX 7, 1 (2018)), called through P/Invoke. Reported as skipped where libxc.so.9 is absent.
/// Tolerance 1e-9 relative: the same formulas with the same constants agree to rounding.
/// </summary>
public class LibxcComparisonTests
{
    private const double RelativeTolerance = 1e-9;

    public static TheoryData<string, int> ComponentsAndLibxcIds => new()
    {
        { "slater", 1 },     // LDA_X
        { "vwn5", 7 },       // LDA_C_VWN (Ceperley-Alder fit, "VWN5")
        { "vwnrpa", 8 },     // LDA_C_VWN_RPA
        { "pw92", 12 },      // LDA_C_PW
        { "pw92mod", 13 },   // LDA_C_PW_MOD
        { "pbex", 101 },     // GGA_X_PBE
        { "b88", 106 },      // GGA_X_B88
        { "pbec", 130 },     // GGA_C_PBE
        { "lyp", 131 },      // GGA_C_LYP
    };

    public static TheoryData<string, int> HybridsAndLibxcIds => new()
    {
        { "b3lyp", 402 },    // HYB_GGA_XC_B3LYP (uses VWN_RPA)
        { "b3lyp5", 475 },   // HYB_GGA_XC_B3LYP5
        { "pbe0", 406 },     // HYB_GGA_XC_PBEH
    };

    private static void AssertClose(double expected, double actual, string what)
    {
        double scale = Math.Max(Math.Abs(expected), 1e-8);
        Assert.True(Math.Abs(expected - actual) <= RelativeTolerance * scale,
            $"{what}: libxc {expected:R}, Orbitarium {actual:R}, relative difference {Math.Abs(expected - actual) / scale:E2}");
    }

    [SkippableTheory]
    [MemberData(nameof(ComponentsAndLibxcIds))]
    public void Given_a_component_when_evaluated_unpolarized_then_libxc_agrees(string name, int libxcId)
    {
        Skip.IfNot(LibxcFunctionalComponent.IsLibraryAvailable, "libxc.so.9 is not installed (apt-get install libxc9)");
        Assert.True(FunctionalRegistry.TryGetComponent(name, out var ours));
        var reference = LibxcFunctionalComponent.Create(libxcId);
        foreach (var (rho, sigma) in FunctionalTestPoints.Unpolarized)
        {
            var a = reference.EvaluateUnpolarized(rho, sigma);
            var b = ours.EvaluateUnpolarized(rho, sigma);
            string at = $"{name} at rho={rho}, sigma={sigma}";
            AssertClose(a.EnergyDensity, b.EnergyDensity, $"{at}: e");
            AssertClose(a.VRho, b.VRho, $"{at}: vrho");
            if (ours.IsGradientCorrected) AssertClose(a.VSigma, b.VSigma, $"{at}: vsigma");
        }
    }

    [SkippableTheory]
    [MemberData(nameof(ComponentsAndLibxcIds))]
    public void Given_a_component_when_evaluated_spin_polarized_then_libxc_agrees(string name, int libxcId)
    {
        Skip.IfNot(LibxcFunctionalComponent.IsLibraryAvailable, "libxc.so.9 is not installed (apt-get install libxc9)");
        Assert.True(FunctionalRegistry.TryGetComponent(name, out var ours));
        var reference = LibxcFunctionalComponent.Create(libxcId);
        foreach (var (ra, rb, saa, sab, sbb) in FunctionalTestPoints.Polarized)
        {
            var a = reference.Evaluate(ra, rb, saa, sab, sbb);
            var b = ours.Evaluate(ra, rb, saa, sab, sbb);
            string at = $"{name} at ({ra}, {rb}, {saa}, {sab}, {sbb})";
            AssertClose(a.EnergyDensity, b.EnergyDensity, $"{at}: e");
            AssertClose(a.VRhoAlpha, b.VRhoAlpha, $"{at}: vrho_a");
            AssertClose(a.VRhoBeta, b.VRhoBeta, $"{at}: vrho_b");
            if (!ours.IsGradientCorrected) continue;
            AssertClose(a.VSigmaAlphaAlpha, b.VSigmaAlphaAlpha, $"{at}: vsigma_aa");
            AssertClose(a.VSigmaAlphaBeta, b.VSigmaAlphaBeta, $"{at}: vsigma_ab");
            AssertClose(a.VSigmaBetaBeta, b.VSigmaBetaBeta, $"{at}: vsigma_bb");
        }
    }

    [SkippableTheory]
    [MemberData(nameof(HybridsAndLibxcIds))]
    public void Given_a_hybrid_when_evaluated_then_libxc_agrees_on_the_semilocal_part_and_the_exact_exchange_fraction(string name, int libxcId)
    {
        Skip.IfNot(LibxcFunctionalComponent.IsLibraryAvailable, "libxc.so.9 is not installed (apt-get install libxc9)");
        var ours = FunctionalRegistry.Get(name);
        var reference = LibxcFunctionalComponent.Create(libxcId);
        Assert.Equal(reference.ExactExchangeFraction, ours.ExactExchangeFraction, 12);
        foreach (var (rho, sigma) in FunctionalTestPoints.Unpolarized)
        {
            var a = reference.EvaluateUnpolarized(rho, sigma);
            var b = ours.EvaluateUnpolarized(rho, sigma);
            AssertClose(a.EnergyDensity, b.EnergyDensity, $"{name} e at rho={rho}");
            AssertClose(a.VRho, b.VRho, $"{name} vrho at rho={rho}");
            AssertClose(a.VSigma, b.VSigma, $"{name} vsigma at rho={rho}");
        }
        foreach (var (ra, rb, saa, sab, sbb) in FunctionalTestPoints.Polarized)
        {
            var a = reference.Evaluate(ra, rb, saa, sab, sbb);
            var b = ours.Evaluate(ra, rb, saa, sab, sbb);
            AssertClose(a.EnergyDensity, b.EnergyDensity, $"{name} e at ({ra}, {rb})");
            AssertClose(a.VRhoBeta, b.VRhoBeta, $"{name} vrho_b at ({ra}, {rb})");
            AssertClose(a.VSigmaAlphaBeta, b.VSigmaAlphaBeta, $"{name} vsigma_ab at ({ra}, {rb})");
        }
    }
}
