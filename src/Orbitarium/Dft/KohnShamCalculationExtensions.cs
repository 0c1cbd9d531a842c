using Orbitarium.Dft.Functionals;
using Orbitarium.Dft.Grids;
using Orbitarium.Scf;

namespace Orbitarium.Dft;

/// <summary>
/// Kohn–Sham DFT entries on a <see cref="Calculation"/>: <c>molecule.WithBasis("6-31G*").RunRks("b3lyp")</c>,
/// <c>calc.RunUks("pbe0", GridLevel.Fine)</c>.
/// </summary>
/// <remarks>Kohn &amp; Sham, Phys. Rev. 140, A1133 (1965). The SCF driver (DIIS, guesses, level shift, in-core or direct
/// J) is the Hartree–Fock one; exact exchange K is built only when the functional has a non-zero exact-exchange
/// fraction.</remarks>
public static class KohnShamCalculationExtensions
{
    /// <summary>Runs restricted (closed-shell) Kohn–Sham with a functional given by name or formula.</summary>
    /// <param name="calculation">Molecule, basis and SCF options.</param>
    /// <param name="functional">A registered name (b3lyp, pbe, pbe0, svwn5, blyp, …) or a formula such as
    /// "0.75*pbex + 0.25*hf + pbec". Default "b3lyp".</param>
    /// <param name="grid">Grid level (default <see cref="GridLevel.Default"/>).</param>
    /// <param name="progress">Receives each SCF iteration.</param>
    /// <param name="cancellationToken">Stops the run.</param>
    /// <exception cref="OrbitariumInputException">Unknown functional, or an open-shell molecule (use <see cref="RunUks(Calculation, string, GridLevel, IProgress{ScfIteration}?, CancellationToken)"/>).</exception>
    public static KohnShamResult RunRks(this Calculation calculation, string functional = "b3lyp", GridLevel grid = GridLevel.Default,
        IProgress<ScfIteration>? progress = null, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(functional);
        return calculation.RunRks(FunctionalRegistry.Get(functional), grid, progress, cancellationToken);
    }

    /// <summary>Runs restricted Kohn–Sham with a functional object (e.g. one made with <see cref="ExchangeCorrelationFunctional.Parse"/>).</summary>
    public static KohnShamResult RunRks(this Calculation calculation, ExchangeCorrelationFunctional functional, GridLevel grid = GridLevel.Default,
        IProgress<ScfIteration>? progress = null, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(functional);
        return calculation.RunKohnSham(functional, new GridExchangeCorrelation(functional, grid), ScfReference.Restricted, progress, cancellationToken);
    }

    /// <summary>Runs unrestricted (spin-polarised) Kohn–Sham with a functional given by name or formula.</summary>
    /// <param name="calculation">Molecule, basis and SCF options.</param>
    /// <param name="functional">A registered name or formula; default "b3lyp".</param>
    /// <param name="grid">Grid level (default <see cref="GridLevel.Default"/>).</param>
    /// <param name="progress">Receives each SCF iteration.</param>
    /// <param name="cancellationToken">Stops the run.</param>
    public static KohnShamResult RunUks(this Calculation calculation, string functional = "b3lyp", GridLevel grid = GridLevel.Default,
        IProgress<ScfIteration>? progress = null, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(functional);
        return calculation.RunUks(FunctionalRegistry.Get(functional), grid, progress, cancellationToken);
    }

    /// <summary>Runs unrestricted Kohn–Sham with a functional object.</summary>
    public static KohnShamResult RunUks(this Calculation calculation, ExchangeCorrelationFunctional functional, GridLevel grid = GridLevel.Default,
        IProgress<ScfIteration>? progress = null, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(functional);
        return calculation.RunKohnSham(functional, new GridExchangeCorrelation(functional, grid), ScfReference.Unrestricted, progress, cancellationToken);
    }

    /// <summary>Runs Kohn–Sham with a functional on a grid of custom sizes.</summary>
    /// <param name="calculation">Molecule, basis and SCF options.</param>
    /// <param name="functional">The functional.</param>
    /// <param name="grid">Grid sizes.</param>
    /// <param name="reference">Restricted or unrestricted.</param>
    /// <param name="progress">Receives each SCF iteration.</param>
    /// <param name="cancellationToken">Stops the run.</param>
    public static KohnShamResult RunKohnSham(this Calculation calculation, ExchangeCorrelationFunctional functional, GridSpecification grid,
        ScfReference reference = ScfReference.Restricted, IProgress<ScfIteration>? progress = null, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(functional);
        ArgumentNullException.ThrowIfNull(grid);
        return calculation.RunKohnSham(functional, new GridExchangeCorrelation(functional, grid), reference, progress, cancellationToken);
    }

    private static KohnShamResult RunKohnSham(this Calculation calculation, ExchangeCorrelationFunctional functional, GridExchangeCorrelation xc,
        ScfReference reference, IProgress<ScfIteration>? progress, CancellationToken cancellationToken)
    {
        ArgumentNullException.ThrowIfNull(calculation);
        if (reference == ScfReference.RestrictedOpenShell)
            throw new OrbitariumInputException("Restricted open-shell Kohn–Sham is not available; use RunUks for open shells.");
        if (reference == ScfReference.Restricted && calculation.Molecule.Multiplicity != 1)
            throw new OrbitariumInputException($"Restricted Kohn–Sham needs a closed shell, but the molecule has multiplicity {calculation.Molecule.Multiplicity}; use RunUks.");
        var scf = calculation.WithOptions(o => o with { ExchangeCorrelation = xc }).Run(reference, progress, cancellationToken);
        var last = xc.LastContribution;
        double electrons = last?.IntegratedElectronCount ?? double.NaN;
        return new KohnShamResult(scf, functional, xc.Grid!, electrons);
    }
}
