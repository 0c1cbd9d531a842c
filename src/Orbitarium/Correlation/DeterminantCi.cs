namespace Orbitarium.Correlation;

/// <summary>Shared driver of <see cref="FullCi"/> and <see cref="Cisd"/>.</summary>
internal static class DeterminantCi
{
    public const int MaximumActiveOrbitals = 24;

    public static ConfigurationInteractionResult Run(string method, MolecularOrbitalHamiltonian hamiltonian, int roots, int maxExcitation,
        CorrelationOptions? options, IProgress<CorrelationProgress>? progress, CancellationToken ct)
    {
        ArgumentNullException.ThrowIfNull(hamiltonian);
        options ??= CorrelationOptions.Default;
        int m = hamiltonian.OrbitalCount, nf = options.FrozenCoreOrbitals;
        Mp2.CheckFrozenCore(nf, hamiltonian.AlphaOccupiedCount, hamiltonian.BetaOccupiedCount);
        int n = m - nf, ka = hamiltonian.AlphaOccupiedCount - nf, kb = hamiltonian.BetaOccupiedCount - nf;
        if (n > MaximumActiveOrbitals)
            throw new OrbitariumInputException(
                $"{method} is limited to {MaximumActiveOrbitals} active orbitals, but this system has {n}: use a smaller basis or freeze core orbitals (WithFrozenCore).");
        double dim = DeterminantStrings.Binomial(n, ka) * DeterminantStrings.Binomial(n, kb);
        if (roots < 1 || roots > dim)
            throw new OrbitariumInputException($"{method} can give between 1 and {dim} roots for this system, {roots} were asked for.");
        MemoryEstimate.Require(method + $" ({dim:N0} determinants)", DeterminantHamiltonian.Doubles(n, ka, kb, 2 * Math.Max(8 * roots, 24) + 4) + (double)n * n * n * n,
            options, "use fewer orbitals (a smaller basis or frozen core) or raise the budget (WithMemoryBudgetMebibytes).");

        // Active-space Hamiltonian over the α orbitals (full CI is invariant to the orbital choice).
        var h = hamiltonian.CoreAlphaArray;
        var g = hamiltonian.EriAlphaAlphaArray;
        double core = hamiltonian.NuclearRepulsionEnergyHartree;
        for (int c = 0; c < nf; c++)
        {
            core += 2 * h[c * m + c];
            for (int d = 0; d < nf; d++)
                core += 2 * g[MolecularOrbitalHamiltonian.Index(m, c, c, d, d)] - g[MolecularOrbitalHamiltonian.Index(m, c, d, d, c)];
        }
        var hAct = new double[n * n];
        for (int p = 0; p < n; p++)
            for (int q = 0; q < n; q++)
            {
                double v = h[(p + nf) * m + q + nf];
                for (int c = 0; c < nf; c++)
                    v += 2 * g[MolecularOrbitalHamiltonian.Index(m, p + nf, q + nf, c, c)] - g[MolecularOrbitalHamiltonian.Index(m, p + nf, c, c, q + nf)];
                hAct[p * n + q] = v;
            }
        var gAct = new double[n * n * n * n];
        for (int p = 0; p < n; p++)
            for (int q = 0; q < n; q++)
                for (int r = 0; r < n; r++)
                    for (int s = 0; s < n; s++)
                        gAct[MolecularOrbitalHamiltonian.Index(n, p, q, r, s)] = g[MolecularOrbitalHamiltonian.Index(m, p + nf, q + nf, r + nf, s + nf)];
        var ci = new DeterminantHamiltonian(n, ka, kb, hAct, gAct, core, maxExcitation);
        IProgress<CorrelationProgress>? shifted = progress is null ? null : new ShiftedProgress(progress, core);
        var result = DavidsonSolver.Solve(ci.Dimension, ci.Diagonal, ci.Multiply, roots, options, shifted, ct, method);
        var energies = result.Eigenvalues.Select(e => e + core).ToArray();
        var s2 = result.Eigenvectors.Select(ci.SpinSquared).ToArray();
        var strengths = new List<double>();
        var dip = hamiltonian.DipoleAlphaArrays;
        if (dip is not null)
        {
            var dAct = new double[3][];
            for (int k = 0; k < 3; k++)
            {
                dAct[k] = new double[n * n];
                for (int p = 0; p < n; p++)
                    for (int q = 0; q < n; q++)
                        dAct[k][p * n + q] = dip[k][(p + nf) * m + q + nf];
            }
            for (int r = 1; r < roots; r++)
            {
                double sum = 0;
                for (int k = 0; k < 3; k++)
                {
                    double t = ci.OneElectronTransition(result.Eigenvectors[0], result.Eigenvectors[r], dAct[k]);
                    sum += t * t;
                }
                strengths.Add(2.0 / 3.0 * (energies[r] - energies[0]) * sum);
            }
        }
        return new ConfigurationInteractionResult(method, hamiltonian.ReferenceEnergyHartree, [.. energies], [.. s2], [.. strengths],
            ci.Dimension, result.Iterations, result.Converged, result.StopReason,
            [.. result.LowestEigenvalueHistory.Select(e => e + core)], result.ResidualHistory, nf);
    }

    private sealed class ShiftedProgress(IProgress<CorrelationProgress> inner, double shift) : IProgress<CorrelationProgress>
    {
        public void Report(CorrelationProgress value) => inner.Report(value with { EnergyHartree = value.EnergyHartree + shift });
    }
}
