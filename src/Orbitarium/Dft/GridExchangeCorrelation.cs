using MathNet.Numerics.LinearAlgebra;
using Orbitarium.BasisSets;
using Orbitarium.Dft.Functionals;
using Orbitarium.Dft.Grids;
using Orbitarium.Scf;

using Orbitarium.Parallelism;

namespace Orbitarium.Dft;

/// <summary>
/// A functional integrated on a molecular grid: the Kohn–Sham exchange–correlation energy E_xc and matrices V_xc
/// handed to the SCF driver through <see cref="IExchangeCorrelationPotential"/>.
/// </summary>
/// <remarks>
/// Per batch of grid points (in parallel): the basis functions that reach the batch are evaluated (with gradients
/// for a GGA), ρ = Σ D_μν φ_μ φ_ν and ∇ρ are formed, the functional gives e, ∂e/∂ρ and ∂e/∂σ, and
/// V_μν += Σ_p w_p [∂e/∂ρ φ_μφ_ν + 2 ∂e/∂σ ∇ρ·∇(φ_μφ_ν)] (closed shell); for spin-polarised densities
/// V^α uses ∂e/∂ρα and (2 ∂e/∂σαα ∇ρα + ∂e/∂σαβ ∇ρβ). (Pople, Gill &amp; Johnson, Chem. Phys. Lett. 199, 557 (1992).)
/// The grid and the per-batch basis screening are built on first use for a basis and reused while the same basis
/// object is passed.
/// </remarks>
public sealed class GridExchangeCorrelation : IExchangeCorrelationPotential
{
    private readonly object _gate = new();
    private MolecularBasis? _cachedBasis;
    private MolecularGrid? _grid;
    private BatchBasis[]? _batchBases;

    /// <summary>Integrates <paramref name="functional"/> on grids of a named level.</summary>
    public GridExchangeCorrelation(ExchangeCorrelationFunctional functional, GridLevel level = GridLevel.Default)
        : this(functional, GridSpecification.ForLevel(level), level) { }

    /// <summary>Integrates <paramref name="functional"/> on grids of custom sizes.</summary>
    public GridExchangeCorrelation(ExchangeCorrelationFunctional functional, GridSpecification specification)
        : this(functional, specification.Validated(), null) { }

    private GridExchangeCorrelation(ExchangeCorrelationFunctional functional, GridSpecification specification, GridLevel? level)
    {
        ArgumentNullException.ThrowIfNull(functional);
        ArgumentNullException.ThrowIfNull(specification);
        Functional = functional;
        Specification = specification;
        Level = level;
    }

    /// <summary>The functional.</summary>
    public ExchangeCorrelationFunctional Functional { get; }

    /// <summary>The grid sizes.</summary>
    public GridSpecification Specification { get; }

    /// <summary>The named grid level, or null for custom sizes.</summary>
    public GridLevel? Level { get; }

    /// <inheritdoc />
    public string Name => Functional.Name;

    /// <inheritdoc />
    public double ExactExchangeFraction => Functional.ExactExchangeFraction;

    /// <summary>The grid of the last evaluation (null before the first).</summary>
    public MolecularGrid? Grid => _grid;

    /// <summary>The result of the last evaluation (null before the first); the SCF driver's last call is on the
    /// final density.</summary>
    public ExchangeCorrelationContribution? LastContribution { get; private set; }

    /// <summary>Builds (or reuses) the grid and basis screening for <paramref name="basis"/>.</summary>
    public MolecularGrid GridFor(MolecularBasis basis, CancellationToken cancellationToken = default) =>
        GridAndBatches(basis, cancellationToken).Grid;

    // Grid and screening read together under the lock, so concurrent evaluations at different geometries (parallel
    // finite differences) never pair one geometry's grid with another's screening.
    private (MolecularGrid Grid, BatchBasis[] Batches) GridAndBatches(MolecularBasis basis, CancellationToken cancellationToken)
    {
        ArgumentNullException.ThrowIfNull(basis);
        lock (_gate)
        {
            if (!ReferenceEquals(basis, _cachedBasis) || _grid is null || _batchBases is null)
            {
                var grid = Level is GridLevel level
                    ? MolecularGrid.Create(basis.Molecule, level, cancellationToken)
                    : MolecularGrid.Create(basis.Molecule, Specification, cancellationToken);
                _batchBases = BatchBasis.ForGrid(basis, grid);
                _grid = grid;
                _cachedBasis = basis;
            }
            return (_grid, _batchBases);
        }
    }

    /// <inheritdoc />
    public ExchangeCorrelationContribution Evaluate(MolecularBasis basis, Matrix<double> densityAlpha, Matrix<double> densityBeta,
        bool spinPolarized, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(basis);
        ArgumentNullException.ThrowIfNull(densityAlpha);
        ArgumentNullException.ThrowIfNull(densityBeta);
        int n = basis.FunctionCount;
        if (densityAlpha.RowCount != n || densityAlpha.ColumnCount != n || densityBeta.RowCount != n || densityBeta.ColumnCount != n)
            throw new ArgumentException($"Density matrices must be {n}x{n} for this basis; got {densityAlpha.RowCount}x{densityAlpha.ColumnCount} and {densityBeta.RowCount}x{densityBeta.ColumnCount}.");
        var (grid, batchBases) = GridAndBatches(basis, cancellationToken);
        var da = densityAlpha.ToArray();
        var db = densityBeta.ToArray();
        int maxFunctions = 0;
        foreach (var bb in batchBases) maxFunctions = Math.Max(maxFunctions, bb.Functions.Length);
        // Fixed interleaved batch sets reduced in order: the same run repeats to the last bit (FixedOrderParallel).
        var totals = FixedOrderParallel.For(grid.Batches.Length,
            FixedOrderParallel.SetCount((spinPolarized ? 16L : 8L) * n * n),
            () => new BatchWorkspace(n, maxFunctions, spinPolarized, Functional.IsGradientCorrected),
            (b, ws) =>
            {
                var bb = batchBases[b];
                if (bb.Basis is not null) ws.Process(grid, grid.Batches[b], bb, Functional, da, db);
            }, cancellationToken);
        var va = new double[n, n];
        var vb = spinPolarized ? new double[n, n] : va;
        double energy = 0, electrons = 0;
        foreach (var ws in totals)
        {
            energy += ws.Energy;
            electrons += ws.Electrons;
            for (int i = 0; i < n; i++)
                for (int j = 0; j < n; j++)
                {
                    va[i, j] += ws.PotentialA[i * n + j];
                    if (spinPolarized) vb[i, j] += ws.PotentialB![i * n + j];
                }
        }
        var mva = Matrix<double>.Build.DenseOfArray(va);
        var mvb = spinPolarized ? Matrix<double>.Build.DenseOfArray(vb) : mva;
        int expected = basis.Molecule.ElectronCount;
        string description = FormattableString.Invariant(
            $"{Functional.Name} on {grid.Description}; integrated electrons {electrons:F6} (error {electrons - expected:+0.0E+00;-0.0E+00})");
        var contribution = new ExchangeCorrelationContribution(energy, mva, mvb, electrons, description);
        LastContribution = contribution;
        return contribution;
    }

    /// <inheritdoc />
    public override string ToString() => $"{Functional.Name} on a {(Level?.ToString() ?? Specification.ToString())} grid";
}
