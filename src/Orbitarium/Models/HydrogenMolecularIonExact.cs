namespace Orbitarium.Models;

/// <summary>
/// The exact (Born–Oppenheimer, non-relativistic) ground state of the hydrogen molecular ion H₂⁺, for contrast with
/// the LCAO model.
/// </summary>
/// <remarks>Sources: D. R. Bates, K. Ledsham and A. L. Stewart, Phil. Trans. R. Soc. A 246, 215 (1953);
/// J. M. Peek, J. Chem. Phys. 43, 3004 (1965).</remarks>
public static class HydrogenMolecularIonExact
{
    /// <summary>Equilibrium distance Rₑ = 1.997 bohr (Bates, Ledsham and Stewart 1953; Peek 1965).</summary>
    public const double EquilibriumDistanceBohr = 1.997;

    /// <summary>Total energy at R = 2.0 bohr: −0.6026342 Eₕ (Bates, Ledsham and Stewart 1953).</summary>
    public const double TotalEnergyAt2BohrHartree = -0.6026342;

    /// <summary>Dissociation energy Dₑ = 2.79 eV, to H(1s) + H⁺ (Bates, Ledsham and Stewart 1953; Peek 1965).</summary>
    public const double DissociationEnergyElectronVolt = 2.79;
}
