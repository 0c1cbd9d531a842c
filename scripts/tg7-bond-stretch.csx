// TIDEGLASS TG-7 calibration dimer: the H2 bond-stretch energy curve, RHF/STO-3G.
// Energies include the nuclear repulsion, so the curve has a minimum and a dissociation limit.
// Check (run by the test suite): at R = 1.4 bohr RHF/STO-3G gives -1.1167 Eh
// (Szabo & Ostlund, Modern Quantum Chemistry, ch. 3; -1.1167143 with exactly normalised contractions).
//
//   orbitarium run scripts/tg7-bond-stretch.csx [basis]

string basis = Args.Count > 0 ? Args[0] : "STO-3G";
var distancesBohr = new[] { 1.0, 1.2, 1.3, 1.4, 1.5, 1.6, 1.8, 2.0, 2.5, 3.0 };
var curve = new List<(double R, double E)>();
Print($"H2 bond stretch, RHF/{basis}");
Print("  R / bohr     R / Å         E / Eh");
foreach (double r in distancesBohr)
{
    var h2 = Molecule.Empty
        .AddAtom("H", 0, 0, 0, LengthUnit.Bohr)
        .AddAtom("H", 0, 0, r, LengthUnit.Bohr)
        .WithTitle($"TG-7 at {r} bohr");
    var result = h2.WithBasis(basis).RunRhf(Progress, Token);
    if (!result.Converged) throw new InvalidOperationException($"RHF did not converge at R = {r} bohr: {result.StopReason}");
    curve.Add((r, result.TotalEnergyHartree));
    Print(FormattableString.Invariant($"E({r:F4} bohr) = {result.TotalEnergyHartree:F7} Eh   ({r * PhysicalConstants.AngstromPerBohr:F4} Å)"));
}
var lowest = curve.MinBy(p => p.E);
Print(FormattableString.Invariant($"lowest point on the grid: R = {lowest.R:F2} bohr, E = {lowest.E:F7} Eh"));
