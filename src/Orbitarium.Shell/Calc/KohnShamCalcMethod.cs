using System.CommandLine;
using System.Text.Json.Nodes;
using Orbitarium.Dft;
using Orbitarium.Dft.Functionals;
using Orbitarium.Dft.Grids;

namespace Orbitarium.Shell.Calc;

/// <summary>
/// A Kohn–Sham method of <c>calc</c>: one per registered functional name (b3lyp, pbe, pbe0, svwn5, blyp, …); it runs
/// restricted Kohn–Sham for a closed shell and unrestricted otherwise. <c>--grid coarse|default|fine|veryfine</c>
/// picks the grid level.
/// </summary>
internal sealed class KohnShamCalcMethod(string functionalName) : ICalcMethod
{
    /// <summary>One method per registered functional name.</summary>
    public static IReadOnlyList<ICalcMethod> All { get; } =
        [.. FunctionalRegistry.Names.Select(n => (ICalcMethod)new KohnShamCalcMethod(n.ToLowerInvariant()))];

    /// <summary>The <c>--grid</c> option (registered in <see cref="CalcMethods.ExtraOptions"/>).</summary>
    public static readonly Option<string> GridOption = new("--grid")
    {
        Description = "DFT grid level: coarse, default, fine or veryfine (default: default).",
        DefaultValueFactory = _ => "default",
    };

    /// <inheritdoc />
    public IReadOnlyList<string> Names { get; } = [functionalName];

    /// <inheritdoc />
    public string Description => $"Kohn–Sham DFT, {FunctionalRegistry.Get(functionalName).Name} (RKS for closed shells, else UKS)";

    /// <summary>Reads a grid level name.</summary>
    /// <exception cref="OrbitariumInputException">Unknown level.</exception>
    public static GridLevel ParseGrid(string? text) => (text ?? "default").Trim().ToLowerInvariant() switch
    {
        "coarse" => GridLevel.Coarse,
        "default" or "medium" => GridLevel.Default,
        "fine" => GridLevel.Fine,
        "veryfine" or "very-fine" => GridLevel.VeryFine,
        _ => throw new OrbitariumInputException($"Unknown grid level '{text}'; use coarse, default, fine or veryfine."),
    };

    /// <inheritdoc />
    public CalcOutcome Run(CalcRequest request, CancellationToken cancellationToken)
    {
        var functional = FunctionalRegistry.Get(functionalName);
        var grid = ParseGrid(request.ParseResult.GetValue(GridOption));
        bool unrestricted = request.Molecule.Multiplicity != 1;
        var result = unrestricted
            ? request.Calculation.RunUks(functional, grid, request.Progress, cancellationToken)
            : request.Calculation.RunRks(functional, grid, request.Progress, cancellationToken);
        var scf = result.Scf;
        return CalcMethods.FromScf(request, scf, result.TotalEnergyHartree, result.MethodName) with
        {
            ExtraJson =
            [
                new("functional", result.Functional.Name),
                new("functional_formula", result.Functional.Formula),
                new("exact_exchange_fraction", result.Functional.ExactExchangeFraction),
                new("exchange_correlation_energy", result.ExchangeCorrelationEnergyHartree),
                new("grid_level", (result.GridLevel?.ToString() ?? "custom").ToLowerInvariant()),
                new("grid_points", result.GridPointCount),
                new("integrated_electrons", result.IntegratedElectronCount),
                new("electron_count_error", result.ElectronCountError),
            ],
            ExtraSummaryLines =
            [
                $"functional {result.Functional}",
                FormattableString.Invariant($"{result.Grid.Description}"),
                FormattableString.Invariant($"integrated electrons {result.IntegratedElectronCount:F8} (error {result.ElectronCountError:E2})"),
            ],
        };
    }
}
