namespace Orbitarium.Correlation;

/// <summary>One progress report of a correlated method.</summary>
/// <param name="Method">Method name, e.g. "CCSD" or "FCI".</param>
/// <param name="Iteration">1-based iteration number (0 for one-shot steps).</param>
/// <param name="EnergyHartree">Current energy: correlation energy for CCSD, lowest root total energy for FCI, hartree.</param>
/// <param name="Residual">Current residual (RMS amplitude change or largest residual norm).</param>
public sealed record CorrelationProgress(string Method, int Iteration, double EnergyHartree, double Residual);
