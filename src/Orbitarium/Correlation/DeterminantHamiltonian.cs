namespace Orbitarium.Correlation;

/// <summary>
/// The Hamiltonian in the space of α/β string products (Slater determinants) of an active space, applied to a vector
/// with the Knowles–Handy factorisation σ = Σ_pq E_pq [k_pq c + ½ Σ_rs (pq|rs) E_rs c], k_pq = h_pq − ½ Σ_r (pr|rq).
/// </summary>
/// <remarks>P. J. Knowles and N. C. Handy, Chem. Phys. Lett. 111, 315 (1984). Vectors are indexed I_α·N_β + I_β.</remarks>
internal sealed class DeterminantHamiltonian
{
    private readonly int _n;
    private readonly double[] _h;
    private readonly double[] _g;
    private readonly double[] _k;
    private readonly int[]? _excitation;
    private readonly int _maxExcitation;

    public DeterminantHamiltonian(int orbitals, int alphaElectrons, int betaElectrons, double[] h, double[] g, double coreEnergy, int maxExcitation)
    {
        _n = orbitals;
        _h = h;
        _g = g;
        CoreEnergy = coreEnergy;
        Alpha = new DeterminantStrings(orbitals, alphaElectrons);
        Beta = new DeterminantStrings(orbitals, betaElectrons);
        int n = orbitals;
        _k = new double[n * n];
        for (int p = 0; p < n; p++)
            for (int q = 0; q < n; q++)
            {
                double v = h[p * n + q];
                for (int r = 0; r < n; r++) v -= 0.5 * g[MolecularOrbitalHamiltonian.Index(n, p, r, r, q)];
                _k[p * n + q] = v;
            }
        _maxExcitation = maxExcitation;
        if (maxExcitation < alphaElectrons + betaElectrons)
        {
            _excitation = new int[Dimension];
            int refA = (1 << alphaElectrons) - 1, refB = (1 << betaElectrons) - 1;
            for (int ia = 0; ia < Alpha.Count; ia++)
                for (int ib = 0; ib < Beta.Count; ib++)
                    _excitation[ia * Beta.Count + ib] = System.Numerics.BitOperations.PopCount((uint)(Alpha.Masks[ia] & ~refA))
                        + System.Numerics.BitOperations.PopCount((uint)(Beta.Masks[ib] & ~refB));
        }
        Diagonal = BuildDiagonal();
    }

    public DeterminantStrings Alpha { get; }
    public DeterminantStrings Beta { get; }
    public int Dimension => Alpha.Count * Beta.Count;
    public double CoreEnergy { get; }

    /// <summary>Diagonal elements without the core energy; excluded determinants (truncated CI) get +1e6.</summary>
    public double[] Diagonal { get; }

    public static double Doubles(int orbitals, int alphaElectrons, int betaElectrons, int vectors)
    {
        double dim = DeterminantStrings.Binomial(orbitals, alphaElectrons) * DeterminantStrings.Binomial(orbitals, betaElectrons);
        return dim * (2.0 * orbitals * orbitals + vectors);
    }

    public bool Included(int index) => _excitation is null || _excitation[index] <= _maxExcitation;

    private double[] BuildDiagonal()
    {
        int n = _n;
        var d = new double[Dimension];
        double Own(int mask)
        {
            double e = 0;
            for (int i = 0; i < n; i++)
            {
                if ((mask & (1 << i)) == 0) continue;
                e += _h[i * n + i];
                for (int j = 0; j < n; j++)
                    if ((mask & (1 << j)) != 0)
                        e += 0.5 * (_g[MolecularOrbitalHamiltonian.Index(n, i, i, j, j)] - _g[MolecularOrbitalHamiltonian.Index(n, i, j, j, i)]);
            }
            return e;
        }
        var ea = Alpha.Masks.Select(Own).ToArray();
        var eb = Beta.Masks.Select(Own).ToArray();
        for (int ia = 0; ia < Alpha.Count; ia++)
            for (int ib = 0; ib < Beta.Count; ib++)
            {
                double e = ea[ia] + eb[ib];
                int ma = Alpha.Masks[ia], mb = Beta.Masks[ib];
                for (int i = 0; i < n; i++)
                    if ((ma & (1 << i)) != 0)
                        for (int j = 0; j < n; j++)
                            if ((mb & (1 << j)) != 0)
                                e += _g[MolecularOrbitalHamiltonian.Index(n, i, i, j, j)];
                int index = ia * Beta.Count + ib;
                d[index] = Included(index) ? e : 1e6;
            }
        return d;
    }

    /// <summary>D[pq] = E_pq c (spin-summed), n² vectors of the CI dimension.</summary>
    public double[][] ApplyReplacements(double[] c)
    {
        int n = _n, nb = Beta.Count, na = Alpha.Count;
        var d = new double[n * n][];
        for (int pq = 0; pq < n * n; pq++) d[pq] = new double[Dimension];
        var A = Alpha;
        var B = Beta;
        // α: every (pq, I_α) is reached from one J_α only, so rows are written without conflict.
        Parallel.For(0, na, ja =>
        {
            var src = c.AsSpan(ja * nb, nb);
            for (int e = ja * A.PerString; e < (ja + 1) * A.PerString; e++)
                MolecularIntegralTransformation.Axpy(A.Sign[e], src, d[A.Pq[e]].AsSpan(A.Target[e] * nb, nb));
        });
        Parallel.For(0, na, ia =>
        {
            int row = ia * nb;
            for (int jb = 0; jb < nb; jb++)
            {
                double cj = c[row + jb];
                if (cj == 0) continue;
                for (int e = jb * B.PerString; e < (jb + 1) * B.PerString; e++)
                    d[B.Pq[e]][row + B.Target[e]] += B.Sign[e] * cj;
            }
        });
        return d;
    }

    /// <summary>σ = H c (without the core energy; projected onto the truncated space when there is one).</summary>
    public void Multiply(double[] input, double[] sigma)
    {
        int n = _n, nn = n * n, nb = Beta.Count, na = Alpha.Count;
        var c = input;
        if (_excitation is not null)
        {
            c = (double[])input.Clone();
            for (int i = 0; i < c.Length; i++) if (!Included(i)) c[i] = 0;
        }
        var d = ApplyReplacements(c);
        var gvec = new double[nn][];
        Parallel.For(0, nn, pq =>
        {
            var row = new double[Dimension];
            MolecularIntegralTransformation.Axpy(_k[pq], c, row);
            for (int rs = 0; rs < nn; rs++)
            {
                double v = 0.5 * _g[pq * nn + rs];
                if (v != 0) MolecularIntegralTransformation.Axpy(v, d[rs], row);
            }
            gvec[pq] = row;
        });
        var A = Alpha;
        var B = Beta;
        // σ[I] = Σ_pq ⟨I|E_pq|K⟩ G_pq[K]; ⟨I|E_pq|K⟩ = ⟨K|E_qp|I⟩, so walk the replacement list of I.
        Parallel.For(0, na, ia =>
        {
            var dst = sigma.AsSpan(ia * nb, nb);
            for (int e = ia * A.PerString; e < (ia + 1) * A.PerString; e++)
            {
                int qp = A.Pq[e];
                int pq = (qp % n) * n + qp / n;
                MolecularIntegralTransformation.Axpy(A.Sign[e], gvec[pq].AsSpan(A.Target[e] * nb, nb), dst);
            }
            int row = ia * nb;
            for (int ib = 0; ib < nb; ib++)
            {
                double s = 0;
                for (int e = ib * B.PerString; e < (ib + 1) * B.PerString; e++)
                {
                    int qp = B.Pq[e];
                    int pq = (qp % n) * n + qp / n;
                    s += B.Sign[e] * gvec[pq][row + B.Target[e]];
                }
                sigma[row + ib] += s;
            }
        });
        if (_excitation is not null)
            for (int i = 0; i < sigma.Length; i++) if (!Included(i)) sigma[i] = 1e6 * input[i];
    }

    /// <summary>⟨c|S²|c⟩ for a normalised vector: S_z(S_z + 1) + N_β − Σ_pq ⟨c|E^α_pq E^β_qp|c⟩.</summary>
    public double SpinSquared(double[] c)
    {
        int n = _n, nb = Beta.Count;
        double sz = 0.5 * (Alpha.Electrons - Beta.Electrons);
        double cross = 0;
        var A = Alpha;
        var B = Beta;
        for (int ja = 0; ja < A.Count; ja++)
            for (int e = ja * A.PerString; e < (ja + 1) * A.PerString; e++)
            {
                int pq = A.Pq[e];
                int qp = (pq % n) * n + pq / n;
                int ia = A.Target[e];
                double sa = A.Sign[e];
                for (int jb = 0; jb < nb; jb++)
                {
                    double cj = c[ja * nb + jb];
                    if (cj == 0) continue;
                    int eb = B.Lookup[jb * n * n + qp];
                    if (eb < 0) continue;
                    cross += c[ia * nb + B.Target[eb]] * sa * B.Sign[eb] * cj;
                }
            }
        return sz * (sz + 1) + Beta.Electrons - cross;
    }

    /// <summary>⟨bra| Σ_pq x_pq E_pq |ket⟩ for a one-electron operator x (n×n).</summary>
    public double OneElectronTransition(double[] bra, double[] ket, double[] x)
    {
        int nb = Beta.Count;
        double s = 0;
        var A = Alpha;
        var B = Beta;
        for (int ja = 0; ja < A.Count; ja++)
            for (int e = ja * A.PerString; e < (ja + 1) * A.PerString; e++)
            {
                double w = x[A.Pq[e]] * A.Sign[e];
                if (w == 0) continue;
                s += w * MolecularIntegralTransformation.Dot(bra.AsSpan(A.Target[e] * nb, nb), ket.AsSpan(ja * nb, nb));
            }
        for (int ia = 0; ia < A.Count; ia++)
            for (int jb = 0; jb < nb; jb++)
            {
                double kj = ket[ia * nb + jb];
                if (kj == 0) continue;
                for (int e = jb * B.PerString; e < (jb + 1) * B.PerString; e++)
                    s += x[B.Pq[e]] * B.Sign[e] * kj * bra[ia * nb + B.Target[e]];
            }
        return s;
    }
}
