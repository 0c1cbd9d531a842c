namespace Orbitarium.Models;

/// <summary>Which part of an LCAO combination's density to evaluate.</summary>
public enum TwoCentreDensityPart
{
    /// <summary>The whole density |ψ±|².</summary>
    Total,

    /// <summary>The A² part, A²/(2(1 ± S)).</summary>
    OnA,

    /// <summary>The B² part, B²/(2(1 ± S)).</summary>
    OnB,

    /// <summary>The interference part ±2AB/(2(1 ± S)).</summary>
    Interference,

    /// <summary>The density minus that of the superposition ½(A² + B²) of two half-filled atoms.</summary>
    DifferenceFromAtoms,
}
