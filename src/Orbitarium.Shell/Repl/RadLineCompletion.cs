using RadLine;

namespace Orbitarium.Shell.Repl;

/// <summary>
/// Adapts <see cref="ScriptCompletion"/> to RadLine: RadLine splits words on whitespace only, so
/// <c>water.Fo</c> arrives as one word; we complete the identifier after the last dot and return whole words.
/// </summary>
public sealed class RadLineCompletion : ITextCompletion
{
    private readonly ReplSession _session;

    /// <summary>Completes against <paramref name="session"/>.</summary>
    public RadLineCompletion(ReplSession session)
    {
        ArgumentNullException.ThrowIfNull(session);
        _session = session;
    }

    /// <summary>Lines of the submission already entered above the current line (set by the console loop).</summary>
    public string PendingText { get; set; } = "";

    /// <inheritdoc />
    public IEnumerable<string>? GetCompletions(string prefix, string word, string suffix)
    {
        string before = (PendingText.Length > 0 ? PendingText + "\n" : "") + prefix + word;
        var result = _session.Complete(before);
        if (result.Names.Length == 0 || result.Partial.Length > word.Length) return null;
        string head = word[..(word.Length - result.Partial.Length)];
        return result.Names.Select(n => head + n).ToList();
    }
}
