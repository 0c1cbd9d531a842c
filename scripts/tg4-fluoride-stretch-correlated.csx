// TIDEGLASS TG-4 fluoride probe: how electron correlation moves the H–F bond.
// Stretches the bond around its minimum with RHF, MP2, CCSD and CCSD(T) (cc-pVDZ, F 1s frozen), energies with the
// nuclear repulsion included, fits a quartic to each curve and reports the equilibrium distance r_e and the
// harmonic wavenumber ω_e (H-1 and F-19 masses). The closed-shell coupled-cluster code makes each point a fraction
// of a second. Check (run by the test suite): RHF bonds too short and too stiff, correlation lengthens and softens
// the bond, and CCSD(T) lands near experiment. The curves go to plots/tg4-fluoride-stretch.png beside the script.
//
//   orbitarium run scripts/tg4-fluoride-stretch-correlated.csx [basis]

string basis = Args.Count > 0 ? Args[0] : "cc-pVDZ";
var options = CorrelationOptions.Default.WithFrozenCore(1);
var methods = new[] { "RHF", "MP2", "CCSD", "CCSD(T)" };
var distancesAngstrom = new List<double>();
for (double r = 0.84; r <= 1.0001; r += 0.02) distancesAngstrom.Add(Math.Round(r, 4));
var energies = methods.ToDictionary(m => m, _ => new List<double>());

Print($"TG-4 H–F stretch, {basis}, F 1s frozen in the correlated methods (energies in Eh)");
Print("  R / Å       RHF              MP2              CCSD             CCSD(T)");
foreach (double r in distancesAngstrom)
{
    Token.ThrowIfCancellationRequested();
    var hf = Molecule.Empty.AddAtom("F", 0, 0, 0).AddAtom("H", 0, 0, r).WithTitle($"TG-4 at {r} Å");
    var rhf = hf.WithBasis(basis).RunRhf(Progress, Token);
    if (!rhf.Converged) throw new InvalidOperationException($"RHF did not converge at R = {r} Å: {rhf.StopReason}");
    var mp2 = rhf.Mp2(options, Progress, Token);
    var cc = rhf.CcsdT(options, Progress, Token);
    if (!cc.Converged) throw new InvalidOperationException($"CCSD did not converge at R = {r} Å: {cc.StopReason}");
    energies["RHF"].Add(rhf.TotalEnergyHartree);
    energies["MP2"].Add(mp2.TotalEnergyHartree);
    energies["CCSD"].Add(cc.CcsdTotalEnergyHartree);
    energies["CCSD(T)"].Add(cc.TotalEnergyHartree);
    Print(FormattableString.Invariant(
        $"  {r:F3}   {rhf.TotalEnergyHartree,15:F9}  {mp2.TotalEnergyHartree,15:F9}  {cc.CcsdTotalEnergyHartree,15:F9}  {cc.TotalEnergyHartree,15:F9}"));
}

// Reduced mass of ¹H¹⁹F in electron masses.
double massH = Element.FromSymbol("H").MostAbundantIsotopeMassDalton, massF = Element.FromSymbol("F").MostAbundantIsotopeMassDalton;
double reducedMass = massH * massF / (massH + massF) * PhysicalConstants.AtomicMassUnitInElectronMasses;

Print("");
Print("  method     r_e / Å    ω_e / cm⁻¹   E(r_e) / Eh");
foreach (var method in methods)
{
    // Quartic least-squares fit in x = R − 0.92 Å (bohr), then Newton for the minimum.
    double centre = 0.92 * PhysicalConstants.BohrPerAngstrom;
    var xs = distancesAngstrom.Select(r => r * PhysicalConstants.BohrPerAngstrom - centre).ToArray();
    var design = Matrix<double>.Build.Dense(xs.Length, 5, (i, j) => Math.Pow(xs[i], j));
    var c = design.QR().Solve(Vector<double>.Build.DenseOfEnumerable(energies[method]));
    double x = 0;
    for (int step = 0; step < 50; step++)
    {
        double d1 = c[1] + 2 * c[2] * x + 3 * c[3] * x * x + 4 * c[4] * x * x * x;
        double d2 = 2 * c[2] + 6 * c[3] * x + 12 * c[4] * x * x;
        x -= d1 / d2;
    }
    double curvature = 2 * c[2] + 6 * c[3] * x + 12 * c[4] * x * x;   // Eh / bohr²
    double omega = Math.Sqrt(curvature / reducedMass) * PhysicalConstants.HartreeToWavenumber;
    double eMin = c[0] + c[1] * x + c[2] * x * x + c[3] * x * x * x + c[4] * x * x * x * x;
    double re = (x + centre) * PhysicalConstants.AngstromPerBohr;
    Print(FormattableString.Invariant($"  {method,-8}  r_e = {re:F4}   ω_e = {omega,7:F1}   {eMin:F9}"));
}

// The four curves, each relative to its own lowest point, so the shift of the minimum and the change of curvature
// show directly.
var curves = methods.Select(method =>
{
    double lowest = energies[method].Min();
    return new CurveSeries(method, [.. distancesAngstrom],
        [.. energies[method].Select(e => (e - lowest) * PhysicalConstants.HartreeToKcalPerMol)]);
}).ToList();
Directory.CreateDirectory(PlotFolder);
var figure = EnergyCurve.Save(curves, Path.Combine(PlotFolder, "tg4-fluoride-stretch.png"), "R(H–F) / Å",
    "E − E(lowest point) / kcal mol⁻¹", $"TG-4 H–F stretch, {basis}");
Print($"figure: {figure.Path}");
