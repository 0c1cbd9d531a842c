using MathNet.Numerics.LinearAlgebra;

namespace Orbitarium.Correlation;

/// <summary>
/// Davidson's iterative eigensolver for the lowest roots of a large symmetric matrix given only as a product
/// σ = H·c and its diagonal, with the diagonal (Davidson) preconditioner and subspace collapse.
/// </summary>
/// <remarks>E. R. Davidson, J. Comput. Phys. 17, 87 (1975); multi-root form B. Liu, NRCC report LBL-8158 (1978).
/// Small problems (dimension ≤ 64) are diagonalised densely.</remarks>
public static class DavidsonSolver
{
    /// <summary>Finds the lowest <paramref name="roots"/> eigenpairs.</summary>
    /// <param name="dimension">Matrix dimension.</param>
    /// <param name="diagonal">The matrix diagonal (length <paramref name="dimension"/>).</param>
    /// <param name="multiply">Computes σ = H·c into its second argument (zeroed on entry).</param>
    /// <param name="roots">Number of lowest eigenpairs wanted.</param>
    /// <param name="options">Residual threshold (on the residual norm), energy threshold, iteration limit.</param>
    /// <param name="progress">Receives (iteration, lowest eigenvalue, largest residual norm).</param>
    /// <param name="cancellationToken">Stops the iterations.</param>
    /// <param name="method">Name shown in progress reports.</param>
    public static DavidsonResult Solve(int dimension, ReadOnlySpan<double> diagonal, Action<double[], double[]> multiply, int roots,
        CorrelationOptions? options = null, IProgress<CorrelationProgress>? progress = null, CancellationToken cancellationToken = default,
        string method = "Davidson")
    {
        Check(dimension, diagonal.Length, multiply, roots);
        options ??= CorrelationOptions.Default;
        var diag = diagonal.ToArray();
        if (dimension <= 64) return Dense(dimension, multiply, roots);
        return Iterate(dimension, diag, multiply, roots, options, progress, cancellationToken, method, symmetric: true, project: null);
    }

    /// <summary>
    /// Finds the eigenpairs of lowest real part of a large non-symmetric matrix (a coupled-cluster Jacobian, say),
    /// with right eigenvectors. Eigenvalues that come out complex in the subspace are reported by their real part.
    /// </summary>
    /// <param name="dimension">Matrix dimension.</param>
    /// <param name="diagonal">The matrix diagonal (length <paramref name="dimension"/>).</param>
    /// <param name="multiply">Computes σ = A·c into its second argument (zeroed on entry).</param>
    /// <param name="roots">Number of eigenpairs wanted.</param>
    /// <param name="project">Applied to every new correction vector, to keep the search inside a subspace (for
    /// example the vectors that respect a symmetry of the parameters); null for none.</param>
    /// <param name="options">Residual threshold (on the residual norm), energy threshold, iteration limit.</param>
    /// <param name="progress">Receives (iteration, lowest eigenvalue, largest residual norm).</param>
    /// <param name="cancellationToken">Stops the iterations.</param>
    /// <param name="method">Name shown in progress reports.</param>
    public static DavidsonResult SolveNonSymmetric(int dimension, ReadOnlySpan<double> diagonal, Action<double[], double[]> multiply,
        int roots, Action<double[]>? project = null, CorrelationOptions? options = null, IProgress<CorrelationProgress>? progress = null,
        CancellationToken cancellationToken = default, string method = "Davidson")
    {
        Check(dimension, diagonal.Length, multiply, roots);
        return Iterate(dimension, diagonal.ToArray(), multiply, roots, options ?? CorrelationOptions.Default, progress, cancellationToken,
            method, symmetric: false, project);
    }

    private static void Check(int dimension, int diagonalLength, Action<double[], double[]> multiply, int roots)
    {
        ArgumentNullException.ThrowIfNull(multiply);
        if (roots < 1 || roots > dimension)
            throw new OrbitariumInputException($"Asked for {roots} roots of a {dimension}-dimensional problem: ask for between 1 and {dimension}.");
        if (diagonalLength != dimension)
            throw new OrbitariumInputException($"The diagonal has {diagonalLength} entries for dimension {dimension}.");
    }

    private static DavidsonResult Iterate(int dimension, double[] diag, Action<double[], double[]> multiply, int roots,
        CorrelationOptions options, IProgress<CorrelationProgress>? progress, CancellationToken cancellationToken, string method,
        bool symmetric, Action<double[]>? project)
    {

        int maxSubspace = Math.Max(8 * roots, 24);
        var basis = new List<double[]>();
        var sigmas = new List<double[]>();
        var order = Enumerable.Range(0, dimension).OrderBy(i => diag[i]).ToArray();
        // Davidson keeps the symmetry of its start vectors, so a state whose leading configuration is far up the
        // diagonal is found only if a start vector reaches it. The non-symmetric (coupled-cluster) problems, whose
        // correlation reorders configurations more, start from more vectors.
        int guesses = Math.Min(dimension, symmetric ? Math.Max(roots + 2, 2 * roots) : Math.Max(roots + 6, 2 * roots));
        // Unit vectors on the lowest diagonal elements; a projection may make two of them the same vector, so take
        // further ones until there are enough independent guesses.
        for (int g = 0; g < dimension && basis.Count < guesses; g++)
        {
            var c = new double[dimension];
            c[order[g]] = 1;
            project?.Invoke(c);
            AddVector(c);
        }
        if (basis.Count < roots)
            throw new OrbitariumInputException($"Only {basis.Count} independent directions exist for {roots} roots: ask for at most {basis.Count}.");
        var eigen = new double[roots];
        var previous = Enumerable.Repeat(double.PositiveInfinity, roots).ToArray();
        var residualNorms = new double[roots];
        double[][] ritz = [];
        var energyHistory = new List<double>();
        var residualHistory = new List<double>();
        bool converged = false;
        string reason = $"reached the limit of {options.MaxIterations} iterations";
        int iteration = 0;
        while (iteration < options.MaxIterations)
        {
            cancellationToken.ThrowIfCancellationRequested();
            iteration++;
            int k = basis.Count;
            var small = Matrix<double>.Build.Dense(k, k);
            for (int i = 0; i < k; i++)
                for (int j = 0; j < k; j++)
                    if (!symmetric || j <= i)
                    {
                        double h = MolecularIntegralTransformation.Dot(basis[i], sigmas[j]);
                        small[i, j] = h;
                        if (symmetric) small[j, i] = h;
                    }
            var evd = small.Evd(symmetric ? Symmetricity.Symmetric : Symmetricity.Asymmetric);
            // The symmetric solver returns ascending eigenvalues; the general one does not, so order by real part.
            var rank = Enumerable.Range(0, k).OrderBy(i => evd.EigenValues[i].Real).ToArray();
            ritz = new double[roots][];
            var newVectors = new List<double[]>();
            double maxResidual = 0;
            for (int r = 0; r < roots; r++)
            {
                int column = rank[r];
                double theta = evd.EigenValues[column].Real;
                eigen[r] = theta;
                var x = new double[dimension];
                var res = new double[dimension];
                double length = 0;
                for (int i = 0; i < k; i++) length += evd.EigenVectors[i, column] * evd.EigenVectors[i, column];
                length = Math.Sqrt(length);
                for (int i = 0; i < k; i++)
                {
                    double y = evd.EigenVectors[i, column] / length;
                    MolecularIntegralTransformation.Axpy(y, basis[i], x);
                    MolecularIntegralTransformation.Axpy(y, sigmas[i], res);
                }
                MolecularIntegralTransformation.Axpy(-theta, x, res);
                ritz[r] = x;
                double norm = Math.Sqrt(MolecularIntegralTransformation.Dot(res, res));
                residualNorms[r] = norm;
                maxResidual = Math.Max(maxResidual, norm);
                if (norm > options.ResidualThreshold)
                {
                    for (int i = 0; i < dimension; i++)
                    {
                        double den = theta - diag[i];
                        res[i] /= Math.Abs(den) < 1e-4 ? (den < 0 ? -1e-4 : 1e-4) : den;
                    }
                    project?.Invoke(res);
                    newVectors.Add(res);
                }
            }
            double maxChange = 0;
            for (int r = 0; r < roots; r++) maxChange = Math.Max(maxChange, Math.Abs(eigen[r] - previous[r]));
            Array.Copy(eigen, previous, roots);
            energyHistory.Add(eigen[0]);
            residualHistory.Add(maxResidual);
            progress?.Report(new CorrelationProgress(method, iteration, eigen[0], maxResidual));
            if (maxResidual <= options.ResidualThreshold && maxChange <= options.EnergyThresholdHartree)
            {
                converged = true;
                reason = "all residual norms and eigenvalue changes below the thresholds";
                break;
            }
            if (basis.Count + newVectors.Count > maxSubspace)
            {
                basis.Clear();
                sigmas.Clear();
                foreach (var x in ritz) AddVector((double[])x.Clone());
            }
            int added = 0;
            foreach (var nv in newVectors)
                if (AddVector(nv)) added++;
            if (added == 0 && newVectors.Count > 0)
            {
                // The corrections lie in the subspace already: the Ritz pairs are as good as this basis allows.
                converged = maxResidual <= Math.Sqrt(options.ResidualThreshold);
                reason = converged ? "subspace exhausted with small residuals" : "the correction vectors became linearly dependent";
                break;
            }
        }
        return new DavidsonResult([.. eigen], [.. ritz], [.. residualNorms], iteration, converged, reason, [.. energyHistory], [.. residualHistory]);

        bool AddVector(double[] c)
        {
            for (int pass = 0; pass < 2; pass++)
                foreach (var b in basis)
                    MolecularIntegralTransformation.Axpy(-MolecularIntegralTransformation.Dot(b, c), b, c);
            double norm = Math.Sqrt(MolecularIntegralTransformation.Dot(c, c));
            if (norm < 1e-8) return false;
            for (int i = 0; i < c.Length; i++) c[i] /= norm;
            var s = new double[c.Length];
            multiply(c, s);
            basis.Add(c);
            sigmas.Add(s);
            return true;
        }
    }

    private static DavidsonResult Dense(int dimension, Action<double[], double[]> multiply, int roots)
    {
        var h = Matrix<double>.Build.Dense(dimension, dimension);
        for (int j = 0; j < dimension; j++)
        {
            var e = new double[dimension];
            e[j] = 1;
            var s = new double[dimension];
            multiply(e, s);
            for (int i = 0; i < dimension; i++) h[i, j] = s[i];
        }
        h = 0.5 * (h + h.Transpose());
        var evd = h.Evd(Symmetricity.Symmetric);
        var values = new double[roots];
        var vectors = new double[roots][];
        for (int r = 0; r < roots; r++)
        {
            values[r] = evd.EigenValues[r].Real;
            vectors[r] = evd.EigenVectors.Column(r).ToArray();
        }
        return new DavidsonResult([.. values], [.. vectors], [.. new double[roots]], 1, true, "diagonalised densely (small dimension)", [values[0]], [0.0]);
    }
}
