namespace Orbitarium.Analysis;

/// <summary>Writes files atomically: into a temporary file beside the target, then renamed over it, so a reader
/// never sees a half-written file and a failure leaves nothing behind.</summary>
public static class AtomicFile
{
    /// <summary>Writes a file through a stream callback, atomically.</summary>
    /// <param name="path">Target path; its folder must exist.</param>
    /// <param name="write">Writes the content to the stream.</param>
    /// <returns>The full path written.</returns>
    /// <exception cref="OrbitariumInputException">The path is empty, its folder does not exist, or it cannot be written.</exception>
    public static string Write(string path, Action<Stream> write)
    {
        ArgumentNullException.ThrowIfNull(write);
        if (string.IsNullOrWhiteSpace(path))
            throw new OrbitariumInputException("The output path is empty; give a file name such as \"orbital.png\".");
        string full;
        try { full = Path.GetFullPath(path); }
        catch (Exception e) when (e is ArgumentException or NotSupportedException or PathTooLongException)
        {
            throw new OrbitariumInputException($"The output path \"{path}\" is not a valid file name ({e.Message}).", e);
        }
        string dir = Path.GetDirectoryName(full) ?? ".";
        if (!Directory.Exists(dir))
            throw new OrbitariumInputException($"The folder \"{dir}\" does not exist; create it or write to an existing folder.");
        if (Directory.Exists(full))
            throw new OrbitariumInputException($"\"{full}\" is a folder; give a file name inside it.");
        string temp = Path.Combine(dir, $".{Path.GetFileName(full)}.{Guid.NewGuid():N}.tmp");
        try
        {
            using (var stream = new FileStream(temp, FileMode.CreateNew, FileAccess.Write, FileShare.None))
            {
                write(stream);
                stream.Flush(true);
            }
            File.Move(temp, full, overwrite: true);
            return full;
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            TryDelete(temp);
            throw new OrbitariumInputException($"Cannot write \"{full}\": {e.Message} Choose a writable folder.", e);
        }
        catch
        {
            TryDelete(temp);
            throw;
        }
    }

    /// <summary>Writes text (UTF-8, no byte-order mark) atomically.</summary>
    /// <param name="path">Target path.</param>
    /// <param name="text">The content.</param>
    /// <returns>The full path written.</returns>
    public static string WriteAllText(string path, string text)
    {
        ArgumentNullException.ThrowIfNull(text);
        return Write(path, s =>
        {
            var bytes = new System.Text.UTF8Encoding(false).GetBytes(text);
            s.Write(bytes, 0, bytes.Length);
        });
    }

    /// <summary>Writes bytes atomically.</summary>
    /// <param name="path">Target path.</param>
    /// <param name="bytes">The content.</param>
    /// <returns>The full path written.</returns>
    public static string WriteAllBytes(string path, byte[] bytes)
    {
        ArgumentNullException.ThrowIfNull(bytes);
        return Write(path, s => s.Write(bytes, 0, bytes.Length));
    }

    private static void TryDelete(string path)
    {
        try { if (File.Exists(path)) File.Delete(path); }
        catch (IOException) { }
        catch (UnauthorizedAccessException) { }
    }
}
