using Orbitarium.Chemistry;
using Orbitarium.Scf;

namespace Orbitarium.Tests.Analysis;

/// <summary>Small systems shared by the analysis tests, computed once per test run.</summary>
internal static class AnalysisSystems
{
    private static readonly Lazy<ScfResult> H2CcPvdz = new(() => Dihydrogen(0.741).WithBasis("cc-pVDZ").RunRhf());
    private static readonly Lazy<ScfResult> H2Sto3g = new(() => Dihydrogen(1.4 * PhysicalConstants.AngstromPerBohr).WithBasis("STO-3G").RunRhf());

    /// <summary>H₂ at the TIDEGLASS TG-7 geometry (0.741 Å), RHF/cc-pVDZ.</summary>
    public static ScfResult DihydrogenRhfCcPvdz => H2CcPvdz.Value;

    /// <summary>H₂ at 1.4 bohr, RHF/STO-3G (the Szabo–Ostlund example).</summary>
    public static ScfResult DihydrogenRhfSto3g => H2Sto3g.Value;

    public static Molecule Dihydrogen(double distanceAngstrom) =>
        Molecule.Empty.AddAtom("H", 0, 0, 0).AddAtom("H", 0, 0, distanceAngstrom);
}
