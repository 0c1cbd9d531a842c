// TIDEGLASS TG-2 hydroxyl radical (a doublet): unrestricted vs restricted open-shell Hartree-Fock.
// UHF lets the alpha and beta orbitals differ, so its energy is at or below ROHF's (variational principle,
// common practice); the price is spin contamination: <S^2> above the pure doublet's 0.75, while ROHF is a
// pure spin state with <S^2> = 0.75 exactly.
//
//   orbitarium run scripts/tg2-hydroxyl-uhf-rohf.csx [basis]

string basis = Args.Count > 0 ? Args[0] : "6-31G*";
string xyz = Path.Combine(ScriptDirectory, "..", "examples", "tg2-hydroxyl.xyz");
var hydroxyl = Molecule.FromXyzFile(xyz);
Print($"{hydroxyl.Formula}, charge {hydroxyl.Charge}, multiplicity {hydroxyl.Multiplicity} ({hydroxyl.AlphaElectronCount} alpha, {hydroxyl.BetaElectronCount} beta), {basis}");
var setup = hydroxyl.WithBasis(basis);
var uhf = setup.RunUhf(Progress, Token);
var rohf = setup.RunRohf(Progress, Token);
foreach (var r in new[] { uhf, rohf })
{
    if (!r.Converged) throw new InvalidOperationException($"{r.MethodName} did not converge ({r.StopReason}).");
    Print(FormattableString.Invariant($"{r.MethodName,-5} E = {r.TotalEnergyHartree:F8} Eh   <S^2> = {r.SpinSquared:F6}   iterations {r.Iterations}"));
}
Print(FormattableString.Invariant($"E(UHF) - E(ROHF) = {(uhf.TotalEnergyHartree - rohf.TotalEnergyHartree) * 1000:F4} mEh"));
