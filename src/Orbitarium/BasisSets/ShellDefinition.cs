using System.Collections.Immutable;

namespace Orbitarium.BasisSets;

/// <summary>
/// One contracted Gaussian shell of an element's basis, not yet placed on an atom:
/// angular momentum, primitive exponents (bohr⁻²) and contraction coefficients.
/// </summary>
/// <remarks>Coefficients multiply <em>normalised</em> primitives, the convention in which basis sets are
/// published; Orbitarium renormalises the contraction exactly when the shell is placed.</remarks>
public sealed class ShellDefinition
{
    /// <summary>Creates a shell definition.</summary>
    /// <exception cref="OrbitariumInputException">Angular momentum outside 0–4, empty or mismatched arrays,
    /// or a non-positive exponent.</exception>
    public ShellDefinition(int angularMomentum, IEnumerable<double> exponents, IEnumerable<double> coefficients)
    {
        if (angularMomentum < 0 || angularMomentum > BasisSets.AngularMomentum.MaxL)
            throw new OrbitariumInputException($"Angular momentum {angularMomentum} is outside s..g (0..{BasisSets.AngularMomentum.MaxL}).");
        Exponents = [.. exponents];
        Coefficients = [.. coefficients];
        if (Exponents.Length == 0)
            throw new OrbitariumInputException("A shell needs at least one primitive.");
        if (Exponents.Length != Coefficients.Length)
            throw new OrbitariumInputException(
                $"A shell has {Exponents.Length} exponents but {Coefficients.Length} coefficients; give one coefficient per exponent.");
        foreach (double a in Exponents)
            if (!(a > 0) || !double.IsFinite(a))
                throw new OrbitariumInputException($"Gaussian exponent {a} must be a positive finite number (bohr⁻²).");
        foreach (double c in Coefficients)
            if (!double.IsFinite(c))
                throw new OrbitariumInputException("A contraction coefficient is not a finite number.");
        AngularMomentum = angularMomentum;
    }

    /// <summary>Creates an uncontracted (single-primitive) shell with exponent α in bohr⁻².</summary>
    public static ShellDefinition Primitive(int angularMomentum, double exponent) => new(angularMomentum, [exponent], [1.0]);

    /// <summary>Angular momentum L (0 = s, 1 = p, 2 = d, 3 = f, 4 = g).</summary>
    public int AngularMomentum { get; }

    /// <summary>Primitive exponents in bohr⁻².</summary>
    public ImmutableArray<double> Exponents { get; }

    /// <summary>Contraction coefficients of normalised primitives.</summary>
    public ImmutableArray<double> Coefficients { get; }

    /// <summary>Number of primitives.</summary>
    public int PrimitiveCount => Exponents.Length;

    /// <inheritdoc />
    public override string ToString() =>
        $"{BasisSets.AngularMomentum.Letter(AngularMomentum)} shell, {PrimitiveCount} primitive(s)";
}
