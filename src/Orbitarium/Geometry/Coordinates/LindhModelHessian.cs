using MathNet.Numerics.LinearAlgebra;
using Orbitarium.Chemistry;

namespace Orbitarium.Geometry.Coordinates;

/// <summary>
/// The model Hessian of Lindh et al.: diagonal force constants for stretches, bends and torsions that decay with the
/// distances between the atoms involved, a good starting guess for quasi-Newton optimisation.
/// </summary>
/// <remarks>
/// k_stretch = 0.45 ρᵢⱼ, k_bend = 0.15 ρᵢⱼ ρⱼₖ, k_torsion = 0.005 ρᵢⱼ ρⱼₖ ρₖₗ (hartree/bohr² or hartree/rad²), with
/// ρᵢⱼ = exp[αᵢⱼ (r²_ref,ij − r²ᵢⱼ)] and α, r_ref tabulated per pair of periodic-table rows.
/// Source: R. Lindh, A. Bernhardsson, G. Karlström and P.-Å. Malmqvist, Chem. Phys. Lett. 241, 423 (1995),
/// Table 1 (parameters from memory). Cartesian components get 0.5 Eₕ/bohr² on the diagonal and the Cartesian
/// projection of the internal model is added for them (common practice).
/// </remarks>
public static class LindhModelHessian
{
    private static readonly double[,] Alpha = { { 1.0000, 0.3949, 0.3949 }, { 0.3949, 0.2800, 0.2800 }, { 0.3949, 0.2800, 0.2800 } };
    private static readonly double[,] ReferenceBohr = { { 1.35, 2.10, 2.53 }, { 2.10, 2.87, 3.40 }, { 2.53, 3.40, 3.40 } };

    /// <summary>Force constant for a stretch (hartree/bohr²).</summary>
    public const double StretchConstant = 0.45;

    /// <summary>Force constant for a bend (hartree/rad²).</summary>
    public const double BendConstant = 0.15;

    /// <summary>Force constant for a torsion (hartree/rad²).</summary>
    public const double TorsionConstant = 0.005;

    /// <summary>The model Hessian in the coordinates of <paramref name="coordinates"/> at <paramref name="molecule"/>.</summary>
    public static Matrix<double> Build(RedundantInternalCoordinates coordinates, Molecule molecule)
    {
        ArgumentNullException.ThrowIfNull(coordinates);
        ArgumentNullException.ThrowIfNull(molecule);
        int m = coordinates.Count;
        var h = Matrix<double>.Build.Dense(m, m);
        bool anyCartesian = false;
        for (int i = 0; i < m; i++)
        {
            var c = coordinates.Coordinates[i];
            var a = c.Atoms;
            h[i, i] = c switch
            {
                BondStretch => StretchConstant * Rho(molecule, a[0], a[1]),
                BondAngle or LinearBend => BendConstant * Rho(molecule, a[0], a[1]) * Rho(molecule, a[1], a[2]),
                Dihedral => Math.Max(TorsionConstant * Rho(molecule, a[0], a[1]) * Rho(molecule, a[1], a[2]) * Rho(molecule, a[2], a[3]), 1e-3),
                _ => 0.0,
            };
            if (c is CartesianComponent) anyCartesian = true;
            h[i, i] = Math.Max(h[i, i], 0.005);
        }
        if (anyCartesian)
        {
            // Cartesian components: project the internal model onto them, Hx = Bᵀ Hq B, plus a small diagonal floor.
            var internals = RedundantInternalCoordinates.FromConnectivity(molecule);
            var x = molecule.PositionsBohr();
            var b = internals.WilsonB(x);
            var hq = Build(internals, molecule);
            var hx = b.Transpose() * hq * b;
            for (int i = 0; i < m; i++)
            {
                if (coordinates.Coordinates[i] is not CartesianComponent ci) continue;
                for (int j = 0; j < m; j++)
                {
                    if (coordinates.Coordinates[j] is not CartesianComponent cj) continue;
                    h[i, j] = hx[3 * ci.Atom + ci.Axis, 3 * cj.Atom + cj.Axis] + (i == j ? 0.005 : 0);
                }
            }
        }
        return h;
    }

    private static int Row(int z) => z <= 2 ? 0 : z <= 10 ? 1 : 2;

    private static double Rho(Molecule molecule, int i, int j)
    {
        int ri = Row(molecule.Atoms[i].NuclearCharge), rj = Row(molecule.Atoms[j].NuclearCharge);
        double r = molecule.DistanceBohr(i, j);
        return Math.Exp(Alpha[ri, rj] * (ReferenceBohr[ri, rj] * ReferenceBohr[ri, rj] - r * r));
    }
}
