using System.CommandLine;
using System.Globalization;
using Orbitarium.Scf;

namespace Orbitarium.Shell.Calc;

/// <summary>The registry of <c>calc</c> methods: add one line per method to <see cref="All"/>.</summary>
internal static class CalcMethods
{
    /// <summary>Every method <c>--method</c> accepts, in the order shown by <c>--help</c>.</summary>
    public static readonly IReadOnlyList<ICalcMethod> All =
    [
        new HartreeFockCalcMethod(ScfReference.Restricted),
        new HartreeFockCalcMethod(ScfReference.Unrestricted),
        new HartreeFockCalcMethod(ScfReference.RestrictedOpenShell),
        .. CorrelationCalcMethod.All,
        .. KohnShamCalcMethod.All,
    ];

    /// <summary>Extra command-line options some methods read through <see cref="CalcRequest.ParseResult"/>
    /// (add one line per option, e.g. a grid size for DFT).</summary>
    public static readonly IReadOnlyList<Option> ExtraOptions =
    [
        CorrelationCalcMethod.ReferenceOption, CorrelationCalcMethod.FrozenCoreOption, CorrelationCalcMethod.StatesOption,
        KohnShamCalcMethod.GridOption,
    ];

    /// <summary>The method called <paramref name="name"/> (case-insensitive).</summary>
    /// <exception cref="OrbitariumInputException">No method has that name.</exception>
    public static ICalcMethod Find(string name)
    {
        string key = name.Trim().ToLowerInvariant();
        foreach (var m in All)
            foreach (var n in m.Names)
                if (n == key) return m;
        throw new OrbitariumInputException($"Unknown method '{name}'; use one of: {string.Join(", ", All.Select(m => m.Names[0]))}.");
    }

    /// <summary>Records the SCF phases' timings and wraps an SCF (Hartree–Fock or Kohn–Sham) result as an outcome;
    /// methods add their own keys with <c>with</c>.</summary>
    public static CalcOutcome FromScf(CalcRequest request, ScfResult scf, double totalEnergyHartree, string methodLabel)
    {
        request.Timings.Add("integrals", scf.IntegralSeconds);
        request.Timings.Add("guess", scf.GuessSeconds);
        request.Timings.Add("scf", scf.IterationSeconds);
        return new CalcOutcome
        {
            Scf = scf,
            TotalEnergyHartree = totalEnergyHartree,
            MethodLabel = methodLabel,
            Converged = scf.Converged,
            FailureMessage = scf.Converged ? null : ScfFailure(scf),
        };
    }

    /// <summary>A one-line message for an SCF that did not converge.</summary>
    public static string ScfFailure(ScfResult result)
    {
        var last = result.History.Length > 0 ? result.History[^1] : null;
        string detail = last is null ? "" : string.Create(CultureInfo.InvariantCulture,
            $" (last energy {last.EnergyHartree:F10} Eh, ΔE {last.EnergyChangeHartree:E2}, |FDS−SDF| {last.CommutatorNorm:E2})");
        return result.StopReason == ScfStopReason.NumericalBreakdown
            ? $"the SCF broke down numerically after {result.Iterations} iterations{detail}; check the geometry and basis."
            : $"the SCF did not converge in {result.Iterations} iterations{detail}; no converged energy is available. " +
              "If the energy oscillates, set a level shift, e.g. --level-shift 0.5 (ScfOptions.LevelShiftHartree at the prompt; 0.2 Eh switches on by itself after 30 iterations); if it is still falling, raise --max-iterations.";
    }
}
