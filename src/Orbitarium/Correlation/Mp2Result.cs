namespace Orbitarium.Correlation;

/// <summary>
/// The second-order Møller–Plesset energy with its same-spin and opposite-spin parts. Immutable; energies in hartree.
/// </summary>
/// <param name="ReferenceKind">"RHF" or "UHF".</param>
/// <param name="ReferenceEnergyHartree">Hartree–Fock energy of the reference, hartree.</param>
/// <param name="SameSpinEnergyHartree">Same-spin (αα + ββ) pair contribution, hartree.</param>
/// <param name="OppositeSpinEnergyHartree">Opposite-spin (αβ) pair contribution, hartree.</param>
/// <param name="FrozenCoreOrbitals">Core orbitals per spin left uncorrelated.</param>
public sealed record Mp2Result(string ReferenceKind, double ReferenceEnergyHartree, double SameSpinEnergyHartree,
    double OppositeSpinEnergyHartree, int FrozenCoreOrbitals)
{
    /// <summary>MP2 correlation energy E(2) = same-spin + opposite-spin, hartree.</summary>
    public double CorrelationEnergyHartree => SameSpinEnergyHartree + OppositeSpinEnergyHartree;

    /// <summary>Reference + MP2 correlation energy, hartree.</summary>
    public double TotalEnergyHartree => ReferenceEnergyHartree + CorrelationEnergyHartree;

    /// <summary>
    /// Spin-component-scaled correlation energy c_os·E_os + c_ss·E_ss, hartree. The defaults 6/5 and 1/3 are those of
    /// S. Grimme, J. Chem. Phys. 118, 9095 (2003).
    /// </summary>
    /// <param name="oppositeSpinScale">Factor on the opposite-spin part (default 1.2).</param>
    /// <param name="sameSpinScale">Factor on the same-spin part (default 1/3).</param>
    public double ScaledCorrelationEnergyHartree(double oppositeSpinScale = 1.2, double sameSpinScale = 1.0 / 3.0) =>
        oppositeSpinScale * OppositeSpinEnergyHartree + sameSpinScale * SameSpinEnergyHartree;

    /// <inheritdoc />
    public override string ToString() =>
        FormattableString.Invariant($"{ReferenceKind}-MP2: E(ref) = {ReferenceEnergyHartree:F10} Eh, E(2) = {CorrelationEnergyHartree:F10} Eh (same-spin {SameSpinEnergyHartree:F10}, opposite-spin {OppositeSpinEnergyHartree:F10}), total {TotalEnergyHartree:F10} Eh");
}
