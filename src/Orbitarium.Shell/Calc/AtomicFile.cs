namespace Orbitarium.Shell.Calc;

/// <summary>Writes files atomically: to a temporary file in the same folder, then renamed over the target, so a
/// reader never sees half a file.</summary>
internal static class AtomicFile
{
    /// <summary>Writes <paramref name="text"/> (UTF-8) to <paramref name="path"/> atomically.</summary>
    /// <exception cref="OrbitariumInputException">The folder does not exist or cannot be written.</exception>
    public static void WriteAllText(string path, string text)
    {
        string full = Path.GetFullPath(path);
        string folder = Path.GetDirectoryName(full) ?? ".";
        string temp = Path.Combine(folder, $".{Path.GetFileName(full)}.{Environment.ProcessId}.{Guid.NewGuid():N}.tmp");
        try
        {
            File.WriteAllText(temp, text);
            File.Move(temp, full, overwrite: true);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            try { File.Delete(temp); } catch (IOException) { } catch (UnauthorizedAccessException) { }
            throw new OrbitariumInputException($"Cannot write '{path}': {e.Message}", e);
        }
    }
}
