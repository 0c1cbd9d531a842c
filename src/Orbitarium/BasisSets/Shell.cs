using System.Collections.Immutable;
using Orbitarium.Chemistry;

namespace Orbitarium.BasisSets;

/// <summary>
/// A contracted Gaussian shell placed on an atom: the unit the integral engine works with.
/// </summary>
/// <remarks>
/// The shell's Cartesian components share one normalisation, that of the x^L component:
/// φ(r) = Σᵢ cᵢ x^lx y^ly z^lz exp(−αᵢ|r−A|²) with cᵢ = <see cref="NormalizedCoefficients"/>.
/// <see cref="Transform"/> turns those components into the shell's basis functions
/// (individually normalised Cartesians, or normalised real solid harmonics when <see cref="IsPure"/>).
/// </remarks>
public sealed class Shell
{
    internal readonly double[] ExponentArray;
    internal readonly double[] CoefficientArray;

    /// <summary>Places a shell definition at a centre (bohr), belonging to atom <paramref name="atomIndex"/>.</summary>
    public Shell(ShellDefinition definition, Vector3D centerBohr, int atomIndex, bool pure)
    {
        ArgumentNullException.ThrowIfNull(definition);
        Definition = definition;
        CenterBohr = centerBohr;
        AtomIndex = atomIndex;
        IsPure = pure;
        ExponentArray = [.. definition.Exponents];
        CoefficientArray = Normalise(definition.AngularMomentum, ExponentArray, [.. definition.Coefficients]);
    }

    /// <summary>The element-level definition this shell was placed from.</summary>
    public ShellDefinition Definition { get; }

    /// <summary>Angular momentum L.</summary>
    public int AngularMomentum => Definition.AngularMomentum;

    /// <summary>Centre of the shell in bohr.</summary>
    public Vector3D CenterBohr { get; }

    /// <summary>Index of the atom the shell sits on (−1 for a floating centre).</summary>
    public int AtomIndex { get; }

    /// <summary>Whether the shell's functions are real solid harmonics (true) or Cartesian (false). s and p
    /// shells are the same either way.</summary>
    public bool IsPure { get; }

    /// <summary>Primitive exponents in bohr⁻².</summary>
    public ImmutableArray<double> Exponents => Definition.Exponents;

    /// <summary>Contraction coefficients including primitive and contraction normalisation for the x^L component.</summary>
    public ImmutableArray<double> NormalizedCoefficients => [.. CoefficientArray];

    /// <summary>Number of primitives.</summary>
    public int PrimitiveCount => ExponentArray.Length;

    /// <summary>Number of Cartesian components, (L+1)(L+2)/2.</summary>
    public int CartesianCount => BasisSets.AngularMomentum.CartesianCount(AngularMomentum);

    /// <summary>Number of basis functions the shell contributes: 2L+1 when pure (L ≥ 2), else the Cartesian count.</summary>
    public int FunctionCount => IsPure && AngularMomentum >= 2 ? 2 * AngularMomentum + 1 : CartesianCount;

    /// <summary>The FunctionCount × CartesianCount matrix from Cartesian components to basis functions
    /// (see <see cref="SolidHarmonics.ShellTransform"/>). Do not modify.</summary>
    public double[,] Transform => SolidHarmonics.ShellTransform(AngularMomentum, IsPure);

    /// <summary>A copy of this shell at another centre (same atom index), e.g. for a displaced geometry.</summary>
    public Shell WithCenter(Vector3D centerBohr) => new(Definition, centerBohr, AtomIndex, IsPure);

    /// <summary>Normalisation constant of a primitive x^L exp(−α r²): (2α/π)^{3/4} (4α)^{L/2} / √((2L−1)!!).</summary>
    public static double PrimitiveNormalization(int l, double alpha) =>
        Math.Pow(2 * alpha / Math.PI, 0.75) * Math.Pow(4 * alpha, 0.5 * l) / Math.Sqrt(BasisSets.AngularMomentum.DoubleFactorial(2 * l - 1));

    private static double[] Normalise(int l, double[] alpha, double[] d)
    {
        var c = new double[alpha.Length];
        for (int i = 0; i < c.Length; i++) c[i] = d[i] * PrimitiveNormalization(l, alpha[i]);
        // ⟨x^L e^{−a r²} | x^L e^{−b r²}⟩ = (2L−1)!! π^{3/2} / (2^L (a+b)^{L+3/2})
        double dfac = BasisSets.AngularMomentum.DoubleFactorial(2 * l - 1);
        double s = 0;
        for (int i = 0; i < c.Length; i++)
            for (int j = 0; j < c.Length; j++)
                s += c[i] * c[j] * dfac * Math.Pow(Math.PI, 1.5) / (Math.Pow(2, l) * Math.Pow(alpha[i] + alpha[j], l + 1.5));
        if (!(s > 0))
            throw new OrbitariumInputException("A contracted shell has zero norm (all coefficients cancel); check its coefficients.");
        double f = 1 / Math.Sqrt(s);
        for (int i = 0; i < c.Length; i++) c[i] *= f;
        return c;
    }

    /// <inheritdoc />
    public override string ToString() =>
        $"{BasisSets.AngularMomentum.Letter(AngularMomentum)} shell on atom {AtomIndex + 1}, {PrimitiveCount} primitive(s), {(IsPure ? "pure" : "Cartesian")}";
}
