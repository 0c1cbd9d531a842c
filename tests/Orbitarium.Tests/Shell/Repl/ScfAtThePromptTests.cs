using Microsoft.Extensions.Time.Testing;
using Orbitarium.Shell.Repl;

namespace Orbitarium.Tests.Shell.Repl;

public class ScfAtThePromptTests
{
    [Fact]
    public async Task An_RHF_result_renders_as_a_summary_panel_with_an_orbital_table()
    {
        var output = new StringWriter();
        var session = TestConsoles.Session(output, TestConsoles.RepositoryRoot());
        // User code resolves files against the process folder; the test gives a full path.
        string xyz = Path.Combine(TestConsoles.RepositoryRoot(), "examples", "tg1-water.xyz");
        await session.SubmitAsync($"var water = Molecule.FromXyzFile(@\"{xyz}\");");

        var result = await session.SubmitAsync("water.WithBasis(\"STO-3G\").RunRhf(Progress, Token)");

        string text = output.ToString();
        Assert.True(result.Status == SubmissionStatus.Accepted, text);
        Assert.Contains("RHF/STO-3G · H2O", text);
        Assert.Contains("converged", text);
        // Water RHF/STO-3G near the experimental geometry: -74.963 Eh (from memory); the panel prints 10 decimals.
        Assert.Contains("-74.963", text);
        Assert.Contains("HOMO", text);
        Assert.Contains("LUMO", text);
        Assert.Contains("SCF iteration(s)", text);
    }

    [Fact]
    public async Task Ctrl_C_during_an_SCF_on_a_102_function_molecule_stops_the_SCF_itself_with_the_session_intact()
    {
        // Given TG-B benzene in 6-31G* (102 Cartesian functions) running RHF at the prompt. The session's clock is
        // a FakeTimeProvider that never moves, so the grace period never ends: the submission can only come back
        // if the SCF itself notices the token (status Cancelled, not Abandoned), whatever the machine's load.
        var output = new StringWriter();
        var session = TestConsoles.Session(output, TestConsoles.RepositoryRoot(), new FakeTimeProvider());
        string xyz = Path.Combine(TestConsoles.RepositoryRoot(), "examples", "tgb-benzene.xyz");
        await session.SubmitAsync($"var benzene = Molecule.FromXyzFile(@\"{xyz}\");");
        await session.SubmitAsync("var setup = benzene.WithBasis(\"6-31G*\");");
        Assert.Equal(102, (await session.SubmitAsync("setup.Basis.FunctionCount")).Value);
        using var ctrlC = new CancellationTokenSource();
        // One RHF takes about 1.5 s on an idle machine, so the submission repeats it: Ctrl+C after 1.5 s then always
        // lands inside an SCF, however fast or busy the machine is.
        var running = session.SubmitAsync("ScfResult? result = null; for (int k = 0; k < 200; k++) result = setup.RunRhf(Progress, Token);", ctrlC.Token);
        await Task.Delay(1500);
        if (running.IsCompleted)
        {
            var early = await running;
            Assert.Fail($"the SCF finished before it could be cancelled ({early.Status}: {early.Message}):\n{output}");
        }

        // When Ctrl+C is pressed
        await ctrlC.CancelAsync();
        var outcome = await running.WaitAsync(TimeSpan.FromSeconds(60));

        // Then the SCF stops on the token and earlier variables are intact
        Assert.Equal(SubmissionStatus.Cancelled, outcome.Status);
        Assert.Equal("C6H6", (await session.SubmitAsync("benzene.Formula")).Value);
        Assert.Equal(SubmissionStatus.CompileError, (await session.SubmitAsync("result")).Status);
    }
}
