namespace Orbitarium.Correlation;

/// <summary>
/// The bookkeeping every coupled-cluster amplitude iteration shares: energy and RMS-change histories, the progress
/// report, and the stopping rule (both the energy change and the RMS amplitude change below their thresholds; a
/// non-finite energy is divergence; otherwise the iteration limit).
/// </summary>
internal sealed class AmplitudeConvergence(CorrelationOptions options, IProgress<CorrelationProgress>? progress, string method,
    double startEnergy)
{
    private double _energy = startEnergy;

    /// <summary>Energy after each iteration, hartree.</summary>
    public List<double> Energies { get; } = [];

    /// <summary>RMS amplitude change of each iteration.</summary>
    public List<double> Residuals { get; } = [];

    /// <summary>Whether the thresholds were met.</summary>
    public bool Converged { get; private set; }

    /// <summary>Why the iterations stopped (or would stop now).</summary>
    public string Reason { get; private set; } = $"reached the limit of {options.MaxIterations} iterations";

    /// <summary>The latest energy, hartree.</summary>
    public double Energy => _energy;

    /// <summary>Records one iteration and reports it; true when the iterations should stop.</summary>
    public bool Record(int iteration, double energy, double rms)
    {
        double change = Math.Abs(energy - _energy);
        _energy = energy;
        Energies.Add(energy);
        Residuals.Add(rms);
        progress?.Report(new CorrelationProgress(method, iteration, energy, rms));
        if (!double.IsFinite(energy))
        {
            Reason = "the amplitudes diverged (non-finite energy)";
            return true;
        }
        if (change < options.EnergyThresholdHartree && rms < options.ResidualThreshold)
        {
            Converged = true;
            Reason = $"energy change {change:E1} Eh and RMS amplitude change {rms:E1} below the thresholds";
            return true;
        }
        return false;
    }
}
