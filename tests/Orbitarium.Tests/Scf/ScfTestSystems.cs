using Orbitarium.BasisSets;
using Orbitarium.Chemistry;

namespace Orbitarium.Tests.Scf;

/// <summary>Molecules and basis sets shared by the SCF and analysis tests.</summary>
internal static class ScfTestSystems
{
    /// <summary>STO-3G expansion of a ζ = 1 Slater 1s: Hehre, Stewart &amp; Pople, J. Chem. Phys. 51, 2657 (1969).</summary>
    public static readonly double[] Sto3GExponents = [2.227660, 0.405771, 0.109818];

    /// <inheritdoc cref="Sto3GExponents"/>
    public static readonly double[] Sto3GCoefficients = [0.154329, 0.535328, 0.444635];

    /// <summary>The published STO-3G 1s shell scaled to Slater exponent ζ (exponents × ζ²).</summary>
    public static ShellDefinition PublishedSto3G1s(double zeta) =>
        new(0, Sto3GExponents.Select(a => a * zeta * zeta), Sto3GCoefficients);

    /// <summary>H₂ at R = 1.4 bohr on the z axis.</summary>
    public static Molecule H2(double rBohr = 1.4) =>
        Molecule.Empty.AddAtom("H", 0, 0, 0, LengthUnit.Bohr).AddAtom("H", 0, 0, rBohr, LengthUnit.Bohr);

    /// <summary>Water at R(OH) = 1.809 bohr, ∠HOH = 104.52° (the geometry used by Szabo &amp; Ostlund, ch. 3).</summary>
    public static Molecule Water()
    {
        double r = 1.809, half = 104.52 / 2 * Math.PI / 180;
        return Molecule.Empty
            .AddAtom("O", 0, 0, 0, LengthUnit.Bohr)
            .AddAtom("H", 0, r * Math.Sin(half), r * Math.Cos(half), LengthUnit.Bohr)
            .AddAtom("H", 0, -r * Math.Sin(half), r * Math.Cos(half), LengthUnit.Bohr);
    }

    /// <summary>The TIDEGLASS hydroxyl radical TG-2 (a doublet).</summary>
    public static Molecule Hydroxyl() => Molecule.FromXyzFile(Example("tg2-hydroxyl.xyz"));

    /// <summary>Path of a file in the repository's examples folder.</summary>
    public static string Example(string name) => Path.Combine(RepositoryRoot(), "examples", name);

    /// <summary>The folder holding Repl.sln.</summary>
    public static string RepositoryRoot()
    {
        var dir = new DirectoryInfo(AppContext.BaseDirectory);
        while (dir is not null && !File.Exists(Path.Combine(dir.FullName, "Repl.sln"))) dir = dir.Parent;
        return dir?.FullName ?? throw new InvalidOperationException("Repl.sln not found above the test binaries.");
    }
}
