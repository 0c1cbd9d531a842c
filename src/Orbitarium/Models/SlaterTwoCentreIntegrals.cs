namespace Orbitarium.Models;

/// <summary>
/// Closed-form one-electron integrals over two normalised 1s Slater orbitals A = (ζ³/π)^{1/2} e^{−ζ r_A} and
/// B = (ζ³/π)^{1/2} e^{−ζ r_B} with the same exponent ζ, on nuclei of charge 1 a distance R apart (atomic units).
/// </summary>
/// <remarks>
/// With w = ζR: overlap S = e^{−w}(1 + w + w²/3); Coulomb integral J = ⟨A|1/r_B|A⟩ = 1/R − e^{−2w}(ζ + 1/R);
/// exchange (resonance) integral K = ⟨A|1/r_A|B⟩ = ζ e^{−w}(1 + w). The one-electron Hamiltonian
/// h = −½∇² − 1/r_A − 1/r_B then gives H_AA = ζ²/2 − ζ − J and H_AB = −(ζ²/2) S + (ζ − 2) K, using
/// (−½∇² − ζ/r_A) A = −(ζ²/2) A. Sources: I. N. Levine, <i>Quantum Chemistry</i> (the H₂⁺ LCAO treatment);
/// B. N. Finkelstein and G. E. Horowitz, Z. Phys. 48, 118 (1928) for the scaled exponent.
/// </remarks>
public static class SlaterTwoCentreIntegrals
{
    /// <summary>Overlap S(R) = e^{−ζR}(1 + ζR + (ζR)²/3) (dimensionless).</summary>
    /// <param name="distanceBohr">Internuclear distance R in bohr (≥ 0).</param>
    /// <param name="exponent">Slater exponent ζ in bohr⁻¹ (&gt; 0); 1 is the free hydrogen atom.</param>
    public static double Overlap(double distanceBohr, double exponent = 1.0)
    {
        Check(distanceBohr, exponent);
        double w = exponent * distanceBohr;
        return Math.Exp(-w) * (1 + w + w * w / 3);
    }

    /// <summary>Coulomb integral J = ⟨A|1/r_B|A⟩ = 1/R − e^{−2ζR}(ζ + 1/R) in hartree: the attraction of the charge
    /// cloud A² by the other nucleus.</summary>
    /// <param name="distanceBohr">Internuclear distance R in bohr (&gt; 0).</param>
    /// <param name="exponent">Slater exponent ζ in bohr⁻¹ (&gt; 0).</param>
    public static double Coulomb(double distanceBohr, double exponent = 1.0)
    {
        CheckPositive(distanceBohr, exponent);
        double w = exponent * distanceBohr;
        // 1/R (1 − e^{−2w}) − ζ e^{−2w}, written with expm1 so small R keeps its digits.
        return -double.ExpM1(-2 * w) / distanceBohr - exponent * Math.Exp(-2 * w);
    }

    /// <summary>Exchange (resonance) integral K = ⟨A|1/r_A|B⟩ = ζ e^{−ζR}(1 + ζR) in hartree: the attraction of the
    /// overlap charge AB by one nucleus.</summary>
    /// <param name="distanceBohr">Internuclear distance R in bohr (≥ 0).</param>
    /// <param name="exponent">Slater exponent ζ in bohr⁻¹ (&gt; 0).</param>
    public static double Exchange(double distanceBohr, double exponent = 1.0)
    {
        Check(distanceBohr, exponent);
        double w = exponent * distanceBohr;
        return exponent * Math.Exp(-w) * (1 + w);
    }

    /// <summary>Diagonal Hamiltonian element H_AA = ⟨A|−½∇² − 1/r_A − 1/r_B|A⟩ = ζ²/2 − ζ − J in hartree.</summary>
    /// <param name="distanceBohr">Internuclear distance R in bohr (&gt; 0).</param>
    /// <param name="exponent">Slater exponent ζ in bohr⁻¹ (&gt; 0).</param>
    public static double DiagonalHamiltonian(double distanceBohr, double exponent = 1.0) =>
        0.5 * exponent * exponent - exponent - Coulomb(distanceBohr, exponent);

    /// <summary>Off-diagonal Hamiltonian element H_AB = ⟨A|−½∇² − 1/r_A − 1/r_B|B⟩ = −(ζ²/2) S + (ζ − 2) K in hartree.</summary>
    /// <param name="distanceBohr">Internuclear distance R in bohr (≥ 0).</param>
    /// <param name="exponent">Slater exponent ζ in bohr⁻¹ (&gt; 0).</param>
    public static double OffDiagonalHamiltonian(double distanceBohr, double exponent = 1.0) =>
        -0.5 * exponent * exponent * Overlap(distanceBohr, exponent) + (exponent - 2) * Exchange(distanceBohr, exponent);

    /// <summary>Value of the normalised 1s Slater orbital (ζ³/π)^{1/2} e^{−ζ r} at distance r (bohr^{−3/2}).</summary>
    /// <param name="radiusBohr">Distance r from the nucleus in bohr.</param>
    /// <param name="exponent">Slater exponent ζ in bohr⁻¹.</param>
    public static double OrbitalValue(double radiusBohr, double exponent = 1.0) =>
        Math.Sqrt(exponent * exponent * exponent / Math.PI) * Math.Exp(-exponent * radiusBohr);

    private static void Check(double distanceBohr, double exponent)
    {
        if (!(distanceBohr >= 0) || !double.IsFinite(distanceBohr))
            throw new OrbitariumInputException(FormattableString.Invariant($"The internuclear distance must be a finite number ≥ 0 bohr, got {distanceBohr}."));
        if (!(exponent > 0) || !double.IsFinite(exponent))
            throw new OrbitariumInputException(FormattableString.Invariant($"The Slater exponent ζ must be a finite positive number (bohr⁻¹), got {exponent}."));
    }

    private static void CheckPositive(double distanceBohr, double exponent)
    {
        Check(distanceBohr, exponent);
        if (distanceBohr == 0)
            throw new OrbitariumInputException("The Coulomb integral needs a distance above 0 bohr (at R = 0 the nuclei coincide).");
    }
}
