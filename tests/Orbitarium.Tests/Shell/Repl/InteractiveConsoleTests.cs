using Orbitarium.Shell.Repl;

namespace Orbitarium.Tests.Shell.Repl;

public class InteractiveConsoleTests
{
    private static (InteractiveConsole Loop, ReplSession Session, StringWriter Output, ScriptedKeys Keys, TestInterrupts CtrlC, PersistentHistory History) Create()
    {
        var output = new StringWriter();
        var keys = new ScriptedKeys();
        var console = TestConsoles.Interactive(output, keys);
        var session = new ReplSession(console, new ReplSessionOptions { WorkingDirectory = TestConsoles.TempFolder() });
        var history = new PersistentHistory(Path.Combine(TestConsoles.TempFolder(), "history.jsonl"));
        var ctrlC = new TestInterrupts();
        return (new InteractiveConsole(session, console, keys, history, ctrlC), session, output, keys, ctrlC, history);
    }

    private static async Task Eventually(Func<bool> condition, string what)
    {
        for (int i = 0; i < 400 && !condition(); i++) await Task.Delay(25);
        Assert.True(condition(), "timed out waiting for " + what);
    }

    public class RunAsync
    {
        [Fact]
        public async Task Typed_lines_are_evaluated_in_one_session_and_kept_in_the_history()
        {
            var (loop, _, output, keys, _, history) = Create();
            keys.Type("var x = 2;\n").Type("x * 21\n").Type("#quit\n");

            int exit = await loop.RunAsync().WaitAsync(TimeSpan.FromSeconds(60));

            Assert.Equal(0, exit);
            Assert.Contains("42", TestConsoles.StripAnsi(output.ToString()));
            Assert.Equal(["var x = 2;", "x * 21", "#quit"], history.Entries);
        }

        [Fact]
        public async Task An_incomplete_line_continues_on_the_next_one()
        {
            var (loop, _, output, keys, _, history) = Create();
            keys.Type("var total = 0;\n").Type("for (int i = 1; i <= 4; i++)\n").Type("{\n").Type("total += i;\n").Type("}\n")
                .Type("total * 1000\n").Type("#quit\n");

            await loop.RunAsync().WaitAsync(TimeSpan.FromSeconds(60));

            Assert.Contains("10000", TestConsoles.StripAnsi(output.ToString()));
            Assert.Contains("for (int i = 1; i <= 4; i++)\n{\ntotal += i;\n}", history.Entries);
        }

        [Fact]
        public async Task Tab_completes_the_member_after_a_dot()
        {
            var (loop, _, output, keys, _, _) = Create();
            keys.Type("var water = Molecule.Empty.AddAtom(\"O\", 0, 0, 0).AddAtom(\"H\", 0, 0, 0.97);\n");
            keys.Type("water.NuclearRep").Press(ConsoleKey.Tab).Type(" * 0 + 17\n").Type("#quit\n");

            await loop.RunAsync().WaitAsync(TimeSpan.FromSeconds(60));

            Assert.Contains("17", TestConsoles.StripAnsi(output.ToString()));
            Assert.DoesNotContain("error", TestConsoles.StripAnsi(output.ToString()));
        }

        [Fact]
        public async Task Ctrl_C_twice_at_an_idle_prompt_asks_before_leaving()
        {
            // Given a console at its prompt
            var (loop, _, output, keys, ctrlC, _) = Create();
            bool prompted = false;
            loop.PromptShown += (_, _) => prompted = true;
            var running = loop.RunAsync();
            await Eventually(() => prompted, "the first prompt");

            // When Ctrl+C is pressed once, then again
            ctrlC.Press();
            await Eventually(() => output.ToString().Contains("Ctrl+C again to leave"), "the hint");
            Assert.False(running.IsCompleted);
            ctrlC.Press();
            await Eventually(() => output.ToString().Contains("Leave Orbitarium?"), "the question");

            // Then it asks, and leaves on yes
            keys.Type("y\n");
            Assert.Equal(0, await running.WaitAsync(TimeSpan.FromSeconds(30)));
        }

        [Fact]
        public async Task Ctrl_C_during_a_submission_cancels_it_and_returns_to_the_prompt()
        {
            var (loop, session, output, keys, ctrlC, _) = Create();
            keys.Type("var kept = 5;\n").Type("while (true) { Token.ThrowIfCancellationRequested(); Thread.Sleep(1); }\n");
            var running = loop.RunAsync();
            await Eventually(() => keys.IsEmpty && session.AcceptedSubmissions.Count == 1, "the loop to start");
            await Task.Delay(500);

            ctrlC.Press();
            await Eventually(() => output.ToString().Contains("Cancelled"), "the cancellation");
            keys.Type("kept * 3\n").Type("#quit\n");
            await running.WaitAsync(TimeSpan.FromSeconds(30));

            Assert.Contains("15", TestConsoles.StripAnsi(output.ToString()));
        }
    }
}
