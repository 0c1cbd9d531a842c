namespace Orbitarium.Models;

/// <summary>
/// The density |ψ±|² of one LCAO combination at a point, split into its parts:
/// |ψ±|² = A²/(2(1±S)) + B²/(2(1±S)) ± 2AB/(2(1±S)). All values in bohr⁻³.
/// </summary>
/// <param name="OnA">The A² part, A²/(2(1 ± S)).</param>
/// <param name="OnB">The B² part, B²/(2(1 ± S)).</param>
/// <param name="Interference">The interference (overlap) part ±2AB/(2(1 ± S)): positive between the nuclei for ψ₊,
/// negative for ψ₋.</param>
public readonly record struct TwoCentreDensityParts(double OnA, double OnB, double Interference)
{
    /// <summary>The whole density, OnA + OnB + Interference.</summary>
    public double Total => OnA + OnB + Interference;
}
