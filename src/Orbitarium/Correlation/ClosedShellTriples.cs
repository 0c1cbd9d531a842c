using Orbitarium.LinearAlgebra;
using Orbitarium.Parallelism;

namespace Orbitarium.Correlation;

/// <summary>
/// The perturbative triples correction (T) for closed-shell CCSD, spin-adapted, from the amplitudes of a
/// <see cref="ClosedShellCcsdSolver"/> (whose integrals are undressed once it has finished).
/// </summary>
/// <remarks>
/// K. Raghavachari, G. W. Trucks, J. A. Pople and M. Head-Gordon, Chem. Phys. Lett. 157, 479 (1989), in the
/// closed-shell form of A. P. Rendell, T. J. Lee and A. Komornicki, Chem. Phys. Lett. 178, 462 (1991):
/// W_ijk^abc = P [Σ_d (bd|ck) t_ij^ad − Σ_l (lj|ck) t_il^ab], P summing the six permutations of the pairs (ia), (jb),
/// (kc); V_ijk^abc = W_ijk^abc + t_i^a (jb|kc) + t_j^b (ia|kc) + t_k^c (ia|jb);
/// E(T) = ⅓ Σ_ijk Σ_abc W_abc (4V_abc + V_bca + V_cab − 2V_acb − 2V_bac − 2V_cba) / D_ijk^abc.
/// The summand of one (ijk) does not change when i, j, k are permuted, so only i ≥ j ≥ k are visited, with weights
/// 6, 3 or 1. Cost O(o³v⁴)/6, as GEMMs; memory O(ov³).
/// </remarks>
internal static class ClosedShellTriples
{
    public static double Energy(ClosedShellCcsdSolver solver, CancellationToken ct)
    {
        int o = solver.Occupied, v = solver.Virtual;
        if (o == 0 || v == 0) return 0;
        var t1 = solver.T1;
        var t2 = solver.T2;
        int vv = v * v, vvv = v * vv;
        // vvvo[k][(b,c)][d] = (bd|ck); ooov[(j,k)][c][l] = (lj|ck); t2ByLast[i][(a,b)][l] = t_il^ab.
        var vvvo = new double[o * vvv];
        for (int k = 0; k < o; k++)
            for (int b = 0; b < v; b++)
                for (int c = 0; c < v; c++)
                    for (int d = 0; d < v; d++)
                        vvvo[((k * v + b) * v + c) * v + d] = solver.Repulsion(o + b, o + d, o + c, k);
        var ooov = new double[o * o * v * o];
        for (int j = 0; j < o; j++)
            for (int k = 0; k < o; k++)
                for (int c = 0; c < v; c++)
                    for (int l = 0; l < o; l++)
                        ooov[((j * o + k) * v + c) * o + l] = solver.Repulsion(l, j, o + c, k);
        var t2ByLast = new double[o * vv * o];
        for (int i = 0; i < o; i++)
            for (int l = 0; l < o; l++)
                for (int ab = 0; ab < vv; ab++)
                    t2ByLast[(i * vv + ab) * o + l] = t2[(i * o + l) * vv + ab];
        var ovov = new double[o * v * o * v];   // (ia|jb) at [(i,a)][(j,b)]
        for (int i = 0; i < o; i++)
            for (int a = 0; a < v; a++)
                for (int j = 0; j < o; j++)
                    for (int b = 0; b < v; b++)
                        ovov[((i * v + a) * o + j) * v + b] = solver.Repulsion(i, o + a, j, o + b);
        var eps = new double[o + v];
        for (int p = 0; p < o + v; p++) eps[p] = solver.OrbitalEnergy(p);

        var triples = new List<(int I, int J, int K)>();
        for (int i = 0; i < o; i++)
            for (int j = 0; j <= i; j++)
                for (int k = 0; k <= j; k++)
                    triples.Add((i, j, k));
        int sets = FixedOrderParallel.SetCount(3L * vvv * sizeof(double));
        var states = FixedOrderParallel.For(triples.Count, sets, () => new State(vvv), (index, state) =>
        {
            var (i, j, k) = triples[index];
            var w = state.W;
            Array.Clear(w);
            // The six orderings of the pairs (ia), (jb), (kc): occupied order, and where a, b, c sit in X.
            AddPermuted(i, j, k, 0, 1, 2);
            AddPermuted(i, k, j, 0, 2, 1);
            AddPermuted(j, i, k, 1, 0, 2);
            AddPermuted(j, k, i, 1, 2, 0);
            AddPermuted(k, i, j, 2, 0, 1);
            AddPermuted(k, j, i, 2, 1, 0);
            var vArr = state.V;
            for (int a = 0; a < v; a++)
                for (int b = 0; b < v; b++)
                {
                    double jbFactor = t1[i * v + a];
                    double ia_jb = ovov[((i * v + a) * o + j) * v + b];
                    for (int c = 0; c < v; c++)
                    {
                        int abc = (a * v + b) * v + c;
                        vArr[abc] = w[abc] + jbFactor * ovov[((j * v + b) * o + k) * v + c]
                            + t1[j * v + b] * ovov[((i * v + a) * o + k) * v + c] + t1[k * v + c] * ia_jb;
                    }
                }
            double sum = 0, eijk = eps[i] + eps[j] + eps[k];
            for (int a = 0; a < v; a++)
                for (int b = 0; b < v; b++)
                    for (int c = 0; c < v; c++)
                    {
                        double z = 4 * vArr[(a * v + b) * v + c] + vArr[(b * v + c) * v + a] + vArr[(c * v + a) * v + b]
                            - 2 * (vArr[(a * v + c) * v + b] + vArr[(b * v + a) * v + c] + vArr[(c * v + b) * v + a]);
                        sum += w[(a * v + b) * v + c] * z / (eijk - eps[o + a] - eps[o + b] - eps[o + c]);
                    }
            int weight = i == j && j == k ? 1 : i == j || j == k ? 3 : 6;
            state.Sum += weight * sum / 3.0;

            // X[a][b][c] = Σ_d t_pq^ad (bd|cr) − Σ_l t_pl^ab (lq|cr) for the occupied order (p, q, r), added to
            // W at the virtual positions the ordering maps a, b, c to.
            void AddPermuted(int p, int q, int r, int posA, int posB, int posC)
            {
                var x = state.X;
                TransposedProduct.Multiply(t2, vvvo, x, v, vv, v, parallel: false, aOffset: (p * o + q) * vv, bOffset: r * vvv);
                TransposedProduct.Multiply(t2ByLast, ooov, x, vv, v, o, alpha: -1.0, accumulate: true, parallel: false,
                    aOffset: p * vv * o, bOffset: (q * o + r) * v * o);
                Span<int> idx = stackalloc int[3];
                for (int a = 0; a < v; a++)
                    for (int b = 0; b < v; b++)
                        for (int c = 0; c < v; c++)
                        {
                            // X's labels (a, b, c) belong to the pairs in positions posA, posB, posC of W.
                            idx[posA] = a;
                            idx[posB] = b;
                            idx[posC] = c;
                            w[(idx[0] * v + idx[1]) * v + idx[2]] += x[(a * v + b) * v + c];
                        }
            }
        }, ct);
        double total = 0;
        foreach (var s in states) total += s.Sum;
        return total;
    }

    private sealed class State(int size)
    {
        public double[] X { get; } = new double[size];
        public double[] W { get; } = new double[size];
        public double[] V { get; } = new double[size];
        public double Sum { get; set; }
    }
}
