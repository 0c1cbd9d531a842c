using Orbitarium.Parallelism;

namespace Orbitarium.Correlation;

/// <summary>
/// The perturbative triples correction (T) to CCSD, spin-orbital form, from converged CCSD amplitudes.
/// </summary>
/// <remarks>
/// K. Raghavachari, G. W. Trucks, J. A. Pople and M. Head-Gordon, Chem. Phys. Lett. 157, 479 (1989); spin-orbital
/// expressions as in T. D. Crawford and H. F. Schaefer, Rev. Comput. Chem. 14, 33 (2000):
/// D t_ijk^abc(c) = P(i/jk) P(a/bc) [Σ_e t_jk^ae ⟨ei||bc⟩ − Σ_m t_im^bc ⟨ma||jk⟩],
/// D t_ijk^abc(d) = P(i/jk) P(a/bc) t_i^a ⟨jk||bc⟩, E(T) = Σ_{i&lt;j&lt;k, a&lt;b&lt;c} t(c) D (t(c) + t(d)).
/// Cost O(o³v⁴).
/// </remarks>
internal static class PerturbativeTriples
{
    public static double Energy(SpinOrbitalSystem system, double[] t1, double[] t2, CancellationToken ct)
    {
        int n = system.Count, o = system.Occupied, v = system.Virtual;
        var g = system.Antisymmetrized;
        var f = system.Fock;
        var beta = system.IsBeta;
        if (o < 3 || v < 3) return 0;
        // A[i, b, c, e] = ⟨ei||bc⟩ (contiguous in e); B[j, k, a, m] = ⟨ma||jk⟩ (contiguous in m);
        // T2t[b, c, i, m] = t_im^bc (contiguous in m).
        var A = new double[o * v * v * v];
        for (int i = 0; i < o; i++)
            for (int b = 0; b < v; b++)
                for (int c = 0; c < v; c++)
                    for (int e = 0; e < v; e++)
                        A[((i * v + b) * v + c) * v + e] = g[(((o + e) * n + i) * n + o + b) * n + o + c];
        var B = new double[o * o * v * o];
        for (int j = 0; j < o; j++)
            for (int k = 0; k < o; k++)
                for (int a = 0; a < v; a++)
                    for (int m = 0; m < o; m++)
                        B[((j * o + k) * v + a) * o + m] = g[((m * n + o + a) * n + j) * n + k];
        var t2t = new double[v * v * o * o];
        for (int i = 0; i < o; i++)
            for (int m = 0; m < o; m++)
                for (int b = 0; b < v; b++)
                    for (int c = 0; c < v; c++)
                        t2t[((b * v + c) * o + i) * o + m] = t2[((i * o + m) * v + b) * v + c];
        var triples = new List<(int, int, int)>();
        for (int i = 0; i < o; i++)
            for (int j = i + 1; j < o; j++)
                for (int k = j + 1; k < o; k++)
                    triples.Add((i, j, k));
        double total = 0;
        // Fixed interleaved sets summed in order, so the energy repeats to the last bit (FixedOrderParallel).
        var partials = FixedOrderParallel.For(triples.Count, FixedOrderParallel.MaxSets, () => new double[1], (idx, sum) =>
        {
            double local = 0;
            var (i, j, k) = triples[idx];
            Span<int> ps = [i, j, k, j, i, k, k, j, i];
            Span<double> psign = [1, -1, -1];
            double dijk = f[i * n + i] + f[j * n + j] + f[k * n + k];
            int betaOcc = (beta[i] ? 1 : 0) + (beta[j] ? 1 : 0) + (beta[k] ? 1 : 0);
            for (int a = 0; a < v; a++)
                for (int b = a + 1; b < v; b++)
                    for (int c = b + 1; c < v; c++)
                    {
                        // Amplitudes vanish unless the triple excitation conserves S_z.
                        if ((beta[o + a] ? 1 : 0) + (beta[o + b] ? 1 : 0) + (beta[o + c] ? 1 : 0) != betaOcc) continue;
                        Span<int> qs = [a, b, c, b, a, c, c, b, a];
                        double con = 0, dis = 0;
                        for (int x = 0; x < 3; x++)
                        {
                            int p = ps[3 * x], q = ps[3 * x + 1], r = ps[3 * x + 2];
                            for (int y = 0; y < 3; y++)
                            {
                                int s = qs[3 * y], t = qs[3 * y + 1], u = qs[3 * y + 2];
                                double sign = psign[x] * psign[y];
                                double xval = MolecularIntegralTransformation.Dot(
                                        t2.AsSpan(((q * o + r) * v + s) * v, v), A.AsSpan(((p * v + t) * v + u) * v, v))
                                    - MolecularIntegralTransformation.Dot(
                                        t2t.AsSpan(((t * v + u) * o + p) * o, o), B.AsSpan(((q * o + r) * v + s) * o, o));
                                con += sign * xval;
                                dis += sign * t1[p * v + s] * g[((q * n + r) * n + o + t) * n + o + u];
                            }
                        }
                        double d = dijk - f[(o + a) * n + o + a] - f[(o + b) * n + o + b] - f[(o + c) * n + o + c];
                        local += con * (con + dis) / d;
                    }
            sum[0] += local;
        }, ct);
        foreach (var sum in partials) total += sum[0];
        return total;
    }
}
