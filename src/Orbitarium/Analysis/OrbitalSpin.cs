namespace Orbitarium.Analysis;

/// <summary>Which spin's orbitals to use from an unrestricted result (restricted results have one set; both give it).</summary>
public enum OrbitalSpin
{
    /// <summary>α (spin-up) orbitals; for restricted results, the shared spatial orbitals.</summary>
    Alpha,

    /// <summary>β (spin-down) orbitals.</summary>
    Beta,
}
