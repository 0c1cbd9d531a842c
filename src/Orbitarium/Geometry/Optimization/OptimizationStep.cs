using System.Collections.Immutable;
using Orbitarium.Chemistry;

namespace Orbitarium.Geometry.Optimization;

/// <summary>One point of an optimisation: the geometry, its energy and the convergence measures of the step planned from it.</summary>
/// <param name="Iteration">1 for the starting point.</param>
/// <param name="Molecule">The geometry.</param>
/// <param name="EnergyHartree">Energy in hartree.</param>
/// <param name="GradientHartreePerBohr">Cartesian gradient (3·N, hartree/bohr).</param>
/// <param name="MaxForce">Largest force component in the optimiser's coordinates (hartree/bohr or hartree/rad).</param>
/// <param name="RmsForce">Root-mean-square force in the optimiser's coordinates.</param>
/// <param name="MaxStep">Largest component of the next step (bohr or rad).</param>
/// <param name="RmsStep">Root-mean-square next step.</param>
/// <param name="TrustRadius">Trust radius used for the next step.</param>
/// <param name="RejectedSteps">Steps rejected (energy rose, atoms collided) before this point was reached.</param>
public sealed record OptimizationStep(
    int Iteration,
    Molecule Molecule,
    double EnergyHartree,
    ImmutableArray<double> GradientHartreePerBohr,
    double MaxForce,
    double RmsForce,
    double MaxStep,
    double RmsStep,
    double TrustRadius,
    int RejectedSteps)
{
    /// <inheritdoc />
    public override string ToString() => FormattableString.Invariant(
        $"step {Iteration,3}: E = {EnergyHartree,18:F10} Eh  max F = {MaxForce:E2}  rms F = {RmsForce:E2}  max step = {MaxStep:E2}  rms step = {RmsStep:E2}");
}
