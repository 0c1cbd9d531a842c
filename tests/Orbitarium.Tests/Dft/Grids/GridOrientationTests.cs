using Orbitarium.Chemistry;
using Orbitarium.Dft;
using Orbitarium.Dft.Grids;
using Orbitarium.Scf;

namespace Orbitarium.Tests.Dft.Grids;

/// <summary>The molecular grid is laid out in a frame fixed to the molecule (GridOrientation).</summary>
public class GridOrientationTests
{
    [Fact]
    public void A_rigidly_moved_molecule_has_the_same_Kohn_Sham_energy()
    {
        // A quadrature energy is invariant under rotation and translation only if the grid moves with the molecule
        // (common practice). Water has three distinct principal moments, so its frame is unique; the energies agree
        // to the SCF convergence (1e-10 Eh thresholds give ~1e-11 Eh), far below the grid error (~1e-6 Eh).
        var water = Molecule.FromZMatrix("O\nH 1 0.96\nH 1 0.96 2 104.5\n");
        var moved = water.RotatedAboutAxis(new Vector3D(0.3, -0.7, 0.5), 37).TranslatedAngstrom(0.4, -1.1, 2.3);
        double e0 = water.WithBasis("6-31G").RunRks("b3lyp", GridLevel.Coarse).TotalEnergyHartree;
        double e1 = moved.WithBasis("6-31G").RunRks("b3lyp", GridLevel.Coarse).TotalEnergyHartree;
        Assert.Equal(e0, e1, 1e-9);
    }

    [Fact]
    public void A_linear_molecule_gets_the_polar_axis_of_the_angular_rules_along_its_axis()
    {
        var axis = new Vector3D(1, 2, -2).Normalized();
        var molecule = Molecule.Empty.AddAtom("O", 0, 0, 0).AddAtom("H", 0.97 * axis.X, 0.97 * axis.Y, 0.97 * axis.Z);
        var frame = GridOrientation.For(molecule);
        Assert.Equal(1, Math.Abs(Vector3D.Dot(frame.ZAxis, axis)), 1e-12);
        Assert.Equal(0, Vector3D.Dot(frame.XAxis, frame.YAxis), 1e-12);
        Assert.Equal(0, Vector3D.Dot(frame.XAxis, frame.ZAxis), 1e-12);
    }

    [Fact]
    public void The_hydroxyl_radical_converges_in_UKS_with_the_default_settings()
    {
        // A ²Π radical: the β π pair is half filled, and which π is occupied is a rotation that costs no energy for a
        // cylindrically symmetric grid. With laboratory-fixed rules the run hit the 128-iteration limit with
        // |FDS − SDF| stuck at 2e-8. Now it converges well within 40 iterations (fully, or grid-limited once the energy
        // is still and the gradient has stopped falling), and the same radical laid along z gives the same energy.
        var oh = Molecule.FromXyz("2\nhydroxyl\nO 0 0 0\nH 0.5 0.5 0.6\n").WithMultiplicity(2);
        var result = oh.WithBasis("6-31G*").RunUks("b3lyp");
        Assert.True(result.Converged, $"stopped: {result.Scf.StopReason} after {result.Scf.Iterations} iterations");
        Assert.True(result.Scf.Iterations < 40, $"{result.Scf.Iterations} iterations");
        // The same radical laid along z gives the same energy (a rigid rotation), to the 1e-7 Eh to which a grid-limited
        // run settles its energy (ScfOptions.GridLimitedEnergyChangeHartree).
        var alongZ = Molecule.FromXyz("2\nhydroxyl\nO 0 0 0\nH 0 0 0.92736184954957\n").WithMultiplicity(2).WithBasis("6-31G*").RunUks("b3lyp");
        Assert.Equal(alongZ.TotalEnergyHartree, result.TotalEnergyHartree, 1e-7);
    }
}
