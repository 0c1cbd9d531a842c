using System.Collections.Immutable;
using MathNet.Numerics.LinearAlgebra;

namespace Orbitarium.Correlation;

/// <summary>
/// Configuration interaction with single excitations (CIS) from a Hartree–Fock reference: spin-adapted singlets and
/// triplets of a closed shell, or the unrestricted manifold of a UHF reference, with oscillator strengths from the
/// transition dipoles.
/// </summary>
/// <remarks>
/// Eigenvalues of A (see <see cref="Rpa"/> for A and B). J. B. Foresman, M. Head-Gordon, J. A. Pople and M. J. Frisch,
/// J. Phys. Chem. 96, 135 (1992). Oscillator strength f = ⅔ ω |⟨0|r|n⟩|² (atomic units); for a singlet
/// ⟨0|r|n⟩ = √2 Σ_ia X_ia ⟨i|r|a⟩. The matrix is diagonalised densely (dimension o·v).
/// </remarks>
public static class Cis
{
    /// <summary>Lowest singlet CIS states of a closed-shell RHF reference.</summary>
    /// <param name="hamiltonian">MO Hamiltonian of a closed-shell RHF reference (with dipole integrals for f).</param>
    /// <param name="states">Number of states (default 5; fewer if the space is smaller).</param>
    /// <param name="options">Frozen core and memory budget.</param>
    /// <param name="progress">Receives one report (iteration 0, lowest excitation energy, residual 0) when done.</param>
    /// <param name="cancellationToken">Stops the calculation.</param>
    public static ExcitedStatesResult Singlets(MolecularOrbitalHamiltonian hamiltonian, int states = 5, CorrelationOptions? options = null,
        IProgress<CorrelationProgress>? progress = null, CancellationToken cancellationToken = default) =>
        Run("CIS", "singlet", hamiltonian, states, options, progress, cancellationToken);

    /// <summary>Lowest triplet CIS states of a closed-shell RHF reference (oscillator strengths are zero).</summary>
    /// <param name="hamiltonian">MO Hamiltonian of a closed-shell RHF reference.</param>
    /// <param name="states">Number of states (default 5).</param>
    /// <param name="options">Frozen core and memory budget.</param>
    /// <param name="progress">Receives one report (iteration 0, lowest excitation energy, residual 0) when done.</param>
    /// <param name="cancellationToken">Stops the calculation.</param>
    public static ExcitedStatesResult Triplets(MolecularOrbitalHamiltonian hamiltonian, int states = 5, CorrelationOptions? options = null,
        IProgress<CorrelationProgress>? progress = null, CancellationToken cancellationToken = default) =>
        Run("CIS", "triplet", hamiltonian, states, options, progress, cancellationToken);

    /// <summary>Lowest CIS states over α and β excitations of a UHF (or closed-shell) reference; spin is not adapted.</summary>
    /// <param name="hamiltonian">MO Hamiltonian of a UHF or RHF reference.</param>
    /// <param name="states">Number of states (default 5).</param>
    /// <param name="options">Frozen core and memory budget.</param>
    /// <param name="progress">Receives one report (iteration 0, lowest excitation energy, residual 0) when done.</param>
    /// <param name="cancellationToken">Stops the calculation.</param>
    public static ExcitedStatesResult Unrestricted(MolecularOrbitalHamiltonian hamiltonian, int states = 5, CorrelationOptions? options = null,
        IProgress<CorrelationProgress>? progress = null, CancellationToken cancellationToken = default) =>
        Run("CIS", "unrestricted", hamiltonian, states, options, progress, cancellationToken);

    internal static ExcitedStatesResult Run(string method, string manifold, MolecularOrbitalHamiltonian h, int states, CorrelationOptions? options,
        IProgress<CorrelationProgress>? progress, CancellationToken ct)
    {
        ArgumentNullException.ThrowIfNull(h);
        options ??= CorrelationOptions.Default;
        if (manifold != "unrestricted" && !h.IsClosedShell)
            throw new OrbitariumInputException(
                $"{method} {manifold}s need a closed-shell RHF reference, but this one has {h.AlphaOccupiedCount} α and {h.BetaOccupiedCount} β electrons{(h.IsRestricted ? "" : " in unrestricted orbitals")}: use the unrestricted {method} on a UHF reference.");
        if (manifold == "unrestricted" && h.IsRestricted && !h.IsClosedShell)
            throw new OrbitariumInputException($"Unrestricted {method} needs a UHF reference for an open shell: run RunUhf first.");
        if (states < 1)
            throw new OrbitariumInputException($"Ask for at least one excited state, got {states}.");
        int nf = Mp2.CheckFrozenCore(options.FrozenCoreOrbitals, h.AlphaOccupiedCount, h.BetaOccupiedCount);
        ct.ThrowIfCancellationRequested();
        var x = ExcitationMatrices.Build(h, manifold, nf, options);
        int dim = x.A.RowCount;
        int count = Math.Min(states, dim);
        var energies = new double[count];
        var amplitudes = new double[count][];
        if (method == "CIS")
        {
            var evd = x.A.Evd(Symmetricity.Symmetric);
            for (int n = 0; n < count; n++)
            {
                energies[n] = evd.EigenValues[n].Real;
                amplitudes[n] = evd.EigenVectors.Column(n).ToArray();
            }
        }
        else
        {
            // (A − B)^{1/2} (A + B) (A − B)^{1/2} Z = ω² Z, X + Y = ω^{-1/2} (A − B)^{1/2} Z.
            var amb = x.A - x.B;
            var apb = x.A + x.B;
            var e1 = amb.Evd(Symmetricity.Symmetric);
            var lambda = e1.EigenValues.Select(c => c.Real).ToArray();
            if (lambda.Min() <= 1e-10)
                throw new OrbitariumInputException(
                    $"The reference is unstable for RPA ({manifold} A − B has the eigenvalue {lambda.Min():E2} Eh): the Hartree–Fock solution is not a minimum; use CIS, or look for a lower (e.g. unrestricted) solution.");
            var sqrtAmb = e1.EigenVectors * Matrix<double>.Build.DiagonalOfDiagonalArray(lambda.Select(Math.Sqrt).ToArray()) * e1.EigenVectors.Transpose();
            var mtx = sqrtAmb * apb * sqrtAmb;
            mtx = 0.5 * (mtx + mtx.Transpose());
            var e2 = mtx.Evd(Symmetricity.Symmetric);
            for (int n = 0; n < count; n++)
            {
                double w2 = e2.EigenValues[n].Real;
                if (w2 <= 0)
                    throw new OrbitariumInputException($"The reference is unstable for RPA (ω² = {w2:E2}): use CIS or a lower Hartree–Fock solution.");
                double w = Math.Sqrt(w2);
                energies[n] = w;
                amplitudes[n] = (sqrtAmb * e2.EigenVectors.Column(n) / Math.Sqrt(w)).ToArray();
            }
        }
        var strengths = ImmutableArray.CreateBuilder<double>();
        var dipoles = ImmutableArray.CreateBuilder<ImmutableArray<double>>();
        if (x.Dipole is { } mu)
            for (int n = 0; n < count; n++)
            {
                var t = new double[3];
                for (int k = 0; k < 3; k++)
                    t[k] = x.DipoleScale * MolecularIntegralTransformation.Dot(amplitudes[n], mu[k]);
                dipoles.Add([.. t]);
                strengths.Add(2.0 / 3.0 * energies[n] * (t[0] * t[0] + t[1] * t[1] + t[2] * t[2]));
            }
        progress?.Report(new CorrelationProgress(method, 0, energies[0], 0));
        return new ExcitedStatesResult(method, manifold, h.ReferenceEnergyHartree, [.. energies], strengths.ToImmutable(), dipoles.ToImmutable(), nf);
    }
}
