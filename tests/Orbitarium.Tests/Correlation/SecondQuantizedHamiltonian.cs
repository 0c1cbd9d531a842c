using MathNet.Numerics.LinearAlgebra;
using Orbitarium.Correlation;

namespace Orbitarium.Tests.Correlation;

/// <summary>
/// An independent full-CI Hamiltonian matrix for the checks: determinants as bit masks over interleaved spin orbitals
/// (2p = α, 2p + 1 = β), matrix built by applying H = Σ h_pq a†_p a_q + ½ Σ ⟨pq|rs⟩ a†_p a†_q a_s a_r term by term
/// (second quantisation, e.g. Szabo &amp; Ostlund §2.3 and Helgaker, Jørgensen &amp; Olsen ch. 1), then diagonalised densely.
/// </summary>
internal static class SecondQuantizedHamiltonian
{
    public static double[] LowestEigenvalues(MolecularOrbitalHamiltonian h, int count)
    {
        int m = h.OrbitalCount, n = 2 * m;
        int na = h.AlphaOccupiedCount, nb = h.BetaOccupiedCount;
        var dets = new List<ulong>();
        for (ulong d = 0; d < 1UL << n; d++)
        {
            int a = 0, b = 0;
            for (int k = 0; k < n; k++)
                if ((d & (1UL << k)) != 0) { if (k % 2 == 0) a++; else b++; }
            if (a == na && b == nb) dets.Add(d);
        }
        var index = new Dictionary<ulong, int>();
        for (int i = 0; i < dets.Count; i++) index[dets[i]] = i;
        var hm = h.CoreHamiltonianAlpha.ToArray();
        var g = h.RepulsionAlphaAlpha.ToArray();
        double H1(int p, int q) => p % 2 != q % 2 ? 0 : hm[(p / 2) * m + q / 2];
        // ⟨pq|rs⟩ = (pr|qs) with spin integration.
        double V(int p, int q, int r, int s) => p % 2 != r % 2 || q % 2 != s % 2 ? 0
            : g[(((p / 2) * m + r / 2) * m + q / 2) * m + s / 2];
        var mat = Matrix<double>.Build.Dense(dets.Count, dets.Count);
        for (int j = 0; j < dets.Count; j++)
        {
            ulong dj = dets[j];
            for (int p = 0; p < n; p++)
                for (int q = 0; q < n; q++)
                {
                    double v = H1(p, q);
                    if (v == 0) continue;
                    var (ok, d, sign) = Annihilate(dj, q);
                    if (!ok) continue;
                    (ok, d, int s2) = Create(d, p);
                    if (!ok) continue;
                    mat[index[d], j] += v * sign * s2;
                }
            for (int p = 0; p < n; p++)
                for (int q = 0; q < n; q++)
                    for (int r = 0; r < n; r++)
                        for (int s = 0; s < n; s++)
                        {
                            double v = V(p, q, r, s);
                            if (v == 0) continue;
                            var (ok, d, s1) = Annihilate(dj, r);
                            if (!ok) continue;
                            (ok, d, int s2) = Annihilate(d, s);
                            if (!ok) continue;
                            (ok, d, int s3) = Create(d, q);
                            if (!ok) continue;
                            (ok, d, int s4) = Create(d, p);
                            if (!ok) continue;
                            mat[index[d], j] += 0.5 * v * s1 * s2 * s3 * s4;
                        }
        }
        var evd = mat.Evd(Symmetricity.Symmetric);
        return [.. Enumerable.Range(0, count).Select(k => evd.EigenValues[k].Real + h.NuclearRepulsionEnergyHartree)];
    }

    private static int Parity(ulong d, int k)
    {
        int c = 0;
        for (int i = 0; i < k; i++) if ((d & (1UL << i)) != 0) c++;
        return c % 2 == 0 ? 1 : -1;
    }

    private static (bool, ulong, int) Annihilate(ulong d, int k) =>
        (d & (1UL << k)) == 0 ? (false, 0, 0) : (true, d & ~(1UL << k), Parity(d, k));

    private static (bool, ulong, int) Create(ulong d, int k) =>
        (d & (1UL << k)) != 0 ? (false, 0, 0) : (true, d | (1UL << k), Parity(d, k));
}
