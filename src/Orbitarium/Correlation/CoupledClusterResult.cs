using System.Collections.Immutable;

namespace Orbitarium.Correlation;

/// <summary>
/// Result of a CCSD calculation, optionally with the perturbative triples correction. Immutable; energies in hartree.
/// </summary>
/// <param name="ReferenceKind">"RHF" or "UHF".</param>
/// <param name="ReferenceEnergyHartree">Hartree–Fock energy of the reference, hartree.</param>
/// <param name="CcsdCorrelationEnergyHartree">CCSD correlation energy, hartree.</param>
/// <param name="TriplesCorrectionHartree">The (T) correction in hartree, or null when it was not computed.</param>
/// <param name="Mp2CorrelationEnergyHartree">MP2 correlation energy from the first-order amplitudes (the starting guess), hartree.</param>
/// <param name="Iterations">Amplitude iterations done.</param>
/// <param name="Converged">Whether the energy and amplitude thresholds were met.</param>
/// <param name="StopReason">Why the iterations stopped, in words.</param>
/// <param name="EnergyHistoryHartree">CCSD correlation energy after each iteration, hartree.</param>
/// <param name="ResidualHistory">Root-mean-square amplitude change after each iteration.</param>
/// <param name="T1Diagnostic">‖t₁‖/√(correlated electrons), dimensionless (T. J. Lee and P. R. Taylor, Int. J. Quantum Chem. Symp. 23, 199 (1989)).</param>
/// <param name="FrozenCoreOrbitals">Core orbitals per spin left uncorrelated.</param>
public sealed record CoupledClusterResult(string ReferenceKind, double ReferenceEnergyHartree, double CcsdCorrelationEnergyHartree,
    double? TriplesCorrectionHartree, double Mp2CorrelationEnergyHartree, int Iterations, bool Converged, string StopReason,
    ImmutableArray<double> EnergyHistoryHartree, ImmutableArray<double> ResidualHistory, double T1Diagnostic, int FrozenCoreOrbitals)
{
    /// <summary>Method name: "CCSD" or "CCSD(T)".</summary>
    public string Method => TriplesCorrectionHartree is null ? "CCSD" : "CCSD(T)";

    /// <summary>Correlation energy of <see cref="Method"/> (CCSD plus (T) when present), hartree.</summary>
    public double CorrelationEnergyHartree => CcsdCorrelationEnergyHartree + (TriplesCorrectionHartree ?? 0);

    /// <summary>Total CCSD energy (reference + CCSD correlation), hartree.</summary>
    public double CcsdTotalEnergyHartree => ReferenceEnergyHartree + CcsdCorrelationEnergyHartree;

    /// <summary>Total energy of <see cref="Method"/>, hartree.</summary>
    public double TotalEnergyHartree => ReferenceEnergyHartree + CorrelationEnergyHartree;

    /// <inheritdoc />
    public override string ToString() =>
        FormattableString.Invariant($"{ReferenceKind}-{Method}: E(ref) = {ReferenceEnergyHartree:F10} Eh, E(CCSD corr) = {CcsdCorrelationEnergyHartree:F10} Eh")
        + (TriplesCorrectionHartree is double t ? FormattableString.Invariant($", E(T) = {t:F10} Eh") : "")
        + FormattableString.Invariant($", total {TotalEnergyHartree:F10} Eh; {Iterations} iterations, ") + (Converged ? "converged" : "NOT CONVERGED: " + StopReason);
}
