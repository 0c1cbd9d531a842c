using Orbitarium.LinearAlgebra;

namespace Orbitarium.Tests.LinearAlgebra;

public class TransposedProductTests
{
    [Theory]
    [InlineData(1, 1, 1)]
    [InlineData(3, 5, 7)]
    [InlineData(37, 22, 300)]      // remainders in rows, columns and the K panel
    [InlineData(40, 41, 1025)]     // several K panels, parallel row blocks
    public void Equals_the_textbook_triple_loop(int m, int n, int k)
    {
        // C = α A Bᵀ + C, against the definition summed in order (round-off only: relative 1e-13).
        var rng = new Random(m * 1000 + n * 10 + k);
        const int aOffset = 3, bOffset = 5;
        var a = new double[aOffset + m * k];
        var b = new double[bOffset + n * k];
        var c = new double[m * n];
        for (int x = 0; x < a.Length; x++) a[x] = rng.NextDouble() - 0.5;
        for (int x = 0; x < b.Length; x++) b[x] = rng.NextDouble() - 0.5;
        for (int x = 0; x < c.Length; x++) c[x] = rng.NextDouble();
        var expected = (double[])c.Clone();
        for (int i = 0; i < m; i++)
            for (int j = 0; j < n; j++)
            {
                double s = 0;
                for (int p = 0; p < k; p++) s += a[aOffset + i * k + p] * b[bOffset + j * k + p];
                expected[i * n + j] += -0.5 * s;
            }

        TransposedProduct.Multiply(a, b, c, m, n, k, alpha: -0.5, accumulate: true, aOffset: aOffset, bOffset: bOffset);

        for (int x = 0; x < c.Length; x++) Assert.Equal(expected[x], c[x], 1e-13 * Math.Max(1, k));
    }

    [Fact]
    public void Writes_into_a_block_of_a_wider_matrix_and_leaves_the_rest_alone()
    {
        // C as a 3×4 block at row 1, column 2 of a 5×9 matrix (row stride 9).
        var rng = new Random(11);
        var a = new double[3 * 6];
        var b = new double[4 * 6];
        for (int x = 0; x < a.Length; x++) a[x] = rng.NextDouble();
        for (int x = 0; x < b.Length; x++) b[x] = rng.NextDouble();
        var c = Enumerable.Repeat(-7.0, 5 * 9).ToArray();
        TransposedProduct.Multiply(a, b, c, 3, 4, 6, cOffset: 1 * 9 + 2, cRowStride: 9);
        for (int row = 0; row < 5; row++)
            for (int col = 0; col < 9; col++)
            {
                bool inside = row >= 1 && row < 4 && col >= 2 && col < 6;
                double expected = -7.0;
                if (inside)
                {
                    expected = 0;
                    for (int p = 0; p < 6; p++) expected += a[(row - 1) * 6 + p] * b[(col - 2) * 6 + p];
                }
                Assert.Equal(expected, c[row * 9 + col], 1e-14);
            }
    }

    [Fact]
    public void Reads_A_and_B_as_blocks_of_wider_matrices()
    {
        // A: 5×3 block at column 4 of rows 9 wide; B: 6×3 block at column 1 of rows 7 wide.
        var rng = new Random(13);
        var a = new double[5 * 9];
        var b = new double[6 * 7];
        for (int x = 0; x < a.Length; x++) a[x] = rng.NextDouble();
        for (int x = 0; x < b.Length; x++) b[x] = rng.NextDouble();
        var c = new double[5 * 6];
        TransposedProduct.Multiply(a, b, c, 5, 6, 3, aOffset: 4, aRowStride: 9, bOffset: 1, bRowStride: 7);
        for (int i = 0; i < 5; i++)
            for (int j = 0; j < 6; j++)
            {
                double expected = 0;
                for (int p = 0; p < 3; p++) expected += a[i * 9 + 4 + p] * b[j * 7 + 1 + p];
                Assert.Equal(expected, c[i * 6 + j], 1e-14);
            }
    }

    [Fact]
    public void Overwrites_unless_asked_to_accumulate()
    {
        var a = new double[] { 1, 2 };
        var b = new double[] { 3, 4 };
        var c = new double[] { 100 };
        TransposedProduct.Multiply(a, b, c, 1, 1, 2);
        Assert.Equal(11, c[0]);
    }

    [Fact]
    public void Gives_the_same_bits_on_every_run()
    {
        // Each element is summed by one thread in a fixed order (what the class promises).
        var rng = new Random(5);
        var a = new double[64 * 700];
        var b = new double[48 * 700];
        for (int x = 0; x < a.Length; x++) a[x] = rng.NextDouble();
        for (int x = 0; x < b.Length; x++) b[x] = rng.NextDouble();
        var first = new double[64 * 48];
        var second = new double[64 * 48];
        TransposedProduct.Multiply(a, b, first, 64, 48, 700);
        TransposedProduct.Multiply(a, b, second, 64, 48, 700);
        Assert.Equal(first, second);
    }

    [Fact]
    public void Refuses_arrays_too_short_for_the_shape()
    {
        Assert.Throws<ArgumentException>(() => TransposedProduct.Multiply(new double[5], new double[6], new double[4], 2, 2, 3));
    }
}
