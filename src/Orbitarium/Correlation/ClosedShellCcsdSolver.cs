using Orbitarium.LinearAlgebra;

namespace Orbitarium.Correlation;

/// <summary>
/// Spin-adapted CCSD for a closed-shell restricted reference: amplitudes t_i^a and t_ij^ab (= t_{iα jβ}^{aα bβ}) over
/// spatial orbitals, with the singles folded into T1-dressed integrals.
/// </summary>
/// <remarks>
/// The singles are folded into the T1-transformed Hamiltonian of H. Koch, O. Christiansen, R. Kobayashi,
/// P. Jørgensen and T. Helgaker, Chem. Phys. Lett. 228, 233 (1994): g̃_pqrs = Σ X_tp Y_uq X_vr Y_ws (tu|vw) with
/// X = 1 − t1ᵀ, Y = 1 + t1, and F̃ built from g̃. The singles residual and the ladder and Fock terms of the doubles are
/// those of T. Helgaker, P. Jørgensen and J. Olsen, <i>Molecular Electronic-Structure Theory</i> (Wiley 2000),
/// §13.7.5; the ring terms are the closed-shell W_mbej / W_mbje intermediates (the spin-orbital ones of Stanton,
/// Gauss, Watts and Bartlett 1991 summed over spin). The tests hold every term to the αβ block of the spin-orbital
/// residual. The dressing composes additively (t1ᵀ·t1ᵀ = 0), so the integrals are re-dressed in place by the change
/// of t1 each iteration; the (ia|jb) block is unchanged by it. Every O(o²v⁴), O(o³v³) and O(o⁴v²) contraction is a
/// <see cref="TransposedProduct"/>; the particle–particle ladder uses the (ai)↔(bj) symmetry of its result and runs
/// over pairs i ≤ j only.
/// </remarks>
internal sealed class ClosedShellCcsdSolver
{
    private readonly int _m, _o, _v;
    private readonly T1DressedIntegrals _integrals;
    private readonly double[] _g;
    private readonly double[] _referenceFock;
    // Blocks of (ia|jb), which the dressing leaves alone, in the layouts the contractions read.
    private readonly double[] _ovovByOccupiedPair;   // [(k,l)][(c,d)] = (kc|ld)
    private readonly double[] _coulombOvov;          // [(k,c)][(l,d)] = (kc|ld)
    private readonly double[] _exchangeOvov;         // [(k,c)][(l,d)] = (kd|lc)
    private readonly double[] _combinedOvov;         // [(k,c)][(l,d)] = 2(ld|kc) − (lc|kd)
    private readonly double[] _ovovByVirtual;        // [c][(k,l,d)] = (ld|kc)
    private readonly double[] _ovovByOccupied;       // [k][(l,c,d)] = (kd|lc)
    private readonly (double[] T1, double[] T2) _amplitudesA, _amplitudesB;
    private readonly double[]?[] _work = new double[]?[Enum.GetValues<Slot>().Length];

    /// <summary>Scratch arrays of the iterations, allocated on first use and reused: an iteration allocates no
    /// array of the size of T2.</summary>
    private enum Slot
    {
        U, Singles, Doubles, Pairs, HoleLadder, HoleLadderTransposed, T2ByVirtualPair, Symmetrised, TCrossed, TDirect,
        UDirect, RingDirect, RingExchange, Ring, RingCrossed, UByVirtual, UByOccupied, DiisVector, DiisError,
    }

    private double[] Work(Slot slot, int length)
    {
        var a = _work[(int)slot];
        if (a is null || a.Length != length) _work[(int)slot] = a = new double[length];
        return a;
    }

    /// <summary>Sets up the solver on the active orbitals of <paramref name="hamiltonian"/> (the first
    /// <paramref name="frozenCore"/> orbitals are frozen).</summary>
    /// <param name="hamiltonian">A closed-shell restricted MO Hamiltonian.</param>
    /// <param name="frozenCore">Frozen core orbitals.</param>
    /// <param name="dressInPlace">Dress the Hamiltonian's own integral array instead of a copy (it is undressed again
    /// when <see cref="Solve"/> returns or throws, to round-off). Only for a Hamiltonian nobody else can see.</param>
    /// <param name="ct">Stops the set-up.</param>
    public ClosedShellCcsdSolver(MolecularOrbitalHamiltonian hamiltonian, int frozenCore, bool dressInPlace, CancellationToken ct)
    {
        int full = hamiltonian.OrbitalCount;
        _m = full - frozenCore;
        _o = hamiltonian.AlphaOccupiedCount - frozenCore;
        _v = _m - _o;
        int m = _m, o = _o, v = _v;
        _g = dressInPlace ? hamiltonian.EriAlphaAlphaArray : (double[])hamiltonian.EriAlphaAlphaArray.Clone();
        ct.ThrowIfCancellationRequested();
        var fock = hamiltonian.FockMatrix(beta: false);
        _referenceFock = new double[m * m];
        for (int p = 0; p < m; p++)
            for (int q = 0; q < m; q++) _referenceFock[p * m + q] = fock[(p + frozenCore) * full + q + frozenCore];
        _integrals = new T1DressedIntegrals(_g, full, frozenCore, o, _referenceFock);
        _amplitudesA = (new double[o * v], new double[o * o * v * v]);
        _amplitudesB = (new double[o * v], new double[o * o * v * v]);
        T1 = _amplitudesA.T1;
        T2 = _amplitudesA.T2;

        _ovovByOccupiedPair = new double[o * o * v * v];
        _coulombOvov = new double[o * v * o * v];
        _exchangeOvov = new double[o * v * o * v];
        _combinedOvov = new double[o * v * o * v];
        _ovovByVirtual = new double[v * o * o * v];
        _ovovByOccupied = new double[o * o * v * v];
        Parallel.For(0, o, k =>
        {
            for (int l = 0; l < o; l++)
                for (int c = 0; c < v; c++)
                    for (int d = 0; d < v; d++)
                    {
                        _ovovByOccupiedPair[((k * o + l) * v + c) * v + d] = G(k, o + c, l, o + d);
                        _coulombOvov[((k * v + c) * o + l) * v + d] = G(k, o + c, l, o + d);
                        _exchangeOvov[((k * v + c) * o + l) * v + d] = G(k, o + d, l, o + c);
                        _combinedOvov[((k * v + c) * o + l) * v + d] = 2 * G(l, o + d, k, o + c) - G(l, o + c, k, o + d);
                        _ovovByVirtual[((c * o + k) * o + l) * v + d] = G(l, o + d, k, o + c);
                        _ovovByOccupied[((k * o + l) * v + c) * v + d] = G(k, o + d, l, o + c);
                    }
        });
    }

    /// <summary>Singles amplitudes t_i^a at [i·v + a].</summary>
    public double[] T1 { get; internal set; }

    /// <summary>Doubles amplitudes t_ij^ab at [((i·o + j)·v + a)·v + b]; t_ij^ab = t_ji^ba.</summary>
    public double[] T2 { get; internal set; }

    /// <summary>Active occupied orbitals.</summary>
    public int Occupied => _o;

    /// <summary>Virtual orbitals.</summary>
    public int Virtual => _v;

    /// <summary>Diagonal of the reference Fock matrix over the active orbitals (occupied first), hartree.</summary>
    public double OrbitalEnergy(int p) => _referenceFock[p * _m + p];

    /// <summary>The active integrals (pq|rs), dressed with the current singles while iterating; after
    /// <see cref="Solve"/> they are undressed again.</summary>
    public double Repulsion(int p, int q, int r, int s) => _g[Index(p, q, r, s)];

    /// <summary>Number of 8-byte numbers the solver holds besides the integrals, for m active orbitals, o occupied,
    /// and a DIIS of the given size.</summary>
    public static double WorkingDoubles(int m, int o, int diis)
    {
        double v = m - o;
        double ovov = o * (double)o * v * v;
        return (2.0 * diis + 20) * ovov + 4.0 * v * v * v + o * (double)o * o * o;
    }

    private long Index(int p, int q, int r, int s) => _integrals.Index(p, q, r, s);
    private double G(int p, int q, int r, int s) => _g[_integrals.Index(p, q, r, s)];

    public CcsdAmplitudeSolver.Outcome Solve(CorrelationOptions options, IProgress<CorrelationProgress>? progress, CancellationToken ct)
    {
        int o = _o, v = _v;
        if (o == 0 || v == 0) return new CcsdAmplitudeSolver.Outcome(0, 0, 0, true, "no excitations possible", [], [], 0);
        var d1 = new double[o * v];
        for (int i = 0; i < o; i++)
            for (int a = 0; a < v; a++)
                d1[i * v + a] = OrbitalEnergy(i) - OrbitalEnergy(o + a);
        // First-order guess: t_ij^ab = (ia|jb) / D_ij^ab, t_i^a = f_ia / D_i^a; its energy is MP2.
        for (int i = 0; i < o; i++)
            for (int a = 0; a < v; a++)
                T1[i * v + a] = _referenceFock[i * _m + o + a] / d1[i * v + a];
        for (int i = 0; i < o; i++)
            for (int j = 0; j < o; j++)
                for (int a = 0; a < v; a++)
                    for (int b = 0; b < v; b++)
                        T2[((i * o + j) * v + a) * v + b] = G(i, o + a, j, o + b) / (d1[i * v + a] + d1[j * v + b]);
        double mp2 = Energy(new double[T1.Length], T2);
        var diis = new AmplitudeDiis(options.DiisVectors);
        var convergence = new AmplitudeConvergence(options, progress, "CCSD", mp2);
        int iteration = 0;
        try
        {
            while (iteration < options.MaxIterations)
            {
                ct.ThrowIfCancellationRequested();
                iteration++;
                Dress(T1);
                var (r1, r2) = Residual(ct);
                int n1 = r1.Length;
                var vec = Work(Slot.DiisVector, n1 + r2.Length);
                var err = Work(Slot.DiisError, vec.Length);
                double sumSq = 0;
                for (int i = 0; i < o; i++)
                    for (int a = 0; a < v; a++)
                    {
                        int x = i * v + a;
                        double step = r1[x] / d1[x];
                        err[x] = step;
                        vec[x] = T1[x] + step;
                        sumSq += step * step;
                    }
                for (int i = 0; i < o; i++)
                    for (int j = 0; j < o; j++)
                        for (int a = 0; a < v; a++)
                        {
                            int row = ((i * o + j) * v + a) * v;
                            double dija = d1[i * v + a];
                            for (int b = 0; b < v; b++)
                            {
                                double step = r2[row + b] / (dija + d1[j * v + b]);
                                err[n1 + row + b] = step;
                                vec[n1 + row + b] = T2[row + b] + step;
                                sumSq += step * step;
                            }
                        }
                double rms = Math.Sqrt(sumSq / vec.Length);
                diis.Extrapolate(vec, err);
                // Two amplitude buffers take turns, so nothing of the size of T2 is allocated per iteration.
                var t1 = T1 == _amplitudesA.T1 ? _amplitudesB.T1 : _amplitudesA.T1;
                var t2 = T2 == _amplitudesA.T2 ? _amplitudesB.T2 : _amplitudesA.T2;
                Array.Copy(vec, 0, t1, 0, n1);
                Array.Copy(vec, n1, t2, 0, t2.Length);
                T1 = t1;
                T2 = t2;
                if (convergence.Record(iteration, Energy(T1, T2), rms)) break;
            }
        }
        finally
        {
            // Leave the integrals as they came, for (T) and for any later use.
            Dress(new double[o * v]);
        }
        double t1Norm = 0;
        foreach (var t in T1) t1Norm += t * t;
        // T. J. Lee and P. R. Taylor, Int. J. Quantum Chem. Symp. 23, 199 (1989): ‖t1‖ / √N for N correlated
        // electrons (2o), as the spin-orbital code reports it.
        double t1Diagnostic = Math.Sqrt(t1Norm / (2.0 * o));
        return new CcsdAmplitudeSolver.Outcome(convergence.Energy, mp2, iteration, convergence.Converged, convergence.Reason,
            convergence.Energies, convergence.Residuals, t1Diagnostic);
    }

    /// <summary>
    /// The CCSD Jacobian A = ∂Ω/∂t at the current amplitudes applied to <paramref name="x"/> (singles then doubles,
    /// doubles with x_ij^ab = x_ji^ba), written to <paramref name="sigma"/>.
    /// </summary>
    /// <remarks>Exact up to round-off: Ω is quartic in the amplitudes (<see cref="QuarticStencil"/>). The amplitudes
    /// and the dressing are restored on return.</remarks>
    public void JacobianTimes(double[] x, double[] sigma, CancellationToken ct)
    {
        int n1 = _o * _v, n2 = T2.Length;
        var t1 = T1;
        var t2 = T2;
        Array.Clear(sigma);
        var shifted1 = new double[n1];
        var shifted2 = new double[n2];
        try
        {
            foreach (var (s, weight) in QuarticStencil.Points(x))
            {
                ct.ThrowIfCancellationRequested();
                for (int i = 0; i < n1; i++) shifted1[i] = t1[i] + s * x[i];
                for (int i = 0; i < n2; i++) shifted2[i] = t2[i] + s * x[n1 + i];
                T1 = shifted1;
                T2 = shifted2;
                Dress(shifted1);
                var (r1, r2) = Residual(ct);
                for (int i = 0; i < n1; i++) sigma[i] += weight * r1[i];
                for (int i = 0; i < n2; i++) sigma[n1 + i] += weight * r2[i];
            }
        }
        finally
        {
            T1 = t1;
            T2 = t2;
        }
    }

    /// <summary>Orbital-energy differences ε_a − ε_i (singles) and ε_a + ε_b − ε_i − ε_j (doubles): the diagonal the
    /// Jacobian is preconditioned with.</summary>
    public double[] OrbitalEnergyDifferences()
    {
        int o = _o, v = _v;
        var d = new double[o * v + T2.Length];
        for (int i = 0; i < o; i++)
            for (int a = 0; a < v; a++) d[i * v + a] = OrbitalEnergy(o + a) - OrbitalEnergy(i);
        for (int i = 0; i < o; i++)
            for (int j = 0; j < o; j++)
                for (int a = 0; a < v; a++)
                    for (int b = 0; b < v; b++)
                        d[o * v + ((i * o + j) * v + a) * v + b] = d[i * v + a] + d[j * v + b];
        return d;
    }

    /// <summary>E = 2 Σ f_ia t_i^a + Σ [2(ia|jb) − (ib|ja)] (t_ij^ab + t_i^a t_j^b).</summary>
    private double Energy(double[] t1, double[] t2)
    {
        int o = _o, v = _v;
        double e = 0;
        for (int i = 0; i < o; i++)
            for (int a = 0; a < v; a++)
                e += 2 * _referenceFock[i * _m + o + a] * t1[i * v + a];
        for (int i = 0; i < o; i++)
            for (int j = 0; j < o; j++)
                for (int a = 0; a < v; a++)
                    for (int b = 0; b < v; b++)
                    {
                        double l = 2 * G(i, o + a, j, o + b) - G(i, o + b, j, o + a);
                        e += l * (t2[((i * o + j) * v + a) * v + b] + t1[i * v + a] * t1[j * v + b]);
                    }
        return e;
    }

    /// <summary>Re-dresses the integrals from the singles they carry to <paramref name="t1"/>, in place.</summary>
    internal void Dress(double[] t1) => _integrals.DressWith(t1);

    /// <summary>The CCSD residuals Ω_ai and Ω_aibj at the current amplitudes (integrals dressed with T1).</summary>
    internal (double[] Singles, double[] Doubles) Residual(CancellationToken ct)
    {
        int m = _m, o = _o, v = _v;
        int ov = o * v, oo = o * o, vv = v * v;
        var t2 = T2;
        var f = _integrals.Fock();
        // u_ij^ab = 2 t_ij^ab − t_ij^ba
        var u = Work(Slot.U, t2.Length);
        for (int ij = 0; ij < oo; ij++)
            for (int a = 0; a < v; a++)
                for (int b = 0; b < v; b++)
                    u[(ij * v + a) * v + b] = 2 * t2[(ij * v + a) * v + b] - t2[(ij * v + b) * v + a];

        // Singles.
        var r1 = Work(Slot.Singles, ov);
        Parallel.For(0, o, i =>
        {
            for (int a = 0; a < v; a++)
            {
                double s = f[(o + a) * m + i];
                // A1: Σ_kcd u_ki^cd (ad|kc) = Σ_kc Σ_d u_ki^cd (kc|ad)
                for (int k = 0; k < o; k++)
                    for (int c = 0; c < v; c++)
                        s += MolecularIntegralTransformation.Dot(u.AsSpan(((k * o + i) * v + c) * v, v),
                            _g.AsSpan((int)Index(k, o + c, o + a, o), v));
                // B1: −Σ_klc u_kl^ac (ki|lc)
                for (int k = 0; k < o; k++)
                    for (int l = 0; l < o; l++)
                        s -= MolecularIntegralTransformation.Dot(u.AsSpan(((k * o + l) * v + a) * v, v),
                            _g.AsSpan((int)Index(k, i, l, o), v));
                // C1: Σ_kc u_ik^ac F̃_kc
                for (int k = 0; k < o; k++)
                    for (int c = 0; c < v; c++)
                        s += u[((i * o + k) * v + a) * v + c] * f[k * m + o + c];
                r1[i * v + a] = s;
            }
        });
        ct.ThrowIfCancellationRequested();

        var r2 = Work(Slot.Doubles, t2.Length);
        Array.Clear(r2);
        // (ai|bj) and the particle–particle ladder Σ_cd t_ij^cd (ac|bd), over pairs i ≤ j.
        int pairCount = o * (o + 1) / 2;
        var pairs = new (int I, int J)[pairCount];
        var tPairs = Work(Slot.Pairs, pairCount * vv);
        for (int i = 0, p = 0; i < o; i++)
            for (int j = i; j < o; j++, p++)
            {
                pairs[p] = (i, j);
                Array.Copy(t2, (i * o + j) * vv, tPairs, p * vv, vv);
            }
        Parallel.For(0, v, () => (Gather: new double[v * vv], Product: new double[pairCount * v]), (a, _, buffers) =>
        {
            // gather[b][(c,d)] = (ac|bd)
            for (int b = 0; b < v; b++)
                for (int c = 0; c < v; c++)
                    Array.Copy(_g, Index(o + a, o + c, o + b, o), buffers.Gather, (b * v + c) * v, v);
            TransposedProduct.Multiply(tPairs, buffers.Gather, buffers.Product, pairCount, v, vv, parallel: false);
            for (int p = 0; p < pairCount; p++)
            {
                var (i, j) = pairs[p];
                for (int b = 0; b < v; b++)
                {
                    double x = buffers.Product[p * v + b];
                    r2[((i * o + j) * v + a) * v + b] += x;
                    if (i != j) r2[((j * o + i) * v + b) * v + a] += x;
                }
            }
            return buffers;
        }, _ => { });
        ct.ThrowIfCancellationRequested();
        for (int i = 0; i < o; i++)
            for (int j = 0; j < o; j++)
                for (int a = 0; a < v; a++)
                    for (int b = 0; b < v; b++)
                        r2[((i * o + j) * v + a) * v + b] += G(o + a, i, o + b, j);

        // Hole–hole ladder: Σ_kl t_kl^ab W_klij, W_klij = (ki|lj) + Σ_cd t_ij^cd (kc|ld).
        var w = Work(Slot.HoleLadder, oo * oo);
        TransposedProduct.Multiply(_ovovByOccupiedPair, t2, w, oo, oo, vv);
        var wT = Work(Slot.HoleLadderTransposed, oo * oo);   // [ij][kl]
        for (int k = 0; k < o; k++)
            for (int l = 0; l < o; l++)
                for (int i = 0; i < o; i++)
                    for (int j = 0; j < o; j++)
                        wT[(i * o + j) * oo + k * o + l] = w[(k * o + l) * oo + i * o + j] + G(k, i, l, j);
        var t2ByVirtualPair = Work(Slot.T2ByVirtualPair, vv * oo);  // [ab][kl]
        for (int kl = 0; kl < oo; kl++)
            for (int ab = 0; ab < vv; ab++)
                t2ByVirtualPair[ab * oo + kl] = t2[kl * vv + ab];
        TransposedProduct.Multiply(wT, t2ByVirtualPair, r2, oo, vv, oo, accumulate: true);
        ct.ThrowIfCancellationRequested();

        // The ring and Fock terms go to x, then Ω_ij^ab += x_ij^ab + x_ji^ba.
        // Ring: x_ij^ab = Σ_me u_im^ae W_mbej + Σ_me t_im^ae W_mbje + Σ_me t_mj^ae W_mbie with
        //   W_mbej = (me|bj) + ½ Σ_nf t_nj^fb L_menf − ½ Σ_nf t_nj^bf (me|nf),  L_menf = 2(me|nf) − (mf|ne),
        //   W_mbje = −(mj|be) + ½ Σ_nf t_nj^bf (mf|ne).
        var x = Work(Slot.Symmetrised, t2.Length);
        var tByOv = Work(Slot.TCrossed, ov * ov);     // [(i,a)][(m,e)] = t_mi^ae
        var tDirect = Work(Slot.TDirect, ov * ov);   // [(i,a)][(m,e)] = t_im^ae
        var uByOv = Work(Slot.UDirect, ov * ov);     // [(i,a)][(m,e)] = u_im^ae
        for (int i = 0; i < o; i++)
            for (int a = 0; a < v; a++)
                for (int l = 0; l < o; l++)
                    for (int d = 0; d < v; d++)
                    {
                        int at = (i * v + a) * ov + l * v + d;
                        tByOv[at] = t2[((l * o + i) * v + a) * v + d];
                        tDirect[at] = t2[((i * o + l) * v + a) * v + d];
                        uByOv[at] = u[((i * o + l) * v + a) * v + d];
                    }
        var wBej = Work(Slot.RingDirect, ov * ov);      // [(j,b)][(m,e)] = W_mbej
        var wBje = Work(Slot.RingExchange, ov * ov);      // [(j,b)][(m,e)] = W_mbje
        TransposedProduct.Multiply(tDirect, _combinedOvov, wBej, ov, ov, ov, alpha: 0.5);
        TransposedProduct.Multiply(tByOv, _coulombOvov, wBej, ov, ov, ov, alpha: -0.5, accumulate: true);
        TransposedProduct.Multiply(tByOv, _exchangeOvov, wBje, ov, ov, ov, alpha: 0.5);
        for (int j = 0; j < o; j++)
            for (int b = 0; b < v; b++)
                for (int mm = 0; mm < o; mm++)
                    for (int e = 0; e < v; e++)
                    {
                        int at = (j * v + b) * ov + mm * v + e;
                        wBej[at] += G(mm, o + e, o + b, j);
                        wBje[at] -= G(mm, j, o + b, o + e);
                    }
        var ring = Work(Slot.Ring, ov * ov);      // [(i,a)][(j,b)]
        TransposedProduct.Multiply(uByOv, wBej, ring, ov, ov, ov);
        TransposedProduct.Multiply(tDirect, wBje, ring, ov, ov, ov, accumulate: true);
        var ringCrossed = Work(Slot.RingCrossed, ov * ov);  // [(j,a)][(i,b)] = Σ_me t_mj^ae W_mbie
        TransposedProduct.Multiply(tByOv, wBje, ringCrossed, ov, ov, ov);
        for (int i = 0; i < o; i++)
            for (int j = 0; j < o; j++)
                for (int a = 0; a < v; a++)
                    for (int b = 0; b < v; b++)
                        x[((i * o + j) * v + a) * v + b] = ring[(i * v + a) * ov + j * v + b] + ringCrossed[(j * v + a) * ov + i * v + b];
        ct.ThrowIfCancellationRequested();

        // Fock terms: Fvv_bc = F̃_bc − Σ_kld u_kl^bd (ld|kc); Foo_kj = F̃_kj + Σ_lcd u_lj^cd (kd|lc).
        var uByVirtual = Work(Slot.UByVirtual, v * oo * v);   // [b][(k,l,d)] = u_kl^bd
        var uByOccupied = Work(Slot.UByOccupied, o * o * vv);  // [j][(l,c,d)] = u_lj^cd
        for (int k = 0; k < o; k++)
            for (int l = 0; l < o; l++)
                for (int b = 0; b < v; b++)
                    for (int d = 0; d < v; d++)
                    {
                        double val = u[((k * o + l) * v + b) * v + d];
                        uByVirtual[((b * o + k) * o + l) * v + d] = val;
                        uByOccupied[((l * o + k) * v + b) * v + d] = val;   // [j=l][(l'=k, c=b, d)] = u_{k l}^{b d}
                    }
        var fvv = new double[vv];
        TransposedProduct.Multiply(uByVirtual, _ovovByVirtual, fvv, v, v, oo * v, alpha: -1.0);
        for (int b = 0; b < v; b++)
            for (int c = 0; c < v; c++) fvv[b * v + c] += f[(o + b) * m + o + c];
        var foo = new double[oo];
        TransposedProduct.Multiply(_ovovByOccupied, uByOccupied, foo, o, o, o * vv);
        for (int k = 0; k < o; k++)
            for (int j = 0; j < o; j++) foo[k * o + j] += f[k * m + j];
        TransposedProduct.Multiply(t2, fvv, x, oo * v, v, v, accumulate: true);
        for (int i = 0; i < o; i++)
            for (int j = 0; j < o; j++)
            {
                var target = x.AsSpan((i * o + j) * vv, vv);
                for (int k = 0; k < o; k++) MolecularIntegralTransformation.Axpy(-foo[k * o + j], t2.AsSpan((i * o + k) * vv, vv), target);
            }

        for (int i = 0; i < o; i++)
            for (int j = 0; j < o; j++)
                for (int a = 0; a < v; a++)
                    for (int b = 0; b < v; b++)
                        r2[((i * o + j) * v + a) * v + b] += x[((i * o + j) * v + a) * v + b] + x[((j * o + i) * v + b) * v + a];
        return (r1, r2);
    }
}
