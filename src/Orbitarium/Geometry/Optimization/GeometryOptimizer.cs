using System.Collections.Immutable;
using MathNet.Numerics.LinearAlgebra;
using Orbitarium.Chemistry;
using Orbitarium.Geometry.Coordinates;
using Orbitarium.Geometry.Vibrations;

namespace Orbitarium.Geometry.Optimization;

/// <summary>
/// Quasi-Newton geometry optimisation in redundant internal (or Cartesian) coordinates: rational-function steps
/// inside a trust radius with BFGS updates of a Lindh model Hessian for minima, and eigenvector following
/// (partitioned RFO with Bofill updates of a finite-difference Hessian) for transition states. Constraints are
/// projected out of the step and enforced exactly after each back-transformation.
/// </summary>
/// <remarks>Sources: C. Peng, P. Y. Ayala, H. B. Schlegel and M. J. Frisch, J. Comput. Chem. 17, 49 (1996) (redundant
/// internals, constraint projection); A. Banerjee et al., J. Phys. Chem. 89, 52 (1985) and J. Baker, J. Comput. Chem. 7,
/// 385 (1986) (RFO, eigenvector following); R. Fletcher, <i>Practical Methods of Optimization</i> (1987) (trust region).
/// A step that makes atoms collide (closer than 0.4 × the sum of their covalent radii) or, for minima, raises the energy
/// by more than 10⁻⁶ Eₕ is rejected and retried with a quarter of its length.</remarks>
public static class GeometryOptimizer
{
    /// <summary>Two atoms closer than this fraction of their covalent-radius sum make a step "colliding": 0.4.</summary>
    public const double CollisionFraction = 0.4;

    private const double InactiveCurvature = 1000;

    /// <summary>Optimises <paramref name="molecule"/> on <paramref name="surface"/>.</summary>
    /// <param name="surface">The energy/gradient provider; its gradient is analytic when it has one, else finite differences.</param>
    /// <param name="molecule">The starting geometry.</param>
    /// <param name="options">Settings (default <see cref="OptimizationOptions.Default"/>).</param>
    /// <param name="progress">Receives every accepted point as it is reached.</param>
    /// <param name="cancellationToken">Stops the optimisation.</param>
    /// <returns>The result; check <see cref="OptimizationResult.Converged"/>.</returns>
    /// <exception cref="OrbitariumInputException">Bad options or constraints.</exception>
    public static OptimizationResult Run(IPotentialEnergySurface surface, Molecule molecule, OptimizationOptions? options = null,
        IProgress<OptimizationStep>? progress = null, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(surface);
        ArgumentNullException.ThrowIfNull(molecule);
        options ??= OptimizationOptions.Default;
        options.Validate();
        if (molecule.AtomCount == 0)
            throw new OrbitariumInputException("The molecule has no atoms; add atoms before optimising.");
        foreach (var c in options.Constraints) c.Validate(molecule);
        return new OptimizationRun(surface, molecule, options, progress, cancellationToken).Execute();
    }

    private sealed class OptimizationRun(IPotentialEnergySurface surface, Molecule start, OptimizationOptions options,
        IProgress<OptimizationStep>? progress, CancellationToken ct)
    {
        private readonly HashSet<int> _frozen = [.. options.Constraints.OfType<FrozenAtomConstraint>().Select(c => c.Atom)];
        private RedundantInternalCoordinates _coords = null!;
        private readonly List<int> _constrained = [];
        private readonly List<double> _targets = [];
        private string _description = "";
        private bool _cartesian;
        private int _evaluations;

        public OptimizationResult Execute()
        {
            bool ts = options.Target == OptimizationTarget.TransitionState;
            var steps = ImmutableArray.CreateBuilder<OptimizationStep>();
            if (start.AtomCount == 1 || _frozen.Count == start.AtomCount)
            {
                var only = Evaluate(start);
                steps.Add(new OptimizationStep(1, start, only.EnergyHartree, only.GradientHartreePerBohr, 0, 0, 0, 0, 0, 0));
                progress?.Report(steps[0]);
                return new OptimizationResult(surface.MethodName, options.Target, only, true, OptimizationStopReason.NothingToOptimize,
                    steps.ToImmutable(), _evaluations, "no free coordinates", options.Constraints);
            }

            ChooseCoordinates(start);
            var x = start.PositionsBohr();
            if (_constrained.Count > 0) x = _coords.EnforceValues(x, _constrained, _targets, _frozen);
            if (Collides(start, x))
                throw new OrbitariumInputException("Moving the starting geometry onto the constraint values makes atoms collide; start closer to the constrained values.");
            var point = Evaluate(start.WithPositionsBohr(x));
            var best = point;
            Matrix<double> h = ts ? TransitionStateHessian(point) : LindhModelHessian.Build(_coords, point.Molecule);
            double trust = options.InitialTrustRadius;
            Vector<double>? followed = null;
            int rejected = 0;
            var stop = OptimizationStopReason.IterationLimit;
            bool converged = false;

            for (int iteration = 1; ; iteration++)
            {
                ct.ThrowIfCancellationRequested();
                var (gq, projector) = InternalGradient(x, point);
                var gt = projector * gq;
                var ht = projector * h * projector + InactiveCurvature * (Matrix<double>.Build.DenseIdentity(h.RowCount) - projector);
                var step = PlanStep(ht, gt, trust, ts, ref followed);

                var (maxF, rmsF) = Measures(gt);
                var (maxS, rmsS) = Measures(step);
                var record = new OptimizationStep(iteration, point.Molecule, point.EnergyHartree, point.GradientHartreePerBohr,
                    maxF, rmsF, maxS, rmsS, trust, rejected);
                steps.Add(record);
                progress?.Report(record);
                rejected = 0;
                if ((maxF < options.MaxForce && rmsF < options.RmsForce && maxS < options.MaxStep && rmsS < options.RmsStep) ||
                    (maxF < options.MaxForce / 100 && rmsF < options.RmsForce / 100))
                {
                    converged = true;
                    stop = OptimizationStopReason.Converged;
                    best = point;
                    break;
                }
                if (iteration >= options.MaxIterations) break;

                // Take a step; shorten and retry when rejected.
                SurfacePoint? next = null;
                double[] xNew = x;
                while (true)
                {
                    ct.ThrowIfCancellationRequested();
                    xNew = TakeStep(x, step);
                    if (xNew.Length > 0 && !Collides(start, xNew))
                    {
                        var trial = Evaluate(start.WithPositionsBohr(xNew));
                        double actual = trial.EnergyHartree - point.EnergyHartree;
                        if (ts || actual <= 1e-6)
                        {
                            double predicted = RationalFunctionStep.PredictedChange(ht, gt, step);
                            trust = UpdateTrust(trust, actual, predicted, step.L2Norm(), ts);
                            next = trial;
                            break;
                        }
                    }
                    rejected++;
                    trust = Math.Min(trust, step.L2Norm()) / 4;
                    if (trust < options.MinTrustRadius) break;
                    step = PlanStep(ht, gt, trust, ts, ref followed);
                }
                if (next is null) { stop = OptimizationStopReason.TrustRadiusCollapsed; break; }

                // Quasi-Newton update in the coordinates.
                var qOld = _coords.Values(x);
                var qNew = _coords.Values(xNew);
                var s = Vector<double>.Build.Dense(_coords.Count);
                for (int i = 0; i < _coords.Count; i++) s[i] = _coords.Coordinates[i].Difference(qNew[i], qOld[i]);
                var (gqNew, _) = InternalGradient(xNew, next);
                var y = gqNew - gq;
                h = ts ? BofillUpdate.Apply(h, s, y) : BfgsUpdate.Apply(h, s, y);

                x = xNew;
                point = next;
                if (ts || point.EnergyHartree < best.EnergyHartree) best = point;
            }
            if (ts && !converged) best = point;
            return new OptimizationResult(surface.MethodName, options.Target, best, converged, stop, steps.ToImmutable(),
                _evaluations, _description, options.Constraints);
        }

        private SurfacePoint Evaluate(Molecule m)
        {
            _evaluations++;
            return surface.EvaluateWithGradient(m, options.FiniteDifferenceStepBohr, ct);
        }

        private void ChooseCoordinates(Molecule m)
        {
            var x = m.PositionsBohr();
            int required = RequiredRank(m);
            _cartesian = options.Coordinates == OptimizationCoordinates.Cartesian;
            if (!_cartesian)
            {
                _coords = RedundantInternalCoordinates.FromConnectivity(m);
                if (_frozen.Count == 0 && _coords.Rank(x) < required)
                {
                    _cartesian = true;
                    _description = "Cartesian (internal coordinates did not span the molecule)";
                }
                else _description = "redundant internal: " + _coords;
            }
            if (_cartesian)
            {
                _coords = RedundantInternalCoordinates.Cartesian(m.AtomCount);
                if (_description.Length == 0) _description = "Cartesian";
            }
            foreach (var c in options.Constraints)
            {
                if (c.Coordinate is not InternalCoordinate coordinate) continue;
                _coords = _coords.WithCoordinate(coordinate, out int index);
                _constrained.Add(index);
                _targets.Add(c.TargetInternal ?? coordinate.Value(x));
            }
            if (_frozen.Count > 0) _description += $", {_frozen.Count} frozen atom(s)";
            if (_constrained.Count > 0) _description += $", {_constrained.Count} fixed coordinate(s)";
        }

        private int RequiredRank(Molecule m)
        {
            var t = RigidBodyModes.Basis(m.PositionsBohr());
            return 3 * m.AtomCount - t.ColumnCount;
        }

        /// <summary>gq = G⁻ B gx and the projector P' (non-redundant space minus constrained directions).</summary>
        private (Vector<double> Gradient, Matrix<double> Projector) InternalGradient(double[] x, SurfacePoint point)
        {
            var b = _coords.WilsonB(x, _frozen);
            var gx = Vector<double>.Build.Dense(point.GradientHartreePerBohr.Length);
            for (int i = 0; i < gx.Count; i++) gx[i] = _frozen.Contains(i / 3) ? 0 : point.GradientHartreePerBohr[i];
            Matrix<double> p;
            Vector<double> gq;
            if (_cartesian && _frozen.Count == 0)
            {
                // Cartesian: project rigid-body motions (the first 3N coordinates are the Cartesian components).
                var bt = b;
                var tr = RigidBodyModes.Projector(x);
                var gInv = RedundantInternalCoordinates.GeneralizedInverse(bt * tr * bt.Transpose());
                gq = gInv * (bt * (tr * gx));
                p = (bt * tr * bt.Transpose()) * gInv;
            }
            else
            {
                var g = b * b.Transpose();
                var gInv = RedundantInternalCoordinates.GeneralizedInverse(g);
                gq = gInv * (b * gx);
                p = g * gInv;
            }
            p = 0.5 * (p + p.Transpose());
            if (_constrained.Count > 0)
            {
                int m = _coords.Count;
                var c = Matrix<double>.Build.Dense(m, m);
                foreach (int i in _constrained) c[i, i] = 1;
                var cpc = c * p * c;
                p = p - p * c * RedundantInternalCoordinates.GeneralizedInverse(cpc) * c * p;
                p = 0.5 * (p + p.Transpose());
            }
            return (gq, p);
        }

        private static Vector<double> PlanStep(Matrix<double> ht, Vector<double> gt, double trust, bool ts, ref Vector<double>? followed)
        {
            if (!ts) return RationalFunctionStep.Minimum(ht, gt, trust);
            return RationalFunctionStep.Saddle(ht, gt, trust, ref followed, InactiveCurvature / 2).Step;
        }

        /// <summary>Back-transforms a coordinate step; empty array when it fails.</summary>
        private double[] TakeStep(double[] x, Vector<double> step)
        {
            var full = step.Clone();
            var q = _coords.Values(x);
            for (int k = 0; k < _constrained.Count; k++)
            {
                int i = _constrained[k];
                full[i] = _coords.Coordinates[i].Difference(_targets[k], q[i]);
            }
            var (xNew, _) = _coords.BackTransform(x, full, _frozen);
            if (_constrained.Count > 0) xNew = _coords.EnforceValues(xNew, _constrained, _targets, _frozen);
            foreach (double v in xNew) if (!double.IsFinite(v)) return [];
            foreach (int a in _frozen)
                for (int k = 0; k < 3; k++) xNew[3 * a + k] = x[3 * a + k];
            return xNew;
        }

        private static bool Collides(Molecule m, double[] x)
        {
            for (int i = 0; i < m.AtomCount; i++)
                for (int j = 0; j < i; j++)
                {
                    double dx = x[3 * i] - x[3 * j], dy = x[3 * i + 1] - x[3 * j + 1], dz = x[3 * i + 2] - x[3 * j + 2];
                    double limit = CollisionFraction * (m.Atoms[i].Element.CovalentRadiusAngstrom + m.Atoms[j].Element.CovalentRadiusAngstrom)
                        * PhysicalConstants.BohrPerAngstrom;
                    limit = Math.Max(limit, Molecule.MinimumNuclearSeparationAngstrom * PhysicalConstants.BohrPerAngstrom * 1.01);
                    if (dx * dx + dy * dy + dz * dz < limit * limit) return true;
                }
            return false;
        }

        private double UpdateTrust(double trust, double actual, double predicted, double length, bool ts)
        {
            double ratio = Math.Abs(predicted) > 1e-12 ? actual / predicted : 1;
            if (ts)
            {
                if (ratio < 0.25 || ratio > 4) trust = Math.Max(length / 2, options.MinTrustRadius * 2);
                else if (ratio > 0.75 && ratio < 1.33 && length > 0.8 * trust) trust *= 1.5;
            }
            else
            {
                if (ratio < 0.25) trust = Math.Max(length / 4, options.MinTrustRadius * 2);
                else if (ratio > 0.75 && length > 0.8 * trust) trust *= 2;
            }
            return Math.Min(trust, options.MaxTrustRadius);
        }

        private Matrix<double> TransitionStateHessian(SurfacePoint point)
        {
            var hx = FiniteDifferenceHessian.Compute(surface, point.Molecule, options.FiniteDifferenceStepBohr, null, ct).HessianHartreePerBohr2;
            _evaluations += 6 * point.Molecule.AtomCount;
            var x = point.Molecule.PositionsBohr();
            var b = _coords.WilsonB(x, _frozen);
            var gInv = RedundantInternalCoordinates.GeneralizedInverse(b * b.Transpose());
            var bp = gInv * b;
            var hq = bp * hx * bp.Transpose();
            return 0.5 * (hq + hq.Transpose());
        }

        private static (double Max, double Rms) Measures(Vector<double> v)
        {
            if (v.Count == 0) return (0, 0);
            double max = v.AbsoluteMaximum();
            return (max, Math.Sqrt(v.DotProduct(v) / v.Count));
        }
    }
}
