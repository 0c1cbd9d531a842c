using Orbitarium.Analysis;
using Orbitarium.Tests.Plots;

namespace Orbitarium.Tests.Analysis;

public class AtomicFileTests
{
    [Fact]
    public void A_failed_write_leaves_neither_the_file_nor_a_temporary_behind()
    {
        using var dir = new PlotTestFolder();
        string target = dir.File("out.txt");
        var e = Assert.Throws<OrbitariumInputException>(() => AtomicFile.Write(target, s =>
        {
            s.WriteByte(1);
            throw new IOException("disk full");
        }));
        Assert.Contains("disk full", e.Message);
        Assert.Empty(Directory.GetFileSystemEntries(dir.Path));
    }

    [Fact]
    public void A_successful_write_replaces_the_old_content_whole()
    {
        using var dir = new PlotTestFolder();
        string target = dir.File("out.txt");
        File.WriteAllText(target, "old content that is longer");
        AtomicFile.WriteAllText(target, "new");
        Assert.Equal("new", File.ReadAllText(target));
        Assert.Single(Directory.GetFileSystemEntries(dir.Path));
    }
}
