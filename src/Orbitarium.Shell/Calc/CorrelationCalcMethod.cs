using System.CommandLine;
using System.Globalization;
using System.Text.Json.Nodes;
using Orbitarium.Correlation;
using Orbitarium.Scf;

namespace Orbitarium.Shell.Calc;

/// <summary>
/// The correlated methods of <c>calc</c>: <c>mp2</c>, <c>ccsd</c>, <c>ccsd(t)</c>, <c>cis</c>, <c>rpa</c>,
/// <c>eom-ccsd</c>, <c>fci</c>.
/// The Hartree–Fock reference is RHF for a singlet and UHF otherwise unless <c>--reference</c> says which; all electrons
/// are correlated unless <c>--frozen-core N</c>. JSON keys: <c>reference_energy</c>, <c>correlation_energy</c>,
/// <c>total_energy</c> (hartree), and for CIS, RPA and FCI <c>excitation_energies</c> (hartree) and
/// <c>oscillator_strengths</c>.
/// </summary>
internal sealed class CorrelationCalcMethod(string name, string description) : ICalcMethod
{
    /// <summary><c>--reference rhf|uhf</c>: the Hartree–Fock reference of a correlated method.</summary>
    public static readonly Option<string?> ReferenceOption = new("--reference")
    { Description = "Reference of a correlated method: rhf or uhf (default: rhf for a singlet, uhf otherwise)." };

    /// <summary><c>--frozen-core N|auto</c>: core orbitals per spin left uncorrelated.</summary>
    public static readonly Option<string?> FrozenCoreOption = new("--frozen-core")
    { Description = "Core orbitals per spin left uncorrelated by a correlated method: a number, or auto for the noble-gas cores of the atoms (water 1, benzene 6). Default 0: all electrons." };

    /// <summary><c>--states N</c>: excited states (CIS, RPA) or roots (FCI).</summary>
    public static readonly Option<int?> StatesOption = new("--states")
    { Description = "Excited states for cis/rpa/eom-ccsd (default 5) or roots including the ground state for fci (default 3)." };

    /// <summary>The methods this class provides, for <see cref="CalcMethods.All"/>.</summary>
    public static IEnumerable<ICalcMethod> All =>
    [
        new CorrelationCalcMethod("mp2", "second-order Møller–Plesset on RHF or UHF"),
        new CorrelationCalcMethod("ccsd", "coupled cluster singles and doubles on RHF or UHF"),
        new CorrelationCalcMethod("ccsd(t)", "CCSD with perturbative triples on RHF or UHF"),
        new CorrelationCalcMethod("cis", "configuration interaction singles excited states"),
        new CorrelationCalcMethod("rpa", "random-phase approximation (TDHF) excited states"),
        new CorrelationCalcMethod("eom-ccsd", "EOM-CCSD excited states: singlets of an RHF reference, all states of a UHF one"),
        new CorrelationCalcMethod("fci", "full configuration interaction (small systems)"),
    ];

    /// <inheritdoc />
    public IReadOnlyList<string> Names => name == "ccsd(t)" ? [name, "ccsdt"] : [name];

    /// <inheritdoc />
    public string Description => description;

    /// <inheritdoc />
    public CalcOutcome Run(CalcRequest request, CancellationToken cancellationToken)
    {
        var parse = request.ParseResult;
        var molecule = request.Molecule;
        string label = name.ToUpperInvariant();
        string? asked = parse.GetValue(ReferenceOption)?.Trim().ToLowerInvariant();
        var reference = asked switch
        {
            null or "" => molecule.Multiplicity == 1 ? ScfReference.Restricted : ScfReference.Unrestricted,
            "rhf" => ScfReference.Restricted,
            "uhf" => ScfReference.Unrestricted,
            _ => throw new OrbitariumInputException($"Unknown --reference '{asked}'; use rhf or uhf."),
        };
        if (reference == ScfReference.Restricted && molecule.Multiplicity != 1)
            throw new OrbitariumInputException(
                $"{label} with an RHF reference needs a closed shell, but the molecule has multiplicity {molecule.Multiplicity}: use --reference uhf (the default for open shells).");
        string frozen = parse.GetValue(FrozenCoreOption)?.Trim().ToLowerInvariant() ?? "0";
        var options = frozen == "auto"
            ? CorrelationOptions.Default.WithStandardFrozenCore(molecule)
            : int.TryParse(frozen, NumberStyles.Integer, CultureInfo.InvariantCulture, out int count)
                ? CorrelationOptions.Default.WithFrozenCore(count)
                : throw new OrbitariumInputException($"--frozen-core takes a number of orbitals or auto, got '{frozen}'.");
        int? states = parse.GetValue(StatesOption);
        if (states is < 1)
            throw new OrbitariumInputException($"--states must be at least 1, got {states}.");

        var scf = request.Calculation.Run(reference, request.Progress, cancellationToken);
        var scfOutcome = CalcMethods.FromScf(request, scf, scf.TotalEnergyHartree, label);
        if (!scf.Converged) return scfOutcome;

        var c = CultureInfo.InvariantCulture;
        var json = new List<KeyValuePair<string, JsonNode?>>();
        var lines = new List<string>();
        double total;
        bool converged = true;
        string? failure = null;
        void Energies(double referenceEnergy, double correlation, double totalEnergy)
        {
            json.Add(new("reference_energy", referenceEnergy));
            json.Add(new("correlation_energy", correlation));
            json.Add(new("frozen_core", options.FrozenCoreOrbitals));
            string what = name == "eom-ccsd" ? "CCSD correlation" : $"{label} correlation";
            lines.Add(string.Create(c, $"{what,-21}{correlation,20:F10}"));
            total = totalEnergy;
        }
        static JsonArray Array(IEnumerable<double> values) => new([.. values.Select(v => (JsonNode?)JsonValue.Create(v))]);

        switch (name)
        {
            case "mp2":
            {
                var r = request.Timings.Measure("correlation", () => scf.Mp2(options, null, cancellationToken));
                Energies(r.ReferenceEnergyHartree, r.CorrelationEnergyHartree, r.TotalEnergyHartree);
                json.Add(new("same_spin_energy", r.SameSpinEnergyHartree));
                json.Add(new("opposite_spin_energy", r.OppositeSpinEnergyHartree));
                lines.Add(string.Create(c, $"  same-spin          {r.SameSpinEnergyHartree,20:F10}"));
                lines.Add(string.Create(c, $"  opposite-spin      {r.OppositeSpinEnergyHartree,20:F10}"));
                break;
            }
            case "ccsd" or "ccsd(t)":
            {
                var r = request.Timings.Measure("correlation", () => name == "ccsd" ? scf.Ccsd(options, null, cancellationToken) : scf.CcsdT(options, null, cancellationToken));
                Energies(r.ReferenceEnergyHartree, r.CorrelationEnergyHartree, r.TotalEnergyHartree);
                json.Add(new("ccsd_correlation_energy", r.CcsdCorrelationEnergyHartree));
                if (r.TriplesCorrectionHartree is double t) json.Add(new("triples_correction", t));
                json.Add(new("mp2_correlation_energy", r.Mp2CorrelationEnergyHartree));
                json.Add(new("cc_iterations", r.Iterations));
                json.Add(new("cc_converged", r.Converged));
                json.Add(new("t1_diagnostic", r.T1Diagnostic));
                lines.Add(string.Create(c, $"  CCSD part          {r.CcsdCorrelationEnergyHartree,20:F10}   ({r.Iterations} iterations, T1 diagnostic {r.T1Diagnostic:F4})"));
                if (r.TriplesCorrectionHartree is double t2) lines.Add(string.Create(c, $"  (T) correction     {t2,20:F10}"));
                converged = r.Converged;
                failure = r.Converged ? null : $"CCSD did not converge: {r.StopReason}; the energy is the last iterate's.";
                break;
            }
            case "cis" or "rpa":
            {
                int n = states ?? 5;
                var r = request.Timings.Measure("correlation", () => name == "cis" ? scf.Cis(n, false, options, null, cancellationToken) : scf.Rpa(n, false, options, null, cancellationToken));
                Energies(r.ReferenceEnergyHartree, 0.0, scf.TotalEnergyHartree);
                json.Add(new("manifold", r.Manifold));
                json.Add(new("excitation_energies", Array(r.ExcitationEnergiesHartree)));
                json.Add(new("oscillator_strengths", Array(r.OscillatorStrengths)));
                for (int k = 0; k < r.ExcitationEnergiesHartree.Length; k++)
                    lines.Add(string.Create(c, $"  {r.Manifold} {k + 1,-3} {r.ExcitationEnergiesHartree[k],14:F8} Eh {r.ExcitationEnergiesElectronVolt[k],10:F4} eV   f = {r.OscillatorStrengths[k]:F5}"));
                break;
            }
            case "eom-ccsd":
            {
                int n = states ?? 5;
                var r = request.Timings.Measure("correlation", () => scf.EomCcsd(n, false, options, null, cancellationToken));
                // The ground state is CCSD: its energy is the reference of the excitation energies.
                Energies(scf.TotalEnergyHartree, r.ReferenceEnergyHartree - scf.TotalEnergyHartree, r.ReferenceEnergyHartree);
                json.Add(new("manifold", r.Manifold));
                json.Add(new("excitation_energies", Array(r.ExcitationEnergiesHartree)));
                for (int k = 0; k < r.ExcitationEnergiesHartree.Length; k++)
                    lines.Add(string.Create(c, $"  {r.Manifold} {k + 1,-3} {r.ExcitationEnergiesHartree[k],14:F8} Eh {r.ExcitationEnergiesElectronVolt[k],10:F4} eV"));
                break;
            }
            default:
            {
                int n = states ?? 3;
                var r = request.Timings.Measure("correlation", () => scf.Fci(n, options, null, cancellationToken));
                Energies(r.ReferenceEnergyHartree, r.CorrelationEnergyHartree, r.TotalEnergyHartree);
                json.Add(new("root_energies", Array(r.RootEnergiesHartree)));
                json.Add(new("spin_squared", Array(r.SpinSquared)));
                json.Add(new("excitation_energies", Array(r.ExcitationEnergiesHartree)));
                json.Add(new("oscillator_strengths", Array(r.OscillatorStrengths)));
                json.Add(new("n_determinants", r.DeterminantCount));
                for (int k = 0; k < r.RootEnergiesHartree.Length; k++)
                    lines.Add(string.Create(c, $"  root {k + 1,-3} {r.RootEnergiesHartree[k],20:F10} Eh   <S^2> = {r.SpinSquared[k]:F4}"));
                converged = r.Converged;
                failure = r.Converged ? null : $"the FCI Davidson solver did not converge: {r.StopReason}.";
                break;
            }
        }
        return new CalcOutcome
        {
            Scf = scf,
            TotalEnergyHartree = total,
            MethodLabel = label,
            Converged = converged,
            FailureMessage = failure,
            ExtraJson = json,
            ExtraSummaryLines = lines,
        };
    }
}
