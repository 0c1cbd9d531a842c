namespace Orbitarium.Dft.Functionals;

/// <summary>One term of a composed functional: a component and the weight it enters with.</summary>
/// <param name="Component">The exchange or correlation component.</param>
/// <param name="Weight">Its weight (dimensionless), e.g. 0.72 for B88 in B3LYP.</param>
public sealed record WeightedComponent(FunctionalComponent Component, double Weight)
{
    /// <inheritdoc />
    public override string ToString() => FormattableString.Invariant($"{Weight:0.#####}*{Component.Name}");
}
