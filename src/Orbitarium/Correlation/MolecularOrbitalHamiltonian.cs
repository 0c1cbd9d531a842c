namespace Orbitarium.Correlation;

/// <summary>
/// The electronic Hamiltonian in a basis of molecular orbitals: one-electron integrals h_pq, electron-repulsion
/// integrals (pq|rs) in chemists' notation, orbital energies, occupations and the nuclear repulsion, for a restricted
/// (one set of orbitals) or unrestricted (α and β sets) reference. Every correlated method of this folder starts
/// from one. Immutable.
/// </summary>
/// <remarks>
/// Arrays are row-major: h_pq at <c>p·m + q</c>, (pq|rs) at <c>((p·m + q)·m + r)·m + s</c> for m orbitals. For an
/// unrestricted reference the mixed-spin block holds (p_α q_α | r_β s_β). Orbitals are ordered with the occupied ones
/// first. The orbitals are expected to be the canonical Hartree–Fock orbitals of the reference; the Fock matrix is
/// rebuilt from the integrals (<see cref="FockMatrix"/>), so slightly non-canonical input stays consistent.
/// Frozen core orbitals are not part of this object: each method takes the count in its
/// <see cref="CorrelationOptions.FrozenCoreOrbitals"/> (default 0, all electrons correlated).
/// </remarks>
public sealed class MolecularOrbitalHamiltonian
{
    private readonly double[] _coreAlpha;
    private readonly double[] _coreBeta;
    private readonly double[] _eriAlphaAlpha;
    private readonly double[] _eriAlphaBeta;
    private readonly double[] _eriBetaBeta;
    private readonly double[] _energiesAlpha;
    private readonly double[] _energiesBeta;
    private readonly double[][]? _dipoleAlpha;
    private readonly double[][]? _dipoleBeta;

    private MolecularOrbitalHamiltonian(int orbitalCount, int alphaOccupied, int betaOccupied, bool restricted,
        double[] energiesAlpha, double[] energiesBeta, double[] coreAlpha, double[] coreBeta,
        double[] eriAA, double[] eriAB, double[] eriBB, double nuclearRepulsion, double[][]? dipoleAlpha, double[][]? dipoleBeta)
    {
        OrbitalCount = orbitalCount;
        AlphaOccupiedCount = alphaOccupied;
        BetaOccupiedCount = betaOccupied;
        IsRestricted = restricted;
        _energiesAlpha = energiesAlpha;
        _energiesBeta = energiesBeta;
        _coreAlpha = coreAlpha;
        _coreBeta = coreBeta;
        _eriAlphaAlpha = eriAA;
        _eriAlphaBeta = eriAB;
        _eriBetaBeta = eriBB;
        NuclearRepulsionEnergyHartree = nuclearRepulsion;
        _dipoleAlpha = dipoleAlpha;
        _dipoleBeta = dipoleBeta;
        ReferenceEnergyHartree = ComputeReferenceEnergy();
    }

    /// <summary>Number of molecular orbitals m (per spin).</summary>
    public int OrbitalCount { get; }

    /// <summary>Number of occupied α orbitals.</summary>
    public int AlphaOccupiedCount { get; }

    /// <summary>Number of occupied β orbitals.</summary>
    public int BetaOccupiedCount { get; }

    /// <summary>Whether α and β electrons share one set of orbitals (RHF or ROHF-like); false for UHF.</summary>
    public bool IsRestricted { get; }

    /// <summary>Whether the reference is a closed shell in one set of orbitals (RHF).</summary>
    public bool IsClosedShell => IsRestricted && AlphaOccupiedCount == BetaOccupiedCount;

    /// <summary>Nuclear repulsion energy in hartree.</summary>
    public double NuclearRepulsionEnergyHartree { get; }

    /// <summary>Energy of the single-determinant reference rebuilt from the integrals, hartree (nuclear repulsion included).</summary>
    public double ReferenceEnergyHartree { get; }

    /// <summary>Whether MO dipole integrals were supplied (needed for oscillator strengths).</summary>
    public bool HasDipoleIntegrals => _dipoleAlpha is not null;

    /// <summary>α orbital energies in hartree.</summary>
    public ReadOnlySpan<double> OrbitalEnergiesAlphaHartree => _energiesAlpha;

    /// <summary>β orbital energies in hartree (the α ones for a restricted reference).</summary>
    public ReadOnlySpan<double> OrbitalEnergiesBetaHartree => _energiesBeta;

    /// <summary>α one-electron (kinetic + nuclear attraction) integrals h_pq, hartree, m×m row-major.</summary>
    public ReadOnlySpan<double> CoreHamiltonianAlpha => _coreAlpha;

    /// <summary>β one-electron integrals, hartree, m×m row-major.</summary>
    public ReadOnlySpan<double> CoreHamiltonianBeta => _coreBeta;

    /// <summary>(p_α q_α | r_α s_α), hartree, m⁴ row-major.</summary>
    public ReadOnlySpan<double> RepulsionAlphaAlpha => _eriAlphaAlpha;

    /// <summary>(p_α q_α | r_β s_β), hartree, m⁴ row-major.</summary>
    public ReadOnlySpan<double> RepulsionAlphaBeta => _eriAlphaBeta;

    /// <summary>(p_β q_β | r_β s_β), hartree, m⁴ row-major.</summary>
    public ReadOnlySpan<double> RepulsionBetaBeta => _eriBetaBeta;

    internal double[] CoreAlphaArray => _coreAlpha;
    internal double[] CoreBetaArray => _coreBeta;
    internal double[] EriAlphaAlphaArray => _eriAlphaAlpha;
    internal double[] EriAlphaBetaArray => _eriAlphaBeta;
    internal double[] EriBetaBetaArray => _eriBetaBeta;
    internal double[][]? DipoleAlphaArrays => _dipoleAlpha;
    internal double[][]? DipoleBetaArrays => _dipoleBeta;

    /// <summary>
    /// Creates the Hamiltonian of a restricted reference (one set of orbitals).
    /// </summary>
    /// <param name="orbitalCount">Number of orbitals m.</param>
    /// <param name="alphaOccupiedCount">Occupied α orbitals (the lowest ones).</param>
    /// <param name="betaOccupiedCount">Occupied β orbitals (equal to α for a closed shell).</param>
    /// <param name="orbitalEnergiesHartree">m orbital energies, hartree.</param>
    /// <param name="coreHamiltonian">m×m one-electron integrals h_pq in the MO basis, hartree.</param>
    /// <param name="repulsion">m⁴ integrals (pq|rs) in the MO basis, hartree.</param>
    /// <param name="nuclearRepulsionEnergyHartree">Nuclear repulsion energy, hartree.</param>
    /// <param name="dipole">Optional MO dipole integrals ⟨p|r_k|q⟩ (k = x, y, z), bohr, each m×m; electron charge not included.</param>
    public static MolecularOrbitalHamiltonian Restricted(int orbitalCount, int alphaOccupiedCount, int betaOccupiedCount,
        ReadOnlySpan<double> orbitalEnergiesHartree, ReadOnlySpan<double> coreHamiltonian, ReadOnlySpan<double> repulsion,
        double nuclearRepulsionEnergyHartree, IReadOnlyList<double[]>? dipole = null)
    {
        Validate(orbitalCount, alphaOccupiedCount, betaOccupiedCount, orbitalEnergiesHartree, coreHamiltonian, repulsion, dipole, "");
        var e = orbitalEnergiesHartree.ToArray();
        var h = coreHamiltonian.ToArray();
        var g = repulsion.ToArray();
        var d = dipole is null ? null : CopyDipole(dipole);
        return new MolecularOrbitalHamiltonian(orbitalCount, alphaOccupiedCount, betaOccupiedCount, true,
            e, e, h, h, g, g, g, nuclearRepulsionEnergyHartree, d, d);
    }

    /// <summary>
    /// Creates the Hamiltonian of an unrestricted reference (separate α and β orbitals).
    /// </summary>
    /// <param name="orbitalCount">Number of orbitals m per spin.</param>
    /// <param name="alphaOccupiedCount">Occupied α orbitals.</param>
    /// <param name="betaOccupiedCount">Occupied β orbitals.</param>
    /// <param name="orbitalEnergiesAlphaHartree">α orbital energies, hartree.</param>
    /// <param name="orbitalEnergiesBetaHartree">β orbital energies, hartree.</param>
    /// <param name="coreHamiltonianAlpha">h_pq over α orbitals, hartree.</param>
    /// <param name="coreHamiltonianBeta">h_pq over β orbitals, hartree.</param>
    /// <param name="repulsionAlphaAlpha">(p_α q_α | r_α s_α), hartree.</param>
    /// <param name="repulsionAlphaBeta">(p_α q_α | r_β s_β), hartree.</param>
    /// <param name="repulsionBetaBeta">(p_β q_β | r_β s_β), hartree.</param>
    /// <param name="nuclearRepulsionEnergyHartree">Nuclear repulsion energy, hartree.</param>
    /// <param name="dipoleAlpha">Optional α MO dipole integrals (x, y, z), bohr.</param>
    /// <param name="dipoleBeta">Optional β MO dipole integrals (x, y, z), bohr.</param>
    public static MolecularOrbitalHamiltonian Unrestricted(int orbitalCount, int alphaOccupiedCount, int betaOccupiedCount,
        ReadOnlySpan<double> orbitalEnergiesAlphaHartree, ReadOnlySpan<double> orbitalEnergiesBetaHartree,
        ReadOnlySpan<double> coreHamiltonianAlpha, ReadOnlySpan<double> coreHamiltonianBeta,
        ReadOnlySpan<double> repulsionAlphaAlpha, ReadOnlySpan<double> repulsionAlphaBeta, ReadOnlySpan<double> repulsionBetaBeta,
        double nuclearRepulsionEnergyHartree, IReadOnlyList<double[]>? dipoleAlpha = null, IReadOnlyList<double[]>? dipoleBeta = null)
    {
        Validate(orbitalCount, alphaOccupiedCount, betaOccupiedCount, orbitalEnergiesAlphaHartree, coreHamiltonianAlpha, repulsionAlphaAlpha, dipoleAlpha, "α ");
        Validate(orbitalCount, alphaOccupiedCount, betaOccupiedCount, orbitalEnergiesBetaHartree, coreHamiltonianBeta, repulsionBetaBeta, dipoleBeta, "β ");
        Validate(orbitalCount, alphaOccupiedCount, betaOccupiedCount, orbitalEnergiesBetaHartree, coreHamiltonianBeta, repulsionAlphaBeta, null, "αβ ");
        if ((dipoleAlpha is null) != (dipoleBeta is null))
            throw new OrbitariumInputException("Dipole integrals were given for one spin only: give both α and β dipole integrals, or neither.");
        return new MolecularOrbitalHamiltonian(orbitalCount, alphaOccupiedCount, betaOccupiedCount, false,
            orbitalEnergiesAlphaHartree.ToArray(), orbitalEnergiesBetaHartree.ToArray(),
            coreHamiltonianAlpha.ToArray(), coreHamiltonianBeta.ToArray(),
            repulsionAlphaAlpha.ToArray(), repulsionAlphaBeta.ToArray(), repulsionBetaBeta.ToArray(),
            nuclearRepulsionEnergyHartree,
            dipoleAlpha is null ? null : CopyDipole(dipoleAlpha), dipoleBeta is null ? null : CopyDipole(dipoleBeta));
    }

    /// <summary>Same Hamiltonian viewed as unrestricted (α and β blocks stored separately); returns itself when already unrestricted.</summary>
    public MolecularOrbitalHamiltonian AsUnrestricted() => IsRestricted
        ? new MolecularOrbitalHamiltonian(OrbitalCount, AlphaOccupiedCount, BetaOccupiedCount, false, _energiesAlpha, _energiesBeta,
            _coreAlpha, _coreBeta, _eriAlphaAlpha, _eriAlphaBeta, _eriBetaBeta, NuclearRepulsionEnergyHartree, _dipoleAlpha, _dipoleBeta)
        : this;

    /// <summary>
    /// The Fock matrix of the reference over α (<paramref name="beta"/> false) or β orbitals, hartree, m×m row-major:
    /// f_pq = h_pq + Σ_k^σ [(pq|kk) − (pk|kq)] + Σ_k^σ' (pq|kk).
    /// </summary>
    /// <param name="beta">True for the β Fock matrix.</param>
    public double[] FockMatrix(bool beta)
    {
        int m = OrbitalCount;
        var f = new double[m * m];
        var h = beta ? _coreBeta : _coreAlpha;
        var same = beta ? _eriBetaBeta : _eriAlphaAlpha;
        int nSame = beta ? BetaOccupiedCount : AlphaOccupiedCount;
        int nOther = beta ? AlphaOccupiedCount : BetaOccupiedCount;
        for (int p = 0; p < m; p++)
            for (int q = 0; q < m; q++)
            {
                double v = h[p * m + q];
                for (int k = 0; k < nSame; k++)
                    v += same[Index(m, p, q, k, k)] - same[Index(m, p, k, k, q)];
                for (int k = 0; k < nOther; k++)
                    v += beta ? _eriAlphaBeta[Index(m, k, k, p, q)] : _eriAlphaBeta[Index(m, p, q, k, k)];
                f[p * m + q] = v;
            }
        return f;
    }

    internal static int Index(int m, int p, int q, int r, int s) => ((p * m + q) * m + r) * m + s;

    private double ComputeReferenceEnergy()
    {
        int m = OrbitalCount;
        double e = NuclearRepulsionEnergyHartree;
        for (int i = 0; i < AlphaOccupiedCount; i++) e += _coreAlpha[i * m + i];
        for (int i = 0; i < BetaOccupiedCount; i++) e += _coreBeta[i * m + i];
        for (int i = 0; i < AlphaOccupiedCount; i++)
            for (int j = 0; j < AlphaOccupiedCount; j++)
                e += 0.5 * (_eriAlphaAlpha[Index(m, i, i, j, j)] - _eriAlphaAlpha[Index(m, i, j, j, i)]);
        for (int i = 0; i < BetaOccupiedCount; i++)
            for (int j = 0; j < BetaOccupiedCount; j++)
                e += 0.5 * (_eriBetaBeta[Index(m, i, i, j, j)] - _eriBetaBeta[Index(m, i, j, j, i)]);
        for (int i = 0; i < AlphaOccupiedCount; i++)
            for (int j = 0; j < BetaOccupiedCount; j++)
                e += _eriAlphaBeta[Index(m, i, i, j, j)];
        return e;
    }

    private static double[][] CopyDipole(IReadOnlyList<double[]> dipole) => [(double[])dipole[0].Clone(), (double[])dipole[1].Clone(), (double[])dipole[2].Clone()];

    private static void Validate(int m, int na, int nb, ReadOnlySpan<double> e, ReadOnlySpan<double> h, ReadOnlySpan<double> g,
        IReadOnlyList<double[]>? dipole, string what)
    {
        if (m < 1)
            throw new OrbitariumInputException($"The orbital count must be at least 1, got {m}.");
        if (na < 0 || nb < 0 || na > m || nb > m)
            throw new OrbitariumInputException($"Occupied orbital counts ({na} α, {nb} β) must lie between 0 and the orbital count {m}.");
        if (e.Length != m)
            throw new OrbitariumInputException($"Expected {m} {what}orbital energies, got {e.Length}.");
        if (h.Length != m * m)
            throw new OrbitariumInputException($"Expected {m}×{m} = {m * m} {what}one-electron integrals, got {h.Length}.");
        if (g.Length != m * m * m * m)
            throw new OrbitariumInputException($"Expected m⁴ = {(long)m * m * m * m} {what}repulsion integrals for {m} orbitals, got {g.Length}.");
        if (dipole is not null && (dipole.Count != 3 || dipole[0].Length != m * m || dipole[1].Length != m * m || dipole[2].Length != m * m))
            throw new OrbitariumInputException($"{what}dipole integrals must be three {m}×{m} matrices (x, y, z).");
    }
}
