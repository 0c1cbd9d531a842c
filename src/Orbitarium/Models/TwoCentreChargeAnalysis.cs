using System.Globalization;

namespace Orbitarium.Models;

/// <summary>
/// Where the one electron of an LCAO combination sits at one distance: integrated charges of the density parts and
/// how much charge the interference term moves into or out of the bond region.
/// </summary>
/// <remarks>
/// Integrated over all space the parts give q_A = q_B = 1/(2(1 ± S)) and q_int = ±S/(1 ± S) (they sum to 1).
/// The <i>bond region</i> here is the slab between the two planes through the nuclei perpendicular to the bond;
/// <see cref="ChargeMovedIntoBondRegion"/> compares the charge there with that of the superposition ½(A² + B²)
/// of two half-filled atoms (positive: charge piled up between the nuclei; negative: charge pushed out).
/// </remarks>
/// <param name="DistanceBohr">Internuclear distance R in bohr.</param>
/// <param name="Exponent">Slater exponent ζ (bohr⁻¹).</param>
/// <param name="Combination">Which combination.</param>
/// <param name="Overlap">Overlap S.</param>
/// <param name="ChargeOnEachAtom">Integrated A² part (equal to the B² part), 1/(2(1 ± S)) electrons.</param>
/// <param name="InterferenceCharge">Integrated interference part, ±S/(1 ± S) electrons.</param>
/// <param name="BondRegionCharge">Charge of |ψ±|² inside the bond-region slab (electrons).</param>
/// <param name="BondRegionChargeOfSuperposition">Charge of ½(A² + B²) inside the slab (electrons).</param>
public sealed record TwoCentreChargeAnalysis(
    double DistanceBohr,
    double Exponent,
    LcaoCombination Combination,
    double Overlap,
    double ChargeOnEachAtom,
    double InterferenceCharge,
    double BondRegionCharge,
    double BondRegionChargeOfSuperposition)
{
    /// <summary>Bond-region charge minus that of the superposition of atoms, in electrons.</summary>
    public double ChargeMovedIntoBondRegion => BondRegionCharge - BondRegionChargeOfSuperposition;

    /// <inheritdoc />
    public override string ToString() => string.Create(CultureInfo.InvariantCulture,
        $"R = {DistanceBohr:F3} bohr, {Combination}: q(A) = q(B) = {ChargeOnEachAtom:F4}, q(interference) = {InterferenceCharge:+0.0000;-0.0000}, bond region {BondRegionCharge:F4} vs {BondRegionChargeOfSuperposition:F4} for free atoms ({ChargeMovedIntoBondRegion:+0.0000;-0.0000} e)");
}
