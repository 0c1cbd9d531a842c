using MathNet.Numerics;
using MathNet.Numerics.LinearAlgebra;
using Orbitarium.BasisSets;
using Orbitarium.Chemistry;
using Orbitarium.Integrals;

namespace Orbitarium.Tests.Integrals;

/// <summary>
/// p, d and f one-electron integrals against numerical quadrature of the basis functions themselves:
/// a Gauss–Hermite product rule (exact for polynomial × Gaussian integrands of degree &lt; 2n; nodes from the
/// Golub–Welsch eigenvalue method, Math. Comp. 23, 221 (1969)) around the Gaussian product centre, and for the
/// Coulomb potential the representation 1/r = (2/√π)∫₀^∞ e^{−s²r²} ds with Gauss–Legendre quadrature in s.
/// </summary>
public class OneElectronQuadratureTests
{
    private const int Nodes = 6; // exact to polynomial degree 11 per axis; f·f·(kinetic or quadrupole) reaches 8
    private static readonly (double[] X, double[] W) Hermite = GaussHermite(Nodes);

    private static (double[] X, double[] W) GaussHermite(int n)
    {
        var j = Matrix<double>.Build.Dense(n, n);
        for (int k = 1; k < n; k++) j[k, k - 1] = j[k - 1, k] = Math.Sqrt(k / 2.0);
        var evd = j.Evd(Symmetricity.Symmetric);
        var x = new double[n]; var w = new double[n];
        for (int k = 0; k < n; k++)
        {
            x[k] = evd.EigenValues[k].Real;
            double v0 = evd.EigenVectors[0, k];
            w[k] = Math.Sqrt(Math.PI) * v0 * v0;
        }
        return (x, w);
    }

    private static MolecularBasis TwoCentreBasis(bool pure)
    {
        var mol = Molecule.Empty.AddAtom("H", 0.2, -0.1, 0.3, LengthUnit.Bohr).AddAtom("He", -0.6, 0.8, 1.1, LengthUnit.Bohr);
        var shells = new List<global::Orbitarium.BasisSets.Shell>();
        int[] ls = [1, 2, 3];
        double[] exps = [0.8, 1.3, 0.6];
        for (int atom = 0; atom < 2; atom++)
            for (int s = 0; s < 3; s++)
                shells.Add(new global::Orbitarium.BasisSets.Shell(ShellDefinition.Primitive(ls[s], exps[s] * (1 + 0.4 * atom)), mol.Atoms[atom].PositionBohr, atom, pure));
        return MolecularBasis.FromShells(mol, shells, "pdf test");
    }

    private enum Op { Overlap, Kinetic, X, Y, Z, Xy, Zz }

    /// <summary>Polynomial part of basis function f (its Gaussian factor removed), optionally with −½∇² applied (then
    /// the Gaussian factor is still the shell's own).</summary>
    private static double PolyPart(global::Orbitarium.BasisSets.Shell sh, int local, Vector3D r, bool laplacian)
    {
        var comps = AngularMomentum.CartesianComponents(sh.AngularMomentum);
        double alpha = sh.Exponents[0], coef = sh.NormalizedCoefficients[0];
        var d = r - sh.CenterBohr;
        double sum = 0;
        for (int c = 0; c < comps.Count; c++)
        {
            double t = sh.Transform[local, c];
            if (t == 0) continue;
            var (lx, ly, lz) = comps[c];
            double px = Math.Pow(d.X, lx), py = Math.Pow(d.Y, ly), pz = Math.Pow(d.Z, lz);
            double value;
            if (!laplacian) value = px * py * pz;
            else
            {
                // d²/dx² [x^l e^{−αx²}] = [l(l−1)x^{l−2} − 2α(2l+1)x^l + 4α²x^{l+2}] e^{−αx²} (calculus; common practice)
                double Second(double x, int l) => (l >= 2 ? l * (l - 1) * Math.Pow(x, l - 2) : 0) - 2 * alpha * (2 * l + 1) * Math.Pow(x, l) + 4 * alpha * alpha * Math.Pow(x, l + 2);
                value = -0.5 * (Second(d.X, lx) * py * pz + px * Second(d.Y, ly) * pz + px * py * Second(d.Z, lz));
            }
            sum += t * coef * value;
        }
        return sum;
    }

    /// <summary>∫ φ_μ · op · φ_ν over all space by the product rule around the Gaussian product centre.</summary>
    private static double Quadrature(global::Orbitarium.BasisSets.Shell a, int ia, global::Orbitarium.BasisSets.Shell b, int ib, Op op, Vector3D origin, Vector3D? extraCentre = null, double extraExponent = 0)
    {
        double al = a.Exponents[0], be = b.Exponents[0];
        var A = a.CenterBohr; var B = b.CenterBohr;
        double p = al + be;
        var P = (al * A + be * B) / p;
        double k = Math.Exp(-al * be / p * (A - B).LengthSquared);
        if (extraCentre is { } C)
        {
            // times e^{−s²|r−C|²}: a new Gaussian product centre.
            double p2 = p + extraExponent;
            k *= Math.Exp(-p * extraExponent / p2 * (P - C).LengthSquared);
            P = (p * P + extraExponent * C) / p2;
            p = p2;
        }
        double scale = 1 / Math.Sqrt(p), sum = 0;
        for (int i = 0; i < Nodes; i++)
            for (int j = 0; j < Nodes; j++)
                for (int l = 0; l < Nodes; l++)
                {
                    var r = new Vector3D(P.X + Hermite.X[i] * scale, P.Y + Hermite.X[j] * scale, P.Z + Hermite.X[l] * scale);
                    double w = Hermite.W[i] * Hermite.W[j] * Hermite.W[l];
                    double f = PolyPart(a, ia, r, false) * PolyPart(b, ib, r, op == Op.Kinetic);
                    var d = r - origin;
                    f *= op switch { Op.X => d.X, Op.Y => d.Y, Op.Z => d.Z, Op.Xy => d.X * d.Y, Op.Zz => d.Z * d.Z, _ => 1.0 };
                    sum += w * f;
                }
        return k * sum * scale * scale * scale;
    }

    [Theory]
    [InlineData(true)]
    [InlineData(false)]
    public void Overlap_kinetic_and_moments_match_Gauss_Hermite_quadrature(bool pure)
    {
        var basis = TwoCentreBasis(pure);
        var origin = new Vector3D(0.3, -0.2, 0.5);
        var s = OneElectronIntegrals.Overlap(basis);
        var t = OneElectronIntegrals.Kinetic(basis);
        var dip = OneElectronIntegrals.Dipole(basis, origin);
        var quad = OneElectronIntegrals.Quadrupole(basis, origin);
        int n = basis.FunctionCount;
        var rng = new Random(pure ? 3 : 4);
        for (int trial = 0; trial < 40; trial++)
        {
            int i = rng.Next(n), j = rng.Next(n);
            var (a, ia) = Locate(basis, i);
            var (b, ib) = Locate(basis, j);
            // The product rule is exact here; 1e-12 allows for rounding in the weighted sum.
            Assert.Equal(Quadrature(a, ia, b, ib, Op.Overlap, origin), s[i, j], 1e-12);
            Assert.Equal(Quadrature(a, ia, b, ib, Op.Kinetic, origin), t[i, j], 1e-11);
            Assert.Equal(Quadrature(a, ia, b, ib, Op.X, origin), dip[0][i, j], 1e-12);
            Assert.Equal(Quadrature(a, ia, b, ib, Op.Z, origin), dip[2][i, j], 1e-12);
            Assert.Equal(Quadrature(a, ia, b, ib, Op.Xy, origin), quad[1][i, j], 1e-12);
            Assert.Equal(Quadrature(a, ia, b, ib, Op.Zz, origin), quad[5][i, j], 1e-12);
        }
    }

    [Fact]
    public void Nuclear_attraction_matches_quadrature_of_the_Gaussian_representation_of_one_over_r()
    {
        var basis = TwoCentreBasis(true);
        var v = OneElectronIntegrals.NuclearAttraction(basis);
        int n = basis.FunctionCount;
        var rng = new Random(5);
        for (int trial = 0; trial < 4; trial++)
        {
            int i = rng.Next(n), j = rng.Next(n);
            var (a, ia) = Locate(basis, i);
            var (b, ib) = Locate(basis, j);
            double expected = 0;
            foreach (var atom in basis.Molecule.Atoms)
            {
                // s = u/(1−u) maps [0, 1) onto [0, ∞); the integrand is smooth in u.
                double integral = Integrate.GaussLegendre(u =>
                {
                    double sv = u / (1 - u);
                    return Quadrature(a, ia, b, ib, Op.Overlap, default, atom.PositionBohr, sv * sv) / ((1 - u) * (1 - u));
                }, 0, 1, 96);
                expected -= atom.NuclearCharge * 2 / Math.Sqrt(Math.PI) * integral;
            }
            Assert.True(Math.Abs(expected - v[i, j]) < 1e-9, $"V[{i},{j}] = {v[i, j]:R}, quadrature {expected:R}");
        }
    }

    private static (global::Orbitarium.BasisSets.Shell Shell, int Local) Locate(MolecularBasis basis, int f)
    {
        int s = basis.FunctionShells[f];
        return (basis.Shells[s], f - basis.ShellOffsets[s]);
    }
}
