using System.Text.Json;

namespace Orbitarium.Shell.Repl;

/// <summary>
/// Submission history kept across sessions in a file (one JSON string per line, so multi-line submissions
/// survive), by default <c>orbitarium/history.jsonl</c> in the user's application-data folder.
/// </summary>
public sealed class PersistentHistory
{
    /// <summary>At most this many entries are kept.</summary>
    public const int MaxEntries = 1000;

    private readonly List<string> _entries = [];

    /// <summary>Opens (or will create) the history file at <paramref name="path"/> and reads its entries.</summary>
    public PersistentHistory(string path)
    {
        ArgumentNullException.ThrowIfNull(path);
        Path = path;
        try
        {
            if (File.Exists(path))
                foreach (string line in File.ReadLines(path))
                    if (TryDecode(line, out string? entry)) _entries.Add(entry);
        }
        catch (IOException)
        {
            // An unreadable history is not worth failing the console for.
        }
        if (_entries.Count > MaxEntries) _entries.RemoveRange(0, _entries.Count - MaxEntries);
    }

    /// <summary>The default history file: <c>ApplicationData/orbitarium/history.jsonl</c> (on Linux <c>~/.config/orbitarium</c>).</summary>
    public static string DefaultPath =>
        System.IO.Path.Combine(Environment.GetFolderPath(Environment.SpecialFolder.ApplicationData, Environment.SpecialFolderOption.DoNotVerify),
            "orbitarium", "history.jsonl");

    /// <summary>The file the history is kept in.</summary>
    public string Path { get; }

    /// <summary>The entries, oldest first.</summary>
    public IReadOnlyList<string> Entries => _entries;

    /// <summary>Adds a submission (skipping blanks and an immediate repeat) and appends it to the file.</summary>
    public void Add(string entry)
    {
        ArgumentNullException.ThrowIfNull(entry);
        if (entry.Trim().Length == 0 || (_entries.Count > 0 && _entries[^1] == entry)) return;
        _entries.Add(entry);
        try
        {
            Directory.CreateDirectory(System.IO.Path.GetDirectoryName(Path)!);
            if (_entries.Count > MaxEntries + MaxEntries / 5)
            {
                _entries.RemoveRange(0, _entries.Count - MaxEntries);
                AtomicFile.WriteAllText(Path, string.Concat(_entries.Select(e => JsonSerializer.Serialize(e) + "\n")));
            }
            else
            {
                File.AppendAllText(Path, JsonSerializer.Serialize(entry) + "\n");
            }
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            // History is a convenience: a read-only home folder must not break the console.
        }
    }

    private static bool TryDecode(string line, [System.Diagnostics.CodeAnalysis.NotNullWhen(true)] out string? entry)
    {
        entry = null;
        if (line.Length == 0) return false;
        try
        {
            entry = JsonSerializer.Deserialize<string>(line);
            return entry is not null;
        }
        catch (JsonException)
        {
            return false;
        }
    }
}
