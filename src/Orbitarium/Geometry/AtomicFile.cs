namespace Orbitarium.Geometry;

/// <summary>Writes text files atomically: to a temporary file beside the target, then renamed over it.</summary>
internal static class AtomicFile
{
    public static void WriteAllText(string path, string text)
    {
        ArgumentNullException.ThrowIfNull(path);
        string full;
        try
        {
            full = Path.GetFullPath(path);
            string dir = Path.GetDirectoryName(full) ?? ".";
            string temp = Path.Combine(dir, $".{Path.GetFileName(full)}.{Environment.ProcessId}.{Guid.NewGuid():N}.tmp");
            File.WriteAllText(temp, text);
            File.Move(temp, full, overwrite: true);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException or ArgumentException or NotSupportedException)
        {
            throw new OrbitariumInputException($"Cannot write '{path}': {e.Message} Check that the folder exists and is writable.", e);
        }
    }
}
