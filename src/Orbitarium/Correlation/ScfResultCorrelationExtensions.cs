using MathNet.Numerics.LinearAlgebra;
using Orbitarium.Integrals;
using Orbitarium.Scf;

namespace Orbitarium.Correlation;

/// <summary>
/// Correlated methods on a Hartree–Fock result, fluent: <c>rhf.Mp2()</c>, <c>rhf.Ccsd()</c>, <c>rhf.CcsdT()</c>,
/// <c>rhf.Cis(5)</c>, <c>rhf.Rpa(5)</c>, <c>rhf.Fci(3)</c>, <c>uhf.Mp2()</c>, …
/// </summary>
/// <remarks>
/// Each call computes the AO repulsion integrals of the result's basis, transforms them to the SCF orbitals
/// (<see cref="MolecularIntegralTransformation"/>, four O(N⁵) quarter-transformations) and runs the method.
/// Options default to <see cref="CorrelationOptions.Default"/>: no frozen core (all electrons correlated), energy
/// threshold 1e-8 Eh, residual 1e-7, 100 iterations, 8 DIIS vectors, 2 GiB memory budget. To run several methods on
/// the same orbitals, build the Hamiltonian once with <see cref="ToMolecularOrbitalHamiltonian"/>.
/// The reference must be a converged Hartree–Fock result (not Kohn–Sham); MP2, CCSD and CIS need RHF (closed shell)
/// or UHF; full CI accepts any of RHF, UHF, ROHF.
/// </remarks>
public static class ScfResultCorrelationExtensions
{
    /// <summary>
    /// The MO Hamiltonian of a Hartree–Fock result: AO integrals transformed to its orbitals, with MO dipole integrals
    /// (about the centre of nuclear charge) for oscillator strengths.
    /// </summary>
    /// <param name="scf">A converged RHF, UHF or ROHF result.</param>
    /// <param name="options">Memory budget for the AO and MO integrals (default 2 GiB).</param>
    /// <param name="cancellationToken">Stops the integral computation.</param>
    public static MolecularOrbitalHamiltonian ToMolecularOrbitalHamiltonian(this ScfResult scf, CorrelationOptions? options = null,
        CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(scf);
        options ??= CorrelationOptions.Default;
        CheckReference(scf, "a correlated method");
        int n = scf.Basis.FunctionCount, m = scf.OrbitalCount;
        double m4 = (double)m * m * m * m;
        bool unrestricted = scf.Reference == ScfReference.Unrestricted;
        // Packed AO integrals (N⁴/8), the transformation's peak, and the finished blocks that wait beside it.
        double packed = ElectronRepulsionTensor.EstimateBytes(n) / 8.0;
        MemoryEstimate.Require("The AO→MO integral transformation",
            packed + MolecularIntegralTransformation.TransformDoubles(n, m, m, m, m) + (unrestricted ? 2 : 0) * m4, options,
            "use a smaller basis or raise the budget (WithMemoryBudgetMebibytes).");
        var ao = ElectronRepulsionTensor.Compute(scf.Basis, null, cancellationToken);
        var dipole = OneElectronIntegrals.Dipole(scf.Basis, scf.Molecule.CenterOfNuclearChargeBohr);
        int na = scf.AlphaElectronCount, nb = scf.BetaElectronCount;
        if (unrestricted)
            return MolecularIntegralTransformation.UnrestrictedHamiltonian(scf.CoreHamiltonian, ao, scf.CoefficientsAlpha, scf.CoefficientsBeta,
                scf.OrbitalEnergiesAlphaHartree.AsSpan(), scf.OrbitalEnergiesBetaHartree.AsSpan(), na, nb, scf.NuclearRepulsionHartree, dipole, cancellationToken);
        return MolecularIntegralTransformation.RestrictedHamiltonian(scf.CoreHamiltonian, ao, scf.CoefficientsAlpha,
            scf.OrbitalEnergiesAlphaHartree.AsSpan(), na, nb, scf.NuclearRepulsionHartree, dipole, cancellationToken);
    }

    /// <summary>
    /// MP2 on an RHF (closed-shell formulas) or UHF result, with same-spin and opposite-spin parts (see <see cref="Correlation.Mp2"/>).
    /// Only the (ia|jb) integrals are transformed.
    /// </summary>
    /// <param name="scf">A converged RHF or UHF result.</param>
    /// <param name="options">Frozen core (default none) and memory budget.</param>
    /// <param name="progress">Receives one report (iteration 0, correlation energy, residual 0) when done.</param>
    /// <param name="cancellationToken">Stops the calculation.</param>
    public static Mp2Result Mp2(this ScfResult scf, CorrelationOptions? options = null, IProgress<CorrelationProgress>? progress = null,
        CancellationToken cancellationToken = default)
    {
        var result = Mp2Core(scf, options, cancellationToken);
        progress?.Report(new CorrelationProgress("MP2", 0, result.CorrelationEnergyHartree, 0));
        return result;
    }

    private static Mp2Result Mp2Core(ScfResult scf, CorrelationOptions? options, CancellationToken cancellationToken)
    {
        ArgumentNullException.ThrowIfNull(scf);
        options ??= CorrelationOptions.Default;
        CheckReference(scf, "MP2");
        RequireRhfOrUhf(scf, "MP2");
        int n = scf.Basis.FunctionCount, m = scf.OrbitalCount, nf = options.FrozenCoreOrbitals;
        int na = scf.AlphaElectronCount, nb = scf.BetaElectronCount;
        Correlation.Mp2.CheckFrozenCore(nf, na, nb);
        double packed = ElectronRepulsionTensor.EstimateBytes(n) / 8.0;
        int o = Math.Max(na, nb) - nf, v = m - Math.Min(na, nb);
        MemoryEstimate.Require("MP2", packed + MolecularIntegralTransformation.TransformDoubles(n, o, v, o, v) + 3.0 * o * v * o * v, options,
            "use a smaller basis or raise the budget (WithMemoryBudgetMebibytes).");
        var ao = ElectronRepulsionTensor.Compute(scf.Basis, null, cancellationToken);
        Matrix<double> Occ(Matrix<double> c, int occ) => c.SubMatrix(0, n, nf, occ - nf);
        Matrix<double> Vir(Matrix<double> c, int occ) => c.SubMatrix(0, n, occ, m - occ);
        if (scf.Reference == ScfReference.Restricted)
        {
            var c = scf.CoefficientsAlpha;
            var iajb = MolecularIntegralTransformation.TransformRepulsion(ao, Occ(c, na), Vir(c, na), Occ(c, na), Vir(c, na), cancellationToken);
            return Correlation.Mp2.Restricted(iajb, [.. scf.OrbitalEnergiesAlphaHartree], nf, na, m, scf.TotalEnergyHartree, cancellationToken);
        }
        var ca = scf.CoefficientsAlpha;
        var cb = scf.CoefficientsBeta;
        var aa = MolecularIntegralTransformation.TransformRepulsion(ao, Occ(ca, na), Vir(ca, na), Occ(ca, na), Vir(ca, na), cancellationToken);
        var ab = MolecularIntegralTransformation.TransformRepulsion(ao, Occ(ca, na), Vir(ca, na), Occ(cb, nb), Vir(cb, nb), cancellationToken);
        var bb = MolecularIntegralTransformation.TransformRepulsion(ao, Occ(cb, nb), Vir(cb, nb), Occ(cb, nb), Vir(cb, nb), cancellationToken);
        return Correlation.Mp2.Unrestricted(aa, ab, bb, [.. scf.OrbitalEnergiesAlphaHartree], [.. scf.OrbitalEnergiesBetaHartree],
            nf, na, nb, m, scf.TotalEnergyHartree, cancellationToken);
    }

    /// <summary>CCSD on an RHF or UHF result (see <see cref="Correlation.Ccsd"/>).</summary>
    /// <param name="scf">A converged RHF or UHF result.</param>
    /// <param name="options">Thresholds, iterations, DIIS, frozen core, memory budget.</param>
    /// <param name="progress">Receives (iteration, correlation energy, RMS amplitude change).</param>
    /// <param name="cancellationToken">Stops the calculation.</param>
    public static CoupledClusterResult Ccsd(this ScfResult scf, CorrelationOptions? options = null, IProgress<CorrelationProgress>? progress = null,
        CancellationToken cancellationToken = default)
    {
        RequireRhfOrUhf(scf, "CCSD");
        return Correlation.Ccsd.ComputeOnPrivateHamiltonian(Hamiltonian(scf, options, "CCSD", cancellationToken), false, options, progress, cancellationToken);
    }

    /// <summary>CCSD followed by the perturbative triples (T) on an RHF or UHF result.</summary>
    /// <param name="scf">A converged RHF or UHF result.</param>
    /// <param name="options">Thresholds, iterations, DIIS, frozen core, memory budget.</param>
    /// <param name="progress">Receives (iteration, correlation energy, RMS amplitude change).</param>
    /// <param name="cancellationToken">Stops the calculation.</param>
    public static CoupledClusterResult CcsdT(this ScfResult scf, CorrelationOptions? options = null, IProgress<CorrelationProgress>? progress = null,
        CancellationToken cancellationToken = default)
    {
        RequireRhfOrUhf(scf, "CCSD(T)");
        return Correlation.Ccsd.ComputeOnPrivateHamiltonian(Hamiltonian(scf, options, "CCSD(T)", cancellationToken), true, options, progress, cancellationToken);
    }

    /// <summary>EOM-CCSD excitation energies (see <see cref="Correlation.EomCcsd"/>): singlets of a closed-shell RHF
    /// result (<paramref name="triplets"/> false) or its triplets, or the S_z-conserving states of a UHF result.</summary>
    /// <param name="scf">A converged RHF (closed shell) or UHF result.</param>
    /// <param name="states">Number of excited states (default 5).</param>
    /// <param name="triplets">For an RHF result: triplets instead of singlets (default false). Ignored for UHF.</param>
    /// <param name="options">Thresholds, iterations, frozen core, memory budget.</param>
    /// <param name="progress">Receives the CCSD iterations, then the eigenvalue iterations.</param>
    /// <param name="cancellationToken">Stops the calculation.</param>
    public static ExcitedStatesResult EomCcsd(this ScfResult scf, int states = 5, bool triplets = false, CorrelationOptions? options = null,
        IProgress<CorrelationProgress>? progress = null, CancellationToken cancellationToken = default)
    {
        RequireRhfOrUhf(scf, "EOM-CCSD");
        if (scf.Reference == ScfReference.Restricted && scf.AlphaElectronCount != scf.BetaElectronCount)
            throw new OrbitariumInputException(
                $"EOM-CCSD on an RHF result needs a closed shell, but this one has {scf.AlphaElectronCount} α and {scf.BetaElectronCount} β electrons: run RunUhf for an open shell.");
        if (scf.Reference == ScfReference.Unrestricted)
            return Correlation.EomCcsd.Unrestricted(Hamiltonian(scf, options, "EOM-CCSD", cancellationToken), states, options, progress, cancellationToken);
        if (triplets)
            return Correlation.EomCcsd.Triplets(Hamiltonian(scf, options, "EOM-CCSD", cancellationToken), states, options, progress, cancellationToken);
        return Correlation.EomCcsd.Run(Hamiltonian(scf, options, "CCSD", cancellationToken), states, options, progress, cancellationToken,
            privateHamiltonian: true);
    }

    /// <summary>CIS excited states: singlets of an RHF result (<paramref name="triplets"/> false) or triplets, or the
    /// unrestricted manifold of a UHF result.</summary>
    /// <param name="scf">A converged RHF or UHF result.</param>
    /// <param name="states">Number of states (default 5).</param>
    /// <param name="triplets">For an RHF result: triplets instead of singlets (default false). Ignored for UHF.</param>
    /// <param name="options">Frozen core and memory budget.</param>
    /// <param name="progress">Receives one report (iteration 0, lowest excitation energy, residual 0) when done.</param>
    /// <param name="cancellationToken">Stops the calculation.</param>
    public static ExcitedStatesResult Cis(this ScfResult scf, int states = 5, bool triplets = false, CorrelationOptions? options = null,
        IProgress<CorrelationProgress>? progress = null, CancellationToken cancellationToken = default)
    {
        RequireRhfOrUhf(scf, "CIS");
        var h = Hamiltonian(scf, options, "CIS", cancellationToken);
        if (scf.Reference == ScfReference.Unrestricted) return Correlation.Cis.Unrestricted(h, states, options, progress, cancellationToken);
        return triplets ? Correlation.Cis.Triplets(h, states, options, progress, cancellationToken) : Correlation.Cis.Singlets(h, states, options, progress, cancellationToken);
    }

    /// <summary>RPA (TDHF) excited states: singlets or triplets of an RHF result, or the unrestricted manifold of a UHF result.</summary>
    /// <param name="scf">A converged RHF or UHF result.</param>
    /// <param name="states">Number of states (default 5).</param>
    /// <param name="triplets">For an RHF result: triplets instead of singlets (default false).</param>
    /// <param name="options">Frozen core and memory budget.</param>
    /// <param name="progress">Receives one report (iteration 0, lowest excitation energy, residual 0) when done.</param>
    /// <param name="cancellationToken">Stops the calculation.</param>
    public static ExcitedStatesResult Rpa(this ScfResult scf, int states = 5, bool triplets = false, CorrelationOptions? options = null,
        IProgress<CorrelationProgress>? progress = null, CancellationToken cancellationToken = default)
    {
        RequireRhfOrUhf(scf, "RPA");
        var h = Hamiltonian(scf, options, "RPA", cancellationToken);
        if (scf.Reference == ScfReference.Unrestricted) return Correlation.Rpa.Unrestricted(h, states, options, progress, cancellationToken);
        return triplets ? Correlation.Rpa.Triplets(h, states, options, progress, cancellationToken) : Correlation.Rpa.Singlets(h, states, options, progress, cancellationToken);
    }

    /// <summary>Full CI in the orbitals of any Hartree–Fock result (see <see cref="FullCi"/>).</summary>
    /// <param name="scf">A converged RHF, UHF or ROHF result.</param>
    /// <param name="roots">Number of roots (default 1).</param>
    /// <param name="options">Thresholds, frozen core, memory budget.</param>
    /// <param name="progress">Receives (iteration, lowest total energy, largest residual).</param>
    /// <param name="cancellationToken">Stops the calculation.</param>
    public static ConfigurationInteractionResult Fci(this ScfResult scf, int roots = 1, CorrelationOptions? options = null,
        IProgress<CorrelationProgress>? progress = null, CancellationToken cancellationToken = default) =>
        FullCi.Compute(Hamiltonian(scf, options, "FCI", cancellationToken, forFullCi: true), roots, options, progress, cancellationToken);

    /// <summary>CISD in the orbitals of a Hartree–Fock result (see <see cref="Correlation.Cisd"/>; small systems only).</summary>
    /// <param name="scf">A converged RHF, UHF or ROHF result.</param>
    /// <param name="roots">Number of roots (default 1).</param>
    /// <param name="options">Thresholds, frozen core, memory budget.</param>
    /// <param name="progress">Receives (iteration, lowest total energy, largest residual).</param>
    /// <param name="cancellationToken">Stops the calculation.</param>
    public static ConfigurationInteractionResult Cisd(this ScfResult scf, int roots = 1, CorrelationOptions? options = null,
        IProgress<CorrelationProgress>? progress = null, CancellationToken cancellationToken = default) =>
        Correlation.Cisd.Compute(Hamiltonian(scf, options, "CISD", cancellationToken, forFullCi: true), roots, options, progress, cancellationToken);

    private static MolecularOrbitalHamiltonian Hamiltonian(ScfResult scf, CorrelationOptions? options, string method, CancellationToken ct, bool forFullCi = false)
    {
        ArgumentNullException.ThrowIfNull(scf);
        CheckReference(scf, method);
        options ??= CorrelationOptions.Default;
        if (forFullCi)
        {
            // Refuse an oversized determinant space before computing any integral.
            int nf = options.FrozenCoreOrbitals, n = scf.OrbitalCount - nf;
            Correlation.Mp2.CheckFrozenCore(nf, scf.AlphaElectronCount, scf.BetaElectronCount);
            if (n > DeterminantCi.MaximumActiveOrbitals)
                throw new OrbitariumInputException(
                    $"{method} is limited to {DeterminantCi.MaximumActiveOrbitals} active orbitals, but this system has {n}: use a smaller basis or freeze core orbitals (WithFrozenCore).");
            MemoryEstimate.Require(method, DeterminantHamiltonian.Doubles(n, scf.AlphaElectronCount - nf, scf.BetaElectronCount - nf, 52), options,
                "use fewer orbitals (a smaller basis or frozen core) or raise the budget (WithMemoryBudgetMebibytes).");
        }
        else if (method.StartsWith("CCSD", StringComparison.Ordinal))
        {
            int nf = options.FrozenCoreOrbitals;
            bool closedShell = scf.Reference == ScfReference.Restricted && scf.AlphaElectronCount == scf.BetaElectronCount;
            // The MO Hamiltonian (m⁴) is held alongside the solver's own arrays.
            double hamiltonian = Math.Pow(scf.OrbitalCount, 4) * (scf.Reference == ScfReference.Restricted ? 1 : 3);
            MemoryEstimate.Require(method, hamiltonian + Correlation.Ccsd.EstimateDoubles(closedShell, scf.OrbitalCount, nf,
                    scf.AlphaElectronCount, scf.BetaElectronCount, options.DiisVectors, copiesIntegrals: false),
                options, "use a smaller basis, freeze core orbitals (WithFrozenCore), or raise the budget (WithMemoryBudgetMebibytes).");
        }
        return scf.ToMolecularOrbitalHamiltonian(options, ct);
    }

    private static void CheckReference(ScfResult scf, string method)
    {
        ArgumentNullException.ThrowIfNull(scf);
        if (scf.Options.ExchangeCorrelation is not null)
            throw new OrbitariumInputException(
                $"{method} needs a Hartree–Fock reference, but this result is Kohn–Sham ({scf.MethodName}): run RunRhf or RunUhf without a functional first.");
        if (!scf.Converged)
            throw new OrbitariumInputException(
                $"{method} needs a converged reference, but the {scf.MethodName} run stopped ({scf.StopReason}) after {scf.Iterations} iterations: converge the SCF first (more iterations, damping, another guess).");
    }

    private static void RequireRhfOrUhf(ScfResult scf, string method)
    {
        ArgumentNullException.ThrowIfNull(scf);
        if (scf.Reference == ScfReference.RestrictedOpenShell)
            throw new OrbitariumInputException(
                $"{method} is built on RHF (closed shell) or UHF references, not ROHF: for this open shell run RunUhf and ask for {method} on that result.");
    }
}
