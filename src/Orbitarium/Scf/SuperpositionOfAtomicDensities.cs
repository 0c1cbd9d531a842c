using MathNet.Numerics.LinearAlgebra;
using Orbitarium.BasisSets;
using Orbitarium.Chemistry;

namespace Orbitarium.Scf;

/// <summary>
/// The superposition-of-atomic-densities starting guess: a block-diagonal AO density made of each neutral atom's
/// spherically averaged Hartree–Fock density in its own basis functions.
/// </summary>
/// <remarks>Almlöf, Faegri &amp; Korsell, J. Comput. Chem. 3, 385 (1982); Van Lenthe et al., J. Comput. Chem. 27, 926 (2006).
/// Each distinct atom (element and shells) runs a small closed-shell SCF with fractional occupations: the Z electrons fill
/// orbitals in order of energy, and orbitals within 1 mEh of each other share their electrons equally, which keeps the
/// density spherical for open-shell atoms. The density is a guess only; its electron count is that of the neutral atoms.</remarks>
public static class SuperpositionOfAtomicDensities
{
    private const double DegeneracyHartree = 1e-3;

    /// <summary>Builds the guess density (total, α + β) for a basis on a molecule.</summary>
    /// <param name="basis">The basis placed on the molecule.</param>
    /// <param name="cancellationToken">Stops the atomic calculations.</param>
    public static Matrix<double> Build(MolecularBasis basis, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(basis);
        int n = basis.FunctionCount;
        var density = Matrix<double>.Build.Dense(n, n);
        var cache = new List<(Element Element, Shell[] Shells, Matrix<double> Density)>();
        for (int a = 0; a < basis.Molecule.AtomCount; a++)
        {
            var functions = new List<int>();
            var shells = new List<Shell>();
            for (int s = 0; s < basis.Shells.Length; s++)
            {
                if (basis.Shells[s].AtomIndex != a) continue;
                shells.Add(basis.Shells[s]);
                for (int f = 0; f < basis.Shells[s].FunctionCount; f++) functions.Add(basis.ShellOffsets[s] + f);
            }
            if (shells.Count == 0) continue;
            var element = basis.Molecule.Atoms[a].Element;
            Matrix<double>? atomic = null;
            foreach (var entry in cache)
                if (entry.Element == element && SameShells(entry.Shells, shells)) { atomic = entry.Density; break; }
            if (atomic is null)
            {
                atomic = AtomDensity(element, shells, cancellationToken);
                cache.Add((element, [.. shells], atomic));
            }
            for (int i = 0; i < functions.Count; i++)
                for (int j = 0; j < functions.Count; j++)
                    density[functions[i], functions[j]] = atomic[i, j];
        }
        return density;
    }

    private static bool SameShells(Shell[] a, List<Shell> b)
    {
        if (a.Length != b.Count) return false;
        for (int i = 0; i < a.Length; i++)
            if (!ReferenceEquals(a[i].Definition, b[i].Definition) || a[i].IsPure != b[i].IsPure) return false;
        return true;
    }

    private static Matrix<double> AtomDensity(Element element, List<Shell> shells, CancellationToken cancellationToken)
    {
        var atom = Molecule.FromAtoms([new Atom(element, Vector3D.Zero)]);
        var basis = MolecularBasis.FromShells(atom, shells.Select(s => new Shell(s.Definition, Vector3D.Zero, 0, s.IsPure)), "atomic guess");
        var ints = ScfIntegrals.Compute(basis, 256L * 1024 * 1024, false, cancellationToken);
        var orth = Orthogonalizer.Create(ints.Overlap, OrthogonalizationKind.Canonical, 1e-7);
        var x = orth.Transform;
        int m = x.ColumnCount, n = basis.FunctionCount;
        double electrons = Math.Min(element.AtomicNumber, 2.0 * m);
        var fock = ints.CoreHamiltonian;
        var density = Matrix<double>.Build.Dense(n, n);
        var diis = new Diis(6);
        for (int iteration = 0; iteration < 40; iteration++)
        {
            cancellationToken.ThrowIfCancellationRequested();
            var fo = x.TransposeThisAndMultiply(fock) * x;
            fo = (fo + fo.Transpose()).Multiply(0.5);
            var evd = fo.Evd(Symmetricity.Symmetric);
            var c = x * evd.EigenVectors;
            var eps = new double[m];
            for (int i = 0; i < m; i++) eps[i] = evd.EigenValues[i].Real;
            var order = Enumerable.Range(0, m).ToArray();
            Array.Sort((double[])eps.Clone(), order);
            var occupation = new double[m];
            double left = electrons;
            for (int start = 0; start < m && left > 1e-12;)
            {
                int end = start + 1;
                while (end < m && eps[order[end]] - eps[order[start]] < DegeneracyHartree) end++;
                double put = Math.Min(left, 2.0 * (end - start));
                for (int k = start; k < end; k++) occupation[order[k]] = put / (end - start);
                left -= put;
                start = end;
            }
            var next = Matrix<double>.Build.Dense(n, n);
            for (int k = 0; k < m; k++)
            {
                if (occupation[k] == 0) continue;
                var col = c.Column(k);
                next = next + col.OuterProduct(col).Multiply(occupation[k]);
            }
            double change = (next - density).InfinityNorm();
            density = next;
            if (change < 1e-5) break; // a guess needs no more
            var jk = ints.Kernel.Build([density], true, cancellationToken);
            fock = ints.CoreHamiltonian + jk.Coulomb[0] - jk.Exchange![0].Multiply(0.5);
            var fds = fock * density * ints.Overlap;
            var error = x.TransposeThisAndMultiply(fds - fds.Transpose()) * x;
            diis.Add([fock], [error]);
            fock = diis.Extrapolate()[0];
        }
        return density;
    }
}
