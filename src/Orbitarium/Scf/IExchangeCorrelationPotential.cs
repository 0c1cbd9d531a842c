using MathNet.Numerics.LinearAlgebra;
using Orbitarium.BasisSets;

namespace Orbitarium.Scf;

/// <summary>
/// The Kohn–Sham hook of the self-consistent-field driver: given the current α and β AO densities, returns the
/// exchange–correlation energy and potential matrices. Hartree–Fock runs without one; DFT supplies one.
/// </summary>
public interface IExchangeCorrelationPotential
{
    /// <summary>Name of the functional, e.g. "B3LYP".</summary>
    string Name { get; }

    /// <summary>Fraction of exact (Hartree–Fock) exchange the SCF driver adds, 0 for pure functionals,
    /// 0.2 for B3LYP, 0.25 for PBE0.</summary>
    double ExactExchangeFraction { get; }

    /// <summary>Evaluates the exchange–correlation energy and potential for the given densities.</summary>
    /// <param name="basis">The basis the densities are expressed in.</param>
    /// <param name="densityAlpha">α AO density matrix.</param>
    /// <param name="densityBeta">β AO density matrix (equal to α for a restricted closed shell).</param>
    /// <param name="spinPolarized">False for restricted closed-shell Kohn–Sham (the potential is then the same for both spins).</param>
    /// <param name="cancellationToken">Stops the evaluation.</param>
    ExchangeCorrelationContribution Evaluate(MolecularBasis basis, Matrix<double> densityAlpha, Matrix<double> densityBeta,
        bool spinPolarized, CancellationToken cancellationToken = default);
}

/// <summary>What one exchange–correlation evaluation returns.</summary>
/// <param name="EnergyHartree">Exchange–correlation energy E_xc (without exact exchange) in hartree.</param>
/// <param name="PotentialAlpha">V_xc matrix for α electrons, hartree.</param>
/// <param name="PotentialBeta">V_xc matrix for β electrons, hartree.</param>
/// <param name="IntegratedElectronCount">Electrons counted by integrating the density on the grid.</param>
/// <param name="Description">One line naming the grid and functional, shown with results.</param>
public sealed record ExchangeCorrelationContribution(
    double EnergyHartree,
    Matrix<double> PotentialAlpha,
    Matrix<double> PotentialBeta,
    double IntegratedElectronCount,
    string Description);
