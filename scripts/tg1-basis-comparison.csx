// TIDEGLASS TG-1 water probe: how the RHF energy falls as the basis set grows.
// The variational principle makes a larger set of the same family give a lower (or equal) energy.
// Published RHF energies near this geometry (O-H 0.958 Å, 104.5°), quoted from memory:
//   STO-3G -74.963 Eh, 6-31G* -76.011 Eh, cc-pVDZ -76.027 Eh.
//
//   orbitarium run scripts/tg1-basis-comparison.csx

string xyz = Path.Combine(ScriptDirectory, "..", "examples", "tg1-water.xyz");
var water = Molecule.FromXyzFile(xyz);
Print($"{water.Formula}: {water.Title}");
Print("basis       functions   E(RHF) / Eh      iterations");
foreach (string basis in new[] { "STO-3G", "3-21G", "6-31G*", "cc-pVDZ" })
{
    var result = water.WithBasis(basis).RunRhf(Progress, Token);
    if (!result.Converged) throw new InvalidOperationException($"{basis}: RHF did not converge ({result.StopReason}).");
    Print(FormattableString.Invariant($"{basis,-10} {result.Basis.FunctionCount,10}   E = {result.TotalEnergyHartree,15:F8}   {result.Iterations,4}"));
}
