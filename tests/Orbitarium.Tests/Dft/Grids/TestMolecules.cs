using Orbitarium.Chemistry;

namespace Orbitarium.Tests.Dft.Grids;

internal static class TestMolecules
{
    /// <summary>Water near its experimental geometry (r(OH) = 0.9572 Å, HOH = 104.52°; common practice).</summary>
    public static Molecule Water { get; } = Molecule.FromXyz("""
        3
        water
        O  0.000000  0.000000  0.117176
        H  0.000000  0.757200 -0.468706
        H  0.000000 -0.757200 -0.468706
        """);
}
