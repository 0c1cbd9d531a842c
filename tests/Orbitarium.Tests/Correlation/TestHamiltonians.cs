using MathNet.Numerics.LinearAlgebra;
using Orbitarium.Correlation;

namespace Orbitarium.Tests.Correlation;

/// <summary>Hamiltonians built from published integrals or seeded random numbers, for the array-level checks.</summary>
internal static class TestHamiltonians
{
    public const double H2BondLengthBohr = 1.4;

    // H2, STO-3G (ζ = 1.24), R = 1.4 bohr: AO integrals as printed in Szabo & Ostlund, Modern Quantum Chemistry,
    // §3.5.2 (four decimals; the individual digits are recalled from the book, i.e. from memory).
    public const double S12 = 0.6593;
    public const double Hcore11 = -1.1204, Hcore12 = -0.9584;
    public const double Eri1111 = 0.7746, Eri1122 = 0.5697, Eri2111 = 0.4441, Eri2121 = 0.2970;

    // MO values printed in the same section (from memory): ε1, ε2, h11, h22, J11, J12, J22, K12.
    public const double Epsilon1 = -0.5782, Epsilon2 = 0.6703;
    public const double H11 = -1.2528, H22 = -0.4756, J11 = 0.6746, J12 = 0.6636, J22 = 0.6975, K12 = 0.1813;

    public static double[] H2AoRepulsion()
    {
        var g = new double[16];
        for (int p = 0; p < 2; p++)
            for (int q = 0; q < 2; q++)
                for (int r = 0; r < 2; r++)
                    for (int s = 0; s < 2; s++)
                    {
                        bool d1 = p == q, d2 = r == s;
                        g[((p * 2 + q) * 2 + r) * 2 + s] = d1 && d2 ? (p == r ? Eri1111 : Eri1122) : d1 || d2 ? Eri2111 : Eri2121;
                    }
        return g;
    }

    public static Matrix<double> H2Coefficients()
    {
        double a = 1 / Math.Sqrt(2 * (1 + S12)), b = 1 / Math.Sqrt(2 * (1 - S12));
        return Matrix<double>.Build.DenseOfArray(new[,] { { a, b }, { a, -b } });
    }

    /// <summary>AO dipole (x, y, z) of H2 on the z axis, nuclei at z = 0 and 1.4 bohr: by inversion symmetry
    /// ⟨φ1|z|φ2⟩ = (R/2) S12 (common practice).</summary>
    public static Matrix<double>[] H2AoDipole()
    {
        var zero = Matrix<double>.Build.Dense(2, 2);
        var z = Matrix<double>.Build.DenseOfArray(new[,] { { 0, 0.7 * S12 }, { 0.7 * S12, 1.4 } });
        return [zero, zero.Clone(), z];
    }

    /// <summary>H2/STO-3G at 1.4 bohr through our AO→MO transformation of the printed AO integrals.</summary>
    public static MolecularOrbitalHamiltonian H2() =>
        MolecularIntegralTransformation.RestrictedHamiltonian(
            Matrix<double>.Build.DenseOfArray(new[,] { { Hcore11, Hcore12 }, { Hcore12, Hcore11 } }),
            H2AoRepulsion(), H2Coefficients(), [Epsilon1, Epsilon2], 1, 1, 1 / H2BondLengthBohr, H2AoDipole());

    /// <summary>
    /// Two copies of a closed-shell Hamiltonian with no integrals between them (fragments infinitely far apart).
    /// Orbitals are ordered occupied(A), occupied(B), virtual(A), virtual(B).
    /// </summary>
    public static MolecularOrbitalHamiltonian NonInteractingPair(MolecularOrbitalHamiltonian a)
    {
        int m = a.OrbitalCount, o = a.AlphaOccupiedCount, M = 2 * m;
        int Map(int frag, int p) => p < o ? frag * o + p : 2 * o + frag * (m - o) + (p - o);
        var e = new double[M];
        var h = new double[M * M];
        var g = new double[M * M * M * M];
        var ea = a.OrbitalEnergiesAlphaHartree;
        var ha = a.CoreHamiltonianAlpha;
        var ga = a.RepulsionAlphaAlpha;
        for (int f = 0; f < 2; f++)
        {
            for (int p = 0; p < m; p++)
            {
                e[Map(f, p)] = ea[p];
                for (int q = 0; q < m; q++)
                    h[Map(f, p) * M + Map(f, q)] = ha[p * m + q];
            }
            for (int p = 0; p < m; p++)
                for (int q = 0; q < m; q++)
                    for (int r = 0; r < m; r++)
                        for (int s = 0; s < m; s++)
                            g[((Map(f, p) * M + Map(f, q)) * M + Map(f, r)) * M + Map(f, s)] = ga[((p * m + q) * m + r) * m + s];
        }
        // No integrals couple the fragments: at infinite separation the inter-fragment Coulomb terms cancel against
        // the electron–nucleus and nucleus–nucleus terms of neutral fragments, and exchange and overlap vanish.
        return MolecularOrbitalHamiltonian.Restricted(M, 2 * o, 2 * o, e, h, g, 2 * a.NuclearRepulsionEnergyHartree);
    }

    /// <summary>
    /// A seeded random Hamiltonian with the 8-fold permutational symmetry of real integrals, diagonally dominant so
    /// that the lowest determinant is a good reference.
    /// </summary>
    public static MolecularOrbitalHamiltonian Random(int m, int alpha, int beta, int seed, double scale = 0.05)
    {
        var rng = new Random(seed);
        var h = new double[m * m];
        for (int p = 0; p < m; p++)
        {
            h[p * m + p] = -2.0 + 0.6 * p;
            for (int q = 0; q < p; q++)
            {
                double v = scale * (2 * rng.NextDouble() - 1);
                h[p * m + q] = v;
                h[q * m + p] = v;
            }
        }
        var g = new double[m * m * m * m];
        for (int p = 0; p < m; p++)
            for (int q = 0; q <= p; q++)
                for (int r = 0; r < m; r++)
                    for (int s = 0; s <= r; s++)
                    {
                        if (p * (p + 1) / 2 + q < r * (r + 1) / 2 + s) continue;
                        double v = p == q && r == s ? 0.3 + 0.2 * rng.NextDouble() : scale * (2 * rng.NextDouble() - 1);
                        foreach (var (a, b, c, d) in new[] { (p, q, r, s), (q, p, r, s), (p, q, s, r), (q, p, s, r), (r, s, p, q), (s, r, p, q), (r, s, q, p), (s, r, q, p) })
                            g[((a * m + b) * m + c) * m + d] = v;
                    }
        var e = new double[m];
        for (int p = 0; p < m; p++) e[p] = h[p * m + p];
        // Orbital energies: the diagonal of the reference's Fock matrix, as for canonical orbitals.
        var f = MolecularOrbitalHamiltonian.Restricted(m, alpha, beta, e, h, g, 0.0).FockMatrix(false);
        for (int p = 0; p < m; p++) e[p] = f[p * m + p];
        return MolecularOrbitalHamiltonian.Restricted(m, alpha, beta, e, h, g, 0.0);
    }
}
