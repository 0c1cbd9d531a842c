using Orbitarium.Plots;
using Orbitarium.Shell.Repl;
using Orbitarium.Shell.Repl.Rendering;

namespace Orbitarium.Tests.Shell.Repl;

public class PlotFileRendererTests
{
    [Fact]
    public void A_written_plot_shows_its_terminal_preview_and_path_at_the_prompt()
    {
        var plot = new PlotFile("/tmp/curve.png", "energy along r(H1–H2)") { TerminalPreview = "⠁⠂⠄⡀ preview", WidthPixels = 800, HeightPixels = 550 };
        var writer = new StringWriter();
        var console = TestConsoles.Plain(writer);
        console.Write(ValueRendererRegistry.CreateDefault().Render(plot, new ConsoleSettings()));
        string text = writer.ToString();
        Assert.Contains("⠁⠂⠄⡀ preview", text);
        Assert.Contains("/tmp/curve.png", text);
        Assert.Contains("800 × 550 px", text);
    }
}
