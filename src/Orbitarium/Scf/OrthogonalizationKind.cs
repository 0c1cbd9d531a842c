namespace Orbitarium.Scf;

/// <summary>How the SCF turns the non-orthogonal AO basis into an orthonormal one (the matrix X with XᵀSX = 1).</summary>
/// <remarks>Szabo &amp; Ostlund, <i>Modern Quantum Chemistry</i>, §3.4.5.</remarks>
public enum OrthogonalizationKind
{
    /// <summary>Symmetric (Löwdin) orthogonalisation X = S^(−1/2). When the overlap has eigenvalues below the
    /// linear-dependency threshold, the driver switches to <see cref="Canonical"/> and reports it.</summary>
    Symmetric,

    /// <summary>Canonical orthogonalisation X = U s^(−1/2), dropping overlap eigenvectors whose eigenvalue is
    /// below the linear-dependency threshold (the number dropped is reported).</summary>
    Canonical,
}
