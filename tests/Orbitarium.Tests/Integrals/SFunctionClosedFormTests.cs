using MathNet.Numerics;
using Orbitarium.BasisSets;
using Orbitarium.Chemistry;
using Orbitarium.Integrals;

namespace Orbitarium.Tests.Integrals;

/// <summary>
/// s-type integrals against the closed forms of Szabo and Ostlund, Modern Quantum Chemistry, Appendix A
/// (eqs. A.9, A.11, A.33, A.41) for unnormalised s Gaussians; the engine's recurrences must reproduce them to rounding.
/// </summary>
public class SFunctionClosedFormTests
{
    private static double F0(double t) => t < 1e-12 ? 1.0 : 0.5 * Math.Sqrt(Math.PI / t) * SpecialFunctions.Erf(Math.Sqrt(t));

    private static Vector3D Center(double a, double b, Vector3D A, Vector3D B) => (a * A + b * B) / (a + b);

    [Fact]
    public void Overlap_kinetic_attraction_and_repulsion_match_Appendix_A()
    {
        var A = new Vector3D(0.1, -0.4, 0.3); var B = new Vector3D(1.2, 0.5, -0.6);
        var C = new Vector3D(-0.7, 0.9, 1.1); var D = new Vector3D(0.4, -1.3, 0.2);
        double a = 0.83, b = 1.91, c = 0.37, d = 2.6;
        var sa = new RawShell(0, A, [a], [1.0]); var sb = new RawShell(0, B, [b], [1.0]);
        var sc = new RawShell(0, C, [c], [1.0]); var sd = new RawShell(0, D, [d], [1.0]);
        double ab2 = (A - B).LengthSquared, cd2 = (C - D).LengthSquared;
        double p = a + b, q = c + d;
        double s = Math.Pow(Math.PI / p, 1.5) * Math.Exp(-a * b / p * ab2);                       // A.9
        double t = a * b / p * (3 - 2 * a * b / p * ab2) * s;                                      // A.11
        var P = Center(a, b, A, B); var Q = Center(c, d, C, D);
        var nucleus = new Vector3D(0.3, 0.2, -0.5);
        double v = 2 * Math.PI / p * Math.Exp(-a * b / p * ab2) * F0(p * (P - nucleus).LengthSquared); // A.33 with Z = −1 factored out
        double g = 2 * Math.Pow(Math.PI, 2.5) / (p * q * Math.Sqrt(p + q)) * Math.Exp(-a * b / p * ab2 - c * d / q * cd2)
                   * F0(p * q / (p + q) * (P - Q).LengthSquared);                                 // A.41
        var r = new double[1];
        RawIntegrals.Overlap(sa, sb, r); Assert.Equal(s, r[0], 1e-14 * s);
        RawIntegrals.Kinetic(sa, sb, r); Assert.Equal(t, r[0], 1e-14 * Math.Abs(t));
        RawIntegrals.Potential(sa, sb, nucleus, 1.0, r); Assert.Equal(v, r[0], 1e-14 * v);
        RawIntegrals.ElectronRepulsion(sa, sb, sc, sd, r); Assert.Equal(g, r[0], 1e-14 * g);
    }

    [Fact]
    public void Hydrogen_atom_STO_3G_energy_is_reproduced()
    {
        // E = ⟨φ|T + V|φ⟩ for the STO-3G 1s (ζ = 1.24; exponents and coefficients of Hehre, Stewart and Pople,
        // J. Chem. Phys. 51, 2657 (1969)): −0.4665819 Eh (analytic value listed in /work/shared/REFERENCES.md per the brief).
        var h = Molecule.Empty.AddAtom("H", 0, 0, 0, LengthUnit.Bohr).WithMultiplicity(2);
        var set = BasisSet.Create("STO-3G").WithElement("H", TestBases.Sto3G1s(1.24));
        var basis = MolecularBasis.Create(h, set);
        var hcore = OneElectronIntegrals.CoreHamiltonian(basis);
        Assert.Equal(1.0, OneElectronIntegrals.Overlap(basis)[0, 0], 14);
        Assert.Equal(-0.4665819, hcore[0, 0], 7);
    }
}
