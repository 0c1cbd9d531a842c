namespace Orbitarium.Tests.BasisSets;

/// <summary>Whether a printed exponent sits at the minimum of the energy it was optimised for.</summary>
internal static class ExponentStationarity
{
    /// <summary>The shift −g/H along x = ln α that reaches the minimum of <paramref name="energyOfLogShift"/> (the energy
    /// with one exponent scaled by eˣ), from central differences with step <paramref name="step"/>. Fails when the energy
    /// is not convex there.</summary>
    public static double ShiftToMinimum(Func<double, double> energyOfLogShift, double step, string what, double? energyAtZero = null)
    {
        double e0 = energyAtZero ?? energyOfLogShift(0);
        double ePlus = energyOfLogShift(step), eMinus = energyOfLogShift(-step);
        double slope = (ePlus - eMinus) / (2 * step);
        double curvature = (ePlus - 2 * e0 + eMinus) / (step * step);
        Assert.True(curvature > 0, $"{what}: energy not convex along ln α (curvature {curvature:E3})");
        return -slope / curvature;
    }
}
