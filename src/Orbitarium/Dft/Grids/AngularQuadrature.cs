using System.Collections.Concurrent;
using Orbitarium.Chemistry;

namespace Orbitarium.Dft.Grids;

/// <summary>
/// A quadrature on the unit sphere: Gauss–Legendre in cos θ × trapezoid in φ, exact for every spherical harmonic
/// of degree ≤ <see cref="Degree"/>. Weights sum to 4π.
/// </summary>
/// <remarks>The product rule needs no tables: ⌈(L+1)/2⌉ Gauss–Legendre nodes in cos θ integrate the polynomial part
/// (degree ≤ L) exactly, and L+1 equally spaced φ integrate e^{imφ} for |m| ≤ L exactly. (Stroud,
/// <i>Approximate Calculation of Multiple Integrals</i>, 1971, §2.6; common practice.) It uses about 1.5× the points of
/// a Lebedev rule of the same degree. The polar axis of the rule is z; <see cref="MolecularGrid"/> lays it out in a
/// frame fixed to the molecule.</remarks>
public sealed class AngularQuadrature
{
    private static readonly ConcurrentDictionary<int, AngularQuadrature> s_cache = new();

    private AngularQuadrature(int degree, Vector3D[] directions, double[] weights)
    {
        Degree = degree;
        Directions = directions;
        Weights = weights;
    }

    /// <summary>Highest degree of spherical harmonics integrated exactly.</summary>
    public int Degree { get; }

    /// <summary>Unit vectors of the nodes.</summary>
    public IReadOnlyList<Vector3D> Directions { get; }

    /// <summary>Weights (sum 4π).</summary>
    public IReadOnlyList<double> Weights { get; }

    /// <summary>Number of nodes: ⌈(L+1)/2⌉ × (L+1).</summary>
    public int Count => Weights.Count;

    /// <summary>The rule exact to degree <paramref name="degree"/> (cached).</summary>
    /// <exception cref="OrbitariumInputException">Degree below 1 or above 131.</exception>
    public static AngularQuadrature OfDegree(int degree)
    {
        if (degree < 1 || degree > 131)
            throw new OrbitariumInputException($"An angular quadrature degree must lie between 1 and 131; {degree} was asked.");
        return s_cache.GetOrAdd(degree, Build);
    }

    private static AngularQuadrature Build(int degree)
    {
        int nTheta = (degree + 2) / 2;
        int nPhi = degree + 1;
        var (x, w) = GaussLegendre.Create(nTheta);
        var dirs = new Vector3D[nTheta * nPhi];
        var wts = new double[nTheta * nPhi];
        int k = 0;
        for (int i = 0; i < nTheta; i++)
        {
            double ct = x[i], st = Math.Sqrt(1 - ct * ct);
            for (int j = 0; j < nPhi; j++)
            {
                // offset φ by half a step so that no node sits on a symmetry plane of a planar molecule by construction
                double phi = 2 * Math.PI * (j + 0.5) / nPhi;
                dirs[k] = new Vector3D(st * Math.Cos(phi), st * Math.Sin(phi), ct);
                wts[k] = w[i] * 2 * Math.PI / nPhi;
                k++;
            }
        }
        return new AngularQuadrature(degree, dirs, wts);
    }
}
