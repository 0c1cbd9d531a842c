using MathNet.Numerics.LinearAlgebra;
using Orbitarium.BasisSets;

using Orbitarium.Parallelism;

namespace Orbitarium.Integrals;

/// <summary>
/// Builds Coulomb and exchange matrices from a stored <see cref="ElectronRepulsionTensor"/> (in-core), visiting each
/// unique integral once and applying the 8-fold permutational symmetry; parallel over integral rows.
/// </summary>
public sealed class InCoreCoulombExchangeKernel : ICoulombExchangeKernel
{
    private readonly ElectronRepulsionTensor _tensor;

    /// <summary>Wraps a computed tensor.</summary>
    public InCoreCoulombExchangeKernel(ElectronRepulsionTensor tensor)
    {
        ArgumentNullException.ThrowIfNull(tensor);
        _tensor = tensor;
    }

    /// <inheritdoc />
    public MolecularBasis Basis => _tensor.Basis;

    /// <summary>The stored tensor.</summary>
    public ElectronRepulsionTensor Tensor => _tensor;

    /// <inheritdoc />
    public string Mode => FormattableString.Invariant($"in-core ({ElectronRepulsionTensor.EstimateBytes(_tensor.FunctionCount) / 1e6:F1} MB)");

    /// <inheritdoc />
    public CoulombExchangeMatrices Build(IReadOnlyList<Matrix<double>> densities, bool withExchange = true, CancellationToken cancellationToken = default)
    {
        int n = _tensor.FunctionCount;
        var dens = CoulombExchangeAccumulator.DensityArrays(densities, n);
        int m = n * (n + 1) / 2;
        var pi = new int[m]; var pj = new int[m];
        for (int i = 0, ij = 0; i < n; i++)
            for (int j = 0; j <= i; j++, ij++) { pi[ij] = i; pj[ij] = j; }
        var jTotal = CoulombExchangeAccumulator.Zeros(dens.Length, n);
        var kTotal = withExchange ? CoulombExchangeAccumulator.Zeros(dens.Length, n) : null;
        var tensor = _tensor;
        long bytesPerSet = (withExchange ? 16L : 8L) * dens.Length * n * n;
        var partials = FixedOrderParallel.For(m, FixedOrderParallel.SetCount(bytesPerSet),
            () => (CoulombExchangeAccumulator.Zeros(dens.Length, n), withExchange ? CoulombExchangeAccumulator.Zeros(dens.Length, n) : null),
            (index, acc) =>
            {
                int ij = m - 1 - index;
                var packed = tensor.Packed;
                int i = pi[ij], j = pj[ij];
                long rowStart = (long)ij * (ij + 1) / 2;
                double fij = i == j ? 0.5 : 1.0;
                for (int kl = 0; kl <= ij; kl++)
                {
                    double v = packed[(int)(rowStart + kl)];
                    if (v == 0) continue;
                    int k = pi[kl], l = pj[kl];
                    v *= fij;
                    if (k == l) v *= 0.5;
                    if (kl == ij) v *= 0.5;
                    CoulombExchangeAccumulator.Scatter(v, i, j, k, l, n, dens, acc.Item1, acc.Item2);
                }
            }, cancellationToken);
        foreach (var acc in partials)
        {
            CoulombExchangeAccumulator.AddInto(jTotal, acc.Item1);
            if (kTotal is not null && acc.Item2 is not null) CoulombExchangeAccumulator.AddInto(kTotal, acc.Item2);
        }
        return new CoulombExchangeMatrices(
            CoulombExchangeAccumulator.Symmetrised(jTotal, n),
            kTotal is null ? null : CoulombExchangeAccumulator.Symmetrised(kTotal, n));
    }
}
