using System.Globalization;

namespace Orbitarium.Analysis;

/// <summary>Validation shared by the grid factories.</summary>
internal static class GridChecks
{
    public static void Positive(double value, string what)
    {
        if (!(value > 0) || !double.IsFinite(value))
            throw new OrbitariumInputException(string.Create(CultureInfo.InvariantCulture, $"The {what} must be a finite positive number, got {value}."));
    }

    public static void NonNegative(double value, string what)
    {
        if (!(value >= 0) || !double.IsFinite(value))
            throw new OrbitariumInputException(string.Create(CultureInfo.InvariantCulture, $"The {what} must be a finite number ≥ 0, got {value}."));
    }

    public static void AtomIndex(Chemistry.Molecule molecule, int index, string role = "atom")
    {
        if (index < 0 || index >= molecule.AtomCount)
            throw new OrbitariumInputException(
                $"There is no {role} with index {index}: the molecule has {molecule.AtomCount} atoms, numbered 0..{molecule.AtomCount - 1}.");
    }

    public static int Count(double length, double spacing, string what)
    {
        double n = Math.Floor(length / spacing + 1e-9) + 1;
        if (n > int.MaxValue / 4)
            throw new OrbitariumInputException(string.Create(CultureInfo.InvariantCulture,
                $"The {what} would have {n:E2} points along one direction; use a coarser spacing."));
        return Math.Max(2, (int)n);
    }
}
