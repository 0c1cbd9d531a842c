namespace Orbitarium.BasisSets;

/// <summary>
/// A Slater-type orbital's radial shape, r^(n−1) e^(−ζr), identified by its principal quantum number n and
/// angular momentum L (for example 2p is n = 2, L = 1): the target of an STO-nG least-squares fit.
/// </summary>
/// <param name="PrincipalQuantumNumber">n ≥ L + 1 (1 for 1s, 2 for 2s/2p, 3 for 3s/3p/3d, …).</param>
/// <param name="AngularMomentum">L (0 = s, 1 = p, 2 = d).</param>
public readonly record struct SlaterOrbital(int PrincipalQuantumNumber, int AngularMomentum)
{
    /// <summary>The 1s Slater function.</summary>
    public static SlaterOrbital S1 => new(1, 0);

    /// <summary>The 2s Slater function (fitted with s Gaussians).</summary>
    public static SlaterOrbital S2 => new(2, 0);

    /// <summary>The 2p Slater function.</summary>
    public static SlaterOrbital P2 => new(2, 1);

    /// <summary>The 3s Slater function.</summary>
    public static SlaterOrbital S3 => new(3, 0);

    /// <summary>The 3p Slater function.</summary>
    public static SlaterOrbital P3 => new(3, 1);

    /// <summary>The 3d Slater function.</summary>
    public static SlaterOrbital D3 => new(3, 2);

    /// <summary>The 4s Slater function.</summary>
    public static SlaterOrbital S4 => new(4, 0);

    /// <summary>The 4p Slater function.</summary>
    public static SlaterOrbital P4 => new(4, 1);

    /// <summary>Readable name such as "2p".</summary>
    public override string ToString() => $"{PrincipalQuantumNumber}{BasisSets.AngularMomentum.Letter(AngularMomentum)}";
}
