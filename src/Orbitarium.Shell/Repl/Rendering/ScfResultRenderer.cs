using System.Globalization;
using Orbitarium.Scf;
using Spectre.Console;
using Spectre.Console.Rendering;

namespace Orbitarium.Shell.Repl.Rendering;

/// <summary>
/// Shows an SCF result as a summary panel (method, energies, convergence, ⟨S²⟩, HOMO–LUMO gap, timings) and a
/// table of the orbitals around the HOMO–LUMO gap (energies in hartree and electronvolt, occupations).
/// A run that did not converge is flagged in red with its stop reason.
/// </summary>
public static class ScfResultRenderer
{
    /// <summary>Renders <paramref name="result"/>.</summary>
    public static IRenderable Render(ScfResult result, ConsoleSettings settings)
    {
        ArgumentNullException.ThrowIfNull(result);
        ArgumentNullException.ThrowIfNull(settings);
        return new Rows(Summary(result), Orbitals(result, settings));
    }

    private static string F(double value, string format) => value.ToString(format, CultureInfo.InvariantCulture);

    private static Panel Summary(ScfResult r)
    {
        var grid = new Grid();
        grid.AddColumn(new GridColumn().PadRight(2));
        grid.AddColumn(new GridColumn().RightAligned());
        grid.AddColumn(new GridColumn().PadLeft(1));
        void Row(string label, string value, string unit = "") =>
            grid.AddRow(new Text(label, new Style(Color.Grey)), new Text(value), new Text(unit, new Style(Color.Grey)));

        Row("total energy", F(r.TotalEnergyHartree, "F10"), "Eh");
        Row("electronic", F(r.ElectronicEnergyHartree, "F10"), "Eh");
        Row("nuclear repulsion", F(r.NuclearRepulsionHartree, "F10"), "Eh");
        Row("one-electron", F(r.OneElectronEnergyHartree, "F10"), "Eh");
        Row("two-electron", F(r.TwoElectronEnergyHartree, "F10"), "Eh");
        if (r.ExchangeCorrelationDescription is not null) Row("exchange–correlation", F(r.ExchangeCorrelationEnergyHartree, "F10"), "Eh");
        if (r.Reference != ScfReference.Restricted) Row("⟨S²⟩", F(r.SpinSquared, "F6"), $"(pure state {F(r.ExpectedSpinSquared, "F4")})");
        if (r.HomoEnergyHartree is double homo) Row("HOMO", F(homo, "F6"), "Eh");
        if (r.LumoEnergyHartree is double lumo) Row("LUMO", F(lumo, "F6"), "Eh");
        if (r.GapElectronVolt is double gap) Row("gap", F(gap, "F4"), "eV");

        string status = r.Converged
            ? $"[green]converged[/]{Markup.Escape(r.ConvergenceDescription["converged".Length..])}"
            : $"[bold red]NOT CONVERGED[/] ({Markup.Escape(r.StopReason.ToString())}) after {r.Iterations} iterations — the energy is the last iterate's, not a result";
        string timing = string.Create(CultureInfo.InvariantCulture,
            $"integrals {r.IntegralSeconds:F2} s · guess {r.GuessSeconds:F2} s · iterations {r.IterationSeconds:F2} s · {r.IntegralMode}");
        var body = new Rows(grid, new Markup(status), new Text(timing, new Style(Color.Grey)));
        string header = string.Create(CultureInfo.InvariantCulture,
            $"{r.MethodName}/{r.Basis.Name} · {r.Molecule.Formula} · charge {r.Molecule.Charge} · multiplicity {r.Molecule.Multiplicity} · {r.Basis.FunctionCount} basis functions");
        return new Panel(body)
            .Header(new PanelHeader(" " + Markup.Escape(header) + " "))
            .Border(BoxBorder.Rounded)
            .BorderColor(r.Converged ? Color.Aqua : Color.Red);
    }

    private static Table Orbitals(ScfResult r, ConsoleSettings settings)
    {
        bool restricted = r.Reference != ScfReference.Unrestricted;
        int n = r.OrbitalCount;
        int homoIndex = 0;
        for (int i = 0; i < n; i++)
            if (r.OccupationsAlpha[i] > 0 || r.OccupationsBeta[i] > 0) homoIndex = i;
        int around = Math.Max(1, settings.OrbitalsAroundGap);
        int first = Math.Max(0, homoIndex - around + 1), last = Math.Min(n - 1, homoIndex + around);

        var table = new Table().Border(TableBorder.Simple).BorderColor(Color.Grey);
        table.AddColumn(new TableColumn("MO").RightAligned());
        if (restricted)
        {
            table.AddColumn(new TableColumn("occ").RightAligned());
            table.AddColumn(new TableColumn("ε / Eh").RightAligned());
            table.AddColumn(new TableColumn("ε / eV").RightAligned());
        }
        else
        {
            table.AddColumn(new TableColumn("occ α").RightAligned());
            table.AddColumn(new TableColumn("ε α / Eh").RightAligned());
            table.AddColumn(new TableColumn("occ β").RightAligned());
            table.AddColumn(new TableColumn("ε β / Eh").RightAligned());
        }
        table.AddColumn(new TableColumn(""));
        string format = "F" + Math.Clamp(settings.Decimals, 0, 12).ToString(CultureInfo.InvariantCulture);
        for (int i = first; i <= last; i++)
        {
            string mark = i == homoIndex ? "HOMO" : i == homoIndex + 1 ? "LUMO" : "";
            double occA = r.OccupationsAlpha[i], occB = r.OccupationsBeta[i];
            var cells = new List<string> { (i + 1).ToString(CultureInfo.InvariantCulture) };
            if (restricted)
            {
                cells.Add(F(occA + occB, "0.##"));
                cells.Add(F(r.OrbitalEnergiesAlphaHartree[i], format));
                cells.Add(F(r.OrbitalEnergiesAlphaHartree[i] * PhysicalConstants.HartreeToElectronVolt, "F3"));
            }
            else
            {
                cells.Add(F(occA, "0.##"));
                cells.Add(F(r.OrbitalEnergiesAlphaHartree[i], format));
                cells.Add(F(occB, "0.##"));
                cells.Add(F(r.OrbitalEnergiesBetaHartree[i], format));
            }
            cells.Add(mark);
            table.AddRow(cells.Select(c => new Text(c)).ToArray<IRenderable>());
        }
        string caption = string.Create(CultureInfo.InvariantCulture,
            $"orbitals {first + 1}–{last + 1} of {n}");
        table.Caption(new TableTitle(caption, new Style(Color.Grey)));
        return table;
    }
}
