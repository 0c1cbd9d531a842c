using Orbitarium.Chemistry;
using Orbitarium.Dft;
using Orbitarium.Scf;

namespace Orbitarium.Tests.Dft;

public class ReproducibilityTests
{
    [Fact]
    public void The_same_calculation_repeats_to_the_last_bit()
    {
        // Parallel sums are reduced in a fixed order (FixedOrderParallel), so thread scheduling cannot change the last
        // digits. The open-shell O atom in UKS/B3LYP is the sensitive case: its soft p-shell rotation amplified
        // last-digit noise into runs that differed by 1e-7 Eh and by tens of iterations.
        var calc = Molecule.Empty.AddAtom("O", 0, 0, 0).WithMultiplicity(3).WithBasis("6-31G*");
        var first = calc.RunUks("b3lyp");
        var second = calc.RunUks("b3lyp");
        Assert.Equal(first.Scf.Iterations, second.Scf.Iterations);
        Assert.Equal(BitConverter.DoubleToInt64Bits(first.TotalEnergyHartree), BitConverter.DoubleToInt64Bits(second.TotalEnergyHartree));
        var rhf1 = Molecule.FromXyz("3\nwater\nO 0 0 0.1173\nH 0 0.7572 -0.4692\nH 0 -0.7572 -0.4692\n").WithBasis("6-31G").RunRhf();
        var rhf2 = Molecule.FromXyz("3\nwater\nO 0 0 0.1173\nH 0 0.7572 -0.4692\nH 0 -0.7572 -0.4692\n").WithBasis("6-31G").RunRhf();
        Assert.Equal(BitConverter.DoubleToInt64Bits(rhf1.TotalEnergyHartree), BitConverter.DoubleToInt64Bits(rhf2.TotalEnergyHartree));
    }
}
