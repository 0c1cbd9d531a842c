using System.Collections.Immutable;

namespace Orbitarium.Correlation;

/// <summary>
/// Vertical excitations from a Hartree–Fock reference (CIS or RPA/TDHF). Immutable; energies in hartree, dipoles in
/// atomic units (e·a₀).
/// </summary>
/// <param name="Method">"CIS" or "RPA".</param>
/// <param name="Manifold">"singlet", "triplet" (restricted, spin-adapted) or "unrestricted".</param>
/// <param name="ReferenceEnergyHartree">Energy of the reference, hartree.</param>
/// <param name="ExcitationEnergiesHartree">Excitation energies ω_n, ascending, hartree.</param>
/// <param name="OscillatorStrengths">f_n = ⅔ ω_n |μ_0n|² (zero for triplets); empty without dipole integrals.</param>
/// <param name="TransitionDipoles">Transition dipole vectors ⟨0|r|n⟩ (x, y, z) in e·a₀ (sign is arbitrary); empty without dipole integrals.</param>
/// <param name="FrozenCoreOrbitals">Core orbitals excluded from the excitation space.</param>
public sealed record ExcitedStatesResult(string Method, string Manifold, double ReferenceEnergyHartree,
    ImmutableArray<double> ExcitationEnergiesHartree, ImmutableArray<double> OscillatorStrengths,
    ImmutableArray<ImmutableArray<double>> TransitionDipoles, int FrozenCoreOrbitals)
{
    /// <summary>Excitation energies in electronvolt (CODATA 2018 conversion).</summary>
    public ImmutableArray<double> ExcitationEnergiesElectronVolt =>
        [.. ExcitationEnergiesHartree.Select(e => e * PhysicalConstants.HartreeToElectronVolt)];

    /// <summary>Total energies of the excited states (reference + ω), hartree.</summary>
    public ImmutableArray<double> StateEnergiesHartree => [.. ExcitationEnergiesHartree.Select(e => e + ReferenceEnergyHartree)];

    /// <summary>Sum of the oscillator strengths of the states computed (compare with the Thomas–Reiche–Kuhn value N).</summary>
    public double OscillatorStrengthSum => OscillatorStrengths.Sum();

    /// <inheritdoc />
    public override string ToString() =>
        $"{Method} {Manifold}: " + string.Join(", ", ExcitationEnergiesHartree.Select((e, i) =>
            FormattableString.Invariant($"{e:F6} Eh") + (OscillatorStrengths.Length > i ? FormattableString.Invariant($" (f = {OscillatorStrengths[i]:F4})") : "")));
}
