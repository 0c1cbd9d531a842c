using MathNet.Numerics.LinearAlgebra;

namespace Orbitarium.Scf;

/// <summary>The mutable working state of one SCF run (orbitals, occupations, densities); never leaves the driver.</summary>
internal sealed class ScfState
{
    public ScfState(Matrix<double> overlap, Matrix<double> x, int alphaCount, int betaCount)
    {
        Overlap = overlap;
        X = x;
        AlphaCount = alphaCount;
        BetaCount = betaCount;
        int n = overlap.RowCount, m = x.ColumnCount;
        CoefficientsAlpha = Matrix<double>.Build.Dense(n, m);
        CoefficientsBeta = CoefficientsAlpha;
        EnergiesAlpha = new double[m];
        EnergiesBeta = EnergiesAlpha;
        DensityAlpha = Matrix<double>.Build.Dense(n, n);
        DensityBeta = DensityAlpha;
    }

    public Matrix<double> Overlap { get; }
    public Matrix<double> X { get; }
    public int AlphaCount { get; }
    public int BetaCount { get; }
    public int OrbitalCount => X.ColumnCount;

    public Matrix<double> CoefficientsAlpha { get; set; }
    public Matrix<double> CoefficientsBeta { get; set; }
    public double[] EnergiesAlpha { get; set; }
    public double[] EnergiesBeta { get; set; }
    public Matrix<double> DensityAlpha { get; set; }
    public Matrix<double> DensityBeta { get; set; }

    /// <summary>Rebuilds the densities from the current orbitals by aufbau (lowest orbitals filled).</summary>
    public void UpdateDensities()
    {
        DensityAlpha = Density(CoefficientsAlpha, AlphaCount);
        DensityBeta = ReferenceEquals(CoefficientsBeta, CoefficientsAlpha) && BetaCount == AlphaCount
            ? DensityAlpha
            : Density(CoefficientsBeta, BetaCount);
    }

    /// <summary>D = C_occ C_occᵀ for the first <paramref name="count"/> columns.</summary>
    public static Matrix<double> Density(Matrix<double> c, int count)
    {
        int n = c.RowCount;
        if (count == 0) return Matrix<double>.Build.Dense(n, n);
        var occ = c.SubMatrix(0, n, 0, count);
        return occ.TransposeAndMultiply(occ);
    }
}
