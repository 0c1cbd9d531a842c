using Orbitarium.Shell.Repl;

namespace Orbitarium.Tests.Shell.Repl;

public class AnalysisAtThePromptTests
{
    [Fact]
    public void Scripts_see_the_models_analysis_and_plots_namespaces()
    {
        Assert.Contains("Orbitarium.Models", ScriptEnvironment.Imports);
        Assert.Contains("Orbitarium.Analysis", ScriptEnvironment.Imports);
        Assert.Contains("Orbitarium.Plots", ScriptEnvironment.Imports);
    }
}
