namespace Orbitarium.Correlation;

/// <summary>
/// The active spin orbitals of a reference with antisymmetrised integrals ⟨pq||rs⟩ and the Fock matrix, for the
/// spin-orbital coupled-cluster and CI codes. Order: occupied α, occupied β, virtual α, virtual β (frozen core removed).
/// </summary>
internal sealed class SpinOrbitalSystem
{
    private SpinOrbitalSystem(int n, int o, double[] fock, double[] v, int[] spatial, bool[] isBeta, double reference)
    {
        Count = n;
        Occupied = o;
        Fock = fock;
        Antisymmetrized = v;
        Spatial = spatial;
        IsBeta = isBeta;
        ReferenceEnergyHartree = reference;
    }

    /// <summary>Active spin orbitals n.</summary>
    public int Count { get; }

    /// <summary>Occupied active spin orbitals o.</summary>
    public int Occupied { get; }

    /// <summary>Virtual spin orbitals v = n − o.</summary>
    public int Virtual => Count - Occupied;

    /// <summary>Fock matrix n×n.</summary>
    public double[] Fock { get; }

    /// <summary>⟨pq||rs⟩ = ⟨pq|rs⟩ − ⟨pq|sr⟩, n⁴ row-major.</summary>
    public double[] Antisymmetrized { get; }

    /// <summary>Spatial orbital of each spin orbital.</summary>
    public int[] Spatial { get; }

    /// <summary>Spin of each spin orbital.</summary>
    public bool[] IsBeta { get; }

    /// <summary>Reference energy, hartree.</summary>
    public double ReferenceEnergyHartree { get; }

    /// <summary>Number of doubles the system holds (for memory checks).</summary>
    public static double Doubles(int n) => (double)n * n * n * n + 2.0 * n * n;

    /// <summary>Builds the active spin-orbital system; the Fock matrix includes the frozen core.</summary>
    public static SpinOrbitalSystem Build(MolecularOrbitalHamiltonian h, int frozenCore, CancellationToken ct)
    {
        int m = h.OrbitalCount, na = h.AlphaOccupiedCount, nb = h.BetaOccupiedCount, nf = frozenCore;
        var order = new List<(int P, bool Beta)>();
        for (int p = nf; p < na; p++) order.Add((p, false));
        for (int p = nf; p < nb; p++) order.Add((p, true));
        int o = order.Count;
        for (int p = na; p < m; p++) order.Add((p, false));
        for (int p = nb; p < m; p++) order.Add((p, true));
        int n = order.Count;
        var spatial = new int[n];
        var beta = new bool[n];
        for (int p = 0; p < n; p++) (spatial[p], beta[p]) = order[p];
        var fa = h.FockMatrix(false);
        var fb = h.IsRestricted && na == nb ? fa : h.FockMatrix(true);
        var fock = new double[n * n];
        for (int p = 0; p < n; p++)
            for (int q = 0; q < n; q++)
                if (beta[p] == beta[q])
                    fock[p * n + q] = (beta[p] ? fb : fa)[spatial[p] * m + spatial[q]];
        var aa = h.EriAlphaAlphaArray;
        var ab = h.EriAlphaBetaArray;
        var bb = h.EriBetaBetaArray;
        var v = new double[(long)n * n * n * n];
        Parallel.For(0, n, new ParallelOptions { CancellationToken = ct }, p =>
        {
            for (int q = 0; q < n; q++)
                for (int r = 0; r < n; r++)
                {
                    int baseIndex = ((p * n + q) * n + r) * n;
                    for (int s = 0; s < n; s++)
                        v[baseIndex + s] = Physicist(p, q, r, s) - Physicist(p, q, s, r);
                }
        });
        return new SpinOrbitalSystem(n, o, fock, v, spatial, beta, h.ReferenceEnergyHartree);

        // ⟨pq|rs⟩ = (pr|qs) with spin integration.
        double Physicist(int p, int q, int r, int s)
        {
            if (beta[p] != beta[r] || beta[q] != beta[s]) return 0;
            int P = spatial[p], Q = spatial[q], R = spatial[r], S = spatial[s];
            if (!beta[p] && !beta[q]) return aa[MolecularOrbitalHamiltonian.Index(m, P, R, Q, S)];
            if (beta[p] && beta[q]) return bb[MolecularOrbitalHamiltonian.Index(m, P, R, Q, S)];
            if (!beta[p]) return ab[MolecularOrbitalHamiltonian.Index(m, P, R, Q, S)];
            return ab[MolecularOrbitalHamiltonian.Index(m, Q, S, P, R)];
        }
    }
}
