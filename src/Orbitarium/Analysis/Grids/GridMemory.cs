using System.Globalization;

namespace Orbitarium.Analysis;

/// <summary>Checks, before any work, that the values of a grid fit in memory.</summary>
public static class GridMemory
{
    /// <summary>Bytes stored per grid point (one double).</summary>
    public const int BytesPerPoint = sizeof(double);

    /// <summary>The most memory one grid may take: half of the memory available to the process, and at most the
    /// largest array .NET allows.</summary>
    public static long LimitBytes
    {
        get
        {
            long available = GC.GetGCMemoryInfo().TotalAvailableMemoryBytes;
            if (available <= 0) available = 8L << 30;
            return Math.Min(available / 2, (long)Array.MaxLength * BytesPerPoint);
        }
    }

    /// <summary>Memory the values of <paramref name="pointCount"/> points need, in bytes.</summary>
    /// <param name="pointCount">Number of grid points.</param>
    public static long RequiredBytes(long pointCount) => pointCount * BytesPerPoint;

    /// <summary>Refuses a grid whose values would not fit in memory, naming the size it would need.</summary>
    /// <param name="pointCount">Number of points.</param>
    /// <param name="shape">Shape for the message, e.g. "400 × 400 × 400".</param>
    /// <exception cref="OrbitariumInputException">The grid is too large.</exception>
    public static void EnsureFits(long pointCount, string shape)
    {
        long need = RequiredBytes(pointCount), limit = LimitBytes;
        if (pointCount > Array.MaxLength || need > limit)
            throw new OrbitariumInputException(string.Create(CultureInfo.InvariantCulture,
                $"The grid {shape} has {pointCount:N0} points and would need {FormatBytes(need)} for its values, more than the {FormatBytes(limit)} allowed here; use a coarser spacing or a smaller region."));
    }

    /// <summary>Formats a byte count as KB, MB or GB (powers of 1024).</summary>
    /// <param name="bytes">Number of bytes.</param>
    public static string FormatBytes(long bytes) => bytes switch
    {
        >= 1L << 30 => string.Create(CultureInfo.InvariantCulture, $"{bytes / (double)(1L << 30):F1} GB"),
        >= 1L << 20 => string.Create(CultureInfo.InvariantCulture, $"{bytes / (double)(1L << 20):F1} MB"),
        _ => string.Create(CultureInfo.InvariantCulture, $"{bytes / 1024.0:F1} KB"),
    };
}
