using System.Collections.Immutable;

namespace Orbitarium.Correlation;

/// <summary>
/// Result of a determinant CI (full CI or CISD): the lowest roots with ⟨S²⟩, excitation energies and oscillator
/// strengths from the lowest root. Immutable; energies in hartree.
/// </summary>
/// <param name="Method">"FCI" or "CISD".</param>
/// <param name="ReferenceEnergyHartree">Energy of the Hartree–Fock reference, hartree.</param>
/// <param name="RootEnergiesHartree">Total energies of the roots, ascending, hartree.</param>
/// <param name="SpinSquared">⟨S²⟩ of each root (0 singlet, 2 triplet, 0.75 doublet, …).</param>
/// <param name="OscillatorStrengths">f₀ₙ = ⅔ ΔE |⟨0|r|n⟩|² from the lowest root to each higher root (length roots − 1); empty without dipole integrals.</param>
/// <param name="DeterminantCount">Dimension of the determinant space.</param>
/// <param name="Iterations">Davidson iterations.</param>
/// <param name="Converged">Whether every root met the thresholds.</param>
/// <param name="StopReason">Why the solver stopped.</param>
/// <param name="EnergyHistoryHartree">Lowest root total energy after each iteration, hartree.</param>
/// <param name="ResidualHistory">Largest residual norm after each iteration.</param>
/// <param name="FrozenCoreOrbitals">Doubly occupied core orbitals left out of the active space.</param>
public sealed record ConfigurationInteractionResult(string Method, double ReferenceEnergyHartree, ImmutableArray<double> RootEnergiesHartree,
    ImmutableArray<double> SpinSquared, ImmutableArray<double> OscillatorStrengths, int DeterminantCount, int Iterations, bool Converged,
    string StopReason, ImmutableArray<double> EnergyHistoryHartree, ImmutableArray<double> ResidualHistory, int FrozenCoreOrbitals)
{
    /// <summary>Energy of the lowest root, hartree.</summary>
    public double TotalEnergyHartree => RootEnergiesHartree[0];

    /// <summary>Lowest root minus the reference energy, hartree.</summary>
    public double CorrelationEnergyHartree => RootEnergiesHartree[0] - ReferenceEnergyHartree;

    /// <summary>Excitation energies of the higher roots above the lowest, hartree (length roots − 1).</summary>
    public ImmutableArray<double> ExcitationEnergiesHartree =>
        [.. RootEnergiesHartree.Skip(1).Select(e => e - RootEnergiesHartree[0])];

    /// <summary>Total spin S of each root from ⟨S²⟩ = S(S+1).</summary>
    public ImmutableArray<double> Spin => [.. SpinSquared.Select(s2 => 0.5 * (Math.Sqrt(1 + 4 * Math.Max(0, s2)) - 1))];

    /// <inheritdoc />
    public override string ToString() =>
        FormattableString.Invariant($"{Method}: {DeterminantCount} determinants, lowest root {TotalEnergyHartree:F10} Eh (correlation {CorrelationEnergyHartree:F10} Eh), {RootEnergiesHartree.Length} roots; ")
        + (Converged ? "converged" : "NOT CONVERGED: " + StopReason);
}
