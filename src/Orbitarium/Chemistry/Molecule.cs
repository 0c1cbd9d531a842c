using System.Collections.Immutable;
using System.Globalization;
using System.Text;
using MathNet.Numerics.LinearAlgebra;

namespace Orbitarium.Chemistry;

/// <summary>
/// An immutable molecule: atoms at positions (stored in bohr), a total charge and a spin multiplicity.
/// Every change (<c>With…</c>, <see cref="AddAtom(string,double,double,double,LengthUnit)"/>, a translation)
/// returns a new molecule; the old one stays valid.
/// </summary>
/// <remarks>
/// A molecule is always physically sensible: coordinates are finite, no two nuclei are closer than
/// <see cref="MinimumNuclearSeparationAngstrom"/>, and the multiplicity fits the electron count.
/// Build one in code (<see cref="Empty"/> then <see cref="AddAtom(string,double,double,double,LengthUnit)"/>),
/// from XYZ text (<see cref="FromXyz"/>, <see cref="FromXyzFile"/>) or from a Z-matrix (<see cref="FromZMatrix"/>).
/// </remarks>
public sealed class Molecule
{
    /// <summary>Two nuclei closer than this (in ångström) are refused: 0.1 Å.</summary>
    public const double MinimumNuclearSeparationAngstrom = 0.1;

    private readonly int? _explicitMultiplicity;

    private Molecule(ImmutableArray<Atom> atoms, int charge, int? multiplicity, string title)
    {
        Atoms = atoms;
        Charge = charge;
        _explicitMultiplicity = multiplicity;
        Title = title;
        Validate();
    }

    /// <summary>A molecule with no atoms, neutral; start a fluent build from here.</summary>
    public static Molecule Empty { get; } = new([], 0, null, "");

    /// <summary>The atoms, in input order.</summary>
    public ImmutableArray<Atom> Atoms { get; }

    /// <summary>Number of atoms.</summary>
    public int AtomCount => Atoms.Length;

    /// <summary>Total charge in units of e (0 for a neutral molecule, +1 for a cation).</summary>
    public int Charge { get; }

    /// <summary>Spin multiplicity 2S+1. Unless set, the lowest one the electron count allows (1 or 2).</summary>
    public int Multiplicity => _explicitMultiplicity ?? (ElectronCount % 2 == 0 ? 1 : 2);

    /// <summary>Whether the multiplicity was set explicitly rather than defaulted.</summary>
    public bool HasExplicitMultiplicity => _explicitMultiplicity.HasValue;

    /// <summary>A free-text title (the comment line of an XYZ file).</summary>
    public string Title { get; }

    /// <summary>Sum of nuclear charges.</summary>
    public int NuclearChargeSum
    {
        get
        {
            int z = 0;
            foreach (var a in Atoms) z += a.NuclearCharge;
            return z;
        }
    }

    /// <summary>Number of electrons: sum of nuclear charges minus the total charge.</summary>
    public int ElectronCount => NuclearChargeSum - Charge;

    /// <summary>
    /// The usual frozen-core count for correlated methods: the noble-gas core orbitals of every atom
    /// (<see cref="Element.NobleGasCoreOrbitals"/>; water 1, benzene 6, SiH₄ 5). A system with no electron outside
    /// those cores (Li⁺, Be²⁺) gets 0, so its electrons are correlated rather than all frozen.
    /// </summary>
    public int StandardFrozenCoreOrbitals
    {
        get
        {
            int core = 0;
            foreach (var a in Atoms) core += a.Element.NobleGasCoreOrbitals;
            return core >= AlphaElectronCount ? 0 : Math.Min(core, BetaElectronCount);
        }
    }

    /// <summary>Number of α electrons, (N + 2S)/2.</summary>
    public int AlphaElectronCount => (ElectronCount + Multiplicity - 1) / 2;

    /// <summary>Number of β electrons, (N − 2S)/2.</summary>
    public int BetaElectronCount => (ElectronCount - Multiplicity + 1) / 2;

    // ---------------------------------------------------------------- building

    /// <summary>Creates a molecule from atoms, a charge and (optionally) a multiplicity.</summary>
    /// <exception cref="OrbitariumInputException">Coordinates are not finite, nuclei collide, or the
    /// multiplicity does not fit the electron count.</exception>
    public static Molecule FromAtoms(IEnumerable<Atom> atoms, int charge = 0, int? multiplicity = null, string title = "")
    {
        ArgumentNullException.ThrowIfNull(atoms);
        return new Molecule([.. atoms], charge, multiplicity, title);
    }

    /// <summary>Returns a new molecule with one more atom, position in <paramref name="unit"/> (ångström by default).</summary>
    public Molecule AddAtom(string symbol, double x, double y, double z, LengthUnit unit = LengthUnit.Angstrom) =>
        AddAtom(Atom.Create(symbol, x, y, z, unit));

    /// <summary>Returns a new molecule with one more atom.</summary>
    public Molecule AddAtom(Atom atom)
    {
        ArgumentNullException.ThrowIfNull(atom);
        return new Molecule(Atoms.Add(atom), Charge, _explicitMultiplicity, Title);
    }

    /// <summary>Returns a copy with a new total charge (the multiplicity stays as set, or re-defaults).</summary>
    public Molecule WithCharge(int charge) => new(Atoms, charge, _explicitMultiplicity, Title);

    /// <summary>Returns a copy with spin multiplicity 2S+1 (1 singlet, 2 doublet, 3 triplet, …).</summary>
    public Molecule WithMultiplicity(int multiplicity) => new(Atoms, Charge, multiplicity, Title);

    /// <summary>Returns a copy with a new title.</summary>
    public Molecule WithTitle(string title) => new(Atoms, Charge, _explicitMultiplicity, title ?? "");

    /// <summary>Returns a copy with the atoms replaced (same charge, multiplicity and title).</summary>
    public Molecule WithAtoms(IEnumerable<Atom> atoms) => new([.. atoms], Charge, _explicitMultiplicity, Title);

    /// <summary>Returns a copy with atom <paramref name="index"/> moved to a new position in bohr.</summary>
    public Molecule WithAtomPositionBohr(int index, Vector3D positionBohr)
    {
        CheckAtomIndex(index);
        return new Molecule(Atoms.SetItem(index, Atoms[index].WithPositionBohr(positionBohr)), Charge, _explicitMultiplicity, Title);
    }

    /// <summary>Returns a copy with all positions replaced; <paramref name="positionsBohr"/> has 3·N values x₁ y₁ z₁ x₂ … in bohr.</summary>
    public Molecule WithPositionsBohr(ReadOnlySpan<double> positionsBohr)
    {
        if (positionsBohr.Length != 3 * AtomCount)
            throw new ArgumentException($"Expected {3 * AtomCount} coordinates (3 per atom), got {positionsBohr.Length}.", nameof(positionsBohr));
        var b = ImmutableArray.CreateBuilder<Atom>(AtomCount);
        for (int i = 0; i < AtomCount; i++)
            b.Add(Atoms[i].WithPositionBohr(new Vector3D(positionsBohr[3 * i], positionsBohr[3 * i + 1], positionsBohr[3 * i + 2])));
        return new Molecule(b.MoveToImmutable(), Charge, _explicitMultiplicity, Title);
    }

    /// <summary>All positions as 3·N values x₁ y₁ z₁ x₂ … in bohr.</summary>
    public double[] PositionsBohr()
    {
        var x = new double[3 * AtomCount];
        for (int i = 0; i < AtomCount; i++)
        {
            var p = Atoms[i].PositionBohr;
            x[3 * i] = p.X; x[3 * i + 1] = p.Y; x[3 * i + 2] = p.Z;
        }
        return x;
    }

    /// <summary>Returns a copy translated by a displacement in bohr.</summary>
    public Molecule TranslatedBohr(Vector3D displacementBohr)
    {
        var b = ImmutableArray.CreateBuilder<Atom>(AtomCount);
        foreach (var a in Atoms) b.Add(a.WithPositionBohr(a.PositionBohr + displacementBohr));
        return new Molecule(b.MoveToImmutable(), Charge, _explicitMultiplicity, Title);
    }

    /// <summary>Returns a copy translated by a displacement in ångström.</summary>
    public Molecule TranslatedAngstrom(double dx, double dy, double dz) =>
        TranslatedBohr(new Vector3D(dx, dy, dz) * PhysicalConstants.BohrPerAngstrom);

    /// <summary>Returns a copy rotated about the origin by a 3×3 rotation matrix (applied as r' = R·r).</summary>
    /// <exception cref="ArgumentException">The matrix is not 3×3 or not orthogonal with determinant +1.</exception>
    public Molecule Rotated(Matrix<double> rotation)
    {
        ArgumentNullException.ThrowIfNull(rotation);
        if (rotation.RowCount != 3 || rotation.ColumnCount != 3)
            throw new ArgumentException($"A rotation must be 3x3, got {rotation.RowCount}x{rotation.ColumnCount}.", nameof(rotation));
        var should = rotation * rotation.Transpose() - Matrix<double>.Build.DenseIdentity(3);
        if (should.FrobeniusNorm() > 1e-8 || Math.Abs(rotation.Determinant() - 1) > 1e-8)
            throw new ArgumentException("The matrix is not a proper rotation (orthogonal with determinant +1).", nameof(rotation));
        var b = ImmutableArray.CreateBuilder<Atom>(AtomCount);
        foreach (var a in Atoms)
        {
            var p = a.PositionBohr;
            b.Add(a.WithPositionBohr(new Vector3D(
                rotation[0, 0] * p.X + rotation[0, 1] * p.Y + rotation[0, 2] * p.Z,
                rotation[1, 0] * p.X + rotation[1, 1] * p.Y + rotation[1, 2] * p.Z,
                rotation[2, 0] * p.X + rotation[2, 1] * p.Y + rotation[2, 2] * p.Z)));
        }
        return new Molecule(b.MoveToImmutable(), Charge, _explicitMultiplicity, Title);
    }

    /// <summary>Returns a copy rotated by <paramref name="angleDegrees"/> about an axis through the origin.</summary>
    public Molecule RotatedAboutAxis(Vector3D axis, double angleDegrees) => Rotated(RotationMatrix(axis, angleDegrees));

    /// <summary>The rotation matrix (Rodrigues' formula) for a right-handed turn about <paramref name="axis"/>.</summary>
    public static Matrix<double> RotationMatrix(Vector3D axis, double angleDegrees)
    {
        var u = axis.Normalized();
        double t = angleDegrees * Math.PI / 180.0, c = Math.Cos(t), s = Math.Sin(t), k = 1 - c;
        return Matrix<double>.Build.DenseOfArray(new[,]
        {
            { c + u.X * u.X * k, u.X * u.Y * k - u.Z * s, u.X * u.Z * k + u.Y * s },
            { u.Y * u.X * k + u.Z * s, c + u.Y * u.Y * k, u.Y * u.Z * k - u.X * s },
            { u.Z * u.X * k - u.Y * s, u.Z * u.Y * k + u.X * s, c + u.Z * u.Z * k },
        });
    }

    /// <summary>Returns a copy with the atoms in a new order; <paramref name="order"/>[i] is the old index of new atom i.</summary>
    public Molecule Permuted(IReadOnlyList<int> order)
    {
        ArgumentNullException.ThrowIfNull(order);
        if (order.Count != AtomCount || order.Distinct().Count() != AtomCount || order.Any(i => i < 0 || i >= AtomCount))
            throw new ArgumentException($"The order must be a permutation of 0..{AtomCount - 1}.", nameof(order));
        return new Molecule([.. order.Select(i => Atoms[i])], Charge, _explicitMultiplicity, Title);
    }

    /// <summary>Returns a copy with the centre of mass moved to the origin.</summary>
    public Molecule CenteredAtCenterOfMass() => TranslatedBohr(-CenterOfMassBohr);

    /// <summary>Returns the union of this molecule and <paramref name="other"/> (charges add; multiplicity re-defaults).</summary>
    public Molecule CombinedWith(Molecule other)
    {
        ArgumentNullException.ThrowIfNull(other);
        return new Molecule(Atoms.AddRange(other.Atoms), Charge + other.Charge, null, Title);
    }

    // ---------------------------------------------------------------- derived quantities

    /// <summary>Nuclear repulsion energy Σ_{A&lt;B} Z_A Z_B / R_AB in hartree.</summary>
    public double NuclearRepulsionEnergyHartree
    {
        get
        {
            double e = 0;
            for (int i = 0; i < Atoms.Length; i++)
                for (int j = 0; j < i; j++)
                    e += Atoms[i].NuclearCharge * Atoms[j].NuclearCharge /
                         Vector3D.Distance(Atoms[i].PositionBohr, Atoms[j].PositionBohr);
            return e;
        }
    }

    /// <summary>Total mass in dalton using most-abundant-isotope masses.</summary>
    public double IsotopicMassDalton => Atoms.Sum(a => a.Element.MostAbundantIsotopeMassDalton);

    /// <summary>Molar mass in g/mol using standard atomic weights.</summary>
    public double MolarMassGramPerMole => Atoms.Sum(a => a.Element.StandardAtomicWeight);

    /// <summary>Centre of mass in bohr (most-abundant-isotope masses).</summary>
    public Vector3D CenterOfMassBohr
    {
        get
        {
            if (AtomCount == 0) return Vector3D.Zero;
            Vector3D sum = Vector3D.Zero;
            double m = 0;
            foreach (var a in Atoms)
            {
                double mi = a.Element.MostAbundantIsotopeMassDalton;
                sum += mi * a.PositionBohr;
                m += mi;
            }
            return sum / m;
        }
    }

    /// <summary>Centre of nuclear charge in bohr.</summary>
    public Vector3D CenterOfNuclearChargeBohr
    {
        get
        {
            if (AtomCount == 0) return Vector3D.Zero;
            Vector3D sum = Vector3D.Zero;
            foreach (var a in Atoms) sum += a.NuclearCharge * a.PositionBohr;
            return sum / NuclearChargeSum;
        }
    }

    /// <summary>Inertia tensor about the centre of mass, in dalton·bohr² (isotope masses).</summary>
    public Matrix<double> InertiaTensorDaltonBohr2()
    {
        var com = CenterOfMassBohr;
        var t = Matrix<double>.Build.Dense(3, 3);
        foreach (var a in Atoms)
        {
            double m = a.Element.MostAbundantIsotopeMassDalton;
            var r = a.PositionBohr - com;
            double r2 = r.LengthSquared;
            for (int i = 0; i < 3; i++)
                for (int j = 0; j < 3; j++)
                    t[i, j] += m * ((i == j ? r2 : 0) - r[i] * r[j]);
        }
        return t;
    }

    /// <summary>Principal moments of inertia in dalton·bohr², ascending.</summary>
    public double[] PrincipalMomentsDaltonBohr2()
    {
        var evd = InertiaTensorDaltonBohr2().Evd(MathNet.Numerics.LinearAlgebra.Symmetricity.Symmetric);
        var values = evd.EigenValues.Select(v => v.Real).ToArray();
        Array.Sort(values);
        return values;
    }

    /// <summary>Distance between atoms <paramref name="i"/> and <paramref name="j"/> in ångström.</summary>
    public double DistanceAngstrom(int i, int j) => DistanceBohr(i, j) * PhysicalConstants.AngstromPerBohr;

    /// <summary>Distance between atoms <paramref name="i"/> and <paramref name="j"/> in bohr.</summary>
    public double DistanceBohr(int i, int j)
    {
        CheckAtomIndex(i); CheckAtomIndex(j);
        return Vector3D.Distance(Atoms[i].PositionBohr, Atoms[j].PositionBohr);
    }

    /// <summary>Angle i–j–k in degrees (j is the vertex).</summary>
    public double AngleDegrees(int i, int j, int k)
    {
        CheckAtomIndex(i); CheckAtomIndex(j); CheckAtomIndex(k);
        var a = Atoms[i].PositionBohr - Atoms[j].PositionBohr;
        var b = Atoms[k].PositionBohr - Atoms[j].PositionBohr;
        double c = Vector3D.Dot(a, b) / (a.Length * b.Length);
        return Math.Acos(Math.Clamp(c, -1, 1)) * 180 / Math.PI;
    }

    /// <summary>Dihedral angle i–j–k–l in degrees, in (−180, 180].</summary>
    public double DihedralDegrees(int i, int j, int k, int l)
    {
        CheckAtomIndex(i); CheckAtomIndex(j); CheckAtomIndex(k); CheckAtomIndex(l);
        var b1 = Atoms[j].PositionBohr - Atoms[i].PositionBohr;
        var b2 = Atoms[k].PositionBohr - Atoms[j].PositionBohr;
        var b3 = Atoms[l].PositionBohr - Atoms[k].PositionBohr;
        var n1 = Vector3D.Cross(b1, b2);
        var n2 = Vector3D.Cross(b2, b3);
        var m1 = Vector3D.Cross(n1, b2.Normalized());
        double x = Vector3D.Dot(n1, n2), y = Vector3D.Dot(m1, n2);
        return Math.Atan2(y, x) * 180 / Math.PI;
    }

    /// <summary>
    /// Pairs of atoms (i &lt; j) closer than <paramref name="tolerance"/> × (sum of covalent radii).
    /// The default factor 1.3 is common practice for bond perception.
    /// </summary>
    public IReadOnlyList<(int I, int J)> BondedPairs(double tolerance = 1.3)
    {
        var pairs = new List<(int, int)>();
        for (int i = 0; i < AtomCount; i++)
            for (int j = i + 1; j < AtomCount; j++)
            {
                double limit = tolerance * (Atoms[i].Element.CovalentRadiusAngstrom + Atoms[j].Element.CovalentRadiusAngstrom);
                if (DistanceAngstrom(i, j) < limit) pairs.Add((i, j));
            }
        return pairs;
    }

    /// <summary>Empirical formula in Hill order (C, then H, then the rest alphabetically; alphabetical
    /// when there is no carbon), e.g. "CH4O".</summary>
    public string Formula
    {
        get
        {
            var counts = new SortedDictionary<string, int>(StringComparer.Ordinal);
            foreach (var a in Atoms) counts[a.Symbol] = counts.GetValueOrDefault(a.Symbol) + 1;
            var sb = new StringBuilder();
            void Emit(string s)
            {
                if (!counts.TryGetValue(s, out int n)) return;
                sb.Append(s);
                if (n > 1) sb.Append(n.ToString(CultureInfo.InvariantCulture));
                counts.Remove(s);
            }
            if (counts.ContainsKey("C")) { Emit("C"); Emit("H"); }
            foreach (var s in counts.Keys.ToList()) Emit(s);
            return sb.ToString();
        }
    }

    // ---------------------------------------------------------------- text formats

    /// <summary>Reads a molecule from XYZ text: an atom count, a comment line, then "symbol x y z" lines in ångström
    /// (or in <paramref name="unit"/>).</summary>
    /// <exception cref="OrbitariumInputException">A line is malformed; the message names the line.</exception>
    public static Molecule FromXyz(string text, LengthUnit unit = LengthUnit.Angstrom, int charge = 0, int? multiplicity = null) =>
        XyzFormat.Parse(text, unit, charge, multiplicity);

    /// <summary>Reads a molecule from an XYZ file (see <see cref="FromXyz"/>).</summary>
    /// <exception cref="OrbitariumInputException">The file cannot be read or is malformed.</exception>
    public static Molecule FromXyzFile(string path, LengthUnit unit = LengthUnit.Angstrom, int charge = 0, int? multiplicity = null) =>
        XyzFormat.ReadFile(path, unit, charge, multiplicity);

    /// <summary>Builds a molecule from a Z-matrix (bond lengths in ångström or <paramref name="unit"/>, angles in degrees);
    /// see <see cref="ZMatrix"/> for the layout.</summary>
    public static Molecule FromZMatrix(string text, LengthUnit unit = LengthUnit.Angstrom, int charge = 0, int? multiplicity = null) =>
        ZMatrix.Parse(text, unit, charge, multiplicity);

    /// <summary>Writes the molecule as XYZ text in ångström (count line, title line, one line per atom).</summary>
    public string ToXyz() => XyzFormat.Write(this);

    /// <inheritdoc />
    public override string ToString()
    {
        var sb = new StringBuilder();
        sb.Append(CultureInfo.InvariantCulture, $"{Formula} (charge {Charge}, multiplicity {Multiplicity}, {AtomCount} atoms, Å)");
        foreach (var a in Atoms) sb.Append('\n').Append(a);
        return sb.ToString();
    }

    // ---------------------------------------------------------------- validation

    private void CheckAtomIndex(int index)
    {
        if (index < 0 || index >= AtomCount)
            throw new ArgumentOutOfRangeException(nameof(index), index, $"Atom index must be 0..{AtomCount - 1}.");
    }

    private void Validate()
    {
        for (int i = 0; i < Atoms.Length; i++)
        {
            if (!Atoms[i].PositionBohr.IsFinite)
                throw new OrbitariumInputException(
                    $"Atom {i + 1} ({Atoms[i].Symbol}) has a coordinate that is not a finite number; give finite x, y, z.");
            for (int j = 0; j < i; j++)
            {
                double d = Vector3D.Distance(Atoms[i].PositionBohr, Atoms[j].PositionBohr) * PhysicalConstants.AngstromPerBohr;
                if (d < MinimumNuclearSeparationAngstrom)
                    throw new OrbitariumInputException(FormattableString.Invariant(
                        $"Atoms {j + 1} ({Atoms[j].Symbol}) and {i + 1} ({Atoms[i].Symbol}) are {d:F4} Å apart, closer than {MinimumNuclearSeparationAngstrom} Å; check the coordinates and their unit."));
            }
        }
        int n = ElectronCount;
        if (Atoms.Length > 0 && n < 0)
            throw new OrbitariumInputException($"Charge {Charge} leaves {n} electrons; the charge can be at most +{NuclearChargeSum}.");
        if (_explicitMultiplicity is int m)
        {
            if (m < 1)
                throw new OrbitariumInputException($"Multiplicity {m} is impossible: it is 2S+1 and at least 1.");
            if (Atoms.Length > 0 && ((n + m - 1) % 2 != 0 || m - 1 > n))
            {
                string hint = n % 2 == 0 ? "an odd multiplicity (1, 3, …)" : "an even multiplicity (2, 4, …)";
                throw new OrbitariumInputException(
                    $"Multiplicity {m} is impossible for {n} electrons (charge {Charge}); use {hint} no larger than {n + 1}.");
            }
        }
    }
}
