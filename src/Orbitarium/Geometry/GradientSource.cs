namespace Orbitarium.Geometry;

/// <summary>How a nuclear gradient was obtained; reported with every result that carries one.</summary>
public enum GradientSource
{
    /// <summary>No gradient was computed.</summary>
    None,

    /// <summary>Analytic derivative of the method's energy.</summary>
    Analytic,

    /// <summary>Central finite differences of energies (see <see cref="FiniteDifferenceGradient"/>).</summary>
    FiniteDifference,
}
