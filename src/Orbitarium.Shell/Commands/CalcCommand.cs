using System.CommandLine;
using Orbitarium.BasisSets;
using Orbitarium.Chemistry;
using Orbitarium.Scf;
using Orbitarium.Shell.Calc;

namespace Orbitarium.Shell.Commands;

/// <summary>
/// <c>orbitarium calc --geometry FILE.xyz --basis NAME --method NAME [--charge N] [--multiplicity M]
/// [--units angstrom|bohr] [--json] [--output FILE] [--max-iterations N] [--level-shift EH] [--task energy|optimize|frequencies]</c>: one calculation, a readable summary or
/// one JSON object. Exit codes: 0 success, 2 bad input (one line on stderr), 3 a solver did not converge.
/// Methods come from <see cref="CalcMethods.All"/>.
/// </summary>
internal static class CalcCommand
{
    /// <summary>Exit code for success.</summary>
    public const int Success = 0;

    /// <summary>Exit code for bad input (file, geometry, basis, method, charge/multiplicity, options).</summary>
    public const int InputError = 2;

    /// <summary>Exit code for a calculation that did not converge.</summary>
    public const int NotConverged = 3;

    /// <summary>Exit code for an unexpected internal failure.</summary>
    public const int InternalError = 1;

    private static readonly Option<string> Geometry = new("--geometry", "-g")
    { Description = "XYZ file with the geometry (ångström unless --units bohr).", Required = true };
    private static readonly Option<string> Basis = new("--basis", "-b")
    { Description = "Basis set name, e.g. STO-3G, 6-31G*, cc-pVDZ.", Required = true };
    private static readonly Option<string> Method = new("--method", "-m")
    { Description = "Method: " + string.Join(", ", CalcMethods.All.Select(m => $"{m.Names[0]} ({m.Description})")) + ".", Required = true };
    private static readonly Option<int> Charge = new("--charge") { Description = "Total charge in e (default 0)." };
    private static readonly Option<int?> Multiplicity = new("--multiplicity")
    { Description = "Spin multiplicity 2S+1 (default: 1 for an even electron count, 2 for odd)." };
    private static readonly Option<string> Units = new("--units")
    { Description = "Unit of the XYZ coordinates: angstrom (default) or bohr.", DefaultValueFactory = _ => "angstrom" };
    private static readonly Option<bool> Json = new("--json") { Description = "Print one JSON object instead of the summary." };
    private static readonly Option<string?> Output = new("--output", "-o")
    { Description = "Write the summary or JSON to this file (atomically) instead of standard output." };
    private static readonly Option<int?> MaxIterations = new("--max-iterations")
    { Description = "Largest number of SCF iterations (default 128)." };
    private static readonly Option<double?> LevelShift = new("--level-shift")
    { Description = "SCF level shift in hartree added to virtual orbitals (default 0); 0.1–0.5 calms an oscillating open shell." };

    /// <summary>Builds the command for the root command of <c>orbitarium</c>.</summary>
    public static Command Create()
    {
        var cmd = new Command("calc", "Run one calculation on a geometry file and print a summary or JSON. " +
                                      "Exit codes: 0 success, 2 bad input, 3 not converged.");
        foreach (var o in new Option[] { Geometry, Basis, Method, Charge, Multiplicity, Units, Json, Output, MaxIterations, LevelShift })
            cmd.Options.Add(o);
        foreach (var o in CalcMethods.ExtraOptions) cmd.Options.Add(o);
        foreach (var o in new Option[] { GeometryCalcTask.Task, GeometryCalcTask.Temperature, GeometryCalcTask.Pressure, GeometryCalcTask.MaxSteps })
            cmd.Options.Add(o);
        cmd.SetAction((parse, ct) => Task.FromResult(Execute(parse, Console.Out, Console.Error, ct)));
        return cmd;
    }

    /// <summary>Parses and runs <c>calc</c> with the given arguments (those after the word "calc"), writing to the given
    /// writers; parse errors give exit code 2 and one line on <paramref name="error"/>.</summary>
    public static int Invoke(IReadOnlyList<string> args, TextWriter output, TextWriter error, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(args);
        var root = new RootCommand("orbitarium");
        var cmd = Create();
        cmd.SetAction((parse, ct) => Task.FromResult(Execute(parse, output, error, ct)));
        root.Subcommands.Add(cmd);
        var parse = root.Parse(["calc", .. args]);
        if (parse.Errors.Count > 0)
        {
            error.WriteLine($"calc: {parse.Errors[0].Message} (see 'orbitarium calc --help')");
            return InputError;
        }
        return parse.InvokeAsync(new InvocationConfiguration { Output = output, Error = error }, cancellationToken).GetAwaiter().GetResult();
    }

    private static int Execute(ParseResult parse, TextWriter output, TextWriter error, CancellationToken cancellationToken)
    {
        try
        {
            var timings = new CalcTimings();
            var method = CalcMethods.Find(parse.GetValue(Method)!);
            var unit = LengthUnitExtensions.Parse(parse.GetValue(Units) ?? "angstrom");
            string basisName = parse.GetValue(Basis)!;
            var molecule = timings.Measure("input", () =>
                Molecule.FromXyzFile(parse.GetValue(Geometry)!, unit, parse.GetValue(Charge), parse.GetValue(Multiplicity)));
            var basisSet = BasisSetLibrary.Get(basisName);
            var options = ScfOptions.Default;
            if (parse.GetValue(MaxIterations) is int max) options = options with { MaxIterations = max };
            if (parse.GetValue(LevelShift) is double shift)
            {
                if (!(shift >= 0) || !double.IsFinite(shift))
                    throw new OrbitariumInputException($"--level-shift {shift} must be a finite number ≥ 0 (hartree), e.g. 0.2.");
                options = options with { LevelShiftHartree = shift };
            }
            var calculation = timings.Measure("input", () => Calculation.Create(molecule, basisSet, null, options));
            var request = new CalcRequest
            {
                Molecule = molecule,
                BasisName = basisName,
                MethodName = method.Names[0],
                Calculation = calculation,
                Timings = timings,
                ParseResult = parse,
            };
            string task = GeometryCalcTask.Parse(parse);
            CalcOutcome outcome;
            string? geometryXyz = null;
            if (task == "energy") outcome = method.Run(request, cancellationToken);
            else (request, outcome, geometryXyz) = GeometryCalcTask.Run(task, method, request, cancellationToken);
            var report = new CalcReport(request, outcome);
            string text = parse.GetValue(Json) ? report.ToJsonText() : report.ToText();
            string? path = parse.GetValue(Output);
            if (geometryXyz is not null && path is { Length: > 0 } && path.EndsWith(".xyz", StringComparison.OrdinalIgnoreCase))
            {
                // --task optimize --output FILE.xyz: the optimised geometry goes to the file, the report to stdout.
                AtomicFile.WriteAllText(path, geometryXyz);
                output.Write(text);
            }
            else if (path is { Length: > 0 }) AtomicFile.WriteAllText(path, text);
            else output.Write(text);
            if (!outcome.Converged)
            {
                error.WriteLine($"calc: {outcome.FailureMessage ?? "the calculation did not converge."}");
                return NotConverged;
            }
            return Success;
        }
        catch (Orbitarium.Geometry.ScfConvergenceException e)
        {
            error.WriteLine($"calc: {OneLine(e.Message)}");
            return NotConverged;
        }
        catch (OrbitariumInputException e)
        {
            error.WriteLine($"calc: {OneLine(e.Message)}");
            return InputError;
        }
        catch (OperationCanceledException)
        {
            error.WriteLine("calc: cancelled.");
            return InternalError;
        }
        catch (Exception e) when (e is not OutOfMemoryException)
        {
            error.WriteLine($"calc: internal error ({e.GetType().Name}): {OneLine(e.Message)}");
            return InternalError;
        }
    }

    private static string OneLine(string message) => message.Replace("\r", " ").Replace('\n', ' ');
}
