namespace Orbitarium.Models;

/// <summary>Which normalised combination of the two atomic orbitals A and B: ψ± = (A ± B)/√(2(1 ± S)).</summary>
public enum LcaoCombination
{
    /// <summary>The in-phase (bonding, σg) combination ψ₊ = (A + B)/√(2(1 + S)).</summary>
    InPhase,

    /// <summary>The out-of-phase (antibonding, σu) combination ψ₋ = (A − B)/√(2(1 − S)).</summary>
    OutOfPhase,
}
