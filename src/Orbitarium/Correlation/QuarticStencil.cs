namespace Orbitarium.Correlation;

/// <summary>
/// The directional derivative of a function that is a polynomial of degree at most four along the direction, from
/// four values: dΩ/ds(0) = [8(Ω(h) − Ω(−h)) − (Ω(2h) − Ω(−2h))] / (12 h). Exact for such polynomials whatever h, so
/// it gives the coupled-cluster Jacobian times a vector exactly (the CCSD residual is quartic in the amplitudes: the
/// Baker–Campbell–Hausdorff expansion of e^{−T} H e^{T} ends at the fourfold commutator for a two-body H).
/// </summary>
internal static class QuarticStencil
{
    /// <summary>The displacements s along the direction and the weights of Ω(t + s·x).</summary>
    /// <param name="direction">The direction x; the step keeps s·x at most 0.01 in any component, the size of the
    /// amplitudes themselves, so round-off stays small.</param>
    /// <returns>Four (displacement, weight) pairs; empty for a zero direction, whose derivative is zero.</returns>
    public static (double Displacement, double Weight)[] Points(ReadOnlySpan<double> direction)
    {
        double largest = 0;
        foreach (var value in direction) largest = Math.Max(largest, Math.Abs(value));
        if (largest == 0) return [];
        double h = 0.01 / largest;
        return [(h, 8 / (12 * h)), (-h, -8 / (12 * h)), (2 * h, -1 / (12 * h)), (-2 * h, 1 / (12 * h))];
    }
}
