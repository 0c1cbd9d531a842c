using Orbitarium.Chemistry;
using Orbitarium.Geometry;
using Orbitarium.Geometry.Optimization;

namespace Orbitarium.Tests.Geometry.Optimization;

public class GeometryOptimizerTests
{
    private static readonly OptimizationOptions Tight = OptimizationOptions.Tight with { FiniteDifferenceStepBohr = 1e-3 };

    [Theory]
    [InlineData(OptimizationCoordinates.RedundantInternal)]
    [InlineData(OptimizationCoordinates.Cartesian)]
    public void The_water_model_reaches_its_reference_bond_and_angle(OptimizationCoordinates coordinates)
    {
        // The model's minimum is at r = 1.8 bohr, θ = 104.5° by construction.
        var result = ModelSurfaces.WaterModel().Optimize(ModelSurfaces.DistortedWater(), Tight.WithCoordinates(coordinates));
        Assert.True(result.Converged, result.ToString());
        Assert.Equal(1.8, result.Molecule.DistanceBohr(0, 1), 4);
        Assert.Equal(1.8, result.Molecule.DistanceBohr(0, 2), 4);
        Assert.Equal(104.5, result.Molecule.AngleDegrees(1, 0, 2), 2);
        Assert.True(result.Trajectory.Length >= 2);
    }

    [Fact]
    public void Distorted_starts_reach_the_same_minimum()
    {
        var surface = ModelSurfaces.WaterModel();
        var a = surface.Optimize(ModelSurfaces.DistortedWater(), Tight);
        var b = surface.Optimize(Molecule.Empty.AddAtom("O", 0, 0, 0).AddAtom("H", 1.2, 0, 0).AddAtom("H", -0.2, 0.7, 0.3), Tight);
        Assert.True(a.Converged && b.Converged);
        Assert.Equal(a.EnergyHartree, b.EnergyHartree, 9);
        Assert.Equal(a.Molecule.AngleDegrees(1, 0, 2), b.Molecule.AngleDegrees(1, 0, 2), 2);
    }

    [Fact]
    public void A_fixed_angle_is_held_to_1e_6_while_the_bonds_relax()
    {
        var result = ModelSurfaces.WaterModel().Optimize(ModelSurfaces.DistortedWater(),
            Tight.WithConstraint(GeometryConstraint.Angle(1, 0, 2, 95.0)));
        Assert.True(result.Converged, result.ToString());
        foreach (var step in result.Trajectory) Assert.Equal(95.0, step.Molecule.AngleDegrees(1, 0, 2), 6);
        Assert.Equal(1.8, result.Molecule.DistanceBohr(0, 1), 3);
    }

    [Fact]
    public void A_relaxed_scan_holds_each_constrained_distance_to_1e_6()
    {
        var values = new[] { 0.90, 0.95, 1.00 };
        var scan = ModelSurfaces.WaterModel().RelaxedScan(ModelSurfaces.DistortedWater(), GeometryConstraint.Distance(0, 1), values, Tight);
        Assert.True(scan.AllConverged);
        for (int i = 0; i < values.Length; i++)
        {
            Assert.Equal(values[i], scan.Points[i].Molecule.DistanceAngstrom(0, 1), 6);
            Assert.Equal(104.5, scan.Points[i].Molecule.AngleDegrees(1, 0, 2), 2);
        }
    }

    [Fact]
    public void Frozen_atoms_do_not_move()
    {
        var start = ModelSurfaces.DistortedWater();
        var result = ModelSurfaces.WaterModel().Optimize(start, Tight.WithConstraint(GeometryConstraint.Frozen(0)).WithConstraint(GeometryConstraint.Frozen(1)));
        Assert.True(result.Converged, result.ToString());
        Assert.Equal(start.Atoms[0].PositionBohr, result.Molecule.Atoms[0].PositionBohr);
        Assert.Equal(start.Atoms[1].PositionBohr, result.Molecule.Atoms[1].PositionBohr);
        Assert.Equal(1.8, result.Molecule.DistanceBohr(0, 2), 3);
    }

    [Fact]
    public void The_step_limit_returns_the_best_geometry_flagged_not_converged()
    {
        var result = ModelSurfaces.WaterModel().Optimize(ModelSurfaces.DistortedWater(), Tight.WithMaxIterations(2));
        Assert.False(result.Converged);
        Assert.Equal(OptimizationStopReason.IterationLimit, result.StopReason);
        Assert.Equal(result.Trajectory.Min(s => s.EnergyHartree), result.EnergyHartree);
    }

    [Fact]
    public void A_single_atom_has_nothing_to_optimise()
    {
        var result = new DelegateSurface("atom", _ => -526.8).Optimize(Molecule.Empty.AddAtom("Ar", 0, 0, 0));
        Assert.True(result.Converged);
        Assert.Equal(OptimizationStopReason.NothingToOptimize, result.StopReason);
    }

    [Fact]
    public void A_bent_start_of_a_linear_model_straightens()
    {
        // O–C–O model with its minimum at 180°: 2.2 bohr bonds, linear reference angle.
        var surface = ModelSurfaces.ValenceForceField([(0, 1, 2.2, 0.8), (1, 2, 2.2, 0.8)], [(0, 1, 2, 180.0, 0.2)]);
        var start = Molecule.Empty.AddAtom("O", 0, 0.08, -1.2).AddAtom("C", 0, 0, 0).AddAtom("O", 0, 0.03, 1.1);
        var result = surface.Optimize(start, Tight);
        Assert.True(result.Converged, result.ToString());
        Assert.True(result.Molecule.AngleDegrees(0, 1, 2) > 179.5);
        Assert.Equal(2.2, result.Molecule.DistanceBohr(0, 1), 3);
    }

    [Fact]
    public void Colliding_atoms_reject_the_step_and_never_crash()
    {
        // A pair attraction without repulsion pulls two atoms together: steps that collide are rejected.
        var surface = new DelegateSurface("collapse", m => -1.0 / m.DistanceBohr(0, 1));
        var start = Molecule.Empty.AddAtom("He", 0, 0, 0).AddAtom("He", 0, 0, 1.0);
        var result = surface.Optimize(start, OptimizationOptions.Default.WithMaxIterations(30));
        Assert.False(result.Converged);
        Assert.True(result.Molecule.DistanceAngstrom(0, 1) > 0.4 * 0.56);
    }

    [Fact]
    public void Eigenvector_following_finds_the_torsional_saddle_point()
    {
        // H–O–O–H model with a twofold torsion A(1 + cos 2φ): minima at ±90°, saddle points at 0° and 180°.
        var surface = ModelSurfaces.ValenceForceField(
            [(0, 1, 2.7, 0.5), (0, 2, 1.8, 0.5), (1, 3, 1.8, 0.5)],
            [(2, 0, 1, 100.0, 0.15), (0, 1, 3, 100.0, 0.15)],
            [(2, 0, 1, 3, 0.004, 2)]);
        var start = Molecule.FromZMatrix("O\nO 1 1.43\nH 1 0.95 2 100\nH 2 0.95 1 100 3 150");
        var result = surface.Optimize(start, Tight.ForTransitionState());
        Assert.True(result.Converged, result.ToString());
        Assert.Equal(180.0, Math.Abs(result.Molecule.DihedralDegrees(2, 0, 1, 3)), 1);
        var modes = surface.Frequencies(result.Molecule, 1e-3);
        Assert.Equal(1, modes.ImaginaryModeCount);
    }

    [Fact]
    public void Bad_constraint_indices_are_refused_with_a_clear_message()
    {
        var e = Assert.Throws<OrbitariumInputException>(() =>
            ModelSurfaces.WaterModel().Optimize(ModelSurfaces.DistortedWater(), OptimizationOptions.Default.WithConstraint(GeometryConstraint.Distance(0, 7))));
        Assert.Contains("0-based", e.Message);
    }

    [Fact]
    public void The_trajectory_exports_as_multi_frame_xyz()
    {
        var result = ModelSurfaces.WaterModel().Optimize(ModelSurfaces.DistortedWater(), Tight);
        string text = result.TrajectoryXyz();
        Assert.Equal(result.Trajectory.Length, text.Split('\n').Count(l => l.Trim() == "3"));
        string path = Path.Combine(Path.GetTempPath(), $"orbitarium-traj-{Guid.NewGuid():N}.xyz");
        result.WriteTrajectory(path);
        Assert.Equal(text, File.ReadAllText(path));
        File.Delete(path);
    }
}
