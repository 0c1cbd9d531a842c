namespace Orbitarium;

/// <summary>
/// Raised when input given to Orbitarium (a geometry, a basis name, a charge, an option) cannot be used.
/// The message names the problem and what to do about it; the console and the <c>calc</c> command show it
/// as one line, never as a stack trace.
/// </summary>
public class OrbitariumInputException : Exception
{
    /// <summary>Creates the exception with a message that names the problem and the remedy.</summary>
    public OrbitariumInputException(string message) : base(message) { }

    /// <summary>Creates the exception for a problem at a 1-based line of a text input.</summary>
    public OrbitariumInputException(string message, int lineNumber) : base($"line {lineNumber}: {message}")
    {
        LineNumber = lineNumber;
    }

    /// <summary>Creates the exception wrapping a lower-level cause.</summary>
    public OrbitariumInputException(string message, Exception inner) : base(message, inner) { }

    /// <summary>The 1-based line of the text input the problem was found on, when there is one.</summary>
    public int? LineNumber { get; }
}
