namespace Orbitarium.Tests.Dft.Functionals;

/// <summary>Density points spanning core, valence and tail regions (atomic units), closed shell and spin-polarised.</summary>
internal static class FunctionalTestPoints
{
    /// <summary>(ρ, σ) pairs: ρ in bohr⁻³, σ = |∇ρ|² in bohr⁻⁸.</summary>
    public static readonly (double Rho, double Sigma)[] Unpolarized =
    [
        (0.01, 1e-4), (0.05, 3e-3), (0.1, 0.02), (0.35, 0.4), (1.0, 0.5), (2.5, 12.0), (10.0, 300.0), (0.003, 2e-5), (0.2, 1e-3),
    ];

    /// <summary>(ρα, ρβ, σαα, σαβ, σββ).</summary>
    public static readonly (double Ra, double Rb, double Saa, double Sab, double Sbb)[] Polarized =
    [
        (0.1, 0.05, 0.02, 0.005, 0.01), (1.2, 0.7, 0.9, 0.3, 0.4), (0.02, 0.015, 1e-3, 5e-4, 8e-4),
        (5.0, 0.5, 10.0, 1.0, 0.3), (0.3, 0.3, 0.1, 0.08, 0.1), (0.04, 0.002, 4e-3, -1e-4, 1e-5), (3.0, 2.9, 40.0, -5.0, 38.0),
    ];
}
