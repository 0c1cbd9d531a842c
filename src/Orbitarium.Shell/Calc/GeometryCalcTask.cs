using System.CommandLine;
using System.Globalization;
using System.Text.Json.Nodes;
using Orbitarium.Geometry;
using Orbitarium.Geometry.Optimization;
using Orbitarium.Geometry.Thermochemistry;
using Orbitarium.Geometry.Vibrations;

namespace Orbitarium.Shell.Calc;

/// <summary>The geometry tasks of <c>calc</c>: <c>--task optimize</c> (minimum; the optimised geometry goes to
/// <c>--output FILE.xyz</c>) and <c>--task frequencies</c> (harmonic analysis and thermochemistry at the given geometry).
/// Adds the JSON keys <c>geometry</c> (Å), <c>gradient</c> (Eh/bohr), <c>frequencies_cm1</c> and <c>thermochemistry</c>.</summary>
internal static class GeometryCalcTask
{
    private static readonly CultureInfo C = CultureInfo.InvariantCulture;

    /// <summary><c>--task energy|optimize|frequencies</c>.</summary>
    public static readonly Option<string> Task = new("--task")
    { Description = "What to compute: energy (default), optimize (minimise the geometry; with --output FILE.xyz the optimised geometry is written there) or frequencies (harmonic wavenumbers, IR intensities and thermochemistry at the given geometry).", DefaultValueFactory = _ => "energy" };

    /// <summary><c>--temperature K</c> for thermochemistry.</summary>
    public static readonly Option<double> Temperature = new("--temperature")
    { Description = "Temperature in K for --task frequencies (default 298.15).", DefaultValueFactory = _ => IdealGasThermochemistry.StandardTemperatureKelvin };

    /// <summary><c>--pressure Pa</c> for thermochemistry.</summary>
    public static readonly Option<double> Pressure = new("--pressure")
    { Description = "Pressure in Pa for --task frequencies (default 100000 = 1 bar).", DefaultValueFactory = _ => PhysicalConstants.StandardPressurePascal };

    /// <summary><c>--max-steps N</c> for optimisations.</summary>
    public static readonly Option<int?> MaxSteps = new("--max-steps")
    { Description = "Largest number of optimisation steps for --task optimize (default 100); when reached, the best geometry is reported and the exit code is 3." };

    /// <summary>The task name, checked.</summary>
    /// <exception cref="OrbitariumInputException">An unknown task.</exception>
    public static string Parse(ParseResult parse)
    {
        string task = (parse.GetValue(Task) ?? "energy").Trim().ToLowerInvariant();
        return task switch
        {
            "energy" or "optimize" or "frequencies" => task,
            "optimise" => "optimize",
            _ => throw new OrbitariumInputException($"Unknown task '{task}'; use energy, optimize or frequencies."),
        };
    }

    /// <summary>Runs a geometry task and returns the request and outcome of the final geometry (for the report), and
    /// the optimised geometry's XYZ text (optimize only).</summary>
    public static (CalcRequest Request, CalcOutcome Outcome, string? GeometryXyz) Run(string task, ICalcMethod method, CalcRequest request,
        CancellationToken cancellationToken)
    {
        var surface = new CalcMethodSurface(method, request);
        var extraJson = new List<KeyValuePair<string, JsonNode?>> { new("task", task) };
        var lines = new List<string>();
        var molecule = request.Molecule;
        bool converged = true;
        string? failure = null;
        string? xyz = null;
        if (task == "optimize")
        {
            var options = OptimizationOptions.Default;
            if (request.ParseResult.GetValue(MaxSteps) is int max) options = options.WithMaxIterations(max);
            var clock = System.Diagnostics.Stopwatch.StartNew();
            var result = GeometryOptimizer.Run(surface, molecule, options, null, cancellationToken);
            request.Timings.Add("optimisation", clock.Elapsed.TotalSeconds);
            molecule = result.Molecule;
            converged = result.Converged;
            if (!converged)
                failure = $"the geometry optimisation did not converge ({result.StopReason}) in {result.Iterations} steps; the best geometry found is reported, not a stationary point.";
            extraJson.Add(new("geometry", Geometry(molecule)));
            extraJson.Add(new("gradient", Triples(result.GradientHartreePerBohr)));
            extraJson.Add(new("gradient_source", Source(result.GradientSource)));
            extraJson.Add(new("optimization", new JsonObject
            {
                ["converged"] = result.Converged,
                ["stop_reason"] = result.StopReason.ToString(),
                ["steps"] = result.Iterations,
                ["coordinates"] = result.CoordinatesDescription,
                ["energies"] = new JsonArray([.. result.Trajectory.Select(s => (JsonNode?)JsonValue.Create(s.EnergyHartree))]),
                ["max_force"] = result.Trajectory[^1].MaxForce,
                ["rms_force"] = result.Trajectory[^1].RmsForce,
            }));
            lines.Add(string.Create(C, $"geometry optimisation: {(result.Converged ? "converged" : "NOT CONVERGED (" + result.StopReason + ")")} after {result.Iterations} steps, {Source(result.GradientSource)} gradients, {result.CoordinatesDescription}"));
            lines.Add(string.Create(C, $"final max force {result.Trajectory[^1].MaxForce:E2}, rms force {result.Trajectory[^1].RmsForce:E2}"));
            lines.Add("optimised geometry (Å):");
            foreach (var a in molecule.Atoms)
                lines.Add(string.Create(C, $"  {a.Symbol,-2} {a.PositionAngstrom.X,14:F8} {a.PositionAngstrom.Y,14:F8} {a.PositionAngstrom.Z,14:F8}"));
            xyz = molecule.WithTitle(string.Create(C, $"{surface.MethodName} {(converged ? "optimised" : "NOT CONVERGED")} E = {result.EnergyHartree:F10} Eh")).ToXyz();
        }
        else
        {
            double t = request.ParseResult.GetValue(Temperature), p = request.ParseResult.GetValue(Pressure);
            var clock = System.Diagnostics.Stopwatch.StartNew();
            var hessian = FiniteDifferenceHessian.Compute(surface, molecule, FiniteDifferenceHessian.DefaultStepBohr, null, cancellationToken);
            request.Timings.Add("hessian", clock.Elapsed.TotalSeconds);
            var vib = VibrationalAnalysis.FromHessian(hessian, surface.MethodName);
            var thermo = IdealGasThermochemistry.Compute(vib, t, p);
            extraJson.Add(new("geometry", Geometry(molecule)));
            extraJson.Add(new("gradient", Triples(hessian.GradientHartreePerBohr)));
            extraJson.Add(new("gradient_source", Source(hessian.GradientSource)));
            extraJson.Add(new("frequencies_cm1", new JsonArray([.. vib.Modes.Select(m => (JsonNode?)JsonValue.Create(m.WavenumberPerCm))])));
            extraJson.Add(new("imaginary_modes", vib.ImaginaryModeCount));
            if (vib.Modes.All(m => m.IrIntensityKmPerMol.HasValue))
                extraJson.Add(new("ir_intensities_km_mol", new JsonArray([.. vib.Modes.Select(m => (JsonNode?)JsonValue.Create(m.IrIntensityKmPerMol!.Value))])));
            extraJson.Add(new("thermochemistry", new JsonObject
            {
                ["temperature_k"] = thermo.TemperatureKelvin,
                ["pressure_pa"] = thermo.PressurePascal,
                ["point_group"] = thermo.PointGroup,
                ["symmetry_number"] = thermo.SymmetryNumber,
                ["zero_point_energy"] = thermo.ZeroPointEnergyHartree,
                ["thermal_energy_correction"] = thermo.ThermalEnergyCorrectionHartree,
                ["enthalpy_correction"] = thermo.EnthalpyCorrectionHartree,
                ["gibbs_correction"] = thermo.GibbsCorrectionHartree,
                ["entropy_j_per_k_mol"] = thermo.EntropyJoulePerMoleKelvin,
                ["enthalpy"] = thermo.EnthalpyHartree,
                ["gibbs_energy"] = thermo.GibbsEnergyHartree,
                ["excluded_imaginary_modes"] = thermo.ExcludedImaginaryModes,
                ["energy_unit"] = "hartree",
            }));
            double maxG = hessian.GradientHartreePerBohr.Max(Math.Abs);
            lines.Add(string.Create(C, $"harmonic frequencies ({Source(hessian.GradientSource)} gradients differentiated, step {hessian.StepBohr} bohr):"));
            foreach (var m in vib.Modes) lines.Add("  " + m);
            if (vib.ImaginaryModeCount > 0) lines.Add(string.Create(C, $"{vib.ImaginaryModeCount} imaginary mode(s): not a minimum."));
            if (maxG > 4.5e-4) lines.Add(string.Create(C, $"warning: the largest gradient component is {maxG:E2} Eh/bohr; the geometry is not a stationary point, so the frequencies are not meaningful. Optimise first."));
            foreach (var l in thermo.ToString().Split('\n')) lines.Add(l);
        }

        var (finalRequest, finalOutcome) = surface.Run(molecule, cancellationToken);
        foreach (var (phase, seconds) in request.Timings.Phases) finalRequest.Timings.Add(phase, seconds);
        var outcome = new CalcOutcome
        {
            Scf = finalOutcome.Scf,
            TotalEnergyHartree = finalOutcome.TotalEnergyHartree,
            MethodLabel = finalOutcome.MethodLabel,
            Converged = converged && finalOutcome.Converged,
            FailureMessage = failure ?? finalOutcome.FailureMessage,
            ExtraJson = [.. finalOutcome.ExtraJson, .. extraJson],
            ExtraSummaryLines = [.. finalOutcome.ExtraSummaryLines, .. lines],
        };
        return (finalRequest, outcome, xyz);
    }

    private static string Source(GradientSource s) => s switch
    {
        GradientSource.Analytic => "analytic",
        GradientSource.FiniteDifference => "finite-difference",
        _ => "none",
    };

    private static JsonArray Geometry(Orbitarium.Chemistry.Molecule m) =>
        new([.. m.Atoms.Select(a => (JsonNode?)new JsonArray(a.PositionAngstrom.X, a.PositionAngstrom.Y, a.PositionAngstrom.Z))]);

    private static JsonArray Triples(IReadOnlyList<double> g)
    {
        var arr = new JsonArray();
        for (int i = 0; i + 2 < g.Count; i += 3) arr.Add(new JsonArray(g[i], g[i + 1], g[i + 2]));
        return arr;
    }
}
