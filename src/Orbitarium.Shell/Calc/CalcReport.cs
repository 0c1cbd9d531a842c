using System.Globalization;
using System.Text;
using System.Text.Json;
using System.Text.Json.Nodes;
using Orbitarium.Analysis;
using Orbitarium.Scf;

namespace Orbitarium.Shell.Calc;

/// <summary>Turns a finished calculation into the <c>calc</c> JSON object or the readable summary.</summary>
internal sealed class CalcReport
{
    private static readonly CultureInfo C = CultureInfo.InvariantCulture;

    public CalcReport(CalcRequest request, CalcOutcome outcome)
    {
        Request = request;
        Outcome = outcome;
        var clock = System.Diagnostics.Stopwatch.StartNew();
        Mulliken = MullikenPopulation.Charges(outcome.Scf);
        Lowdin = LowdinPopulation.Charges(outcome.Scf);
        Multipoles = MultipoleMoments.Compute(outcome.Scf);
        request.Timings.Add("analysis", clock.Elapsed.TotalSeconds);
    }

    public CalcRequest Request { get; }
    public CalcOutcome Outcome { get; }
    public AtomicCharges Mulliken { get; }
    public AtomicCharges Lowdin { get; }
    public MultipoleMoments Multipoles { get; }

    /// <summary>The JSON object (keys listed in README "calc").</summary>
    public JsonObject ToJson()
    {
        var scf = Outcome.Scf;
        var m = Request.Molecule;
        var json = new JsonObject
        {
            ["method"] = Request.MethodName,
            ["method_label"] = Outcome.MethodLabel,
            ["reference"] = scf.Reference switch
            {
                ScfReference.Restricted => "restricted",
                ScfReference.Unrestricted => "unrestricted",
                _ => "restricted-open-shell",
            },
            ["basis"] = Request.BasisName,
            ["n_basis"] = scf.Basis.FunctionCount,
            ["n_electrons"] = m.ElectronCount,
            ["charge"] = m.Charge,
            ["multiplicity"] = m.Multiplicity,
            ["total_energy"] = Outcome.TotalEnergyHartree,
            ["nuclear_repulsion"] = scf.NuclearRepulsionHartree,
            ["scf_energy"] = scf.TotalEnergyHartree,
            ["one_electron_energy"] = scf.OneElectronEnergyHartree,
            ["two_electron_energy"] = scf.TwoElectronEnergyHartree,
            ["converged"] = Outcome.Converged,
            ["stop_reason"] = scf.StopReason.ToString(),
            ["iterations"] = scf.Iterations,
            ["automatic_level_shift_iteration"] = scf.AutomaticLevelShiftIteration,
            ["energy_unit"] = "hartree",
            ["orbital_energies"] = new JsonObject
            {
                ["alpha"] = Array(scf.OrbitalEnergiesAlphaHartree),
                ["beta"] = Array(scf.OrbitalEnergiesBetaHartree),
            },
            ["occupations"] = new JsonObject
            {
                ["alpha"] = Array(scf.OccupationsAlpha),
                ["beta"] = Array(scf.OccupationsBeta),
            },
            ["homo_energy"] = scf.HomoEnergyHartree,
            ["lumo_energy"] = scf.LumoEnergyHartree,
            ["gap_ev"] = scf.GapElectronVolt,
            ["atoms"] = new JsonArray([.. m.Atoms.Select(a => (JsonNode?)JsonValue.Create(a.Symbol))]),
            ["mulliken_charges"] = Array(Mulliken.ChargesElementary),
            ["lowdin_charges"] = Array(Lowdin.ChargesElementary),
            ["dipole_debye"] = new JsonArray(Multipoles.DipoleDebye.X, Multipoles.DipoleDebye.Y, Multipoles.DipoleDebye.Z),
            ["dipole_magnitude_debye"] = Multipoles.DipoleMagnitudeDebye,
            ["integral_mode"] = scf.IntegralMode,
            ["dropped_linear_dependencies"] = scf.DroppedLinearDependencies,
        };
        if (scf.Reference == ScfReference.Unrestricted) json["s_squared"] = scf.SpinSquared;
        foreach (var (key, value) in Outcome.ExtraJson) json[key] = value;
        var timings = new JsonObject();
        foreach (var (phase, seconds) in Request.Timings.Phases) timings[phase] = Math.Round(seconds, 4);
        timings["total"] = Math.Round(Request.Timings.TotalSeconds, 4);
        json["timings"] = timings;
        return json;
    }

    /// <summary>The JSON text, indented.</summary>
    public string ToJsonText() => ToJson().ToJsonString(new JsonSerializerOptions { WriteIndented = true }) + "\n";

    private static JsonArray Array(IEnumerable<double> values) => new([.. values.Select(v => (JsonNode?)JsonValue.Create(v))]);

    /// <summary>The readable summary: energy, convergence, orbital table, charges, dipole.</summary>
    public string ToText()
    {
        var scf = Outcome.Scf;
        var m = Request.Molecule;
        var o = scf.Options;
        var sb = new StringBuilder();
        string title = m.Title.Length > 0 ? "  — " + m.Title : "";
        sb.Append(C, $"{Outcome.MethodLabel}/{Request.BasisName}  {m.Formula}{title}\n");
        sb.Append(C, $"  basis functions {scf.Basis.FunctionCount}   electrons {m.ElectronCount} (α {m.AlphaElectronCount}, β {m.BetaElectronCount})   charge {m.Charge}   multiplicity {m.Multiplicity}\n");
        sb.Append(C, $"  two-electron integrals: {scf.IntegralMode}");
        if (scf.DroppedLinearDependencies > 0) sb.Append(C, $"; {scf.DroppedLinearDependencies} near-linear dependencies dropped");
        sb.Append('\n');
        if (scf.AutomaticLevelShiftIteration is int shiftedAt)
            sb.Append(C, $"  SCF still far from converged after {shiftedAt} iterations: level shift {o.AutomaticLevelShiftHartree} Eh switched on\n");
        if (scf.StopReason == ScfStopReason.ConvergedGridLimited)
            sb.Append(C, $"  SCF converged in {scf.Iterations} iterations (|ΔE| < {Math.Max(o.EnergyThresholdHartree, o.GridLimitedEnergyChangeHartree):0e0} Eh for {o.QuietIterationsForGridLimit} iterations; max|FDS−SDF| {scf.History[^1].CommutatorNorm:0.0e0}, limited by the grid)\n");
        else if (scf.Converged)
            sb.Append(C, $"  SCF converged in {scf.Iterations} iterations (|ΔE| < {o.EnergyThresholdHartree:0e0} Eh, max|FDS−SDF| < {o.CommutatorThreshold:0e0})\n");
        else
            sb.Append(C, $"  SCF NOT CONVERGED: {CalcMethods.ScfFailure(scf)}\n");
        sb.Append('\n');
        sb.Append("Energy (hartree)\n");
        sb.Append(C, $"  total                {Outcome.TotalEnergyHartree,20:F10}\n");
        if (Math.Abs(Outcome.TotalEnergyHartree - scf.TotalEnergyHartree) > 0)
            sb.Append(C, $"  SCF reference        {scf.TotalEnergyHartree,20:F10}\n");
        sb.Append(C, $"  nuclear repulsion    {scf.NuclearRepulsionHartree,20:F10}\n");
        sb.Append(C, $"  one-electron         {scf.OneElectronEnergyHartree,20:F10}\n");
        sb.Append(C, $"  two-electron         {scf.TwoElectronEnergyHartree,20:F10}\n");
        if (scf.ExchangeCorrelationEnergyHartree != 0)
            sb.Append(C, $"  exchange-correlation {scf.ExchangeCorrelationEnergyHartree,20:F10}\n");
        if (scf.Reference == ScfReference.Unrestricted)
            sb.Append(C, $"  <S^2>                {scf.SpinSquared,20:F6}   (pure spin state {scf.ExpectedSpinSquared:F4})\n");
        foreach (var line in Outcome.ExtraSummaryLines) sb.Append("  ").Append(line).Append('\n');
        sb.Append('\n');
        AppendOrbitals(sb, scf);
        sb.Append('\n');
        sb.Append("Atomic charges (e)          Mulliken     Löwdin\n");
        for (int a = 0; a < m.AtomCount; a++)
            sb.Append(C, $"  {m.Atoms[a].Symbol + (a + 1).ToString(C),-6}                  {Mulliken.ChargesElementary[a],10:F6} {Lowdin.ChargesElementary[a],10:F6}\n");
        sb.Append('\n');
        var d = Multipoles.DipoleDebye;
        sb.Append(C, $"Dipole moment (debye, about the centre of mass)\n  x {d.X,10:F4}   y {d.Y,10:F4}   z {d.Z,10:F4}   |μ| {Multipoles.DipoleMagnitudeDebye,10:F4}\n");
        sb.Append('\n');
        sb.Append("Timings (s): ");
        sb.Append(string.Join(", ", Request.Timings.Phases.Select(p => string.Create(C, $"{p.Key} {p.Value:F3}"))));
        sb.Append(C, $", total {Request.Timings.TotalSeconds:F3}\n");
        return sb.ToString();
    }

    private static void AppendOrbitals(StringBuilder sb, ScfResult scf)
    {
        bool unrestricted = scf.Reference == ScfReference.Unrestricted;
        int occupied = Math.Max(scf.AlphaElectronCount, scf.BetaElectronCount);
        int shown = Math.Min(scf.OrbitalCount, occupied + 5);
        sb.Append(C, $"Orbitals (lowest {shown} of {scf.OrbitalCount}; energies in hartree and eV)\n");
        if (unrestricted)
        {
            sb.Append("     #   occ α    ε α (Eh)      ε α (eV)   occ β    ε β (Eh)      ε β (eV)\n");
            for (int i = 0; i < shown; i++)
            {
                double ea = scf.OrbitalEnergiesAlphaHartree[i], eb = scf.OrbitalEnergiesBetaHartree[i];
                sb.Append(C, $"  {i + 1,4}   {scf.OccupationsAlpha[i],4:F1} {ea,12:F6} {ea * PhysicalConstants.HartreeToElectronVolt,12:F4}   {scf.OccupationsBeta[i],4:F1} {eb,12:F6} {eb * PhysicalConstants.HartreeToElectronVolt,12:F4}\n");
            }
        }
        else
        {
            sb.Append("     #   occ      ε (Eh)        ε (eV)\n");
            for (int i = 0; i < shown; i++)
            {
                double e = scf.OrbitalEnergiesAlphaHartree[i];
                sb.Append(C, $"  {i + 1,4}   {scf.OccupationsAlpha[i] + scf.OccupationsBeta[i],4:F1} {e,12:F6} {e * PhysicalConstants.HartreeToElectronVolt,12:F4}\n");
            }
        }
        if (scf.HomoEnergyHartree is double h && scf.LumoEnergyHartree is double l)
            sb.Append(C, $"  HOMO {h:F6} Eh, LUMO {l:F6} Eh, gap {(l - h) * PhysicalConstants.HartreeToElectronVolt:F4} eV\n");
    }
}
