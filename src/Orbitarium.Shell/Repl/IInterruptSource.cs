namespace Orbitarium.Shell.Repl;

/// <summary>Where Ctrl+C comes from: the process's console in the real executable, a test in tests.</summary>
public interface IInterruptSource
{
    /// <summary>Raised on each Ctrl+C.</summary>
    event EventHandler? Interrupted;
}
