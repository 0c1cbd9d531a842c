using System.Globalization;
using System.Text;
using Orbitarium.Chemistry;
using Orbitarium.Dft.Functionals;
using Orbitarium.Dft.Grids;
using Orbitarium.Scf;

namespace Orbitarium.Dft;

/// <summary>
/// The outcome of a Kohn–Sham calculation: the SCF result (energies, orbitals, densities, history, stop reason)
/// plus the functional, the grid (level, point count) and the integrated electron count with its error.
/// </summary>
/// <remarks>Immutable. A result that is not <see cref="Converged"/> holds the last energy and must not be used as a
/// converged one.</remarks>
public sealed class KohnShamResult
{
    internal KohnShamResult(ScfResult scf, ExchangeCorrelationFunctional functional, MolecularGrid grid, double integratedElectrons)
    {
        Scf = scf;
        Functional = functional;
        Grid = grid;
        IntegratedElectronCount = integratedElectrons;
    }

    /// <summary>The underlying SCF result.</summary>
    public ScfResult Scf { get; }

    /// <summary>The molecule (same as <c>Scf.Molecule</c>).</summary>
    public Molecule Molecule => Scf.Molecule;

    /// <summary>Lets a Kohn–Sham result go wherever an <see cref="ScfResult"/> is taken (fields, populations, bond
    /// orders, plots, correlation): it converts to its <see cref="Scf"/> part.</summary>
    /// <param name="result">The Kohn–Sham result.</param>
    public static implicit operator ScfResult(KohnShamResult result)
    {
        ArgumentNullException.ThrowIfNull(result);
        return result.Scf;
    }

    /// <summary>The functional.</summary>
    public ExchangeCorrelationFunctional Functional { get; }

    /// <summary>The molecular grid used.</summary>
    public MolecularGrid Grid { get; }

    /// <summary>The named grid level, or null for custom sizes.</summary>
    public GridLevel? GridLevel => Grid.Level;

    /// <summary>Number of grid points.</summary>
    public int GridPointCount => Grid.PointCount;

    /// <summary>Whether the SCF converged.</summary>
    public bool Converged => Scf.Converged;

    /// <summary>Total Kohn–Sham energy, hartree.</summary>
    public double TotalEnergyHartree => Scf.TotalEnergyHartree;

    /// <summary>The semi-local exchange–correlation energy E_xc from the grid, hartree (exact exchange is in the
    /// two-electron energy).</summary>
    public double ExchangeCorrelationEnergyHartree => Scf.ExchangeCorrelationEnergyHartree;

    /// <summary>∫ρ on the grid for the final density.</summary>
    public double IntegratedElectronCount { get; }

    /// <summary>∫ρ − N: the grid's integration error on the density (electrons).</summary>
    public double ElectronCountError => IntegratedElectronCount - Scf.Molecule.ElectronCount;

    /// <summary>"RKS/B3LYP" or "UKS/B3LYP".</summary>
    public string MethodName => Scf.MethodName;

    /// <summary>A short readable summary.</summary>
    public string Summary()
    {
        var c = CultureInfo.InvariantCulture;
        var sb = new StringBuilder();
        sb.Append(c, $"{MethodName}/{Scf.Basis.Name}  {Scf.Molecule.Formula}\n");
        sb.Append(c, $"  {Scf.ConvergenceDescription}\n");
        sb.Append(c, $"  total energy          {TotalEnergyHartree,20:F10} Eh\n");
        sb.Append(c, $"  exchange-correlation  {ExchangeCorrelationEnergyHartree,20:F10} Eh   (exact exchange fraction {Functional.ExactExchangeFraction:0.###})\n");
        sb.Append(c, $"  {Grid.Description}\n");
        sb.Append(c, $"  integrated electrons  {IntegratedElectronCount,20:F8}   error {ElectronCountError:E2}\n");
        return sb.ToString();
    }

    /// <inheritdoc />
    public override string ToString() => Summary();
}
