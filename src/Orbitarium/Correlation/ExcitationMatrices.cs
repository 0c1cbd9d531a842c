using MathNet.Numerics.LinearAlgebra;

namespace Orbitarium.Correlation;

/// <summary>
/// The orbital-rotation Hessian blocks A and B of a Hartree–Fock reference over single excitations i→a, and the
/// dipole vector μ_ia, for the spin-adapted singlet and triplet manifolds of a closed shell or the unrestricted
/// (α and β) manifold.
/// </summary>
/// <remarks>
/// Closed shell: A¹ = δ(f_ab δ_ij − f_ij δ_ab) + 2(ia|jb) − (ij|ab), B¹ = 2(ia|jb) − (ib|ja), A³ = δ(…) − (ij|ab),
/// B³ = −(ib|ja); unrestricted: A = δ(…) + (ia|jb) − δ_σσ'(ij|ab), B = (ia|jb) − δ_σσ'(ib|ja).
/// Szabo and Ostlund, <i>Modern Quantum Chemistry</i>, §4.2; A. Dreuw and M. Head-Gordon, Chem. Rev. 105, 4009 (2005).
/// </remarks>
internal sealed class ExcitationMatrices
{
    private ExcitationMatrices(Matrix<double> a, Matrix<double> b, double[][]? dipole, double dipoleScale)
    {
        A = a;
        B = b;
        Dipole = dipole;
        DipoleScale = dipoleScale;
    }

    public Matrix<double> A { get; }
    public Matrix<double> B { get; }

    /// <summary>μ_ia per Cartesian component, or null.</summary>
    public double[][]? Dipole { get; }

    /// <summary>√2 for spin-adapted singlets, 0 for triplets, 1 for unrestricted.</summary>
    public double DipoleScale { get; }

    public static ExcitationMatrices Build(MolecularOrbitalHamiltonian h, string manifold, int nf, CorrelationOptions options)
    {
        int m = h.OrbitalCount;
        bool unrestricted = manifold == "unrestricted";
        int na = h.AlphaOccupiedCount, nb = h.BetaOccupiedCount;
        var blocks = new List<(int Occ, bool Beta)> { (na, false) };
        if (unrestricted) blocks.Add((nb, true));
        int dim = 0;
        foreach (var (occ, _) in blocks) dim += (occ - nf) * (m - occ);
        if (dim == 0)
            throw new OrbitariumInputException("There are no occupied→virtual excitations in this system: add virtual orbitals (a larger basis).");
        MemoryEstimate.Require("The excitation matrices", 4.0 * dim * dim, options, "use a smaller basis or freeze core orbitals (WithFrozenCore).");
        var fa = h.FockMatrix(false);
        var fb = unrestricted ? h.FockMatrix(true) : fa;
        var a = Matrix<double>.Build.Dense(dim, dim);
        var b = Matrix<double>.Build.Dense(dim, dim);
        var gaa = h.EriAlphaAlphaArray;
        var gab = h.EriAlphaBetaArray;
        var gbb = h.EriBetaBetaArray;
        // Enumerate excitations (spin, i, a).
        var list = new List<(bool Beta, int I, int A)>();
        foreach (var (occ, beta) in blocks)
            for (int i = nf; i < occ; i++)
                for (int x = occ; x < m; x++)
                    list.Add((beta, i, x));
        for (int p = 0; p < dim; p++)
        {
            var (sp, i, ap) = list[p];
            for (int q = 0; q < dim; q++)
            {
                var (sq, j, bq) = list[q];
                double aval = 0, bval = 0;
                if (sp == sq)
                {
                    var f = sp ? fb : fa;
                    if (i == j) aval += f[ap * m + bq];
                    if (ap == bq) aval -= f[j * m + i];
                }
                double iajb, ijab = 0, ibja = 0;
                if (sp == sq)
                {
                    var g = sp ? gbb : gaa;
                    iajb = g[MolecularOrbitalHamiltonian.Index(m, i, ap, j, bq)];
                    ijab = g[MolecularOrbitalHamiltonian.Index(m, i, j, ap, bq)];
                    ibja = g[MolecularOrbitalHamiltonian.Index(m, i, bq, j, ap)];
                }
                else
                    iajb = sp ? gab[MolecularOrbitalHamiltonian.Index(m, j, bq, i, ap)] : gab[MolecularOrbitalHamiltonian.Index(m, i, ap, j, bq)];
                switch (manifold)
                {
                    case "singlet":
                        aval += 2 * iajb - ijab;
                        bval = 2 * iajb - ibja;
                        break;
                    case "triplet":
                        aval -= ijab;
                        bval = -ibja;
                        break;
                    default:
                        aval += iajb - ijab;
                        bval = iajb - ibja;
                        break;
                }
                a[p, q] = aval;
                b[p, q] = bval;
            }
        }
        double[][]? dip = null;
        if (h.DipoleAlphaArrays is { } da)
        {
            var db = h.DipoleBetaArrays!;
            dip = new double[3][];
            for (int k = 0; k < 3; k++)
            {
                dip[k] = new double[dim];
                for (int p = 0; p < dim; p++)
                {
                    var (s, i, x) = list[p];
                    dip[k][p] = (s ? db : da)[k][i * m + x];
                }
            }
        }
        double scale = manifold switch { "singlet" => Math.Sqrt(2), "triplet" => 0, _ => 1 };
        return new ExcitationMatrices(a, b, dip, scale);
    }
}
