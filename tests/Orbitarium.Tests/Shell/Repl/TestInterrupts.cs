using Orbitarium.Shell.Repl;

namespace Orbitarium.Tests.Shell.Repl;

/// <summary>Ctrl+C pressed by a test.</summary>
internal sealed class TestInterrupts : IInterruptSource
{
    public event EventHandler? Interrupted;

    public void Press() => Interrupted?.Invoke(this, EventArgs.Empty);
}
