using MathNet.Numerics.Integration;
using Orbitarium.Chemistry;

namespace Orbitarium.Models;

/// <summary>
/// The exact two-centre LCAO model of one electron over two protons (the hydrogen molecular ion H₂⁺) in 1s Slater
/// orbitals A and B with a common exponent ζ, either fixed or optimised at each distance.
/// </summary>
/// <remarks>
/// <para>The normalised combinations are ψ± = (A ± B)/√(2(1 ± S)); their energies are
/// E±(R) = (H_AA ± H_AB)/(1 ± S) + 1/R with the closed-form integrals of <see cref="SlaterTwoCentreIntegrals"/>.
/// The energy is variational in ζ, so the optimised exponent minimises E at every R.</para>
/// <para>Textbook results this model reproduces (I. N. Levine, <i>Quantum Chemistry</i>): with ζ = 1 the in-phase
/// state is bound with Rₑ = 2.49 bohr, Dₑ = 1.76 eV; with ζ optimised (B. N. Finkelstein and G. E. Horowitz,
/// Z. Phys. 48, 118 (1928)) ζ ≈ 1.24, Rₑ = 2.00 bohr, Dₑ = 2.35 eV. The exact values, Rₑ = 2.00 bohr and
/// Dₑ = 2.79 eV, are in <see cref="HydrogenMolecularIonExact"/>.</para>
/// <para>Geometry of the spatial functions: nucleus A at (0, 0, −R/2), nucleus B at (0, 0, +R/2), in bohr.</para>
/// </remarks>
public sealed partial class TwoCentreLcaoModel
{
    /// <summary>Smallest exponent the optimiser tries (bohr⁻¹).</summary>
    public const double MinimumExponent = 0.2;

    /// <summary>Largest exponent the optimiser tries (bohr⁻¹); 2 is the united-atom (He⁺) limit.</summary>
    public const double MaximumExponent = 3.0;

    private TwoCentreLcaoModel(double? fixedExponent) => FixedExponent = fixedExponent;

    /// <summary>The model with a fixed exponent ζ (1 = the free hydrogen 1s orbital).</summary>
    /// <param name="exponent">Slater exponent ζ in bohr⁻¹, between 0.2 and 3.</param>
    public static TwoCentreLcaoModel WithExponent(double exponent = 1.0)
    {
        if (!(exponent >= MinimumExponent && exponent <= MaximumExponent))
            throw new OrbitariumInputException(FormattableString.Invariant(
                $"The Slater exponent ζ = {exponent} is outside {MinimumExponent}..{MaximumExponent} bohr⁻¹; give a value in that range (1 is the free hydrogen atom)."));
        return new TwoCentreLcaoModel(exponent);
    }

    /// <summary>The model with ζ optimised (energy minimised) at each distance and for each combination.</summary>
    public static TwoCentreLcaoModel WithOptimizedExponent() => new(null);

    /// <summary>The fixed exponent, or null when ζ is optimised at each distance.</summary>
    public double? FixedExponent { get; }

    /// <summary>A short name for tables and legends, e.g. "LCAO, ζ = 1" or "LCAO, ζ optimised".</summary>
    public string Name => FixedExponent is double z ? FormattableString.Invariant($"LCAO, ζ = {z:0.###}") : "LCAO, ζ optimised";

    /// <summary>The exponent used at distance R for one combination: the fixed one or the energy-minimising one.</summary>
    /// <param name="distanceBohr">Internuclear distance in bohr (&gt; 0).</param>
    /// <param name="combination">In-phase or out-of-phase.</param>
    public double ExponentAt(double distanceBohr, LcaoCombination combination = LcaoCombination.InPhase)
    {
        CheckDistance(distanceBohr);
        if (FixedExponent is double z) return z;
        return GoldenSectionSearch.Minimize(zeta => ElectronicEnergy(distanceBohr, zeta, combination), MinimumExponent, MaximumExponent, 1e-10);
    }

    /// <summary>Evaluates one combination at one distance: S, J, K and the energies.</summary>
    /// <param name="distanceBohr">Internuclear distance in bohr (&gt; 0).</param>
    /// <param name="combination">In-phase (default) or out-of-phase.</param>
    public TwoCentreLcaoPoint Evaluate(double distanceBohr, LcaoCombination combination = LcaoCombination.InPhase)
    {
        double zeta = ExponentAt(distanceBohr, combination);
        return new TwoCentreLcaoPoint(distanceBohr, zeta, combination,
            SlaterTwoCentreIntegrals.Overlap(distanceBohr, zeta),
            SlaterTwoCentreIntegrals.Coulomb(distanceBohr, zeta),
            SlaterTwoCentreIntegrals.Exchange(distanceBohr, zeta),
            ElectronicEnergy(distanceBohr, zeta, combination),
            1.0 / distanceBohr);
    }

    /// <summary>Evaluates the model along a list of distances (bohr).</summary>
    /// <param name="distancesBohr">Internuclear distances in bohr.</param>
    /// <param name="combination">In-phase (default) or out-of-phase.</param>
    public IReadOnlyList<TwoCentreLcaoPoint> Curve(IEnumerable<double> distancesBohr, LcaoCombination combination = LcaoCombination.InPhase)
    {
        ArgumentNullException.ThrowIfNull(distancesBohr);
        var list = new List<TwoCentreLcaoPoint>();
        foreach (double r in distancesBohr) list.Add(Evaluate(r, combination));
        return list;
    }

    /// <summary>Finds the minimum of the in-phase curve between 0.5 and 10 bohr.</summary>
    public TwoCentreLcaoEquilibrium FindEquilibrium()
    {
        double r = GoldenSectionSearch.Minimize(x => Evaluate(x).TotalEnergyHartree, 0.5, 10.0, 1e-7);
        var p = Evaluate(r);
        return new TwoCentreLcaoEquilibrium(r, p.Exponent, p.TotalEnergyHartree, -0.5 - p.TotalEnergyHartree);
    }

    /// <summary>The density of one combination at a point, split into A², B² and interference parts (bohr⁻³).
    /// Nucleus A sits at (0, 0, −R/2), B at (0, 0, +R/2), in bohr.</summary>
    /// <param name="distanceBohr">Internuclear distance in bohr (&gt; 0).</param>
    /// <param name="pointBohr">The point in bohr.</param>
    /// <param name="combination">In-phase (default) or out-of-phase.</param>
    public TwoCentreDensityParts DensityAt(double distanceBohr, Vector3D pointBohr, LcaoCombination combination = LcaoCombination.InPhase)
    {
        double zeta = ExponentAt(distanceBohr, combination);
        return DensityParts(distanceBohr, zeta, pointBohr, combination);
    }

    /// <summary>The value of the normalised combination ψ± at a point (bohr^{−3/2}); nuclei as in <see cref="DensityAt"/>.</summary>
    /// <param name="distanceBohr">Internuclear distance in bohr (&gt; 0).</param>
    /// <param name="pointBohr">The point in bohr.</param>
    /// <param name="combination">In-phase (default) or out-of-phase.</param>
    public double OrbitalAt(double distanceBohr, Vector3D pointBohr, LcaoCombination combination = LcaoCombination.InPhase)
    {
        double zeta = ExponentAt(distanceBohr, combination);
        double s = SlaterTwoCentreIntegrals.Overlap(distanceBohr, zeta);
        double sign = combination == LcaoCombination.InPhase ? 1 : -1;
        var (a, b) = AtomicValues(distanceBohr, zeta, pointBohr);
        return (a + sign * b) / Math.Sqrt(2 * (1 + sign * s));
    }

    /// <summary>Integrated charges of the density parts and the charge moved into (or out of) the bond region at
    /// one distance; see <see cref="TwoCentreChargeAnalysis"/> for the definitions.</summary>
    /// <param name="distanceBohr">Internuclear distance in bohr (&gt; 0).</param>
    /// <param name="combination">In-phase (default) or out-of-phase.</param>
    public TwoCentreChargeAnalysis AnalyseCharge(double distanceBohr, LcaoCombination combination = LcaoCombination.InPhase)
    {
        double zeta = ExponentAt(distanceBohr, combination);
        double s = SlaterTwoCentreIntegrals.Overlap(distanceBohr, zeta);
        double sign = combination == LcaoCombination.InPhase ? 1 : -1;
        double norm = 1 + sign * s;
        var (slabAA, slabAB) = SlabIntegrals(distanceBohr, zeta);
        return new TwoCentreChargeAnalysis(distanceBohr, zeta, combination, s,
            ChargeOnEachAtom: 1 / (2 * norm),
            InterferenceCharge: sign * s / norm,
            BondRegionCharge: (slabAA + sign * slabAB) / norm,
            BondRegionChargeOfSuperposition: slabAA);
    }

    internal static double ElectronicEnergy(double distanceBohr, double zeta, LcaoCombination combination)
    {
        double s = SlaterTwoCentreIntegrals.Overlap(distanceBohr, zeta);
        double haa = SlaterTwoCentreIntegrals.DiagonalHamiltonian(distanceBohr, zeta);
        double hab = SlaterTwoCentreIntegrals.OffDiagonalHamiltonian(distanceBohr, zeta);
        return combination == LcaoCombination.InPhase ? (haa + hab) / (1 + s) : (haa - hab) / (1 - s);
    }

    private static TwoCentreDensityParts DensityParts(double distanceBohr, double zeta, Vector3D p, LcaoCombination combination)
    {
        double s = SlaterTwoCentreIntegrals.Overlap(distanceBohr, zeta);
        double sign = combination == LcaoCombination.InPhase ? 1 : -1;
        double norm = 2 * (1 + sign * s);
        var (a, b) = AtomicValues(distanceBohr, zeta, p);
        return new TwoCentreDensityParts(a * a / norm, b * b / norm, sign * 2 * a * b / norm);
    }

    private static (double A, double B) AtomicValues(double distanceBohr, double zeta, Vector3D p)
    {
        double ra = Vector3D.Distance(p, new Vector3D(0, 0, -distanceBohr / 2));
        double rb = Vector3D.Distance(p, new Vector3D(0, 0, distanceBohr / 2));
        return (SlaterTwoCentreIntegrals.OrbitalValue(ra, zeta), SlaterTwoCentreIntegrals.OrbitalValue(rb, zeta));
    }

    /// <summary>∫ A² and ∫ AB over the slab −R/2 ≤ z ≤ R/2, by Gauss–Legendre quadrature in cylindrical coordinates.</summary>
    private static (double AA, double AB) SlabIntegrals(double distanceBohr, double zeta)
    {
        double half = distanceBohr / 2;
        // Piecewise radial panels so the exponential tails and the cusps at the slab corners are resolved.
        double[] radialEdges = [0, 0.25 / zeta, 1 / zeta, 3 / zeta, 8 / zeta, 40 / zeta];
        double[] axialEdges = [-half, -0.75 * half, 0, 0.75 * half, half];
        double aa = 0, ab = 0;
        const int order = 32;
        for (int iz = 0; iz + 1 < axialEdges.Length; iz++)
        {
            var zr = new GaussLegendreRule(axialEdges[iz], axialEdges[iz + 1], order);
            for (int ir = 0; ir + 1 < radialEdges.Length; ir++)
            {
                var rr = new GaussLegendreRule(radialEdges[ir], radialEdges[ir + 1], order);
                for (int i = 0; i < order; i++)
                {
                    double z = zr.Abscissas[i];
                    for (int j = 0; j < order; j++)
                    {
                        double rho = rr.Abscissas[j];
                        double w = zr.Weights[i] * rr.Weights[j] * 2 * Math.PI * rho;
                        double a = SlaterTwoCentreIntegrals.OrbitalValue(Math.Sqrt(rho * rho + (z + half) * (z + half)), zeta);
                        double b = SlaterTwoCentreIntegrals.OrbitalValue(Math.Sqrt(rho * rho + (z - half) * (z - half)), zeta);
                        aa += w * a * a;
                        ab += w * a * b;
                    }
                }
            }
        }
        return (aa, ab);
    }

    private static void CheckDistance(double distanceBohr)
    {
        if (!(distanceBohr > 0) || !double.IsFinite(distanceBohr))
            throw new OrbitariumInputException(FormattableString.Invariant(
                $"The internuclear distance must be a finite number above 0 bohr, got {distanceBohr}."));
    }

    /// <inheritdoc />
    public override string ToString() => Name;
}
