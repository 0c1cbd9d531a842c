using Orbitarium.BasisSets;

namespace Orbitarium.Integrals;

/// <summary>
/// A shell's Cartesian-to-basis-function matrix (<see cref="Shell.Transform"/>) in flat form, and the
/// index-by-index application of such matrices to raw integral blocks.
/// </summary>
internal sealed class ShellTransform
{
    private ShellTransform(int rows, int columns, double[] matrix, bool isIdentity)
    {
        Rows = rows; Columns = columns; Matrix = matrix; IsIdentity = isIdentity;
    }

    /// <summary>The transform of a placed shell.</summary>
    public static ShellTransform For(Shell shell)
    {
        var t = shell.Transform;
        int rows = t.GetLength(0), cols = t.GetLength(1);
        var flat = new double[rows * cols];
        bool identity = rows == cols;
        for (int i = 0; i < rows; i++)
            for (int j = 0; j < cols; j++)
            {
                flat[i * cols + j] = t[i, j];
                if (t[i, j] != (i == j ? 1.0 : 0.0)) identity = false;
            }
        return new ShellTransform(rows, cols, flat, identity);
    }

    /// <summary>Number of basis functions (rows).</summary>
    public int Rows { get; }

    /// <summary>Number of Cartesian components (columns).</summary>
    public int Columns { get; }

    /// <summary>Row-major Rows × Columns matrix.</summary>
    public double[] Matrix { get; }

    /// <summary>Whether the matrix is the identity (s, p and Cartesian shells whose components are already normalised).</summary>
    public bool IsIdentity { get; }

    /// <summary>
    /// Applies this transform to the middle index of data viewed as [pre][Columns][post], writing [pre][Rows][post].
    /// </summary>
    public void ApplyToIndex(ReadOnlySpan<double> source, Span<double> target, int pre, int post)
    {
        if (IsIdentity)
        {
            source[..(pre * Columns * post)].CopyTo(target);
            return;
        }
        target[..(pre * Rows * post)].Clear();
        for (int a = 0; a < pre; a++)
            for (int r = 0; r < Rows; r++)
            {
                var dst = target.Slice((a * Rows + r) * post, post);
                for (int c = 0; c < Columns; c++)
                {
                    double w = Matrix[r * Columns + c];
                    if (w == 0) continue;
                    var src = source.Slice((a * Columns + c) * post, post);
                    for (int t = 0; t < post; t++) dst[t] += w * src[t];
                }
            }
    }

    /// <summary>Transforms a raw two-index block [na][nb] to basis functions in place order (result in <paramref name="target"/>).</summary>
    public static void Apply2(ShellTransform ta, ShellTransform tb, ReadOnlySpan<double> raw, Span<double> target, Span<double> scratch)
    {
        tb.ApplyToIndex(raw, scratch, ta.Columns, 1);
        ta.ApplyToIndex(scratch, target, 1, tb.Rows);
    }

    /// <summary>Transforms a raw four-index block [na][nb][nc][nd]; <paramref name="work"/> is overwritten and
    /// must hold the raw block size; the result lands in <paramref name="target"/>.</summary>
    public static void Apply4(ShellTransform ta, ShellTransform tb, ShellTransform tc, ShellTransform td,
        Span<double> work, Span<double> target)
    {
        if (ta.IsIdentity && tb.IsIdentity && tc.IsIdentity && td.IsIdentity)
        {
            work[..(ta.Columns * tb.Columns * tc.Columns * td.Columns)].CopyTo(target);
            return;
        }
        // work → target → work → target, index d, c, b, a.
        td.ApplyToIndex(work, target, ta.Columns * tb.Columns * tc.Columns, 1);
        tc.ApplyToIndex(target, work, ta.Columns * tb.Columns, td.Rows);
        tb.ApplyToIndex(work, target, ta.Columns, tc.Rows * td.Rows);
        target[..(tb.Rows * tc.Rows * td.Rows * ta.Columns)].CopyTo(work);
        ta.ApplyToIndex(work, target, 1, tb.Rows * tc.Rows * td.Rows);
    }
}
