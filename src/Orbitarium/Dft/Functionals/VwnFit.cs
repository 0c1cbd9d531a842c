namespace Orbitarium.Dft.Functionals;

/// <summary>
/// The Vosko–Wilk–Nusair interpolation formula for the correlation energy per electron of the uniform gas,
/// with one parameter set (A, x₀, b, c), x = √r_s.
/// </summary>
/// <remarks>S. H. Vosko, L. Wilk, M. Nusair, Can. J. Phys. 58, 1200 (1980), eq. 4.4:
/// ε(x) = A [ ln(x²/X(x)) + 2b/Q atan(Q/(2x+b)) − b x₀/X(x₀) ( ln((x−x₀)²/X(x)) + 2(b+2x₀)/Q atan(Q/(2x+b)) ) ],
/// X(x) = x² + bx + c, Q = √(4c − b²). Energies in hartree (A is half the rydberg value).</remarks>
internal readonly record struct VwnFit(double A, double X0, double B, double C)
{
    public DualNumber Evaluate(DualNumber rs)
    {
        var x = DualNumber.Sqrt(rs);
        var xx = rs + B * x + C;
        double q = Math.Sqrt(4 * C - B * B);
        double xx0 = X0 * X0 + B * X0 + C;
        var at = DualNumber.Atan(q / (2 * x + B));
        var dx = x - X0;
        return A * (DualNumber.Log(rs / xx) + 2 * B / q * at
            - B * X0 / xx0 * (DualNumber.Log(dx * dx / xx) + 2 * (B + 2 * X0) / q * at));
    }

    /// <summary>Paramagnetic fit to Ceperley–Alder (the "VWN5" parameters): A = 0.0310907, x₀ = −0.10498, b = 3.72744, c = 12.9352.</summary>
    public static readonly VwnFit CeperleyAlderParamagnetic = new(0.0310907, -0.10498, 3.72744, 12.9352);

    /// <summary>Ferromagnetic fit to Ceperley–Alder: A = 0.01554535, x₀ = −0.32500, b = 7.06042, c = 18.0578.</summary>
    public static readonly VwnFit CeperleyAlderFerromagnetic = new(0.01554535, -0.32500, 7.06042, 18.0578);

    /// <summary>Spin stiffness fit (gives −α_c): A = −1/(6π²), x₀ = −0.0047584, b = 1.13107, c = 13.0045.</summary>
    public static readonly VwnFit CeperleyAlderSpinStiffness = new(-1 / (6 * Math.PI * Math.PI), -0.0047584, 1.13107, 13.0045);

    /// <summary>Paramagnetic fit to the random-phase approximation: A = 0.0310907, x₀ = −0.409286, b = 13.0720, c = 42.7198.</summary>
    public static readonly VwnFit RpaParamagnetic = new(0.0310907, -0.409286, 13.0720, 42.7198);

    /// <summary>Ferromagnetic fit to the random-phase approximation: A = 0.01554535, x₀ = −0.743294, b = 20.1231, c = 101.578.</summary>
    public static readonly VwnFit RpaFerromagnetic = new(0.01554535, -0.743294, 20.1231, 101.578);
}
