using System.Globalization;
using MathNet.Numerics.LinearAlgebra;
using Orbitarium.Chemistry;
using Orbitarium.Scf;

namespace Orbitarium.Analysis;

/// <summary>
/// Builds the data of an orbital energy-level diagram: molecular levels between the levels of the fragments (or
/// free atoms) they come from, connected where a fragment orbital contributes, each molecular level labelled by its
/// main atomic components and its bonding character between the fragments.
/// </summary>
/// <remarks>
/// A fragment orbital f contributes to molecular orbital k with weight |⟨f|k⟩|² = (c_fᵀ S c_k)², computed in the
/// molecule's basis (a fragment's functions are the molecule's functions on its atoms, at the same positions).
/// The character is that of the largest-magnitude per-orbital overlap population between an atom of one fragment
/// and an atom of another (<see cref="OverlapPopulation"/>), never guessed from the energy.
/// </remarks>
public static class OrbitalLevelDiagram
{
    /// <summary>Connections below this weight are not drawn: 0.1.</summary>
    public const double DefaultConnectionThreshold = 0.1;

    /// <summary>A diagram of a diatomic molecule between its two free atoms (computed with the same basis and method).</summary>
    /// <param name="molecule">The molecule's SCF result (two atoms).</param>
    /// <param name="spin">Which spin's orbitals to show for unrestricted results (default α).</param>
    /// <param name="cancellationToken">Stops the atom calculations.</param>
    public static LevelDiagramData FromAtoms(ScfResult molecule, OrbitalSpin spin = OrbitalSpin.Alpha, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(molecule);
        if (molecule.Molecule.AtomCount != 2)
            throw new OrbitariumInputException($"FromAtoms draws a diatomic between its atoms; {molecule.Molecule.Formula} has {molecule.Molecule.AtomCount}. Use FromFragments with fragment results.");
        var a = FreeAtom.Compute(molecule, 0, cancellationToken);
        var b = FreeAtom.Compute(molecule, 1, cancellationToken);
        return FromFragments(molecule, a, b, spin);
    }

    /// <summary>A diagram of a molecule between two fragments computed separately (same basis set, atoms at the same
    /// positions as in the molecule).</summary>
    /// <param name="molecule">The molecule's SCF result.</param>
    /// <param name="left">The left fragment's result.</param>
    /// <param name="right">The right fragment's result.</param>
    /// <param name="spin">Which spin's orbitals to show for unrestricted results (default α).</param>
    /// <param name="lowestEnergyHartree">Lowest level shown; null shows from 1.5 Eh below the highest occupied level (hides core levels).</param>
    /// <param name="highestEnergyHartree">Highest level shown; null shows up to 0.8 Eh above the lowest empty level.</param>
    /// <param name="connectionThreshold">Weight below which connections are not drawn (default 0.1).</param>
    /// <exception cref="OrbitariumInputException">A fragment atom has no matching atom in the molecule, or the basis functions differ.</exception>
    public static LevelDiagramData FromFragments(ScfResult molecule, ScfResult left, ScfResult right, OrbitalSpin spin = OrbitalSpin.Alpha,
        double? lowestEnergyHartree = null, double? highestEnergyHartree = null, double connectionThreshold = DefaultConnectionThreshold)
    {
        ArgumentNullException.ThrowIfNull(molecule);
        ArgumentNullException.ThrowIfNull(left);
        ArgumentNullException.ThrowIfNull(right);
        var (c, occ) = ScfFields.Orbitals(molecule, spin);
        var energies = Energies(molecule, spin);
        int homo = -1;
        for (int k = 0; k < occ.Count; k++) if (occ[k] > 0) homo = k;
        double eHomo = homo >= 0 ? energies[homo] : energies[0];
        double eLumo = homo + 1 < energies.Count ? energies[homo + 1] : eHomo;
        double lo = lowestEnergyHartree ?? eHomo - 1.5;
        double hi = highestEnergyHartree ?? eLumo + 0.8;

        var fragments = new[] { left, right };
        var maps = fragments.Select(f => FunctionMap(molecule, f)).ToArray();
        var fragmentAtoms = fragments.Select((f, i) => AtomMap(molecule.Molecule, f.Molecule)).ToArray();
        var pairs = new List<(int, int)>();
        foreach (int a in fragmentAtoms[0])
            foreach (int b in fragmentAtoms[1]) pairs.Add(a < b ? (a, b) : (b, a));
        var populations = pairs.Count > 0
            ? OverlapPopulation.Compute(molecule.Basis, molecule.Overlap,
                [new OrbitalSet("", c, energies, occ)], pairs)
            : null;

        var molLevels = new List<EnergyLevel>();
        var molIndex = new List<int>();
        var compositions = Composition(molecule, spin, null, molecule.Molecule);
        for (int k = 0; k < energies.Count; k++)
        {
            if (energies[k] < lo || energies[k] > hi) continue;
            var dominant = populations?.Dominant(k);
            string character = dominant is null ? "" : dominant.Character switch
            {
                BondCharacter.Bonding => "bonding",
                BondCharacter.Antibonding => "antibonding",
                _ => "non-bonding",
            };
            string pairLabel = dominant is null ? "" : $" {Label(molecule.Molecule, dominant.AtomA)}–{Label(molecule.Molecule, dominant.AtomB)}";
            molLevels.Add(new EnergyLevel(k, energies[k], occ[k], $"{k + 1} {character}{pairLabel}: {compositions[k]}".Trim(), dominant?.Character));
            molIndex.Add(k);
        }

        var columns = new List<LevelColumn>();
        var connections = new List<LevelConnection>();
        var s = molecule.Overlap;
        for (int fi = 0; fi < 2; fi++)
        {
            var f = fragments[fi];
            var (cf, occf) = ScfFields.Orbitals(f, spin);
            var ef = Energies(f, spin);
            var compF = Composition(f, spin, fragmentAtoms[fi], molecule.Molecule);
            var levels = new List<EnergyLevel>();
            var fIndex = new List<int>();
            for (int k = 0; k < ef.Count; k++)
            {
                if (ef[k] < lo || ef[k] > hi) continue;
                levels.Add(new EnergyLevel(k, ef[k], occf[k], compF[k], null));
                fIndex.Add(k);
            }
            int column = fi == 0 ? 0 : 2;
            for (int li = 0; li < fIndex.Count; li++)
            {
                // Embed the fragment orbital in the molecular basis and project it on each molecular orbital.
                var embedded = Vector<double>.Build.Dense(molecule.Basis.FunctionCount);
                for (int mu = 0; mu < maps[fi].Length; mu++) embedded[maps[fi][mu]] = cf[mu, fIndex[li]];
                var sf = s * embedded;
                for (int mi = 0; mi < molIndex.Count; mi++)
                {
                    double o = sf.DotProduct(c.Column(molIndex[mi]));
                    if (o * o >= connectionThreshold) connections.Add(new LevelConnection(column, li, mi, o * o));
                }
            }
            columns.Add(new LevelColumn(FragmentTitle(molecule.Molecule, fragmentAtoms[fi]), levels));
        }
        columns.Insert(1, new LevelColumn(molecule.Molecule.Formula, molLevels));
        string spinText = molecule.Reference == ScfReference.Unrestricted ? (spin == OrbitalSpin.Alpha ? " (α)" : " (β)") : "";
        return new LevelDiagramData($"orbital levels of {molecule.Molecule.Formula}{spinText}, {molecule.Basis.Name}", columns, 1, connections);
    }

    private static IReadOnlyList<double> Energies(ScfResult r, OrbitalSpin spin) =>
        r.Reference == ScfReference.Unrestricted && spin == OrbitalSpin.Beta ? r.OrbitalEnergiesBetaHartree : r.OrbitalEnergiesAlphaHartree;

    private static string[] Composition(ScfResult r, OrbitalSpin spin, int[]? atomMap, Molecule labels)
    {
        bool beta = r.Reference == ScfReference.Unrestricted && spin == OrbitalSpin.Beta;
        var list = new string[r.OrbitalCount];
        for (int k = 0; k < list.Length; k++)
        {
            var m = OrbitalComposition.Analyse(r, k, beta);
            var main = m.Contributions.Where(x => x.Fraction >= 0.15).Take(3).ToList();
            if (main.Count == 0 && m.Contributions.Length > 0) main.Add(m.Contributions[0]);
            list[k] = string.Join(" + ", main.Select(x => string.Create(CultureInfo.InvariantCulture,
                $"{Label(labels, atomMap is null ? x.AtomIndex : atomMap[x.AtomIndex])} {BasisSets.AngularMomentum.Letter(x.AngularMomentum)}{(main.Count > 1 ? $" {100 * x.Fraction:F0}%" : "")}")));
        }
        return list;
    }

    private static string Label(Molecule m, int atom) => $"{m.Atoms[atom].Symbol}{atom + 1}";

    private static string FragmentTitle(Molecule molecule, int[] atoms) => string.Join(" ", atoms.Select(a => Label(molecule, a)));

    /// <summary>For each fragment atom, the matching molecule atom (same element, same position within 1e-4 bohr).</summary>
    private static int[] AtomMap(Molecule molecule, Molecule fragment)
    {
        var map = new int[fragment.AtomCount];
        for (int i = 0; i < fragment.AtomCount; i++)
        {
            map[i] = -1;
            for (int j = 0; j < molecule.AtomCount; j++)
                if (molecule.Atoms[j].Element == fragment.Atoms[i].Element &&
                    Vector3D.Distance(molecule.Atoms[j].PositionBohr, fragment.Atoms[i].PositionBohr) < 1e-4)
                    map[i] = j;
            if (map[i] < 0)
                throw new OrbitariumInputException($"Fragment atom {i} ({fragment.Atoms[i].Symbol}) has no atom of the molecule at its position; compute fragments at the molecule's geometry.");
        }
        return map;
    }

    /// <summary>For each fragment basis function, the index of the same function in the molecule's basis.</summary>
    private static int[] FunctionMap(ScfResult molecule, ScfResult fragment)
    {
        var atoms = AtomMap(molecule.Molecule, fragment.Molecule);
        var fb = fragment.Basis;
        var mb = molecule.Basis;
        var map = new int[fb.FunctionCount];
        for (int fa = 0; fa < atoms.Length; fa++)
        {
            var fIdx = Enumerable.Range(0, fb.FunctionCount).Where(mu => fb.FunctionAtoms[mu] == fa).ToArray();
            var mIdx = Enumerable.Range(0, mb.FunctionCount).Where(mu => mb.FunctionAtoms[mu] == atoms[fa]).ToArray();
            if (fIdx.Length != mIdx.Length)
                throw new OrbitariumInputException($"Fragment atom {fa} has {fIdx.Length} basis functions but the molecule has {mIdx.Length} on it; use the same basis set for fragments and molecule.");
            for (int i = 0; i < fIdx.Length; i++) map[fIdx[i]] = mIdx[i];
        }
        return map;
    }
}
