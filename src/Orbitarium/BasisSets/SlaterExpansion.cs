using System.Collections.Immutable;

namespace Orbitarium.BasisSets;

/// <summary>
/// The result of an STO-nG fit: n Gaussian exponents (for Slater exponent ζ = 1, in bohr⁻²) shared by
/// one or more Slater functions, and for each of those the coefficients of normalised Gaussian primitives.
/// </summary>
/// <remarks>Exponents for another ζ follow by scaling with ζ² (<see cref="ExponentsFor"/>); the
/// coefficients do not change. Produced by <see cref="StoNGFit"/>.</remarks>
public sealed class SlaterExpansion
{
    internal SlaterExpansion(ImmutableArray<SlaterOrbital> orbitals, ImmutableArray<double> exponents,
        ImmutableArray<ImmutableArray<double>> coefficients, ImmutableArray<double> residuals, int iterations)
    {
        Orbitals = orbitals;
        Exponents = exponents;
        Coefficients = coefficients;
        Residuals = residuals;
        Iterations = iterations;
    }

    /// <summary>The Slater functions fitted together (sharing the Gaussian exponents).</summary>
    public ImmutableArray<SlaterOrbital> Orbitals { get; }

    /// <summary>Gaussian exponents in bohr⁻² for ζ = 1, in decreasing order.</summary>
    public ImmutableArray<double> Exponents { get; }

    /// <summary>Per orbital (same order as <see cref="Orbitals"/>), the coefficients of normalised Gaussian
    /// primitives; the contraction is normalised to 1.</summary>
    public ImmutableArray<ImmutableArray<double>> Coefficients { get; }

    /// <summary>Per orbital, the least-squares residual ∫(φ_STO − φ_G)² of the best unnormalised expansion
    /// (equal to 1 − S², S the overlap of the normalised expansion with the Slater function).</summary>
    public ImmutableArray<double> Residuals { get; }

    /// <summary>Quasi-Newton iterations the fit took.</summary>
    public int Iterations { get; }

    /// <summary>The Gaussian exponents in bohr⁻² for Slater exponent <paramref name="zeta"/> (bohr⁻¹): α·ζ².</summary>
    public double[] ExponentsFor(double zeta)
    {
        if (!(zeta > 0) || !double.IsFinite(zeta))
            throw new OrbitariumInputException($"Slater exponent ζ = {zeta} must be a positive number (bohr⁻¹).");
        var a = new double[Exponents.Length];
        for (int i = 0; i < a.Length; i++) a[i] = Exponents[i] * zeta * zeta;
        return a;
    }

    /// <summary>The contracted shell that approximates orbital <paramref name="orbitalIndex"/> with exponent ζ.</summary>
    public ShellDefinition ShellFor(int orbitalIndex, double zeta) =>
        new(Orbitals[orbitalIndex].AngularMomentum, ExponentsFor(zeta), Coefficients[orbitalIndex]);

    /// <inheritdoc />
    public override string ToString() =>
        $"STO-{Exponents.Length}G fit of {string.Join("", Orbitals)} (residuals {string.Join(", ", Residuals.Select(r => r.ToString("E2", System.Globalization.CultureInfo.InvariantCulture)))})";
}
