using Orbitarium.Chemistry;
using Orbitarium.Dft.Grids;

namespace Orbitarium.Tests.Dft.Grids;

public class MolecularGridTests
{
    public class Integrate
    {
        [Fact]
        public void Given_the_very_fine_grid_when_gaussians_are_integrated_then_the_exact_value_is_found_to_1e8()
        {
            // ∫ exp(−α|r − C|²) d³r = (π/α)^{3/2} (textbook Gaussian integral), for centres on a nucleus,
            // at a bond midpoint and off every atom.
            var grid = MolecularGrid.Create(TestMolecules.Water, GridLevel.VeryFine);
            var atoms = TestMolecules.Water.Atoms;
            Vector3D[] centres =
            [
                atoms[0].PositionBohr, atoms[1].PositionBohr,
                0.5 * (atoms[0].PositionBohr + atoms[1].PositionBohr),
                new Vector3D(0.4, -0.3, 0.9),
            ];
            // Exponents 0.2-5 bohr^-2 span valence densities at every centre; a sharp one (40) sits on the oxygen
            // nucleus. (A sharp Gaussian on hydrogen spills into the oxygen cell and needs degree > 70 for 1e-8:
            // 6e-8 at degree 59, measured.)
            var cases = new List<(double Alpha, Vector3D Centre)>();
            foreach (var alpha in new[] { 0.2, 1.0, 5.0 })
                foreach (var c in centres) cases.Add((alpha, c));
            cases.Add((40.0, atoms[0].PositionBohr));
            foreach (var (alpha, c) in cases)
            {
                double exact = Math.Pow(Math.PI / alpha, 1.5);
                double value = grid.Integrate(p => Math.Exp(-alpha * (p - c).LengthSquared));
                Assert.True(Math.Abs(value / exact - 1) < 1e-8, $"alpha {alpha} at {c}: {value:R} vs {exact:R}");
            }
        }
    }

    public class Create
    {
        [Fact]
        public void Given_water_when_built_at_each_level_then_point_counts_grow_with_the_level()
        {
            int previous = 0;
            foreach (var level in new[] { GridLevel.Coarse, GridLevel.Default, GridLevel.Fine })
            {
                var grid = MolecularGrid.Create(TestMolecules.Water, level);
                Assert.True(grid.PointCount > previous);
                Assert.True(grid.PointCount <= grid.PointsBeforeScreening);
                Assert.All(grid.Batches, b => Assert.InRange(b.Count, 1, MolecularGrid.MaxBatchSize));
                Assert.Equal(grid.PointCount, grid.Batches.Sum(b => b.Count));
                previous = grid.PointCount;
            }
        }
    }
}
