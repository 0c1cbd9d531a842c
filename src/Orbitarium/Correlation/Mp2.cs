namespace Orbitarium.Correlation;

/// <summary>
/// Second-order Møller–Plesset perturbation theory on a Hartree–Fock reference, restricted closed shell or unrestricted.
/// </summary>
/// <remarks>
/// Closed shell: E(2) = Σ_ijab (ia|jb)[2(ia|jb) − (ib|ja)] / (ε_i + ε_j − ε_a − ε_b), split into the opposite-spin part
/// Σ (ia|jb)²/D and the same-spin part Σ (ia|jb)[(ia|jb) − (ib|ja)]/D. Unrestricted: same-spin pairs
/// Σ_{i&lt;j, a&lt;b} [(ia|jb) − (ib|ja)]²/D per spin and opposite-spin pairs Σ (i_α a_α|j_β b_β)²/D.
/// C. Møller and M. S. Plesset, Phys. Rev. 46, 618 (1934); Szabo and Ostlund, <i>Modern Quantum Chemistry</i>, §6.4.
/// The cost after the O(N⁵) integral transformation is O(o²v²).
/// </remarks>
public static class Mp2
{
    /// <summary>
    /// MP2 for the reference described by <paramref name="hamiltonian"/>: closed-shell formulas for a restricted closed
    /// shell, unrestricted formulas otherwise. A restricted open-shell reference is refused (use a UHF reference).
    /// </summary>
    /// <param name="hamiltonian">MO Hamiltonian of a canonical Hartree–Fock reference.</param>
    /// <param name="options">Frozen core (default none).</param>
    /// <param name="progress">Receives one report (iteration 0, correlation energy, residual 0) when done.</param>
    /// <param name="cancellationToken">Stops the calculation.</param>
    public static Mp2Result Compute(MolecularOrbitalHamiltonian hamiltonian, CorrelationOptions? options = null,
        IProgress<CorrelationProgress>? progress = null, CancellationToken cancellationToken = default)
    {
        var result = ComputeCore(hamiltonian, options, cancellationToken);
        progress?.Report(new CorrelationProgress("MP2", 0, result.CorrelationEnergyHartree, 0));
        return result;
    }

    private static Mp2Result ComputeCore(MolecularOrbitalHamiltonian hamiltonian, CorrelationOptions? options, CancellationToken cancellationToken)
    {
        ArgumentNullException.ThrowIfNull(hamiltonian);
        options ??= CorrelationOptions.Default;
        if (hamiltonian.IsRestricted && !hamiltonian.IsClosedShell)
            throw new OrbitariumInputException(
                $"Restricted MP2 needs a closed shell, but the reference has {hamiltonian.AlphaOccupiedCount} α and {hamiltonian.BetaOccupiedCount} β electrons: run a UHF reference (RunUhf) and ask for MP2 on it.");
        int m = hamiltonian.OrbitalCount;
        int nf = CheckFrozenCore(options.FrozenCoreOrbitals, hamiltonian.AlphaOccupiedCount, hamiltonian.BetaOccupiedCount);
        if (hamiltonian.IsRestricted)
        {
            int nocc = hamiltonian.AlphaOccupiedCount;
            var iajb = ExtractOvov(hamiltonian.EriAlphaAlphaArray, m, nf, nocc);
            return Restricted(iajb, hamiltonian.OrbitalEnergiesAlphaHartree.ToArray(), nf, nocc, m, hamiltonian.ReferenceEnergyHartree, cancellationToken);
        }
        int na = hamiltonian.AlphaOccupiedCount, nb = hamiltonian.BetaOccupiedCount;
        var aa = ExtractOvov(hamiltonian.EriAlphaAlphaArray, m, nf, na);
        var ab = ExtractOvovMixed(hamiltonian.EriAlphaBetaArray, m, nf, na, nb);
        var bb = ExtractOvov(hamiltonian.EriBetaBetaArray, m, nf, nb);
        return Unrestricted(aa, ab, bb, hamiltonian.OrbitalEnergiesAlphaHartree.ToArray(), hamiltonian.OrbitalEnergiesBetaHartree.ToArray(),
            nf, na, nb, m, hamiltonian.ReferenceEnergyHartree, cancellationToken);
    }

    internal static int CheckFrozenCore(int nf, int na, int nb)
    {
        if (nf < 0 || nf > Math.Min(na, nb))
            throw new OrbitariumInputException($"Cannot freeze {nf} core orbitals: the reference has only {Math.Min(na, nb)} doubly occupied orbitals; use a smaller frozen-core count.");
        return nf;
    }

    /// <summary>Closed-shell MP2 from (ia|jb) over active occupied i, j (o of them) and virtual a, b (v).</summary>
    /// <param name="iajb">o·v·o·v integrals (ia|jb), row-major.</param>
    /// <param name="energies">All m orbital energies.</param>
    /// <param name="nf">Frozen core count.</param>
    /// <param name="nocc">Occupied count (including frozen).</param>
    /// <param name="m">Orbital count.</param>
    /// <param name="reference">Reference energy.</param>
    /// <param name="ct">Cancellation.</param>
    internal static Mp2Result Restricted(double[] iajb, double[] energies, int nf, int nocc, int m, double reference, CancellationToken ct)
    {
        int o = nocc - nf, v = m - nocc;
        double os = 0, ss = 0;
        for (int i = 0; i < o; i++)
        {
            ct.ThrowIfCancellationRequested();
            double ei = energies[nf + i];
            for (int a = 0; a < v; a++)
            {
                double eia = ei - energies[nocc + a];
                for (int j = 0; j < o; j++)
                {
                    double eiaj = eia + energies[nf + j];
                    for (int b = 0; b < v; b++)
                    {
                        double x = iajb[((i * v + a) * o + j) * v + b];
                        double y = iajb[((i * v + b) * o + j) * v + a];
                        double d = eiaj - energies[nocc + b];
                        os += x * x / d;
                        ss += x * (x - y) / d;
                    }
                }
            }
        }
        return new Mp2Result("RHF", reference, ss, os, nf);
    }

    internal static Mp2Result Unrestricted(double[] aa, double[] ab, double[] bb, double[] ea, double[] eb, int nf, int na, int nb, int m,
        double reference, CancellationToken ct)
    {
        double ss = SameSpin(aa, ea, nf, na, m, ct) + SameSpin(bb, eb, nf, nb, m, ct);
        int oa = na - nf, va = m - na, ob = nb - nf, vb = m - nb;
        double os = 0;
        for (int i = 0; i < oa; i++)
        {
            ct.ThrowIfCancellationRequested();
            for (int a = 0; a < va; a++)
            {
                double eia = ea[nf + i] - ea[na + a];
                for (int j = 0; j < ob; j++)
                    for (int b = 0; b < vb; b++)
                    {
                        double x = ab[((i * va + a) * ob + j) * vb + b];
                        os += x * x / (eia + eb[nf + j] - eb[nb + b]);
                    }
            }
        }
        return new Mp2Result("UHF", reference, ss, os, nf);
    }

    private static double SameSpin(double[] iajb, double[] e, int nf, int nocc, int m, CancellationToken ct)
    {
        int o = nocc - nf, v = m - nocc;
        double s = 0;
        for (int i = 0; i < o; i++)
        {
            ct.ThrowIfCancellationRequested();
            for (int j = i + 1; j < o; j++)
                for (int a = 0; a < v; a++)
                    for (int b = a + 1; b < v; b++)
                    {
                        double x = iajb[((i * v + a) * o + j) * v + b] - iajb[((i * v + b) * o + j) * v + a];
                        s += x * x / (e[nf + i] + e[nf + j] - e[nocc + a] - e[nocc + b]);
                    }
        }
        return s;
    }

    /// <summary>(ia|jb) block of a same-spin m⁴ tensor: i, j in [nf, nocc), a, b in [nocc, m).</summary>
    internal static double[] ExtractOvov(double[] g, int m, int nf, int nocc)
    {
        int o = nocc - nf, v = m - nocc;
        var r = new double[o * v * o * v];
        for (int i = 0; i < o; i++)
            for (int a = 0; a < v; a++)
                for (int j = 0; j < o; j++)
                    for (int b = 0; b < v; b++)
                        r[((i * v + a) * o + j) * v + b] = g[MolecularOrbitalHamiltonian.Index(m, nf + i, nocc + a, nf + j, nocc + b)];
        return r;
    }

    private static double[] ExtractOvovMixed(double[] g, int m, int nf, int na, int nb)
    {
        int oa = na - nf, va = m - na, ob = nb - nf, vb = m - nb;
        var r = new double[oa * va * ob * vb];
        for (int i = 0; i < oa; i++)
            for (int a = 0; a < va; a++)
                for (int j = 0; j < ob; j++)
                    for (int b = 0; b < vb; b++)
                        r[((i * va + a) * ob + j) * vb + b] = g[MolecularOrbitalHamiltonian.Index(m, nf + i, na + a, nf + j, nb + b)];
        return r;
    }
}
