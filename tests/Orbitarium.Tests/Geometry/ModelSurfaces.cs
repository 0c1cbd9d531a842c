using Orbitarium.Chemistry;
using Orbitarium.Geometry;

namespace Orbitarium.Tests.Geometry;

/// <summary>Analytic model potentials with known stationary points, for testing the geometry machinery
/// independently of any electronic-structure method. Their formulas are written out here from scratch (not with the
/// library's internal-coordinate classes).</summary>
internal static class ModelSurfaces
{
    /// <summary>Harmonic bonds and angles plus an optional cosine torsion: a valence force field whose minimum is at
    /// the reference values by construction.</summary>
    public static DelegateSurface ValenceForceField(
        IReadOnlyList<(int I, int J, double R0Bohr, double K)> bonds,
        IReadOnlyList<(int I, int J, int K, double Theta0Degrees, double ForceConstant)> angles,
        IReadOnlyList<(int I, int J, int K, int L, double Amplitude, int Multiplicity)>? torsions = null)
    {
        double Energy(Molecule m)
        {
            var x = m.PositionsBohr();
            double e = 0;
            foreach (var (i, j, r0, k) in bonds)
            {
                double r = Distance(x, i, j);
                e += 0.5 * k * (r - r0) * (r - r0);
            }
            foreach (var (i, j, kk, t0, k) in angles)
            {
                double t = Angle(x, i, j, kk);
                double d = t - t0 * Math.PI / 180;
                e += 0.5 * k * d * d;
            }
            if (torsions is not null)
                foreach (var (i, j, k, l, a, n) in torsions)
                    e += a * (1 + Math.Cos(n * Torsion(x, i, j, k, l)));
            return e;
        }
        return new DelegateSurface("valence model", Energy);
    }

    /// <summary>A harmonic diatomic E = ½k(r − r₀)² with its analytic gradient.</summary>
    public static DelegateSurface HarmonicDiatomic(double r0Bohr, double kHartreePerBohr2) => new(
        "harmonic diatomic",
        m => 0.5 * kHartreePerBohr2 * Math.Pow(m.DistanceBohr(0, 1) - r0Bohr, 2),
        m =>
        {
            var d = m.Atoms[0].PositionBohr - m.Atoms[1].PositionBohr;
            double r = d.Length;
            var g = kHartreePerBohr2 * (r - r0Bohr) / r * d;
            return [g.X, g.Y, g.Z, -g.X, -g.Y, -g.Z];
        });

    /// <summary>A water-like model: two O–H bonds (1.8 bohr, k = 0.5) and the H–O–H angle (104.5°, k = 0.16).</summary>
    public static DelegateSurface WaterModel() =>
        ValenceForceField([(0, 1, 1.8, 0.5), (0, 2, 1.8, 0.5)], [(1, 0, 2, 104.5, 0.16)]);

    public static Molecule DistortedWater() => Molecule.Empty
        .AddAtom("O", 0.0, 0.0, 0.1)
        .AddAtom("H", 0.0, 0.85, -0.45)
        .AddAtom("H", 0.05, -0.70, -0.55);

    public static double Distance(double[] x, int i, int j)
    {
        double dx = x[3 * i] - x[3 * j], dy = x[3 * i + 1] - x[3 * j + 1], dz = x[3 * i + 2] - x[3 * j + 2];
        return Math.Sqrt(dx * dx + dy * dy + dz * dz);
    }

    public static double Angle(double[] x, int i, int j, int k)
    {
        double ux = x[3 * i] - x[3 * j], uy = x[3 * i + 1] - x[3 * j + 1], uz = x[3 * i + 2] - x[3 * j + 2];
        double vx = x[3 * k] - x[3 * j], vy = x[3 * k + 1] - x[3 * j + 1], vz = x[3 * k + 2] - x[3 * j + 2];
        double c = (ux * vx + uy * vy + uz * vz) / Math.Sqrt((ux * ux + uy * uy + uz * uz) * (vx * vx + vy * vy + vz * vz));
        return Math.Acos(Math.Clamp(c, -1, 1));
    }

    /// <summary>Torsion by the textbook atan2 formula (IUPAC sign convention).</summary>
    public static double Torsion(double[] x, int i, int j, int k, int l)
    {
        Vector3D P(int a) => new(x[3 * a], x[3 * a + 1], x[3 * a + 2]);
        var b1 = P(j) - P(i);
        var b2 = P(k) - P(j);
        var b3 = P(l) - P(k);
        var n1 = Vector3D.Cross(b1, b2);
        var n2 = Vector3D.Cross(b2, b3);
        var m1 = Vector3D.Cross(n1, b2 / b2.Length);
        return Math.Atan2(Vector3D.Dot(m1, n2), Vector3D.Dot(n1, n2));
    }
}
