namespace Orbitarium.Analysis;

/// <summary>One orbital level of an energy-level diagram.</summary>
/// <param name="Orbital">Orbital index (0-based) in its calculation.</param>
/// <param name="EnergyHartree">Orbital energy in hartree.</param>
/// <param name="Occupation">Electrons in the orbital (of the spin shown).</param>
/// <param name="Label">Text beside the level: main atomic components and, for molecular levels, the bonding character.</param>
/// <param name="Character">Bonding character between the fragments (molecular levels), or null for fragment levels.</param>
public sealed record EnergyLevel(int Orbital, double EnergyHartree, double Occupation, string Label, BondCharacter? Character);
