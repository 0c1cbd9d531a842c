namespace Orbitarium;

/// <summary>
/// Physical constants and unit conversions, CODATA 2018 recommended values, in one place.
/// Every conversion in Orbitarium goes through these.
/// </summary>
/// <remarks>Source: E. Tiesinga, P. J. Mohr, D. B. Newell, B. N. Taylor, "CODATA recommended values of the
/// fundamental physical constants: 2018", Rev. Mod. Phys. 93, 025010 (2021).</remarks>
public static class PhysicalConstants
{
    /// <summary>Bohr radius a₀ in ångström: 0.529177210903 Å.</summary>
    public const double BohrRadiusAngstrom = 0.529177210903;

    /// <summary>Ångström per bohr (same as <see cref="BohrRadiusAngstrom"/>), for readable conversions.</summary>
    public const double AngstromPerBohr = BohrRadiusAngstrom;

    /// <summary>Bohr per ångström, 1 / a₀[Å].</summary>
    public const double BohrPerAngstrom = 1.0 / BohrRadiusAngstrom;

    /// <summary>Hartree energy Eₕ in electronvolt: 27.211386245988 eV.</summary>
    public const double HartreeToElectronVolt = 27.211386245988;

    /// <summary>Hartree energy in kcal/mol: 627.5094740631 kcal/mol (thermochemical calorie, 4.184 J).</summary>
    public const double HartreeToKcalPerMol = 627.5094740631;

    /// <summary>Hartree energy in kJ/mol: 2625.4996394799 kJ/mol.</summary>
    public const double HartreeToKJPerMol = 2625.4996394799;

    /// <summary>Hartree energy in wavenumbers: 219474.6313632 cm⁻¹.</summary>
    public const double HartreeToWavenumber = 219474.6313632;

    /// <summary>Hartree energy in joule: 4.3597447222071e-18 J.</summary>
    public const double HartreeToJoule = 4.3597447222071e-18;

    /// <summary>One debye in atomic units of dipole (e·a₀): 0.393430269. 1 D = 10⁻²¹ C·m²/s / c.</summary>
    public const double DebyeInAtomicUnits = 0.3934302694;

    /// <summary>Atomic unit of dipole (e·a₀) in debye: 2.541746473.</summary>
    public const double AtomicUnitsToDebye = 1.0 / DebyeInAtomicUnits;

    /// <summary>Atomic mass constant in electron masses: m_u / m_e = 1822.888486209.</summary>
    public const double AtomicMassUnitInElectronMasses = 1822.888486209;

    /// <summary>Atomic mass constant m_u in kilogram: 1.66053906660e-27 kg.</summary>
    public const double AtomicMassUnitKilogram = 1.66053906660e-27;

    /// <summary>Boltzmann constant in J/K (exact since 2019 SI): 1.380649e-23.</summary>
    public const double BoltzmannJoulePerKelvin = 1.380649e-23;

    /// <summary>Boltzmann constant in hartree per kelvin: 3.1668115634556e-6 Eₕ/K.</summary>
    public const double BoltzmannHartreePerKelvin = 3.1668115634556e-6;

    /// <summary>Planck constant in J·s (exact): 6.62607015e-34.</summary>
    public const double PlanckJouleSecond = 6.62607015e-34;

    /// <summary>Speed of light in vacuum in cm/s (exact): 2.99792458e10.</summary>
    public const double SpeedOfLightCentimetrePerSecond = 2.99792458e10;

    /// <summary>Avogadro constant in mol⁻¹ (exact): 6.02214076e23.</summary>
    public const double AvogadroPerMole = 6.02214076e23;

    /// <summary>Molar gas constant in J K⁻¹ mol⁻¹: N_A·k_B = 8.314462618.</summary>
    public const double GasConstantJoulePerMoleKelvin = 8.314462618;

    /// <summary>Standard pressure, 1 bar = 100000 Pa (IUPAC standard state).</summary>
    public const double StandardPressurePascal = 1.0e5;
}
