using System.Numerics;
using System.Runtime.InteropServices;

namespace Orbitarium.Dft;

/// <summary>Small vectorised loops used by the grid integration (y += a·x and dot products).</summary>
internal static class DenseKernels
{
    /// <summary>y += a·x over the common length.</summary>
    public static void Axpy(double a, ReadOnlySpan<double> x, Span<double> y)
    {
        int n = x.Length, i = 0;
        if (Vector.IsHardwareAccelerated && n >= Vector<double>.Count)
        {
            var va = new Vector<double>(a);
            var vx = MemoryMarshal.Cast<double, Vector<double>>(x);
            var vy = MemoryMarshal.Cast<double, Vector<double>>(y[..n]);
            for (int k = 0; k < vx.Length; k++) vy[k] += va * vx[k];
            i = vx.Length * Vector<double>.Count;
        }
        for (; i < n; i++) y[i] += a * x[i];
    }

    /// <summary>Σ xᵢ yᵢ.</summary>
    public static double Dot(ReadOnlySpan<double> x, ReadOnlySpan<double> y)
    {
        int n = x.Length, i = 0;
        double s = 0;
        if (Vector.IsHardwareAccelerated && n >= Vector<double>.Count)
        {
            var acc = Vector<double>.Zero;
            var vx = MemoryMarshal.Cast<double, Vector<double>>(x);
            var vy = MemoryMarshal.Cast<double, Vector<double>>(y[..n]);
            for (int k = 0; k < vx.Length; k++) acc += vx[k] * vy[k];
            s = Vector.Dot(acc, Vector<double>.One);
            i = vx.Length * Vector<double>.Count;
        }
        for (; i < n; i++) s += x[i] * y[i];
        return s;
    }
}
