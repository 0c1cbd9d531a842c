using System.Collections.Immutable;
using System.Globalization;
using System.Text;
using MathNet.Numerics.LinearAlgebra;
using Orbitarium.Chemistry;

namespace Orbitarium.Geometry.Vibrations;

/// <summary>
/// Harmonic vibrational analysis: the mass-weighted Hessian with translations and rotations projected out,
/// its eigenvalues as wavenumbers (cm⁻¹), the normal modes, and infrared intensities from dipole derivatives.
/// </summary>
/// <remarks>
/// ν̃ = √(λ / m_u[mₑ]) · Eₕ[cm⁻¹] for eigenvalue λ in Eₕ/(bohr²·u); imaginary frequencies are reported as negative
/// numbers and flagged. IR intensity A = N_A π/(3c²) · |∂μ/∂Q|², i.e. 974.87 km/mol per (e²/u), from CODATA constants.
/// Sources: E. B. Wilson, J. C. Decius and P. C. Cross, <i>Molecular Vibrations</i> (1955), ch. 2 and 11;
/// intensities: common practice (double-harmonic approximation).
/// </remarks>
public sealed class VibrationalAnalysis
{
    /// <summary>Modes with |ν̃| below this (cm⁻¹) that are imaginary are still flagged but called "small": 50 cm⁻¹.</summary>
    public const double SmallImaginaryWavenumberPerCm = 50;

    private VibrationalAnalysis(CartesianHessian hessian, ImmutableArray<double> masses, ImmutableArray<VibrationalMode> modes, bool linear, string methodName)
    {
        Hessian = hessian;
        MassesDalton = masses;
        Modes = modes;
        IsLinear = linear;
        MethodName = methodName;
    }

    /// <summary>The method, e.g. "RHF/STO-3G".</summary>
    public string MethodName { get; }

    /// <summary>The Cartesian Hessian analysed.</summary>
    public CartesianHessian Hessian { get; }

    /// <summary>The geometry.</summary>
    public Molecule Molecule => Hessian.Molecule;

    /// <summary>Atomic masses used (u): most-abundant isotopes unless overridden.</summary>
    public ImmutableArray<double> MassesDalton { get; }

    /// <summary>Whether the molecule is linear (3N − 5 modes).</summary>
    public bool IsLinear { get; }

    /// <summary>The 3N − 6 (3N − 5 for linear molecules) normal modes, ascending; imaginary ones first.</summary>
    public ImmutableArray<VibrationalMode> Modes { get; }

    /// <summary>The wavenumbers in cm⁻¹ (negative for imaginary), ascending.</summary>
    public ImmutableArray<double> WavenumbersPerCm => [.. Modes.Select(m => m.WavenumberPerCm)];

    /// <summary>Number of imaginary modes: 0 at a minimum, 1 at a transition state.</summary>
    public int ImaginaryModeCount => Modes.Count(m => m.IsImaginary);

    /// <summary>Analyses a Hessian.</summary>
    /// <param name="hessian">Cartesian Hessian (e.g. from <see cref="FiniteDifferenceHessian"/>).</param>
    /// <param name="methodName">Name shown in results.</param>
    /// <param name="massesDalton">Per-atom masses in u (e.g. for isotopologues); default most-abundant isotopes.</param>
    /// <exception cref="OrbitariumInputException">The mass list has the wrong length or a non-positive mass.</exception>
    public static VibrationalAnalysis FromHessian(CartesianHessian hessian, string methodName = "", IReadOnlyList<double>? massesDalton = null)
    {
        ArgumentNullException.ThrowIfNull(hessian);
        var mol = hessian.Molecule;
        int n = mol.AtomCount, n3 = 3 * n;
        var masses = new double[n];
        for (int a = 0; a < n; a++) masses[a] = massesDalton is null ? mol.Atoms[a].Element.MostAbundantIsotopeMassDalton : massesDalton[a];
        if (massesDalton is not null && massesDalton.Count != n)
            throw new OrbitariumInputException($"Give one mass per atom: the molecule has {n} atoms, {massesDalton.Count} masses were given.");
        foreach (double m in masses)
            if (!(m > 0)) throw new OrbitariumInputException($"Atomic mass {m} u is not positive; give masses in dalton (u).");
        var x = mol.PositionsBohr();
        var rigid = RigidBodyModes.Basis(x, masses);
        bool linear = n == 2 || (n > 2 && rigid.ColumnCount == 5);
        var modes = ImmutableArray.CreateBuilder<VibrationalMode>();
        if (n > 1)
        {
            var invSqrt = new double[n3];
            for (int i = 0; i < n3; i++) invSqrt[i] = 1 / Math.Sqrt(masses[i / 3]);
            var hmw = Matrix<double>.Build.Dense(n3, n3, (i, j) => hessian.HessianHartreePerBohr2[i, j] * invSqrt[i] * invSqrt[j]);
            var d = RigidBodyModes.ComplementBasis(x, masses);
            var hv = d.Transpose() * hmw * d;
            hv = 0.5 * (hv + hv.Transpose());
            var evd = hv.Evd(Symmetricity.Symmetric);
            var order = Enumerable.Range(0, hv.RowCount).OrderBy(i => evd.EigenValues[i].Real).ToArray();
            double irFactor = IrIntensityFactorKmPerMol;
            for (int k = 0; k < order.Length; k++)
            {
                double lambda = evd.EigenValues[order[k]].Real;
                var lmw = d * evd.EigenVectors.Column(order[k]);
                var cart = Vector<double>.Build.Dense(n3, i => lmw[i] * invSqrt[i]);
                double norm2 = cart.DotProduct(cart);
                double reduced = 1 / norm2;
                var disp = cart / Math.Sqrt(norm2);
                double wavenumber = Math.Sign(lambda) * Math.Sqrt(Math.Abs(lambda) / PhysicalConstants.AtomicMassUnitInElectronMasses) * PhysicalConstants.HartreeToWavenumber;
                double? ir = null;
                if (hessian.DipoleDerivatives is Matrix<double> dmu)
                {
                    var dq = dmu * cart; // ∂μ/∂Q in e·a₀/(bohr·u^½)
                    ir = irFactor * dq.DotProduct(dq);
                }
                modes.Add(new VibrationalMode(k, wavenumber, lambda, [.. disp], ir, reduced));
            }
        }
        return new VibrationalAnalysis(hessian, [.. masses], modes.ToImmutable(), linear, methodName);
    }

    /// <summary>N_A π/(3c²) · Eₕ a₀ / m_u: converts |∂μ/∂Q|² in e²/u to km/mol (≈ 974.87).</summary>
    public static double IrIntensityFactorKmPerMol
    {
        get
        {
            double c = PhysicalConstants.SpeedOfLightCentimetrePerSecond * 1e-2;
            double a0 = PhysicalConstants.BohrRadiusAngstrom * 1e-10;
            return PhysicalConstants.AvogadroPerMole * Math.PI * a0 * PhysicalConstants.HartreeToJoule /
                   (3 * c * c * PhysicalConstants.AtomicMassUnitKilogram) * 1e-3;
        }
    }

    /// <summary>The normal mode as a multi-frame XYZ animation (Å): <paramref name="frames"/> frames of one period,
    /// largest displacement <paramref name="amplitudeAngstrom"/>.</summary>
    public string ModeAnimationXyz(int modeIndex, int frames = 20, double amplitudeAngstrom = 0.3)
    {
        if (modeIndex < 0 || modeIndex >= Modes.Length)
            throw new OrbitariumInputException($"Mode {modeIndex} does not exist; modes are 0..{Modes.Length - 1}.");
        var mode = Modes[modeIndex];
        double maxComponent = mode.CartesianDisplacement.Max(Math.Abs);
        double scale = amplitudeAngstrom * PhysicalConstants.BohrPerAngstrom / Math.Max(maxComponent, 1e-12);
        var x0 = Molecule.PositionsBohr();
        var list = new List<Molecule>();
        for (int f = 0; f < frames; f++)
        {
            double s = Math.Sin(2 * Math.PI * f / frames) * scale;
            var x = new double[x0.Length];
            for (int i = 0; i < x.Length; i++) x[i] = x0[i] + s * mode.CartesianDisplacement[i];
            list.Add(Molecule.WithPositionsBohr(x).WithTitle(FormattableString.Invariant($"mode {modeIndex + 1} {mode.WavenumberPerCm:F1} cm-1 frame {f + 1}")));
        }
        return XyzFormat.WriteFrames(list);
    }

    /// <inheritdoc />
    public override string ToString()
    {
        var sb = new StringBuilder();
        sb.Append(CultureInfo.InvariantCulture, $"Harmonic frequencies ({MethodName}, {Modes.Length} modes");
        if (ImaginaryModeCount > 0) sb.Append(CultureInfo.InvariantCulture, $", {ImaginaryModeCount} IMAGINARY");
        sb.Append(')');
        foreach (var m in Modes) sb.Append('\n').Append(m);
        return sb.ToString();
    }
}
