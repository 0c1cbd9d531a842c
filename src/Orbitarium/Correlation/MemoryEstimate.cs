using System.Globalization;

namespace Orbitarium.Correlation;

/// <summary>Up-front memory checks: a method that would not fit the budget is refused before it allocates.</summary>
internal static class MemoryEstimate
{
    /// <summary>Throws when <paramref name="doubles"/> 8-byte numbers exceed the budget.</summary>
    public static void Require(string method, double doubles, CorrelationOptions options, string remedy)
    {
        double bytes = doubles * 8.0;
        if (bytes > options.MemoryBudgetBytes)
            throw new OrbitariumInputException(string.Create(CultureInfo.InvariantCulture,
                $"{method} would need about {Format(bytes)} of memory, more than the budget of {Format(options.MemoryBudgetBytes)}: {remedy}"));
    }

    public static string Format(double bytes) => bytes >= 1 << 30
        ? string.Create(CultureInfo.InvariantCulture, $"{bytes / (1 << 30):F1} GiB")
        : string.Create(CultureInfo.InvariantCulture, $"{bytes / (1 << 20):F1} MiB");
}
