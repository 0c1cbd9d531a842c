namespace Orbitarium.Shell.Repl;

/// <summary>Writes files atomically: to a temporary file beside the target, then renamed over it.</summary>
internal static class AtomicFile
{
    public static void WriteAllText(string path, string text)
    {
        string? folder = Path.GetDirectoryName(path);
        if (!string.IsNullOrEmpty(folder)) Directory.CreateDirectory(folder);
        string temp = path + "." + Guid.NewGuid().ToString("N")[..8] + ".tmp";
        try
        {
            File.WriteAllText(temp, text);
            File.Move(temp, path, overwrite: true);
        }
        finally
        {
            if (File.Exists(temp)) File.Delete(temp);
        }
    }
}
