using MathNet.Numerics.LinearAlgebra;
using Orbitarium.Chemistry;

namespace Orbitarium.Dft.Grids;

/// <summary>
/// The frame in which the angular rules of a <see cref="MolecularGrid"/> are laid out: fixed to the molecule, so that
/// a rigid rotation of the molecule rotates its grid with it (energies do not depend on how the molecule was
/// entered), and, for a linear molecule, with the rules' polar axis on the molecular axis, so that the grid keeps the
/// molecule's cylindrical symmetry.
/// </summary>
/// <remarks>
/// Axes: eigenvectors of the nuclear-charge second-moment tensor Σ Z (r − c)(r − c)ᵀ about the centre of nuclear
/// charge c (ascending eigenvalues; each axis signed so that Σ Z ((r − c)·e)³ &gt; 0, or else so that the first atom
/// off the plane through c normal to e lies on its positive side). Linear molecules: polar axis along the molecule.
/// Otherwise the polar axis of the product rule is turned to (1, 1, 1)/√3 in that frame, so that the planes of a
/// planar molecule (coordinate planes of the frame) do not coincide with the rule's sparse equator. Atoms use the
/// laboratory axes with the same turn. Orienting the grid with the molecule is common practice for rotational
/// invariance of quadrature-based energies; within degenerate eigenvalues (symmetric tops) the axes are those the
/// eigensolver returns.
/// </remarks>
internal readonly record struct GridOrientation(Vector3D XAxis, Vector3D YAxis, Vector3D ZAxis)
{
    private const double LinearTolerance = 1e-10;

    /// <summary>Coordinates in the frame → laboratory coordinates.</summary>
    public Vector3D Apply(Vector3D v) => v.X * XAxis + v.Y * YAxis + v.Z * ZAxis;

    /// <summary>The frame of <paramref name="molecule"/>.</summary>
    public static GridOrientation For(Molecule molecule)
    {
        ArgumentNullException.ThrowIfNull(molecule);
        var centre = molecule.CenterOfNuclearChargeBohr;
        var tensor = Matrix<double>.Build.Dense(3, 3);
        foreach (var atom in molecule.Atoms)
        {
            var r = atom.PositionBohr - centre;
            for (int i = 0; i < 3; i++)
                for (int j = 0; j < 3; j++)
                    tensor[i, j] += atom.NuclearCharge * r[i] * r[j];
        }
        var laboratory = new GridOrientation(new Vector3D(1, 0, 0), new Vector3D(0, 1, 0), new Vector3D(0, 0, 1));
        if (molecule.AtomCount == 1) return laboratory.Turned();

        var evd = tensor.Evd(Symmetricity.Symmetric);
        var order = new[] { 0, 1, 2 };
        Array.Sort(order, (a, b) => evd.EigenValues[a].Real.CompareTo(evd.EigenValues[b].Real));
        var axes = new Vector3D[3];
        for (int k = 0; k < 3; k++)
        {
            var column = evd.EigenVectors.Column(order[k]);
            axes[k] = Signed(molecule, centre, new Vector3D(column[0], column[1], column[2]).Normalized());
        }
        double largest = evd.EigenValues[order[2]].Real;
        bool linear = evd.EigenValues[order[1]].Real <= LinearTolerance * largest;
        // Linear: the largest spread is along the molecule; it becomes the polar axis.
        return linear ? new GridOrientation(axes[0], axes[1], axes[2]) : new GridOrientation(axes[0], axes[1], axes[2]).Turned();
    }

    private static Vector3D Signed(Molecule molecule, Vector3D centre, Vector3D axis)
    {
        double third = 0;
        foreach (var atom in molecule.Atoms)
        {
            double t = Vector3D.Dot(atom.PositionBohr - centre, axis);
            third += atom.NuclearCharge * t * t * t;
        }
        if (Math.Abs(third) > 1e-8) return third > 0 ? axis : -axis;
        foreach (var atom in molecule.Atoms)
        {
            double t = Vector3D.Dot(atom.PositionBohr - centre, axis);
            if (Math.Abs(t) > 1e-6) return t > 0 ? axis : -axis;
        }
        return axis;
    }

    // The same frame with its z axis turned onto (1, 1, 1)/√3 (Rodrigues rotation about e_z × n).
    private GridOrientation Turned()
    {
        var n = new Vector3D(1, 1, 1).Normalized();
        var k = Vector3D.Cross(new Vector3D(0, 0, 1), n);
        double sin = k.Length, cos = n.Z;
        k /= sin;
        Vector3D Rotate(Vector3D v) => cos * v + sin * Vector3D.Cross(k, v) + (1 - cos) * Vector3D.Dot(k, v) * k;
        return new GridOrientation(Apply(Rotate(new Vector3D(1, 0, 0))), Apply(Rotate(new Vector3D(0, 1, 0))), Apply(Rotate(new Vector3D(0, 0, 1))));
    }
}
