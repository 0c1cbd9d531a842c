using MathNet.Numerics.Integration;

namespace Orbitarium.Tests.Models;

/// <summary>Independent numerical integration over all space for two centres a distance R apart, in prolate
/// spheroidal coordinates λ = (r_A + r_B)/R, μ = (r_A − r_B)/R with dV = (R³/8)(λ² − μ²) dλ dμ dφ
/// (common practice for two-centre integrals).</summary>
internal static class SpheroidalQuadrature
{
    public static double Integrate(double distanceBohr, Func<double, double, double> integrandOfRaRb)
    {
        double r = distanceBohr;
        double[] lambdaEdges = [1, 1.5, 2.5, 5, 10, 20, 1 + 80 / r];
        double sum = 0;
        var mu = new GaussLegendreRule(-1, 1, 64);
        for (int k = 0; k + 1 < lambdaEdges.Length; k++)
        {
            if (lambdaEdges[k] >= lambdaEdges[^1]) break;
            var lam = new GaussLegendreRule(lambdaEdges[k], Math.Min(lambdaEdges[k + 1], lambdaEdges[^1]), 48);
            for (int i = 0; i < lam.Abscissas.Length; i++)
                for (int j = 0; j < mu.Abscissas.Length; j++)
                {
                    double l = lam.Abscissas[i], m = mu.Abscissas[j];
                    double ra = r * (l + m) / 2, rb = r * (l - m) / 2;
                    sum += lam.Weights[i] * mu.Weights[j] * (l * l - m * m) * integrandOfRaRb(ra, rb);
                }
        }
        return sum * 2 * Math.PI * r * r * r / 8;
    }
}
