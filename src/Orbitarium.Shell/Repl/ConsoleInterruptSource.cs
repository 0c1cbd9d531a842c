namespace Orbitarium.Shell.Repl;

/// <summary>Turns the process's Ctrl+C into <see cref="IInterruptSource.Interrupted"/> instead of ending the process.</summary>
public sealed class ConsoleInterruptSource : IInterruptSource, IDisposable
{
    /// <summary>Starts listening to Ctrl+C.</summary>
    public ConsoleInterruptSource() => Console.CancelKeyPress += OnCancelKeyPress;

    /// <inheritdoc />
    public event EventHandler? Interrupted;

    /// <summary>Stops listening; Ctrl+C ends the process again.</summary>
    public void Dispose() => Console.CancelKeyPress -= OnCancelKeyPress;

    private void OnCancelKeyPress(object? sender, ConsoleCancelEventArgs e)
    {
        e.Cancel = true;
        Interrupted?.Invoke(this, EventArgs.Empty);
    }
}
