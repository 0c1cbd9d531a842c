namespace Orbitarium.Scf;

/// <summary>The kind of Hartree–Fock (or Kohn–Sham) reference determinant.</summary>
public enum ScfReference
{
    /// <summary>Restricted closed shell (RHF/RKS): α and β electrons share spatial orbitals; needs an even electron count and a singlet.</summary>
    Restricted,

    /// <summary>Unrestricted (UHF/UKS): separate α and β spatial orbitals (Pople &amp; Nesbet, J. Chem. Phys. 22, 571 (1954)).</summary>
    Unrestricted,

    /// <summary>Restricted open shell (ROHF): doubly and singly occupied orbitals share one set of spatial orbitals;
    /// the determinant is a spin eigenfunction (Roothaan, Rev. Mod. Phys. 32, 179 (1960)).</summary>
    RestrictedOpenShell,
}
