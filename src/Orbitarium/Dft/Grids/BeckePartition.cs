using Orbitarium.Chemistry;

namespace Orbitarium.Dft.Grids;

/// <summary>
/// Becke's fuzzy-cell partition of space into atomic cells, with atomic size adjustment.
/// </summary>
/// <remarks>A. D. Becke, J. Chem. Phys. 88, 2547 (1988): cell functions s(μ) = ½(1 − p(p(p(ν)))), p(x) = 3x/2 − x³/2,
/// ν = μ + a(1 − μ²), μ = (r_A − r_B)/R_AB; size adjustment a = u/(u² − 1), u = (χ − 1)/(χ + 1), χ = R_A/R_B from
/// Bragg–Slater radii, |a| ≤ ½ (his appendix). The weight of atom A at r is P_A(r)/Σ_B P_B(r), P_A = Π_{B≠A} s(ν_AB).</remarks>
internal sealed class BeckePartition
{
    private readonly Vector3D[] _centers;
    private readonly double[,] _inverseDistance;
    private readonly double[,] _adjustment;

    public BeckePartition(Molecule molecule)
    {
        int n = molecule.AtomCount;
        _centers = new Vector3D[n];
        _inverseDistance = new double[n, n];
        _adjustment = new double[n, n];
        var radii = new double[n];
        for (int a = 0; a < n; a++)
        {
            _centers[a] = molecule.Atoms[a].PositionBohr;
            radii[a] = BraggSlaterRadii.RadiusBohr(molecule.Atoms[a].Element);
        }
        for (int a = 0; a < n; a++)
            for (int b = 0; b < n; b++)
            {
                if (a == b) continue;
                _inverseDistance[a, b] = 1 / Vector3D.Distance(_centers[a], _centers[b]);
                double chi = radii[a] / radii[b];
                double u = (chi - 1) / (chi + 1);
                double adj = Math.Abs(u) < 1e-12 ? 0 : u / (u * u - 1);
                _adjustment[a, b] = Math.Clamp(adj, -0.5, 0.5);
            }
    }

    public int AtomCount => _centers.Length;

    /// <summary>Becke weight of <paramref name="atom"/> at <paramref name="point"/>; <paramref name="scratch"/> needs 2 × AtomCount.</summary>
    public double Weight(int atom, Vector3D point, Span<double> scratch)
    {
        int n = _centers.Length;
        if (n == 1) return 1;
        var dist = scratch[..n];
        var cell = scratch.Slice(n, n);
        for (int a = 0; a < n; a++) dist[a] = Vector3D.Distance(point, _centers[a]);
        double total = 0;
        for (int a = 0; a < n; a++)
        {
            double p = 1;
            for (int b = 0; b < n && p > 0; b++)
            {
                if (a == b) continue;
                double mu = (dist[a] - dist[b]) * _inverseDistance[a, b];
                double nu = mu + _adjustment[a, b] * (1 - mu * mu);
                double f = nu;
                f = 1.5 * f - 0.5 * f * f * f;
                f = 1.5 * f - 0.5 * f * f * f;
                f = 1.5 * f - 0.5 * f * f * f;
                p *= 0.5 * (1 - f);
            }
            cell[a] = p;
            total += p;
        }
        return total > 0 ? cell[atom] / total : 0;
    }
}
