using Orbitarium.BasisSets;
using Orbitarium.Chemistry;
using Orbitarium.Geometry;
using Orbitarium.Geometry.Optimization;
using Orbitarium.Scf;

namespace Orbitarium.Tests.Geometry.Reference;

public class TransitionStateTests
{
    [Fact]
    public void Ammonia_inversion_saddle_point_is_planar_D3h_with_one_imaginary_mode()
    {
        // Fact of the trade (common practice): the umbrella-inversion transition state of NH3 is planar (D3h) with a
        // single imaginary frequency. Start from a flattened pyramid and follow the lowest Hessian eigenvector uphill.
        var start = Molecule.FromXyz("4\n\nN 0 0 0.12\nH 0.98 0 -0.04\nH -0.49 0.8487 -0.04\nH -0.49 -0.8487 -0.04");
        var calc = Calculation.Create(start, BasisSetLibrary.Get("STO-3G"));
        var ts = calc.Optimize(OptimizationOptions.Tight.ForTransitionState());
        Assert.True(ts.Converged, ts.ToString());
        Assert.Equal("D3h", ts.Molecule.PointGroup(0.01).Name);
        var vib = calc.WithMolecule(ts.Molecule).Frequencies();
        Assert.Equal(1, vib.ImaginaryModeCount);
        Assert.True(vib.Modes[0].IsImaginary);
    }
}
