using System.Globalization;
using MathNet.Numerics.LinearAlgebra;
using Orbitarium.BasisSets;
using Orbitarium.Chemistry;

namespace Orbitarium.Analysis;

/// <summary>
/// Evaluates orbitals and densities built from a basis on any grid (plane, line or box), in parallel over batches of
/// points.
/// </summary>
/// <remarks>
/// An orbital is ψ(r) = Σ_μ C_μk φ_μ(r); a density from an AO density matrix D is ρ(r) = Σ_μν φ_μ(r) D_μν φ_ν(r),
/// evaluated through the eigen-decomposition D = Σ_k w_k v_k v_kᵀ as Σ_k w_k (v_k·φ(r))² so the cost per point is
/// N × rank(D) instead of N². Values are in atomic units (bohr^{−3/2} and bohr⁻³).
/// </remarks>
public static class FieldEvaluator
{
    private const int BatchSize = 256;

    /// <summary>Values of molecular orbital <paramref name="orbitalIndex"/> (column of <paramref name="coefficients"/>, 0-based).</summary>
    /// <param name="basis">The basis the coefficients refer to.</param>
    /// <param name="coefficients">N × M matrix of MO coefficients, one orbital per column.</param>
    /// <param name="orbitalIndex">Orbital index 0..M−1 (0-based, in the coefficients' order).</param>
    /// <param name="grid">Where to evaluate.</param>
    /// <param name="label">Name of the quantity (default "MO k", numbered from 1 as in the orbital tables).</param>
    /// <param name="cancellationToken">Stops the evaluation.</param>
    /// <exception cref="OrbitariumInputException">The orbital index is unknown or the shapes do not match.</exception>
    public static GridField Orbital(MolecularBasis basis, Matrix<double> coefficients, int orbitalIndex, IGrid grid,
        string? label = null, CancellationToken cancellationToken = default)
    {
        CheckCoefficients(basis, coefficients, orbitalIndex);
        ArgumentNullException.ThrowIfNull(grid);
        var c = coefficients.Column(orbitalIndex).ToArray();
        var values = Evaluate(basis, grid, (phi, _) => Dot(c, phi), cancellationToken);
        return new GridField(grid, basis.Molecule, values, label ?? $"MO {orbitalIndex + 1}", "bohr^-3/2", true);
    }

    /// <summary>The density of an AO density matrix (total, one spin, or a difference such as α − β).</summary>
    /// <param name="basis">The basis.</param>
    /// <param name="density">Symmetric N × N AO density matrix.</param>
    /// <param name="grid">Where to evaluate.</param>
    /// <param name="quantity">Name of the quantity (default "electron density").</param>
    /// <param name="isSigned">True when the matrix is a difference (spin density, deformation density).</param>
    /// <param name="cancellationToken">Stops the evaluation.</param>
    public static GridField Density(MolecularBasis basis, Matrix<double> density, IGrid grid, string quantity = "electron density",
        bool isSigned = false, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(basis);
        ArgumentNullException.ThrowIfNull(density);
        ArgumentNullException.ThrowIfNull(grid);
        int n = basis.FunctionCount;
        if (density.RowCount != n || density.ColumnCount != n)
            throw new OrbitariumInputException($"The density matrix is {density.RowCount}x{density.ColumnCount} but the basis has {n} functions; use the density of a calculation in this basis.");
        var sym = 0.5 * (density + density.Transpose());
        var evd = sym.Evd(Symmetricity.Symmetric);
        double max = 0;
        for (int k = 0; k < n; k++) max = Math.Max(max, Math.Abs(evd.EigenValues[k].Real));
        var weights = new List<double>();
        var vectors = new List<double[]>();
        for (int k = 0; k < n; k++)
        {
            double w = evd.EigenValues[k].Real;
            if (Math.Abs(w) <= 1e-12 * Math.Max(1, max)) continue;
            weights.Add(w);
            vectors.Add(evd.EigenVectors.Column(k).ToArray());
        }
        var wArr = weights.ToArray();
        var vArr = vectors.ToArray();
        var values = Evaluate(basis, grid, (phi, _) =>
        {
            double rho = 0;
            for (int k = 0; k < wArr.Length; k++)
            {
                double t = Dot(vArr[k], phi);
                rho += wArr[k] * t * t;
            }
            return rho;
        }, cancellationToken);
        return new GridField(grid, basis.Molecule, values, quantity, "bohr^-3", isSigned);
    }

    /// <summary>
    /// The interference part of an orbital's density between two atoms: 2 ψ_A(r) ψ_B(r) × occupation, where ψ_X is
    /// the part of the orbital built from the basis functions on atom X. Positive where the two atoms' parts add in
    /// phase (charge piled up), negative where they cancel.
    /// </summary>
    /// <param name="basis">The basis.</param>
    /// <param name="coefficients">N × M MO coefficients, one orbital per column.</param>
    /// <param name="orbitalIndex">Orbital index (0-based).</param>
    /// <param name="atomA">First atom (0-based).</param>
    /// <param name="atomB">Second atom (0-based), different from the first.</param>
    /// <param name="grid">Where to evaluate.</param>
    /// <param name="occupation">Electrons in the orbital (default 1: per electron).</param>
    /// <param name="cancellationToken">Stops the evaluation.</param>
    public static GridField OrbitalInterference(MolecularBasis basis, Matrix<double> coefficients, int orbitalIndex, int atomA, int atomB,
        IGrid grid, double occupation = 1.0, CancellationToken cancellationToken = default)
    {
        CheckCoefficients(basis, coefficients, orbitalIndex);
        ArgumentNullException.ThrowIfNull(grid);
        GridChecks.AtomIndex(basis.Molecule, atomA);
        GridChecks.AtomIndex(basis.Molecule, atomB);
        if (atomA == atomB) throw new OrbitariumInputException($"The interference term needs two different atoms; both indices are {atomA}.");
        int n = basis.FunctionCount;
        var ca = new double[n];
        var cb = new double[n];
        for (int mu = 0; mu < n; mu++)
        {
            if (basis.FunctionAtoms[mu] == atomA) ca[mu] = coefficients[mu, orbitalIndex];
            else if (basis.FunctionAtoms[mu] == atomB) cb[mu] = coefficients[mu, orbitalIndex];
        }
        var values = Evaluate(basis, grid, (phi, _) => 2 * occupation * Dot(ca, phi) * Dot(cb, phi), cancellationToken);
        var m = basis.Molecule;
        string q = string.Create(CultureInfo.InvariantCulture,
            $"interference of MO {orbitalIndex + 1} between {m.Atoms[atomA].Symbol}{atomA + 1} and {m.Atoms[atomB].Symbol}{atomB + 1}");
        return new GridField(grid, m, values, q, "bohr^-3", true);
    }

    /// <summary>Delegate that reduces the basis-function values at one point to one number.</summary>
    internal delegate double PointReducer(ReadOnlySpan<double> basisValues, Vector3D pointBohr);

    /// <summary>Runs <paramref name="reducer"/> at every grid point, in parallel over batches.</summary>
    internal static double[] Evaluate(MolecularBasis basis, IGrid grid, PointReducer reducer, CancellationToken cancellationToken)
    {
        int count = grid.PointCount, n = basis.FunctionCount;
        var values = new double[count];
        int batches = (count + BatchSize - 1) / BatchSize;
        var options = new ParallelOptions { CancellationToken = cancellationToken };
        Parallel.For(0, batches, options,
            () => (Points: new Vector3D[BatchSize], Phi: new double[BatchSize * n]),
            (b, _, scratch) =>
            {
                int start = b * BatchSize, len = Math.Min(BatchSize, count - start);
                var points = scratch.Points.AsSpan(0, len);
                grid.FillPoints(start, points);
                BasisFunctionEvaluator.EvaluateValues(basis, points, scratch.Phi.AsSpan(0, len * n));
                for (int p = 0; p < len; p++)
                    values[start + p] = reducer(scratch.Phi.AsSpan(p * n, n), points[p]);
                return scratch;
            },
            _ => { });
        return values;
    }

    internal static double Dot(double[] a, ReadOnlySpan<double> b)
    {
        double s = 0;
        for (int i = 0; i < a.Length; i++) s += a[i] * b[i];
        return s;
    }

    private static void CheckCoefficients(MolecularBasis basis, Matrix<double> coefficients, int orbitalIndex)
    {
        ArgumentNullException.ThrowIfNull(basis);
        ArgumentNullException.ThrowIfNull(coefficients);
        if (coefficients.RowCount != basis.FunctionCount)
            throw new OrbitariumInputException($"The coefficient matrix has {coefficients.RowCount} rows but the basis has {basis.FunctionCount} functions; use coefficients from a calculation in this basis.");
        if (orbitalIndex < 0 || orbitalIndex >= coefficients.ColumnCount)
            throw new OrbitariumInputException($"There is no orbital {orbitalIndex}: orbitals are numbered 0..{coefficients.ColumnCount - 1}.");
    }
}
