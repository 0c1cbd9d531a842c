using System.Globalization;

namespace Orbitarium.Analysis;

/// <summary>The Mulliken overlap population of one orbital between one pair of atoms.</summary>
/// <param name="Orbital">Orbital index (0-based, in its set).</param>
/// <param name="SpinLabel">"" restricted, "α" or "β".</param>
/// <param name="EnergyHartree">Orbital energy in hartree.</param>
/// <param name="Occupation">Electrons in the orbital.</param>
/// <param name="AtomA">First atom (0-based).</param>
/// <param name="AtomB">Second atom (0-based), AtomA &lt; AtomB.</param>
/// <param name="PerElectron">Overlap population per electron, 2 Σ_{μ∈A, ν∈B} C_μ C_ν S_μν.</param>
/// <param name="Character">Bonding, non-bonding or antibonding from the sign and size of <paramref name="PerElectron"/>.</param>
public sealed record OrbitalPairPopulation(int Orbital, string SpinLabel, double EnergyHartree, double Occupation,
    int AtomA, int AtomB, double PerElectron, BondCharacter Character)
{
    /// <summary>Overlap population carried by the electrons in the orbital: occupation × per-electron value.</summary>
    public double Population => Occupation * PerElectron;

    /// <inheritdoc />
    public override string ToString() => string.Create(CultureInfo.InvariantCulture,
        $"MO {Orbital}{SpinLabel} ({EnergyHartree:F4} Eh, occ {Occupation:0.##}) atoms {AtomA}–{AtomB}: {PerElectron:+0.0000;-0.0000} per electron, {Character}");
}
