namespace Orbitarium.Dft.Grids;

/// <summary>
/// Named molecular-grid sizes, from coarse to very fine. See <see cref="GridSpecification.ForLevel"/> for the
/// radial and angular sizes of each and DEVELOPERS.md for point counts on water and benzene.
/// </summary>
public enum GridLevel
{
    /// <summary>35 radial points (H, He; +5 per row below), angular degree 17 (162 directions): quick looks only.</summary>
    Coarse,

    /// <summary>50 radial points (H, He; +5 per row), angular degree 29 (450 directions): the default, electron count
    /// typically within 1e-5.</summary>
    Default,

    /// <summary>75 radial points (H, He; +5 per row), angular degree 41 (882 directions).</summary>
    Fine,

    /// <summary>120 radial points (H, He; +5 per row), angular degree 59 (1800 directions): reference quality.</summary>
    VeryFine,
}
