using System.Collections.Immutable;
using System.Globalization;
using System.Text;
using MathNet.Numerics.LinearAlgebra;
using Orbitarium.BasisSets;
using Orbitarium.Chemistry;

namespace Orbitarium.Scf;

/// <summary>
/// The outcome of a self-consistent-field run (Hartree–Fock or Kohn–Sham): energies and their parts, orbitals,
/// occupations, densities, Fock matrices, the iteration history and why it stopped.
/// </summary>
/// <remarks>
/// Immutable. The matrices are shared with the result, not copied: treat them as read-only
/// (call <c>.Clone()</c> before changing one). AO matrices are N × N in the order of
/// <see cref="MolecularBasis.FunctionLabels"/>; coefficient matrices are N × M with one column per molecular orbital
/// (M = N minus dropped linear dependencies), orbitals in ascending energy.
/// A result that is not <see cref="Converged"/> holds the last energy; never use it as if it were converged.
/// </remarks>
public sealed class ScfResult
{
    internal ScfResult() { }

    /// <summary>The molecule (geometry, charge, multiplicity).</summary>
    public required Molecule Molecule { get; init; }

    /// <summary>The basis placed on the molecule.</summary>
    public required MolecularBasis Basis { get; init; }

    /// <summary>The kind of reference determinant.</summary>
    public required ScfReference Reference { get; init; }

    /// <summary>The options the run used.</summary>
    public required ScfOptions Options { get; init; }

    /// <summary>Short method name: "RHF", "UHF", "ROHF", or with a functional "RKS/B3LYP", "UKS/B3LYP", "ROKS/B3LYP".</summary>
    public string MethodName
    {
        get
        {
            var xc = Options.ExchangeCorrelation;
            if (xc is null)
                return Reference switch { ScfReference.Restricted => "RHF", ScfReference.Unrestricted => "UHF", _ => "ROHF" };
            string k = Reference switch { ScfReference.Restricted => "RKS", ScfReference.Unrestricted => "UKS", _ => "ROKS" };
            return $"{k}/{xc.Name}";
        }
    }

    /// <summary>Whether the run met both convergence thresholds.</summary>
    public bool Converged => StopReason is ScfStopReason.Converged or ScfStopReason.ConvergedGridLimited;

    /// <summary>One line on how the iterations ended, e.g. "converged in 11 iterations", "converged in 14 iterations;
    /// orbital gradient 1.2E-006 Eh is grid-limited" or "NOT CONVERGED (MaximumIterationsReached) after 128 iterations".</summary>
    public string ConvergenceDescription => (StopReason switch
    {
        ScfStopReason.Converged => FormattableString.Invariant($"converged in {Iterations} iterations"),
        ScfStopReason.ConvergedGridLimited => FormattableString.Invariant(
            $"converged in {Iterations} iterations; orbital gradient {History[^1].CommutatorNorm:0.0E+0} Eh is grid-limited"),
        _ => FormattableString.Invariant($"NOT CONVERGED ({StopReason}) after {Iterations} iterations"),
    }) + (AutomaticLevelShiftIteration is int k ? FormattableString.Invariant($"; automatic level shift from iteration {k}") : "");

    /// <summary>Why the iterations stopped.</summary>
    public required ScfStopReason StopReason { get; init; }

    /// <summary>Number of iterations run.</summary>
    public int Iterations => History.Length;

    /// <summary>Every iteration's energy, energy change, commutator norm and DIIS subspace size.</summary>
    public required ImmutableArray<ScfIteration> History { get; init; }

    /// <summary>Total energy, electronic plus nuclear repulsion, hartree.</summary>
    public double TotalEnergyHartree =>
        NuclearRepulsionHartree + OneElectronEnergyHartree + TwoElectronEnergyHartree + ExchangeCorrelationEnergyHartree;

    /// <summary>Electronic energy (total minus nuclear repulsion), hartree.</summary>
    public double ElectronicEnergyHartree => TotalEnergyHartree - NuclearRepulsionHartree;

    /// <summary>Nuclear repulsion energy Σ Z_A Z_B / R_AB, hartree.</summary>
    public required double NuclearRepulsionHartree { get; init; }

    /// <summary>One-electron energy Σ D_μν H_μν (kinetic plus nuclear attraction), hartree.</summary>
    public required double OneElectronEnergyHartree { get; init; }

    /// <summary>Two-electron energy: Coulomb minus (scaled) exact exchange, ½ Σ D·J − ½ x Σ_σ D^σ·K^σ, hartree.</summary>
    public required double TwoElectronEnergyHartree { get; init; }

    /// <summary>Exchange–correlation energy of the functional, hartree (0 for Hartree–Fock).</summary>
    public required double ExchangeCorrelationEnergyHartree { get; init; }

    /// <summary>One line describing the functional and grid (null for Hartree–Fock).</summary>
    public string? ExchangeCorrelationDescription { get; init; }

    /// <summary>Number of α electrons.</summary>
    public int AlphaElectronCount => Molecule.AlphaElectronCount;

    /// <summary>Number of β electrons.</summary>
    public int BetaElectronCount => Molecule.BetaElectronCount;

    /// <summary>α orbital energies, hartree, ascending (for ROHF, eigenvalues of the effective Fock matrix).</summary>
    public required ImmutableArray<double> OrbitalEnergiesAlphaHartree { get; init; }

    /// <summary>β orbital energies, hartree (the same as α for restricted references).</summary>
    public required ImmutableArray<double> OrbitalEnergiesBetaHartree { get; init; }

    /// <summary>α MO coefficients, N × M (columns are orbitals).</summary>
    public required Matrix<double> CoefficientsAlpha { get; init; }

    /// <summary>β MO coefficients, N × M (the same matrix as α for restricted references).</summary>
    public required Matrix<double> CoefficientsBeta { get; init; }

    /// <summary>α occupation of each orbital (0 or 1).</summary>
    public required ImmutableArray<double> OccupationsAlpha { get; init; }

    /// <summary>β occupation of each orbital (0 or 1).</summary>
    public required ImmutableArray<double> OccupationsBeta { get; init; }

    /// <summary>Total occupation of each spatial orbital for restricted references (0, 1 or 2); α + β.</summary>
    public ImmutableArray<double> Occupations
    {
        get
        {
            var b = ImmutableArray.CreateBuilder<double>(OccupationsAlpha.Length);
            for (int i = 0; i < OccupationsAlpha.Length; i++) b.Add(OccupationsAlpha[i] + OccupationsBeta[i]);
            return b.MoveToImmutable();
        }
    }

    /// <summary>α AO density matrix D^α = C^α_occ C^α_occᵀ.</summary>
    public required Matrix<double> DensityAlpha { get; init; }

    /// <summary>β AO density matrix.</summary>
    public required Matrix<double> DensityBeta { get; init; }

    /// <summary>Total AO density matrix D^α + D^β (Σ D·S = number of electrons).</summary>
    public required Matrix<double> DensityTotal { get; init; }

    /// <summary>Spin density matrix D^α − D^β.</summary>
    public Matrix<double> DensitySpin => DensityAlpha - DensityBeta;

    /// <summary>α Fock (or Kohn–Sham) matrix of the final density, hartree.</summary>
    public required Matrix<double> FockAlpha { get; init; }

    /// <summary>β Fock matrix of the final density, hartree (equal to α for RHF).</summary>
    public required Matrix<double> FockBeta { get; init; }

    /// <summary>AO overlap matrix S.</summary>
    public required Matrix<double> Overlap { get; init; }

    /// <summary>Core Hamiltonian H = T + V (kinetic plus nuclear attraction), hartree.</summary>
    public required Matrix<double> CoreHamiltonian { get; init; }

    /// <summary>⟨S²⟩ of the determinant: S_z(S_z+1) + N_β − Σ_ij |⟨φ_i^α|φ_j^β⟩|² (Szabo &amp; Ostlund eq. 2.271);
    /// exactly S(S+1) for RHF and ROHF.</summary>
    public required double SpinSquared { get; init; }

    /// <summary>S(S+1) of a pure spin state of the molecule's multiplicity, for comparison with <see cref="SpinSquared"/>.</summary>
    public double ExpectedSpinSquared
    {
        get
        {
            double s = (Molecule.Multiplicity - 1) / 2.0;
            return s * (s + 1);
        }
    }

    /// <summary>How the two-electron integrals were handled, e.g. "in-core (3.1 MB)" or "integral-direct".</summary>
    public required string IntegralMode { get; init; }

    /// <summary>The orthogonalisation used (symmetric switches to canonical when linear dependencies are found).</summary>
    public required OrthogonalizationKind OrthogonalizationUsed { get; init; }

    /// <summary>Number of near-linearly-dependent combinations dropped from the basis.</summary>
    public required int DroppedLinearDependencies { get; init; }

    /// <summary>The iteration at which <see cref="ScfOptions.AutomaticLevelShiftHartree"/> switched on, or null when it
    /// did not.</summary>
    public int? AutomaticLevelShiftIteration { get; init; }

    /// <summary>Number of molecular orbitals (basis functions minus dropped dependencies).</summary>
    public int OrbitalCount => OrbitalEnergiesAlphaHartree.Length;

    /// <summary>Seconds spent on integrals (one-electron matrices and the two-electron set-up).</summary>
    public required double IntegralSeconds { get; init; }

    /// <summary>Seconds spent on the starting guess.</summary>
    public required double GuessSeconds { get; init; }

    /// <summary>Seconds spent on the iterations.</summary>
    public required double IterationSeconds { get; init; }

    /// <summary>Energy of the highest occupied orbital (either spin), hartree; null without electrons.</summary>
    public double? HomoEnergyHartree
    {
        get
        {
            double? best = null;
            for (int i = 0; i < OrbitalCount; i++)
            {
                if (OccupationsAlpha[i] > 0 && (best is null || OrbitalEnergiesAlphaHartree[i] > best)) best = OrbitalEnergiesAlphaHartree[i];
                if (OccupationsBeta[i] > 0 && (best is null || OrbitalEnergiesBetaHartree[i] > best)) best = OrbitalEnergiesBetaHartree[i];
            }
            return best;
        }
    }

    /// <summary>Energy of the lowest unoccupied orbital (either spin), hartree; null when every orbital is filled.</summary>
    public double? LumoEnergyHartree
    {
        get
        {
            double? best = null;
            for (int i = 0; i < OrbitalCount; i++)
            {
                if (OccupationsAlpha[i] == 0 && (best is null || OrbitalEnergiesAlphaHartree[i] < best)) best = OrbitalEnergiesAlphaHartree[i];
                if (OccupationsBeta[i] == 0 && (best is null || OrbitalEnergiesBetaHartree[i] < best)) best = OrbitalEnergiesBetaHartree[i];
            }
            return best;
        }
    }

    /// <summary>HOMO–LUMO gap, hartree; null when either is missing.</summary>
    public double? GapHartree => HomoEnergyHartree is double h && LumoEnergyHartree is double l ? l - h : null;

    /// <summary>HOMO–LUMO gap in electronvolt (CODATA 2018 conversion); null when either is missing.</summary>
    public double? GapElectronVolt => GapHartree * PhysicalConstants.HartreeToElectronVolt;

    /// <summary>A few lines: method, energy, convergence, HOMO/LUMO.</summary>
    public override string ToString()
    {
        var c = CultureInfo.InvariantCulture;
        var sb = new StringBuilder();
        sb.Append(c, $"{MethodName}/{Basis.Name} on {Molecule.Formula} (charge {Molecule.Charge}, multiplicity {Molecule.Multiplicity}, {Basis.FunctionCount} basis functions)\n");
        sb.Append(c, $"  total energy       {TotalEnergyHartree,20:F10} Eh\n");
        sb.Append(c, $"  nuclear repulsion  {NuclearRepulsionHartree,20:F10} Eh\n");
        if (Converged) sb.Append(c, $"  {ConvergenceDescription} ({IntegralMode})\n");
        else sb.Append(c, $"  NOT CONVERGED: {StopReason} after {Iterations} iterations; the energy is the last iterate's (an oscillating open shell usually converges with a level shift, ScfOptions.LevelShiftHartree = 0.2–0.5)\n");
        if (Reference != ScfReference.Restricted) sb.Append(c, $"  <S^2> = {SpinSquared:F6} (pure state {ExpectedSpinSquared:F4})\n");
        if (HomoEnergyHartree is double h) sb.Append(c, $"  HOMO {h:F6} Eh");
        if (LumoEnergyHartree is double l) sb.Append(c, $"  LUMO {l:F6} Eh  gap {GapElectronVolt:F4} eV");
        return sb.ToString().TrimEnd();
    }
}
