using MathNet.Numerics.LinearAlgebra;
using Orbitarium.BasisSets;
using Orbitarium.Chemistry;

namespace Orbitarium.Integrals;

/// <summary>
/// One-electron integral matrices over a molecular basis: overlap, kinetic energy, nuclear attraction,
/// point-charge attraction, the core Hamiltonian, and dipole and quadrupole moment integrals.
/// </summary>
/// <remarks>
/// Computed by the Obara–Saika recurrences (S. Obara and A. Saika, J. Chem. Phys. 84, 3963 (1986)) over Cartesian
/// components, then transformed with each shell's <see cref="Shell.Transform"/> to the basis functions (normalised
/// Cartesian or real solid-harmonic). All quantities in atomic units: lengths in bohr, energies in hartree.
/// </remarks>
public static class OneElectronIntegrals
{
    /// <summary>The overlap matrix S_μν = ⟨μ|ν⟩ (dimensionless).</summary>
    public static Matrix<double> Overlap(MolecularBasis b) =>
        Build(b, 1, (x, y, r) => ObaraSaikaOneElectron.Overlap(x, y, r))[0];

    /// <summary>The kinetic-energy matrix T_μν = ⟨μ|−½∇²|ν⟩ in hartree.</summary>
    public static Matrix<double> Kinetic(MolecularBasis b) =>
        Build(b, 1, (x, y, r) => ObaraSaikaOneElectron.Kinetic(x, y, r))[0];

    /// <summary>The nuclear-attraction matrix V_μν = −Σ_A Z_A ⟨μ|1/|r−R_A||ν⟩ in hartree, over all nuclei of the basis's molecule
    /// (bare nuclear charges Z).</summary>
    public static Matrix<double> NuclearAttraction(MolecularBasis b)
    {
        ArgumentNullException.ThrowIfNull(b);
        var charges = new (Vector3D, double)[b.Molecule.AtomCount];
        for (int a = 0; a < charges.Length; a++) charges[a] = (b.Molecule.Atoms[a].PositionBohr, -(double)b.Molecule.Atoms[a].NuclearCharge);
        return Build(b, 1, (x, y, r) => ObaraSaikaOneElectron.Potential(x, y, charges, r))[0];
    }

    /// <summary>The attraction of the electrons to point charges: V_μν = −Σ_C q_C ⟨μ|1/|r−R_C||ν⟩ in hartree
    /// (an electron is attracted by a positive charge, so the matrix is negative for q &gt; 0).</summary>
    /// <param name="b">The basis.</param>
    /// <param name="charges">Positions in bohr and charges in units of the elementary charge.</param>
    /// <exception cref="OrbitariumInputException">A position or charge is not finite.</exception>
    public static Matrix<double> PointChargeAttraction(MolecularBasis b, IReadOnlyList<(Vector3D PositionBohr, double Charge)> charges)
    {
        ArgumentNullException.ThrowIfNull(b);
        ArgumentNullException.ThrowIfNull(charges);
        var list = new (Vector3D, double)[charges.Count];
        for (int i = 0; i < list.Length; i++)
        {
            var (pos, q) = charges[i];
            if (!pos.IsFinite || !double.IsFinite(q))
                throw new OrbitariumInputException($"Point charge {i + 1} has a non-finite position or charge; give finite values (bohr, e).");
            list[i] = (pos, -q);
        }
        return Build(b, 1, (x, y, r) => ObaraSaikaOneElectron.Potential(x, y, list, r))[0];
    }

    /// <summary>The core Hamiltonian H = T + V (kinetic plus nuclear attraction) in hartree.</summary>
    public static Matrix<double> CoreHamiltonian(MolecularBasis b) => Kinetic(b) + NuclearAttraction(b);

    /// <summary>Dipole integrals ⟨μ|(r−O)ᵢ|ν⟩ in bohr for i = x, y, z (array of three matrices). The electronic dipole
    /// moment of a density D is −Σ D_μν ⟨μ|(r−O)|ν⟩ (electron charge −1).</summary>
    /// <param name="b">The basis.</param>
    /// <param name="originBohr">Origin O in bohr.</param>
    public static Matrix<double>[] Dipole(MolecularBasis b, Vector3D originBohr) =>
        Build(b, 3, (x, y, r) => ObaraSaikaOneElectron.Multipole(x, y, originBohr, 1, r));

    /// <summary>Second-moment integrals ⟨μ|(r−O)ᵢ(r−O)ⱼ|ν⟩ in bohr² for ij = xx, xy, xz, yy, yz, zz (array of six matrices,
    /// not traceless).</summary>
    /// <param name="b">The basis.</param>
    /// <param name="originBohr">Origin O in bohr.</param>
    public static Matrix<double>[] Quadrupole(MolecularBasis b, Vector3D originBohr) =>
        Build(b, 6, (x, y, r) => ObaraSaikaOneElectron.Multipole(x, y, originBohr, 2, r));

    private delegate void RawBlock(RawShell a, RawShell b, Span<double> result);

    private static Matrix<double>[] Build(MolecularBasis basis, int components, RawBlock raw)
    {
        ArgumentNullException.ThrowIfNull(basis);
        int n = basis.FunctionCount;
        var shells = basis.Shells;
        int ns = shells.Length;
        var rawShells = new RawShell[ns];
        var transforms = new ShellTransform[ns];
        for (int s = 0; s < ns; s++)
        {
            rawShells[s] = RawShell.FromShell(shells[s]);
            transforms[s] = ShellTransform.For(shells[s]);
        }
        var result = new double[components][];
        for (int c = 0; c < components; c++) result[c] = new double[n * n];
        int maxCart = CartesianIndex.Count(Math.Max(basis.MaxAngularMomentum, 0));
        Parallel.For(0, ns, () => (new double[components * maxCart * maxCart], new double[maxCart * maxCart], new double[maxCart * maxCart]),
            (p, _, buffers) =>
            {
                var (block, scratch, target) = buffers;
                for (int q = 0; q <= p; q++)
                {
                    int na = rawShells[p].CartesianCount, nb = rawShells[q].CartesianCount;
                    raw(rawShells[p], rawShells[q], block);
                    int op = basis.ShellOffsets[p], oq = basis.ShellOffsets[q];
                    int fp = transforms[p].Rows, fq = transforms[q].Rows;
                    for (int c = 0; c < components; c++)
                    {
                        ShellTransform.Apply2(transforms[p], transforms[q], block.AsSpan(c * na * nb, na * nb), target, scratch);
                        var m = result[c];
                        for (int i = 0; i < fp; i++)
                            for (int j = 0; j < fq; j++)
                            {
                                double v = target[i * fq + j];
                                m[(op + i) * n + oq + j] = v;
                                m[(oq + j) * n + op + i] = v;
                            }
                    }
                }
                return buffers;
            },
            _ => { });
        var matrices = new Matrix<double>[components];
        for (int c = 0; c < components; c++)
        {
            var data = result[c];
            matrices[c] = Matrix<double>.Build.Dense(n, n, (i, j) => data[i * n + j]);
        }
        return matrices;
    }
}
