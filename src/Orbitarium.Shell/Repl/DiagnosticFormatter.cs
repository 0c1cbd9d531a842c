using System.Diagnostics;
using System.Globalization;
using Microsoft.CodeAnalysis;

namespace Orbitarium.Shell.Repl;

/// <summary>Turns compiler diagnostics and exceptions into the short messages the console and <c>run</c> print.</summary>
public static class DiagnosticFormatter
{
    /// <summary>At most this many diagnostics are shown for one submission.</summary>
    public const int MaxDiagnostics = 3;

    /// <summary>The errors of a compilation, sorted by position, each as a header line plus the source line and a caret marker.</summary>
    /// <param name="diagnostics">Diagnostics from <c>Script.Compile()</c>.</param>
    /// <param name="fileLabel">Prefix for the location (a script's path), or null at the prompt.</param>
    public static IReadOnlyList<FormattedDiagnostic> Format(IEnumerable<Diagnostic> diagnostics, string? fileLabel)
    {
        ArgumentNullException.ThrowIfNull(diagnostics);
        var errors = diagnostics.Where(d => d.Severity == DiagnosticSeverity.Error)
            .OrderBy(d => d.Location.SourceSpan.Start).Take(MaxDiagnostics).ToList();
        var result = new List<FormattedDiagnostic>();
        foreach (var d in errors)
        {
            var span = d.Location.GetMappedLineSpan();
            int line = span.StartLinePosition.Line + 1, column = span.StartLinePosition.Character + 1;
            string file = fileLabel ?? (string.IsNullOrEmpty(span.Path) ? "" : span.Path);
            if (!string.IsNullOrEmpty(span.Path) && fileLabel is not null && span.Path != fileLabel) file = span.Path;
            string header = string.Create(CultureInfo.InvariantCulture,
                $"{file}({line},{column}): error {d.Id}: {d.GetMessage(CultureInfo.InvariantCulture)}");
            string? sourceLine = null, marker = null;
            if (d.Location.SourceTree is { } tree)
            {
                var text = tree.GetText();
                int lineIndex = d.Location.GetLineSpan().StartLinePosition.Line;
                if (lineIndex >= 0 && lineIndex < text.Lines.Count)
                {
                    var textLine = text.Lines[lineIndex];
                    sourceLine = textLine.ToString();
                    int start = Math.Max(0, d.Location.SourceSpan.Start - textLine.Start);
                    int length = Math.Max(1, Math.Min(d.Location.SourceSpan.Length, textLine.End - d.Location.SourceSpan.Start));
                    marker = new string(' ', Math.Min(start, sourceLine.Length)) + new string('^', length);
                }
            }
            result.Add(new FormattedDiagnostic(header, line, column, sourceLine, marker));
        }
        return result;
    }

    /// <summary>The line of <paramref name="scriptPath"/> where <paramref name="exception"/> was thrown, or null.</summary>
    public static int? ScriptLineOf(Exception exception, string scriptPath)
    {
        ArgumentNullException.ThrowIfNull(exception);
        for (Exception? e = exception; e is not null; e = e.InnerException)
        {
            var frames = new StackTrace(e, fNeedFileInfo: true).GetFrames();
            foreach (var frame in frames)
            {
                string? file = frame.GetFileName();
                if (file is not null && string.Equals(Path.GetFullPath(file), scriptPath, StringComparison.Ordinal) && frame.GetFileLineNumber() > 0)
                    return frame.GetFileLineNumber();
            }
        }
        return null;
    }

    /// <summary>The one-line message for a runtime error: the message alone for input errors, the type name and message otherwise.</summary>
    public static string ExceptionMessage(Exception exception)
    {
        ArgumentNullException.ThrowIfNull(exception);
        var e = exception;
        while (e is AggregateException { InnerExceptions.Count: 1 } a) e = a.InnerExceptions[0];
        if (e is System.Reflection.TargetInvocationException { InnerException: { } inner }) e = inner;
        return e is OrbitariumInputException ? e.Message : $"{e.GetType().Name}: {e.Message}";
    }
}

/// <summary>One compiler error ready to print.</summary>
/// <param name="Header">Location, id and message, e.g. <c>(1,9): error CS0103: The name 'y' does not exist…</c>.</param>
/// <param name="Line">1-based line of the error in its submission or file.</param>
/// <param name="Column">1-based column.</param>
/// <param name="SourceLine">The offending source line, when known.</param>
/// <param name="Marker">Carets under the offending span of <paramref name="SourceLine"/>.</param>
public sealed record FormattedDiagnostic(string Header, int Line, int Column, string? SourceLine, string? Marker);
