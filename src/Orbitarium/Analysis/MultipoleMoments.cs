using System.Globalization;
using MathNet.Numerics.LinearAlgebra;
using Orbitarium.Chemistry;
using Orbitarium.Integrals;
using Orbitarium.Scf;

namespace Orbitarium.Analysis;

/// <summary>Dipole and quadrupole moments of an SCF density plus the nuclei, about a chosen origin (the centre of mass
/// by default).</summary>
/// <param name="OriginBohr">The origin the moments are taken about, bohr.</param>
/// <param name="DipoleAtomicUnits">Dipole vector (x, y, z) in e·a₀.</param>
/// <param name="QuadrupoleAtomicUnits">Traceless quadrupole Θ (3 × 3) in e·a₀².</param>
/// <remarks>μ = Σ_A Z_A (R_A − O) − Σ_μν D_μν ⟨μ|r − O|ν⟩. Θ is Buckingham's traceless form
/// Θ_ij = ½ Σ q (3 r_i r_j − r² δ_ij) (A. D. Buckingham, Q. Rev. Chem. Soc. 13, 183 (1959)); for a charged molecule
/// the dipole depends on the origin. Conversions: 1 e·a₀ = 2.541746 D (CODATA 2018); 1 e·a₀² = 1.345 D·Å.</remarks>
public sealed record MultipoleMoments(Vector3D OriginBohr, Vector3D DipoleAtomicUnits, Matrix<double> QuadrupoleAtomicUnits)
{
    /// <summary>Dipole vector in debye.</summary>
    public Vector3D DipoleDebye => DipoleAtomicUnits * PhysicalConstants.AtomicUnitsToDebye;

    /// <summary>Dipole magnitude in debye.</summary>
    public double DipoleMagnitudeDebye => DipoleDebye.Length;

    /// <summary>Traceless quadrupole in debye·ångström (a new matrix on each call).</summary>
    public Matrix<double> QuadrupoleDebyeAngstrom =>
        QuadrupoleAtomicUnits.Multiply(PhysicalConstants.AtomicUnitsToDebye * PhysicalConstants.BohrRadiusAngstrom);

    /// <summary>Moments of an SCF result about the centre of mass (most-abundant-isotope masses).</summary>
    public static MultipoleMoments Compute(ScfResult result)
    {
        ArgumentNullException.ThrowIfNull(result);
        return Compute(result, result.Molecule.CenterOfMassBohr);
    }

    /// <summary>Moments of an SCF result about <paramref name="originBohr"/>.</summary>
    public static MultipoleMoments Compute(ScfResult result, Vector3D originBohr)
    {
        ArgumentNullException.ThrowIfNull(result);
        var d = result.DensityTotal;
        var dip = OneElectronIntegrals.Dipole(result.Basis, originBohr);
        var second = OneElectronIntegrals.Quadrupole(result.Basis, originBohr);
        var mu = new double[3];
        var m2 = new double[6]; // xx xy xz yy yz zz
        for (int k = 0; k < 3; k++) mu[k] = -Dot(d, dip[k]);
        for (int k = 0; k < 6; k++) m2[k] = -Dot(d, second[k]);
        foreach (var atom in result.Molecule.Atoms)
        {
            var r = atom.PositionBohr - originBohr;
            double z = atom.NuclearCharge;
            mu[0] += z * r.X; mu[1] += z * r.Y; mu[2] += z * r.Z;
            m2[0] += z * r.X * r.X; m2[1] += z * r.X * r.Y; m2[2] += z * r.X * r.Z;
            m2[3] += z * r.Y * r.Y; m2[4] += z * r.Y * r.Z; m2[5] += z * r.Z * r.Z;
        }
        double trace = m2[0] + m2[3] + m2[5];
        var theta = Matrix<double>.Build.Dense(3, 3);
        int[,] index = { { 0, 1, 2 }, { 1, 3, 4 }, { 2, 4, 5 } };
        for (int i = 0; i < 3; i++)
            for (int j = 0; j < 3; j++)
                theta[i, j] = 0.5 * (3 * m2[index[i, j]] - (i == j ? trace : 0));
        return new MultipoleMoments(originBohr, new Vector3D(mu[0], mu[1], mu[2]), theta);
    }

    private static double Dot(Matrix<double> a, Matrix<double> b)
    {
        double s = 0;
        for (int i = 0; i < a.RowCount; i++)
            for (int j = 0; j < a.ColumnCount; j++) s += a[i, j] * b[i, j];
        return s;
    }

    /// <inheritdoc />
    public override string ToString()
    {
        var p = DipoleDebye;
        return string.Create(CultureInfo.InvariantCulture, $"dipole ({p.X:F4}, {p.Y:F4}, {p.Z:F4}) D, |μ| = {DipoleMagnitudeDebye:F4} D");
    }
}
