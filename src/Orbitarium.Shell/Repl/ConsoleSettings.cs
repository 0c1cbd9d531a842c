namespace Orbitarium.Shell.Repl;

/// <summary>Display settings of a console session; change them at the prompt, e.g. <c>Settings.Decimals = 8;</c>.</summary>
public sealed class ConsoleSettings
{
    /// <summary>Rows of a matrix shown before the rest is elided (default 12).</summary>
    public int MatrixMaxRows { get; set; } = 12;

    /// <summary>Columns of a matrix shown before the rest is elided (default 8).</summary>
    public int MatrixMaxColumns { get; set; } = 8;

    /// <summary>Decimals shown for matrix elements and energies in tables (default 6).</summary>
    public int Decimals { get; set; } = 6;

    /// <summary>Orbitals shown around the HOMO–LUMO gap in an SCF result's orbital table (default 8 on each side).</summary>
    public int OrbitalsAroundGap { get; set; } = 8;
}
