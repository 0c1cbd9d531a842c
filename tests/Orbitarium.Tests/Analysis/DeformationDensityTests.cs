using Orbitarium.Analysis;
using Orbitarium.Chemistry;
using Orbitarium.Scf;

namespace Orbitarium.Tests.Analysis;

public class DeformationDensityTests
{
    [Fact]
    public void Integrates_to_zero_and_piles_charge_up_at_the_bond_midpoint()
    {
        var r = AnalysisSystems.DihydrogenRhfCcPvdz;
        var box = FieldEvaluatorTests.FineBox(r.Molecule);
        var delta = ScfFields.DeformationDensity(r, box);
        // Both the molecule and the two neutral atoms hold 2 electrons, so ∫Δρ = 0 (charge conservation).
        Assert.Equal(0.0, delta.IntegrateOverBox(), 1e-4);
        // A covalent bond accumulates density between the nuclei (common practice; Ruedenberg, Rev. Mod. Phys. 34, 326 (1962)).
        var line = LineGrid.Between(new Vector3D(0, 0, 0.3705), new Vector3D(0, 0, 0.3706), 2);
        Assert.True(ScfFields.DeformationDensity(r, line)[0] > 0);
    }

    [Fact]
    public void The_spherical_average_keeps_the_atom_s_electron_count()
    {
        // Averaging over rotations conserves charge (trace of D·S is rotation invariant; common practice).
        var o = Molecule.Empty.AddAtom("O", 0, 0, 0).WithMultiplicity(3).WithBasis("cc-pVDZ").RunUhf();
        var avg = SphericalAtom.Average(o.Basis, o.DensityTotal);
        Assert.Equal(8.0, (avg * o.Overlap).Trace(), 8);
        // The p shell becomes equally filled in x, y and z.
        var s = o.Basis;
        int p = s.FunctionLabels.IndexOf("O1 px");
        Assert.Equal(avg[p, p], avg[p + 1, p + 1], 12);
        Assert.Equal(avg[p, p], avg[p + 2, p + 2], 12);
    }
}
