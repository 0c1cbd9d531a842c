using Orbitarium.Scf;

namespace Orbitarium.Analysis;

/// <summary>Bonding analysis of an SCF result: overlap populations per atom pair split per orbital (α and β
/// separately for UHF). Mayer bond orders are in <see cref="MayerBondOrders"/>.</summary>
public static class BondingAnalysis
{
    /// <summary>Per-orbital Mulliken overlap populations and bonding characters (see <see cref="OverlapPopulation"/>).</summary>
    /// <param name="result">The SCF result.</param>
    /// <param name="pairs">Atom pairs (0-based); null for the bonded pairs of the molecule (all pairs when none is bonded).</param>
    /// <param name="threshold">Non-bonding threshold per electron (default 0.02).</param>
    public static OverlapPopulationTable OverlapPopulations(ScfResult result, IReadOnlyList<(int A, int B)>? pairs = null,
        double threshold = OverlapPopulation.DefaultThreshold)
    {
        ArgumentNullException.ThrowIfNull(result);
        if (pairs is null)
        {
            var bonded = result.Molecule.BondedPairs();
            pairs = bonded.Count > 0 ? [.. bonded.Select(p => (p.I, p.J))] : null;
        }
        return OverlapPopulation.Compute(result.Basis, result.Overlap, OrbitalSets(result), pairs, threshold);
    }

    /// <summary>The orbital sets of a result: one restricted set, or α and β for UHF.</summary>
    /// <param name="result">The SCF result.</param>
    public static IReadOnlyList<OrbitalSet> OrbitalSets(ScfResult result)
    {
        ArgumentNullException.ThrowIfNull(result);
        if (result.Reference == ScfReference.Unrestricted)
            return
            [
                new OrbitalSet("α", result.CoefficientsAlpha, result.OrbitalEnergiesAlphaHartree, result.OccupationsAlpha),
                new OrbitalSet("β", result.CoefficientsBeta, result.OrbitalEnergiesBetaHartree, result.OccupationsBeta),
            ];
        return [new OrbitalSet("", result.CoefficientsAlpha, result.OrbitalEnergiesAlphaHartree, result.Occupations)];
    }
}
