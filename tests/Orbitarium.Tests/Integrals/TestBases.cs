using Orbitarium.BasisSets;
using Orbitarium.Chemistry;

namespace Orbitarium.Tests.Integrals;

/// <summary>Small hand-written bases for the integral tests.</summary>
internal static class TestBases
{
    // STO-3G expansion of a ζ = 1 Slater 1s: Hehre, Stewart and Pople, J. Chem. Phys. 51, 2657 (1969).
    public static readonly double[] Sto3GExponents = [2.227660, 0.405771, 0.109818];
    public static readonly double[] Sto3GCoefficients = [0.154329, 0.535328, 0.444635];

    /// <summary>The STO-3G 1s shell scaled to Slater exponent ζ (exponents × ζ²).</summary>
    public static ShellDefinition Sto3G1s(double zeta) =>
        new(0, Sto3GExponents.Select(a => a * zeta * zeta), Sto3GCoefficients);

    /// <summary>H2 at R bohr along z with the STO-3G (ζ = 1.24) 1s on each atom.</summary>
    public static MolecularBasis H2Sto3G(double rBohr = 1.4)
    {
        var h2 = Molecule.Empty.AddAtom("H", 0, 0, 0, LengthUnit.Bohr).AddAtom("H", 0, 0, rBohr, LengthUnit.Bohr);
        var set = BasisSet.Create("STO-3G (zeta 1.24)").WithElement("H", Sto3G1s(1.24));
        return MolecularBasis.Create(h2, set);
    }

    /// <summary>A water molecule (bohr) with a small hand-made s, p, d (and optionally f) basis of even-tempered primitives
    /// and one contracted s shell per atom; enough to exercise every code path quickly.</summary>
    public static MolecularBasis WaterSpdf(bool pure, bool withF = false)
    {
        var water = Molecule.Empty
            .AddAtom("O", 0, 0, 0.2217, LengthUnit.Bohr)
            .AddAtom("H", 0, 1.4309, -0.8867, LengthUnit.Bohr)
            .AddAtom("H", 0, -1.4309, -0.8867, LengthUnit.Bohr);
        var oShells = new List<ShellDefinition>
        {
            new(0, [130.7, 23.81, 6.444], [0.1543, 0.5353, 0.4446]),
            new(0, [0.9], [1.0]),
            new(1, [5.03, 1.17, 0.38], [0.156, 0.608, 0.392]),
            new(2, [1.2], [1.0]),
        };
        if (withF) oShells.Add(new(3, [0.9], [1.0]));
        var hShells = new List<ShellDefinition> { new(0, [3.42, 0.62, 0.17], [0.154, 0.535, 0.445]), new(1, [0.75], [1.0]) };
        var set = BasisSet.Create("test spdf", pure).WithElement("O", oShells).WithElement("H", hShells);
        return MolecularBasis.Create(water, set);
    }
}
