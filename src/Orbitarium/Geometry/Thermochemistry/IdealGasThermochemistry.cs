using Orbitarium.Chemistry;
using Orbitarium.Geometry.Symmetry;
using Orbitarium.Geometry.Vibrations;

namespace Orbitarium.Geometry.Thermochemistry;

/// <summary>
/// Ideal-gas, rigid-rotor, harmonic-oscillator thermochemistry from a vibrational analysis.
/// </summary>
/// <remarks>
/// Per molecule, with Θ_v = hcν̃/k_B and Θ_r = h²/(8π² I k_B):
/// S_trans = k_B[ln((2π m k_B T/h²)^{3/2} k_B T/p) + 5/2] (Sackur–Tetrode);
/// S_rot = k_B[ln(T/(σΘ_r)) + 1] (linear) or k_B[ln(√π/σ · T^{3/2}/√(Θ_AΘ_BΘ_C)) + 3/2];
/// S_vib = k_B Σ[(Θ_v/T)/(e^{Θ_v/T} − 1) − ln(1 − e^{−Θ_v/T})]; E_trans = 3/2 k_BT; E_rot = k_BT (linear) or 3/2 k_BT;
/// E_vib = Σ k_BΘ_v(½ + 1/(e^{Θ_v/T} − 1)); H = E + k_BT; G = H − TS.
/// Source: D. A. McQuarrie, <i>Statistical Mechanics</i> (Harper &amp; Row, 1976; University Science Books, 2000),
/// ch. 5–8. Imaginary modes are left out and counted.
/// </remarks>
public static class IdealGasThermochemistry
{
    /// <summary>Standard temperature 298.15 K.</summary>
    public const double StandardTemperatureKelvin = 298.15;

    /// <summary>Computes the thermochemistry of a vibrational analysis at <paramref name="temperatureKelvin"/> and
    /// <paramref name="pressurePascal"/> (defaults 298.15 K and 1 bar), the symmetry number taken from the detected
    /// point group unless given.</summary>
    /// <param name="vibrations">The analysis (its geometry, masses and wavenumbers are used).</param>
    /// <param name="temperatureKelvin">Temperature in K (default 298.15).</param>
    /// <param name="pressurePascal">Pressure in Pa (default 10⁵).</param>
    /// <param name="symmetryNumber">Override of the rotational symmetry number.</param>
    /// <param name="symmetryToleranceAngstrom">Tolerance of the point-group detection (default 0.05 Å).</param>
    /// <exception cref="OrbitariumInputException">T or p is not positive.</exception>
    public static ThermochemistryResult Compute(VibrationalAnalysis vibrations, double temperatureKelvin = StandardTemperatureKelvin,
        double pressurePascal = PhysicalConstants.StandardPressurePascal, int? symmetryNumber = null,
        double symmetryToleranceAngstrom = PointGroupDetector.DefaultToleranceAngstrom)
    {
        ArgumentNullException.ThrowIfNull(vibrations);
        if (!(temperatureKelvin > 0) || !double.IsFinite(temperatureKelvin))
            throw new OrbitariumInputException($"The temperature must be a positive number of kelvin, got {temperatureKelvin}.");
        if (!(pressurePascal > 0) || !double.IsFinite(pressurePascal))
            throw new OrbitariumInputException($"The pressure must be a positive number of pascal, got {pressurePascal} (1 bar = 100000 Pa).");
        if (symmetryNumber is int s && s < 1)
            throw new OrbitariumInputException($"The symmetry number must be at least 1, got {s}.");
        var mol = vibrations.Molecule;
        var group = PointGroupDetector.Detect(mol, symmetryToleranceAngstrom);
        int sigma = symmetryNumber ?? group.SymmetryNumber;
        double t = temperatureKelvin;
        double kB = PhysicalConstants.BoltzmannJoulePerKelvin, h = PhysicalConstants.PlanckJouleSecond;
        double kT = PhysicalConstants.BoltzmannHartreePerKelvin * t; // hartree
        double kH = PhysicalConstants.BoltzmannHartreePerKelvin;    // hartree/K

        double massKg = vibrations.MassesDalton.Sum() * PhysicalConstants.AtomicMassUnitKilogram;
        double sTrans = kH * TranslationalEntropyOverK(massKg, t, pressurePascal);
        double eTrans = 1.5 * kT;

        double sRot = 0, eRot = 0;
        if (mol.AtomCount > 1)
        {
            var moments = PrincipalMomentsKgM2(mol, vibrations.MassesDalton);
            if (vibrations.IsLinear)
            {
                sRot = kH * LinearRotationalEntropyOverK(moments[2], t, sigma);
                eRot = kT;
            }
            else
            {
                sRot = kH * NonlinearRotationalEntropyOverK(moments, t, sigma);
                eRot = 1.5 * kT;
            }
        }

        double zpe = 0, eVib = 0, sVib = 0;
        int imaginary = 0;
        double hcOverK = h * PhysicalConstants.SpeedOfLightCentimetrePerSecond / kB; // K·cm
        foreach (var mode in vibrations.Modes)
        {
            if (mode.IsImaginary) { imaginary++; continue; }
            double theta = hcOverK * mode.WavenumberPerCm;
            double u = theta / t;
            double quantum = mode.WavenumberPerCm / PhysicalConstants.HartreeToWavenumber;
            zpe += 0.5 * quantum;
            double em1 = Math.Exp(u) - 1;
            eVib += quantum * (0.5 + 1 / em1);
            sVib += kH * (u / em1 - Math.Log(1 - Math.Exp(-u)));
        }
        double sElec = kH * Math.Log(mol.Multiplicity);
        double thermal = eTrans + eRot + eVib;
        return new ThermochemistryResult(t, pressurePascal, group.Name, sigma, vibrations.Hessian.EnergyHartree, zpe, thermal,
            thermal + kT, sTrans, sRot, sVib, sElec, imaginary);
    }

    /// <summary>Sackur–Tetrode S/k_B = ln[(2π m k_B T/h²)^{3/2} k_B T/p] + 5/2 for a particle of mass <paramref name="massKilogram"/>.</summary>
    public static double TranslationalEntropyOverK(double massKilogram, double temperatureKelvin, double pressurePascal)
    {
        double kB = PhysicalConstants.BoltzmannJoulePerKelvin, h = PhysicalConstants.PlanckJouleSecond;
        double lambda = 2 * Math.PI * massKilogram * kB * temperatureKelvin / (h * h);
        return Math.Log(Math.Pow(lambda, 1.5) * kB * temperatureKelvin / pressurePascal) + 2.5;
    }

    /// <summary>Linear rigid rotor S/k_B = ln[T/(σΘ_r)] + 1, Θ_r = h²/(8π² I k_B).</summary>
    public static double LinearRotationalEntropyOverK(double momentKgM2, double temperatureKelvin, int symmetryNumber)
    {
        double theta = RotationalTemperatureKelvin(momentKgM2);
        return Math.Log(temperatureKelvin / (symmetryNumber * theta)) + 1;
    }

    /// <summary>Nonlinear rigid rotor S/k_B = ln[√π/σ · T^{3/2}/√(Θ_AΘ_BΘ_C)] + 3/2.</summary>
    public static double NonlinearRotationalEntropyOverK(IReadOnlyList<double> momentsKgM2, double temperatureKelvin, int symmetryNumber)
    {
        ArgumentNullException.ThrowIfNull(momentsKgM2);
        double prod = 1;
        foreach (double i in momentsKgM2) prod *= RotationalTemperatureKelvin(i);
        return Math.Log(Math.Sqrt(Math.PI) / symmetryNumber * Math.Pow(temperatureKelvin, 1.5) / Math.Sqrt(prod)) + 1.5;
    }

    /// <summary>Θ_r = h²/(8π² I k_B) in K for a moment of inertia in kg·m².</summary>
    public static double RotationalTemperatureKelvin(double momentKgM2)
    {
        double h = PhysicalConstants.PlanckJouleSecond;
        return h * h / (8 * Math.PI * Math.PI * momentKgM2 * PhysicalConstants.BoltzmannJoulePerKelvin);
    }

    private static double[] PrincipalMomentsKgM2(Molecule mol, IReadOnlyList<double> masses)
    {
        var com = Vector3D.Zero;
        double total = 0;
        for (int a = 0; a < mol.AtomCount; a++) { com += masses[a] * mol.Atoms[a].PositionBohr; total += masses[a]; }
        com /= total;
        var tensor = MathNet.Numerics.LinearAlgebra.Matrix<double>.Build.Dense(3, 3);
        for (int a = 0; a < mol.AtomCount; a++)
        {
            var r = mol.Atoms[a].PositionBohr - com;
            for (int i = 0; i < 3; i++)
                for (int j = 0; j < 3; j++)
                    tensor[i, j] += masses[a] * ((i == j ? r.LengthSquared : 0) - r[i] * r[j]);
        }
        var values = tensor.Evd(MathNet.Numerics.LinearAlgebra.Symmetricity.Symmetric).EigenValues.Select(v => v.Real).OrderBy(v => v).ToArray();
        double a0 = PhysicalConstants.BohrRadiusAngstrom * 1e-10;
        return [.. values.Select(v => Math.Max(v, 0) * PhysicalConstants.AtomicMassUnitKilogram * a0 * a0)];
    }
}
