using Orbitarium.Chemistry;

namespace Orbitarium.Integrals;

/// <summary>
/// Low-level integral blocks over raw Cartesian shells (<see cref="RawShell"/>: L, centre, exponents and coefficients
/// of bare x^lx y^ly z^lz e^{−αr²} primitives), with no shell transform and no renormalisation applied. Meant for
/// derivative integrals: differentiate the Gaussians into raw shells of L ± 1 and combine these blocks.
/// </summary>
/// <remarks>
/// Layouts: two-index blocks [ia·nb + ib]; four-index blocks [((ia·nb + ib)·nc + ic)·nd + id]; components in
/// Orbitarium's Cartesian order (lx = L..0, ly = L−lx..0). L up to <see cref="RawShell.MaxL"/> (h). Thread-safe.
/// Schemes: Obara–Saika (J. Chem. Phys. 84, 3963 (1986)) for one-electron blocks, Head-Gordon–Pople
/// (J. Chem. Phys. 89, 5777 (1988)) for electron repulsion.
/// </remarks>
internal static class RawIntegrals
{
    [ThreadStatic] private static HeadGordonPople? _engine;

    /// <summary>Overlap ⟨a|b⟩.</summary>
    public static void Overlap(RawShell a, RawShell b, Span<double> result) => ObaraSaikaOneElectron.Overlap(a, b, result);

    /// <summary>Kinetic energy ⟨a|−½∇²|b⟩ (hartree).</summary>
    public static void Kinetic(RawShell a, RawShell b, Span<double> result) => ObaraSaikaOneElectron.Kinetic(a, b, result);

    /// <summary>Coulomb potential of one point charge: q⟨a|1/|r−C||b⟩ (hartree per unit electron charge magnitude; the
    /// nuclear attraction of nucleus Z is this with q = −Z).</summary>
    public static void Potential(RawShell a, RawShell b, Vector3D positionBohr, double charge, Span<double> result) =>
        ObaraSaikaOneElectron.Potential(a, b, [(positionBohr, charge)], result);

    /// <summary>Coulomb potential of several point charges: Σ_C q_C⟨a|1/|r−C||b⟩.</summary>
    public static void Potential(RawShell a, RawShell b, ReadOnlySpan<(Vector3D PositionBohr, double Charge)> charges, Span<double> result) =>
        ObaraSaikaOneElectron.Potential(a, b, charges, result);

    /// <summary>Cartesian moments of the given order about an origin: [component][ia·nb + ib].</summary>
    public static void Multipole(RawShell a, RawShell b, Vector3D originBohr, int order, Span<double> result) =>
        ObaraSaikaOneElectron.Multipole(a, b, originBohr, order, result);

    /// <summary>Electron repulsion (ab|cd) in chemists' notation (hartree).</summary>
    public static void ElectronRepulsion(RawShell a, RawShell b, RawShell c, RawShell d, Span<double> result)
    {
        _engine ??= new HeadGordonPople();
        _engine.Compute(new ShellPairData(a, b), new ShellPairData(c, d), result);
    }

    /// <summary>Electron repulsion from precomputed pair data (reuse <see cref="ShellPairData"/> across many quartets).</summary>
    public static void ElectronRepulsion(ShellPairData ab, ShellPairData cd, Span<double> result)
    {
        _engine ??= new HeadGordonPople();
        _engine.Compute(ab, cd, result);
    }
}
