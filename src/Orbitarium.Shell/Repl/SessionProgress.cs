using Orbitarium.Correlation;
using Orbitarium.Scf;

namespace Orbitarium.Shell.Repl;

/// <summary>
/// The <c>Progress</c> of a session: pass it to any long calculation that reports progress, SCF runs
/// (<c>RunRhf(Progress, Token)</c>) and correlated methods (<c>rhf.CcsdT(null, Progress, Token)</c>) alike. At the
/// prompt the iterations appear live in one table; in <c>orbitarium run</c> scripts they are discarded.
/// </summary>
public sealed class SessionProgress : IProgress<ScfIteration>, IProgress<CorrelationProgress>
{
    private readonly IProgress<ScfIteration>? _scf;
    private readonly IProgress<CorrelationProgress>? _correlation;

    /// <summary>Creates a progress that forwards SCF and correlation reports to the given receivers (null discards).</summary>
    /// <param name="scf">Receives SCF iterations.</param>
    /// <param name="correlation">Receives correlated-method iterations.</param>
    public SessionProgress(IProgress<ScfIteration>? scf, IProgress<CorrelationProgress>? correlation)
    {
        _scf = scf;
        _correlation = correlation;
    }

    /// <summary>A progress that discards every report.</summary>
    public static SessionProgress Discard { get; } = new(null, null);

    /// <summary>Receives one SCF iteration.</summary>
    /// <param name="value">The iteration.</param>
    public void Report(ScfIteration value) => _scf?.Report(value);

    /// <summary>Receives one iteration of a correlated method (MP2, CCSD, CIS, FCI…).</summary>
    /// <param name="value">The iteration.</param>
    public void Report(CorrelationProgress value) => _correlation?.Report(value);
}
