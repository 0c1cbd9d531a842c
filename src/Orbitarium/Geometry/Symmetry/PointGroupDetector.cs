using Orbitarium.Chemistry;

namespace Orbitarium.Geometry.Symmetry;

/// <summary>
/// Detects a molecule's point group: every operation (proper rotation Cₙ, n ≤ 8, mirror plane, inversion, improper
/// rotation S₂ₙ) that maps each atom onto an atom of the same element within a tolerance is collected from candidate
/// axes (principal axes of inertia, directions to atoms, midpoints and normals of pairs of like atoms), and the set is
/// classified into its Schoenflies group.
/// </summary>
/// <remarks>The classification scheme is the usual flow chart, e.g. F. A. Cotton, <i>Chemical Applications of Group
/// Theory</i>, 3rd ed. (Wiley, 1990), §3.14. Symmetry numbers: C. J. Cramer, <i>Essentials of Computational Chemistry</i>,
/// 2nd ed. (Wiley, 2004), Table 10.1 (common practice: the order of the rotational subgroup).</remarks>
public static class PointGroupDetector
{
    /// <summary>Default tolerance: 0.05 Å between an image and the nearest like atom.</summary>
    public const double DefaultToleranceAngstrom = 0.05;

    private const int MaxOrder = 8;

    /// <summary>Finds the point group of <paramref name="molecule"/>.</summary>
    /// <param name="molecule">The molecule.</param>
    /// <param name="toleranceAngstrom">Largest distance (Å) between a transformed atom and a like atom (default 0.05).</param>
    /// <exception cref="OrbitariumInputException">The molecule has no atoms or the tolerance is not positive.</exception>
    public static PointGroup Detect(Molecule molecule, double toleranceAngstrom = DefaultToleranceAngstrom)
    {
        ArgumentNullException.ThrowIfNull(molecule);
        if (molecule.AtomCount == 0) throw new OrbitariumInputException("The molecule has no atoms; a point group needs at least one atom.");
        if (!(toleranceAngstrom > 0)) throw new OrbitariumInputException($"The symmetry tolerance must be positive (Å), got {toleranceAngstrom}.");
        double tol = toleranceAngstrom * PhysicalConstants.BohrPerAngstrom;
        var com = molecule.CenterOfMassBohr;
        var r = molecule.Atoms.Select(a => a.PositionBohr - com).ToArray();
        var z = molecule.Atoms.Select(a => a.NuclearCharge).ToArray();
        if (r.Length == 1) return new PointGroup("Kh", 1, toleranceAngstrom);

        bool linear = IsLinear(r, tol);
        bool inversion = Maps(r, z, tol, p => -p);
        if (linear) return inversion ? new PointGroup("D∞h", 2, toleranceAngstrom) : new PointGroup("C∞v", 1, toleranceAngstrom);

        var axes = CandidateAxes(molecule, r, z, tol);
        // Proper rotations: highest order per axis.
        var rotations = new List<(Vector3D Axis, int Order)>();
        foreach (var axis in axes)
        {
            for (int n = MaxOrder; n >= 2; n--)
            {
                if (Maps(r, z, tol, p => Rotate(p, axis, 2 * Math.PI / n))) { rotations.Add((axis, n)); break; }
            }
        }
        var mirrors = axes.Where(a => Maps(r, z, tol, p => Reflect(p, a))).ToList();
        int maxOrder = rotations.Count == 0 ? 1 : rotations.Max(t => t.Order);
        int highAxes = rotations.Count(t => t.Order >= 3);

        string name;
        int sigma;
        if (highAxes >= 2)
        {
            // Cubic and icosahedral groups.
            if (rotations.Any(t => t.Order == 5)) { name = inversion ? "Ih" : "I"; sigma = 60; }
            else if (rotations.Any(t => t.Order == 4)) { name = inversion ? "Oh" : "O"; sigma = 24; }
            else { name = inversion ? "Th" : mirrors.Count > 0 ? "Td" : "T"; sigma = 12; }
            return new PointGroup(name, sigma, toleranceAngstrom);
        }
        if (maxOrder == 1)
        {
            name = inversion ? "Ci" : mirrors.Count > 0 ? "Cs" : "C1";
            return new PointGroup(name, 1, toleranceAngstrom);
        }
        // Main axis: the unique highest-order axis (for D2 any of the three C2 axes).
        var main = rotations.First(t => t.Order == maxOrder).Axis;
        int n0 = maxOrder;
        int perpendicularC2 = rotations.Count(t => Math.Abs(Vector3D.Dot(t.Axis, main)) < 1e-3 &&
            (t.Order % 2 == 0 || Maps(r, z, tol, p => Rotate(p, t.Axis, Math.PI))));
        // Axes may have been recorded with a higher order than 2 only if they are main axes; count C2 perpendicular.
        bool sigmaH = mirrors.Any(m => Math.Abs(Math.Abs(Vector3D.Dot(m, main)) - 1) < 1e-3);
        bool sigmaV = mirrors.Any(m => Math.Abs(Vector3D.Dot(m, main)) < 1e-3);
        if (perpendicularC2 >= n0)
        {
            name = sigmaH ? $"D{n0}h" : sigmaV ? $"D{n0}d" : $"D{n0}";
            sigma = 2 * n0;
        }
        else
        {
            bool s2n = Maps(r, z, tol, p => Reflect(Rotate(p, main, Math.PI / n0), main));
            name = sigmaH ? $"C{n0}h" : sigmaV ? $"C{n0}v" : s2n ? $"S{2 * n0}" : $"C{n0}";
            sigma = n0;
        }
        return new PointGroup(name, sigma, toleranceAngstrom);
    }

    private static bool IsLinear(Vector3D[] r, double tol)
    {
        Vector3D axis = default;
        foreach (var p in r) if (p.Length > tol) { axis = p.Normalized(); break; }
        if (axis.LengthSquared == 0) return true;
        foreach (var p in r)
            if ((p - Vector3D.Dot(p, axis) * axis).Length > tol) return false;
        return true;
    }

    private static List<Vector3D> CandidateAxes(Molecule molecule, Vector3D[] r, int[] z, double tol)
    {
        var list = new List<Vector3D>();
        void Add(Vector3D v)
        {
            if (v.Length < 1e-6) return;
            var u = v.Normalized();
            foreach (var w in list) if (Math.Abs(Math.Abs(Vector3D.Dot(u, w)) - 1) < 1e-6) return;
            list.Add(u);
        }
        var evd = molecule.InertiaTensorDaltonBohr2().Evd(MathNet.Numerics.LinearAlgebra.Symmetricity.Symmetric);
        for (int k = 0; k < 3; k++) Add(new Vector3D(evd.EigenVectors[0, k], evd.EigenVectors[1, k], evd.EigenVectors[2, k]));
        for (int i = 0; i < r.Length; i++)
        {
            if (r[i].Length > tol) Add(r[i]);
            for (int j = 0; j < i; j++)
            {
                if (z[i] != z[j]) continue;
                Add(r[i] + r[j]);
                Add(r[i] - r[j]);
                Add(Vector3D.Cross(r[i], r[j]));
            }
        }
        return list;
    }

    private static bool Maps(Vector3D[] r, int[] z, double tol, Func<Vector3D, Vector3D> op)
    {
        for (int i = 0; i < r.Length; i++)
        {
            var p = op(r[i]);
            bool found = false;
            for (int j = 0; j < r.Length && !found; j++)
                found = z[j] == z[i] && (p - r[j]).Length < tol;
            if (!found) return false;
        }
        return true;
    }

    private static Vector3D Rotate(Vector3D p, Vector3D axis, double angle)
    {
        double c = Math.Cos(angle), s = Math.Sin(angle);
        return c * p + s * Vector3D.Cross(axis, p) + (1 - c) * Vector3D.Dot(axis, p) * axis;
    }

    private static Vector3D Reflect(Vector3D p, Vector3D normal) => p - 2 * Vector3D.Dot(p, normal) * normal;
}
