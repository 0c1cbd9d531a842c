using System.Text.Json.Nodes;
using Orbitarium.Scf;

namespace Orbitarium.Shell.Calc;

/// <summary>What a <see cref="ICalcMethod"/> returns: its SCF reference (for orbitals, charges and dipole), the total
/// energy of the method, whether everything converged, and extra JSON keys and summary lines of its own.</summary>
internal sealed record CalcOutcome
{
    /// <summary>The SCF (HF or KS) result underlying the method.</summary>
    public required ScfResult Scf { get; init; }

    /// <summary>The method's total energy, hartree (the SCF energy for HF/DFT, SCF + correlation for correlated methods).</summary>
    public required double TotalEnergyHartree { get; init; }

    /// <summary>Canonical method label for the output, e.g. "RHF" or "MP2".</summary>
    public required string MethodLabel { get; init; }

    /// <summary>Whether every iterative step converged; false makes the command exit with code 3.</summary>
    public bool Converged { get; init; } = true;

    /// <summary>Why it failed, one line (shown on stderr when <see cref="Converged"/> is false).</summary>
    public string? FailureMessage { get; init; }

    /// <summary>Method-specific JSON keys added to the output object (snake_case names, units in the name or documented).</summary>
    public IReadOnlyList<KeyValuePair<string, JsonNode?>> ExtraJson { get; init; } = [];

    /// <summary>Method-specific lines added to the readable summary.</summary>
    public IReadOnlyList<string> ExtraSummaryLines { get; init; } = [];
}
