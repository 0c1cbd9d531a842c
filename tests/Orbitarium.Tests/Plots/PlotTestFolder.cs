namespace Orbitarium.Tests.Plots;

/// <summary>A fresh temporary folder per test, deleted afterwards.</summary>
public sealed class PlotTestFolder : IDisposable
{
    public PlotTestFolder()
    {
        Path = System.IO.Path.Combine(System.IO.Path.GetTempPath(), "orbitarium-plots-" + Guid.NewGuid().ToString("N"));
        Directory.CreateDirectory(Path);
    }

    public string Path { get; }

    public string File(string name) => System.IO.Path.Combine(Path, name);

    public void Dispose()
    {
        if (Environment.GetEnvironmentVariable("ORBITARIUM_KEEP_TEST_PLOTS") == "1") return;
        try { Directory.Delete(Path, true); } catch (IOException) { }
    }
}
