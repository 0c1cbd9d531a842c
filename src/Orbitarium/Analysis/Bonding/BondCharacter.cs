namespace Orbitarium.Analysis;

/// <summary>The character of an orbital between two atoms, decided from the sign and size of its overlap population.</summary>
public enum BondCharacter
{
    /// <summary>Positive overlap population above the threshold: the orbital piles charge between the atoms.</summary>
    Bonding,

    /// <summary>Overlap population within ± the threshold: the orbital hardly involves the pair.</summary>
    NonBonding,

    /// <summary>Negative overlap population below −threshold: the orbital removes charge from between the atoms.</summary>
    Antibonding,
}
