using MathNet.Numerics.LinearAlgebra;
using Orbitarium.Integrals;

namespace Orbitarium.Scf;

/// <summary>
/// Incremental Fock build for integral-direct SCF: J and K are linear in the density, so after a first full build
/// each iteration contracts only the change ΔD = D − D_previous and adds J[ΔD], K[ΔD] to the stored matrices.
/// The direct kernel's density-weighted screening then skips more and more shell quartets as ΔD shrinks.
/// </summary>
/// <remarks>J. Almlöf, K. Faegri and K. Korsell, J. Comput. Chem. 3, 385 (1982); M. Häser and R. Ahlrichs,
/// J. Comput. Chem. 10, 104 (1989). Screening errors of the increments add up, so a full build is made every
/// <see cref="FullBuildInterval"/> iterations and whenever the driver asks for one (it does before accepting
/// convergence).</remarks>
internal sealed class IncrementalCoulombExchange(ICoulombExchangeKernel kernel, bool incremental)
{
    /// <summary>Incremental builds between two full builds.</summary>
    public const int FullBuildInterval = 8;

    private Matrix<double>[]? _densities;
    private CoulombExchangeMatrices? _matrices;
    private bool _withExchange;
    private int _incrementsSinceFullBuild;
    private bool _fullBuildRequested;

    /// <summary>Whether the last <see cref="Build"/> added increments to stored matrices (false: built in full).</summary>
    public bool LastBuildWasIncremental { get; private set; }

    /// <summary>Makes the next build a full one.</summary>
    public void RequestFullBuild() => _fullBuildRequested = true;

    /// <summary>J (and K) for the densities, incrementally when possible.</summary>
    public CoulombExchangeMatrices Build(IReadOnlyList<Matrix<double>> densities, bool withExchange, CancellationToken cancellationToken)
    {
        bool useIncrement = incremental && !_fullBuildRequested && _densities is not null && _matrices is not null
            && _incrementsSinceFullBuild < FullBuildInterval && _densities.Length == densities.Count && _withExchange == withExchange;
        CoulombExchangeMatrices result;
        if (useIncrement)
        {
            var deltas = new Matrix<double>[densities.Count];
            for (int i = 0; i < deltas.Length; i++) deltas[i] = densities[i] - _densities![i];
            var change = kernel.Build(deltas, withExchange, cancellationToken);
            var coulomb = new Matrix<double>[deltas.Length];
            var exchange = withExchange ? new Matrix<double>[deltas.Length] : null;
            for (int i = 0; i < deltas.Length; i++)
            {
                coulomb[i] = _matrices!.Coulomb[i] + change.Coulomb[i];
                if (exchange is not null) exchange[i] = _matrices.Exchange![i] + change.Exchange![i];
            }
            result = new CoulombExchangeMatrices(coulomb, exchange);
            _incrementsSinceFullBuild++;
        }
        else
        {
            result = kernel.Build(densities, withExchange, cancellationToken);
            _incrementsSinceFullBuild = 0;
        }
        _fullBuildRequested = false;
        LastBuildWasIncremental = useIncrement;
        if (incremental)
        {
            _densities = new Matrix<double>[densities.Count];
            for (int i = 0; i < densities.Count; i++) _densities[i] = densities[i].Clone();
            _matrices = result;
            _withExchange = withExchange;
        }
        return result;
    }
}
