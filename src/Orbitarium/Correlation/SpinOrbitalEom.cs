namespace Orbitarium.Correlation;

/// <summary>
/// EOM-CCSD on the spin-orbital CCSD equations: excitation energies of a UHF reference (all S_z-conserving states),
/// or the triplets of a closed-shell reference (the part odd under exchanging α and β).
/// </summary>
/// <remarks>
/// Same eigenproblem as <see cref="EomCcsd"/>: the lowest eigenvalues of the CCSD Jacobian, here of the
/// spin-orbital residual Ω = D·(t′ − t) of <see cref="CcsdAmplitudeSolver"/>, with products from the exact
/// <see cref="QuarticStencil"/>. Trial vectors are kept antisymmetric
/// (x_ij^ab = −x_ji^ab = −x_ij^ba) and S_z-conserving, and for triplets odd under α↔β. Memory (2m)⁴ as for
/// spin-orbital CCSD.
/// </remarks>
internal static class SpinOrbitalEom
{
    public static ExcitedStatesResult Run(MolecularOrbitalHamiltonian hamiltonian, int states, bool tripletsOfClosedShell,
        CorrelationOptions options, IProgress<CorrelationProgress>? progress, CancellationToken ct)
    {
        int nf = Mp2.CheckFrozenCore(options.FrozenCoreOrbitals, hamiltonian.AlphaOccupiedCount, hamiltonian.BetaOccupiedCount);
        int n = 2 * (hamiltonian.OrbitalCount - nf);
        int occupiedCount = hamiltonian.AlphaOccupiedCount + hamiltonian.BetaOccupiedCount - 2 * nf;
        double dim = occupiedCount * (double)(n - occupiedCount);
        MemoryEstimate.Require("EOM-CCSD", Ccsd.EstimateDoubles(n, occupiedCount, options.DiisVectors)
                + EomCcsd.SubspaceDoubles(states, dim + dim * dim), options,
            "use a smaller basis, freeze core orbitals (WithFrozenCore), ask for fewer states, or raise the budget (WithMemoryBudgetMebibytes).");
        var system = SpinOrbitalSystem.Build(hamiltonian, nf, ct);
        int o = system.Occupied, v = system.Virtual, size = system.Count;
        EomCcsd.RequireExcitations(o, v);
        var solver = new CcsdAmplitudeSolver(system);
        var ground = solver.Solve(options, progress, ct);
        EomCcsd.RequireConverged(ground);

        int n1 = o * v, n2 = o * o * v * v, dimension = n1 + n2;
        var beta = system.IsBeta;
        var d1 = new double[n1];
        for (int i = 0; i < o; i++)
            for (int a = 0; a < v; a++) d1[i * v + a] = system.Fock[i * size + i] - system.Fock[(o + a) * size + o + a];
        var diagonal = new double[dimension];
        for (int x = 0; x < n1; x++) diagonal[x] = -d1[x];
        for (int i = 0; i < o; i++)
            for (int j = 0; j < o; j++)
                for (int a = 0; a < v; a++)
                    for (int b = 0; b < v; b++)
                        diagonal[n1 + ((i * o + j) * v + a) * v + b] = -(d1[i * v + a] + d1[j * v + b]);
        // Spin partners (closed shells only): occupied α i ↔ β i + o/2, virtual likewise.
        int half = o / 2, halfV = v / 2;
        int PartnerOcc(int i) => i < half ? i + half : i - half;
        int PartnerVir(int a) => a < halfV ? a + halfV : a - halfV;

        var t1 = (double[])solver.T1.Clone();
        var t2 = (double[])solver.T2.Clone();
        void Multiply(double[] x, double[] sigma)
        {
            foreach (var (s, weight) in QuarticStencil.Points(x))
            {
                ct.ThrowIfCancellationRequested();
                var s1 = new double[n1];
                var s2 = new double[n2];
                for (int k = 0; k < n1; k++) s1[k] = t1[k] + s * x[k];
                for (int k = 0; k < n2; k++) s2[k] = t2[k] + s * x[n1 + k];
                solver.T1 = s1;
                solver.T2 = s2;
                // The spin-orbital update is t′ = t + Ω/D, so Ω = D·(t′ − t).
                var (u1, u2) = solver.Iterate(d1, ct);
                for (int k = 0; k < n1; k++) sigma[k] += weight * (u1[k] - s1[k]) * d1[k];
                for (int i = 0; i < o; i++)
                    for (int j = 0; j < o; j++)
                        for (int a = 0; a < v; a++)
                        {
                            int row = ((i * o + j) * v + a) * v;
                            double dia = d1[i * v + a];
                            for (int b = 0; b < v; b++)
                                sigma[n1 + row + b] += weight * (u2[row + b] - s2[row + b]) * (dia + d1[j * v + b]);
                        }
            }
            solver.T1 = t1;
            solver.T2 = t2;
        }

        void Project(double[] x)
        {
            // S_z: a single keeps the spin, a double keeps the spin count.
            for (int i = 0; i < o; i++)
                for (int a = 0; a < v; a++)
                    if (beta[i] != beta[o + a]) x[i * v + a] = 0;
            for (int i = 0; i < o; i++)
                for (int j = 0; j < o; j++)
                    for (int a = 0; a < v; a++)
                        for (int b = 0; b < v; b++)
                        {
                            int at = n1 + ((i * o + j) * v + a) * v + b;
                            int before = (beta[i] ? 1 : 0) + (beta[j] ? 1 : 0), after = (beta[o + a] ? 1 : 0) + (beta[o + b] ? 1 : 0);
                            if (before != after || i == j || a == b) { x[at] = 0; continue; }
                            if (j < i || b < a) continue;
                            // Antisymmetry: the four orderings carry one value.
                            double mean = 0.25 * (x[at] - x[n1 + ((j * o + i) * v + a) * v + b] - x[n1 + ((i * o + j) * v + b) * v + a]
                                + x[n1 + ((j * o + i) * v + b) * v + a]);
                            x[at] = mean;
                            x[n1 + ((j * o + i) * v + a) * v + b] = -mean;
                            x[n1 + ((i * o + j) * v + b) * v + a] = -mean;
                            x[n1 + ((j * o + i) * v + b) * v + a] = mean;
                        }
            if (!tripletsOfClosedShell) return;
            // Odd under α↔β: x − P x over pairs of partner elements.
            var copy = (double[])x.Clone();
            for (int i = 0; i < o; i++)
                for (int a = 0; a < v; a++)
                    x[i * v + a] = 0.5 * (copy[i * v + a] - copy[PartnerOcc(i) * v + PartnerVir(a)]);
            for (int i = 0; i < o; i++)
                for (int j = 0; j < o; j++)
                    for (int a = 0; a < v; a++)
                        for (int b = 0; b < v; b++)
                        {
                            int at = n1 + ((i * o + j) * v + a) * v + b;
                            int partner = n1 + ((PartnerOcc(i) * o + PartnerOcc(j)) * v + PartnerVir(a)) * v + PartnerVir(b);
                            x[at] = 0.5 * (copy[at] - copy[partner]);
                        }
        }

        var davidson = EomCcsd.Diagonalise(dimension, diagonal, Multiply, states, Project, options, progress, ct);
        return new ExcitedStatesResult("EOM-CCSD", tripletsOfClosedShell ? "triplet" : "unrestricted",
            system.ReferenceEnergyHartree + ground.Energy, [.. davidson.Eigenvalues], [], [], nf);
    }
}
