using System.Collections.Immutable;
using Orbitarium.Chemistry;

namespace Orbitarium.BasisSets;

/// <summary>
/// A basis placed on a molecule: the ordered shells and the bookkeeping from basis-function index to
/// shell and atom. Basis functions are numbered atom by atom, shell by shell, component by component.
/// </summary>
public sealed class MolecularBasis
{
    private MolecularBasis(Molecule molecule, string name, ImmutableArray<Shell> shells)
    {
        Molecule = molecule;
        Name = name;
        Shells = shells;
        var offsets = ImmutableArray.CreateBuilder<int>(shells.Length);
        var atoms = ImmutableArray.CreateBuilder<int>();
        var shellOf = ImmutableArray.CreateBuilder<int>();
        var labels = ImmutableArray.CreateBuilder<string>();
        int n = 0, ncart = 0, maxL = 0;
        for (int s = 0; s < shells.Length; s++)
        {
            var sh = shells[s];
            offsets.Add(n);
            maxL = Math.Max(maxL, sh.AngularMomentum);
            string atomLabel = sh.AtomIndex >= 0 ? $"{molecule.Atoms[sh.AtomIndex].Symbol}{sh.AtomIndex + 1}" : "X";
            for (int f = 0; f < sh.FunctionCount; f++)
            {
                atoms.Add(sh.AtomIndex);
                shellOf.Add(s);
                labels.Add($"{atomLabel} {FunctionLabel(sh, f)}");
            }
            n += sh.FunctionCount;
            ncart += sh.CartesianCount;
        }
        ShellOffsets = offsets.MoveToImmutable();
        FunctionAtoms = atoms.ToImmutable();
        FunctionShells = shellOf.ToImmutable();
        FunctionLabels = labels.ToImmutable();
        FunctionCount = n;
        CartesianFunctionCount = ncart;
        MaxAngularMomentum = maxL;
    }

    /// <summary>Places <paramref name="basisSet"/> on every atom of <paramref name="molecule"/>.</summary>
    /// <param name="molecule">The molecule.</param>
    /// <param name="basisSet">The basis set; it must cover every element present.</param>
    /// <param name="pure">Override the set's default: true for pure d/f/g, false for Cartesian.</param>
    /// <exception cref="OrbitariumInputException">The set lacks an element of the molecule.</exception>
    public static MolecularBasis Create(Molecule molecule, BasisSet basisSet, bool? pure = null)
    {
        ArgumentNullException.ThrowIfNull(molecule);
        ArgumentNullException.ThrowIfNull(basisSet);
        return Create(molecule, Enumerable.Repeat(basisSet, molecule.AtomCount).ToArray(), pure, basisSet.Name);
    }

    /// <summary>Places a basis set per atom (e.g. a larger set on one atom of interest).</summary>
    /// <param name="molecule">The molecule.</param>
    /// <param name="perAtom">One basis set per atom, in atom order.</param>
    /// <param name="pure">Override each set's default pure/Cartesian choice.</param>
    /// <param name="name">Name for the combination (defaults to the distinct set names joined by '+').</param>
    public static MolecularBasis Create(Molecule molecule, IReadOnlyList<BasisSet> perAtom, bool? pure = null, string? name = null)
    {
        ArgumentNullException.ThrowIfNull(molecule);
        ArgumentNullException.ThrowIfNull(perAtom);
        if (perAtom.Count != molecule.AtomCount)
            throw new OrbitariumInputException($"Give one basis set per atom: the molecule has {molecule.AtomCount} atoms, {perAtom.Count} sets were given.");
        var shells = ImmutableArray.CreateBuilder<Shell>();
        for (int a = 0; a < molecule.AtomCount; a++)
        {
            var atom = molecule.Atoms[a];
            var set = perAtom[a];
            bool isPure = pure ?? set.DefaultPure;
            ImmutableArray<ShellDefinition> defs;
            try { defs = set.ShellsFor(atom.Element); }
            catch (OrbitariumInputException e) { throw new OrbitariumInputException($"Atom {a + 1}: {e.Message}", e); }
            foreach (var def in defs) shells.Add(new Shell(def, atom.PositionBohr, a, isPure));
        }
        name ??= string.Join("+", perAtom.Select(b => b.Name).Distinct());
        return new MolecularBasis(molecule, name, shells.ToImmutable());
    }

    /// <summary>Builds a molecular basis from shells placed by hand (e.g. floating functions).</summary>
    public static MolecularBasis FromShells(Molecule molecule, IEnumerable<Shell> shells, string name = "custom")
    {
        ArgumentNullException.ThrowIfNull(molecule);
        ArgumentNullException.ThrowIfNull(shells);
        return new MolecularBasis(molecule, name, [.. shells]);
    }

    /// <summary>The same basis on a displaced copy of the molecule (same atoms in the same order).</summary>
    /// <exception cref="ArgumentException">The new molecule's atoms differ from this one's.</exception>
    public MolecularBasis WithMolecule(Molecule moved)
    {
        ArgumentNullException.ThrowIfNull(moved);
        if (moved.AtomCount != Molecule.AtomCount)
            throw new ArgumentException($"The new geometry has {moved.AtomCount} atoms; this basis was placed on {Molecule.AtomCount}.", nameof(moved));
        for (int a = 0; a < moved.AtomCount; a++)
            if (moved.Atoms[a].Element != Molecule.Atoms[a].Element)
                throw new ArgumentException($"Atom {a + 1} is {moved.Atoms[a].Symbol} in the new geometry but {Molecule.Atoms[a].Symbol} in this basis.", nameof(moved));
        var shells = Shells.Select(s => s.AtomIndex >= 0 ? s.WithCenter(moved.Atoms[s.AtomIndex].PositionBohr) : s);
        return new MolecularBasis(moved, Name, [.. shells]);
    }

    /// <summary>The molecule the basis sits on.</summary>
    public Molecule Molecule { get; }

    /// <summary>The basis set name (or combination of names).</summary>
    public string Name { get; }

    /// <summary>All shells, in basis-function order.</summary>
    public ImmutableArray<Shell> Shells { get; }

    /// <summary>Index of the first basis function of each shell.</summary>
    public ImmutableArray<int> ShellOffsets { get; }

    /// <summary>Atom index of each basis function.</summary>
    public ImmutableArray<int> FunctionAtoms { get; }

    /// <summary>Shell index of each basis function.</summary>
    public ImmutableArray<int> FunctionShells { get; }

    /// <summary>Readable label of each basis function, e.g. "O1 px" or "C2 d+1".</summary>
    public ImmutableArray<string> FunctionLabels { get; }

    /// <summary>Number of basis functions.</summary>
    public int FunctionCount { get; }

    /// <summary>Number of Cartesian components over all shells (equals <see cref="FunctionCount"/> when all shells are Cartesian).</summary>
    public int CartesianFunctionCount { get; }

    /// <summary>Highest angular momentum present.</summary>
    public int MaxAngularMomentum { get; }

    /// <inheritdoc />
    public override string ToString() => $"{Name} on {Molecule.Formula}: {Shells.Length} shells, {FunctionCount} functions";

    private static string FunctionLabel(Shell sh, int f)
    {
        int l = sh.AngularMomentum;
        if (sh.IsPure && l >= 2) return AngularMomentum.PureLabel(l, f - l);
        var (x, y, z) = AngularMomentum.CartesianComponents(l)[f];
        return l == 0 ? "s" : $"{AngularMomentum.Letter(l)}{AngularMomentum.CartesianLabel(x, y, z)}";
    }
}
