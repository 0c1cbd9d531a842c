using Orbitarium.BasisSets;
using Orbitarium.Chemistry;
using Orbitarium.Geometry;
using Orbitarium.Geometry.Optimization;
using Orbitarium.Scf;

namespace Orbitarium.Tests.Geometry.Reference;

/// <summary>Optimised RHF geometries and harmonic wavenumbers against published tables. Reference values: W. J. Hehre,
/// L. Radom, P. v. R. Schleyer and J. A. Pople, <i>Ab Initio Molecular Orbital Theory</i> (Wiley, 1986), Tables 6.1–6.2
/// (geometries) and 6.x (frequencies) — all from memory. Published 6-31G* uses Cartesian (6D) d functions, as here.</summary>
public class HartreeFockGeometryTests
{
    private static readonly OptimizationOptions Tight = OptimizationOptions.Tight;

    private static Calculation Setup(Molecule m, string basis) => Calculation.Create(m, BasisSetLibrary.Get(basis), pure: false);

    private static readonly Molecule StartWater = Molecule.FromXyz("3\n\nO 0 0 0.12\nH 0 0.80 -0.46\nH 0 -0.76 -0.48");

    private static readonly Molecule StartFormaldehyde = Molecule.FromXyz("4\n\nC 0 0 0\nO 0 0 1.25\nH 0 0.97 -0.55\nH 0 -0.92 -0.58");

    [Theory]
    // Water: RHF/STO-3G r(OH) = 0.989 Å, ∠HOH = 100.0°; RHF/6-31G* 0.947 Å, 105.5° (Hehre et al. 1986, from memory).
    [InlineData("STO-3G", 0.989, 100.0)]
    [InlineData("6-31G*", 0.947, 105.5)]
    public void Water_optimises_to_the_published_RHF_geometry(string basis, double rOh, double angle)
    {
        var result = Setup(StartWater, basis).Optimize(Tight);
        Assert.True(result.Converged, result.ToString());
        Assert.Equal(GradientSource.Analytic, result.GradientSource);
        var m = result.Molecule;
        Assert.InRange(m.DistanceAngstrom(0, 1), rOh - 0.002, rOh + 0.002);
        Assert.InRange(m.DistanceAngstrom(0, 2), rOh - 0.002, rOh + 0.002);
        Assert.InRange(m.AngleDegrees(1, 0, 2), angle - 0.2, angle + 0.2);
    }

    [Theory]
    // Formaldehyde: RHF/STO-3G r(CO) = 1.217 Å, r(CH) = 1.101 Å, ∠HCH = 114.5°;
    // RHF/6-31G* 1.184 Å, 1.092 Å, 115.7° (Hehre et al. 1986, from memory).
    [InlineData("STO-3G", 1.217, 1.101, 114.5)]
    [InlineData("6-31G*", 1.184, 1.092, 115.7)]
    public void Formaldehyde_optimises_to_the_published_RHF_geometry(string basis, double rCo, double rCh, double angle)
    {
        var result = Setup(StartFormaldehyde, basis).Optimize(Tight);
        Assert.True(result.Converged, result.ToString());
        var m = result.Molecule;
        Assert.InRange(m.DistanceAngstrom(0, 1), rCo - 0.002, rCo + 0.002);
        Assert.InRange(m.DistanceAngstrom(0, 2), rCh - 0.002, rCh + 0.002);
        Assert.InRange(m.AngleDegrees(2, 0, 3), angle - 0.2, angle + 0.2);
    }

    [Fact]
    public void Water_reaches_the_same_STO_3G_minimum_from_a_strongly_distorted_start()
    {
        var distorted = Molecule.FromXyz("3\n\nO 0 0 0\nH 0.2 1.3 0.1\nH 0.1 -0.6 -0.9");
        var a = Setup(StartWater, "STO-3G").Optimize(Tight);
        var b = Setup(distorted, "STO-3G").Optimize(Tight);
        Assert.True(a.Converged && b.Converged);
        Assert.Equal(a.EnergyHartree, b.EnergyHartree, 8);
        Assert.Equal(a.Molecule.AngleDegrees(1, 0, 2), b.Molecule.AngleDegrees(1, 0, 2), 1);
    }

    [Fact]
    public void Water_RHF_STO_3G_wavenumbers_match_the_published_table()
    {
        // RHF/STO-3G harmonic wavenumbers of water: 2170, 4140, 4391 cm⁻¹ (Hehre et al. 1986, from memory).
        // Tolerance 4 cm⁻¹: published values rounded, Hessian by finite differences (h = 0.005 bohr).
        var opt = Setup(StartWater, "STO-3G").Optimize(Tight);
        var vib = Setup(opt.Molecule, "STO-3G").Frequencies();
        Assert.Equal(0, vib.ImaginaryModeCount);
        var w = vib.WavenumbersPerCm;
        Assert.Equal(3, w.Length);
        Assert.InRange(w[0], 2170 - 4, 2170 + 4);
        Assert.InRange(w[1], 4140 - 4, 4140 + 4);
        Assert.InRange(w[2], 4391 - 4, 4391 + 4);
        Assert.All(vib.Modes, m => Assert.NotNull(m.IrIntensityKmPerMol));
        var thermo = vib.Thermochemistry();
        Assert.Equal("C2v", thermo.PointGroup);
        Assert.Equal(2, thermo.SymmetryNumber);
    }

    [Fact]
    public void A_relaxed_scan_of_the_water_angle_holds_it_to_1e_6()
    {
        var scan = Setup(StartWater, "STO-3G").AsSurface().RelaxedScan(StartWater, GeometryConstraint.Angle(1, 0, 2), [95.0, 110.0]);
        Assert.True(scan.AllConverged);
        Assert.Equal(95.0, scan.Points[0].Molecule.AngleDegrees(1, 0, 2), 6);
        Assert.Equal(110.0, scan.Points[1].Molecule.AngleDegrees(1, 0, 2), 6);
        Assert.True(scan.Points[1].EnergyHartree > scan.Points[0].EnergyHartree - 1); // both real SCF energies
    }
}
