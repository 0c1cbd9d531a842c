using System.Diagnostics;
using Microsoft.Extensions.Time.Testing;
using Orbitarium.Shell.Repl;

namespace Orbitarium.Tests.Shell.Repl;

public class ReplSessionTests
{
    private const string WaterXyz = "3\\nTG-1 water probe\\nO 0 0 0.1173\\nH 0 0.7572 -0.4692\\nH 0 -0.7572 -0.4692";

    public class SubmitAsync
    {
        [Fact]
        public async Task Variables_declared_in_one_submission_are_visible_in_the_next()
        {
            // Given a session with a variable
            var output = new StringWriter();
            var session = TestConsoles.Session(output);
            await session.SubmitAsync("var x = 6 * 7;");

            // When a later submission uses it
            var result = await session.SubmitAsync("x");

            // Then its value is shown
            Assert.Equal(SubmissionStatus.Accepted, result.Status);
            Assert.Equal(42, result.Value);
            Assert.Contains("42", output.ToString());
        }

        [Fact]
        public async Task Methods_and_types_persist_too()
        {
            var output = new StringWriter();
            var session = TestConsoles.Session(output);
            await session.SubmitAsync("record Point(double X, double Y);");
            await session.SubmitAsync("double Norm(Point p) => Math.Sqrt(p.X * p.X + p.Y * p.Y);");

            var result = await session.SubmitAsync("Norm(new Point(3, 4))");

            Assert.Equal(5.0, result.Value);
        }

        [Fact]
        public async Task A_compile_error_shows_line_column_and_span_and_keeps_the_state()
        {
            var output = new StringWriter();
            var session = TestConsoles.Session(output);
            await session.SubmitAsync("var kept = 1;");

            var result = await session.SubmitAsync("var y = 2;\nvar z = missing + 1;");

            Assert.Equal(SubmissionStatus.CompileError, result.Status);
            string text = output.ToString();
            Assert.Contains("(2,9): error CS0103", text);
            Assert.Contains("var z = missing + 1;", text);
            Assert.Contains("        ^^^^^^^", text);
            Assert.Equal(1, (await session.SubmitAsync("kept")).Value);
        }

        [Fact]
        public async Task A_thrown_exception_shows_the_message_only_and_leaves_prior_variables_intact()
        {
            var output = new StringWriter();
            var session = TestConsoles.Session(output);
            await session.SubmitAsync("var before = 10;");

            var failed = await session.SubmitAsync("var during = 5; throw new InvalidOperationException(\"boom\");");

            Assert.Equal(SubmissionStatus.RuntimeError, failed.Status);
            Assert.Contains("InvalidOperationException: boom", output.ToString());
            Assert.DoesNotContain("   at ", output.ToString());
            Assert.Equal(10, (await session.SubmitAsync("before")).Value);
            // The failed submission's declarations are dropped with it.
            Assert.Equal(SubmissionStatus.CompileError, (await session.SubmitAsync("during")).Status);
        }

        [Fact]
        public async Task A_library_input_error_shows_its_own_message()
        {
            var output = new StringWriter();
            var session = TestConsoles.Session(output);

            var result = await session.SubmitAsync("Molecule.FromXyz(\"2\\nbad\\nO 0 0 0\\nXx 0 0 1\")");

            Assert.Equal(SubmissionStatus.RuntimeError, result.Status);
            Assert.DoesNotContain("OrbitariumInputException", result.Message);
        }

        [Fact]
        public async Task Trace_shows_the_full_trace_of_the_last_error()
        {
            var output = new StringWriter();
            var session = TestConsoles.Session(output);
            await session.SubmitAsync("void Deep() => throw new ArgumentException(\"deep trouble\");");
            await session.SubmitAsync("Deep();");

            await session.SubmitAsync("#trace");

            string text = output.ToString();
            Assert.Contains("System.ArgumentException: deep trouble", text);
            Assert.Contains("   at ", text);
        }

        // The grace period after Ctrl+C runs on a FakeTimeProvider the test moves, so these tests decide "stopped
        // by itself" versus "abandoned" by the session's logic, not by how busy the machine is. The wall-clock
        // limits below only guard against a hang.
        private static readonly TimeSpan HangGuard = TimeSpan.FromSeconds(60);

        [Fact]
        public async Task Code_that_honours_the_token_is_cancelled_without_waiting_out_the_grace_period()
        {
            var output = new StringWriter();
            var clock = new FakeTimeProvider();
            var session = TestConsoles.Session(output, clock: clock);
            await session.SubmitAsync("var survivor = \"still here\";");
            using var ctrlC = new CancellationTokenSource();

            var submission = session.SubmitAsync("while (true) { Token.ThrowIfCancellationRequested(); Thread.Sleep(1); }", ctrlC.Token);
            await Task.Delay(300);
            Assert.False(submission.IsCompleted, "the loop ended before Ctrl+C");
            await ctrlC.CancelAsync();
            // The fake clock never moves, so the grace period never ends: only the code stopping ends the wait.
            var result = await submission.WaitAsync(HangGuard);

            Assert.Equal(SubmissionStatus.Cancelled, result.Status);
            Assert.Equal("still here", (await session.SubmitAsync("survivor")).Value);
        }

        [Fact]
        public async Task Code_that_ignores_the_token_is_abandoned_when_the_grace_period_ends_and_the_session_goes_on()
        {
            var output = new StringWriter();
            var clock = new FakeTimeProvider();
            var session = TestConsoles.Session(output, clock: clock);
            await session.SubmitAsync("var counter = 3;");
            using var ctrlC = new CancellationTokenSource();

            var submission = session.SubmitAsync("var stop = false; while (!stop) { Thread.Sleep(1); }", ctrlC.Token);
            await Task.Delay(300);
            await ctrlC.CancelAsync();
            await Task.Delay(300);
            Assert.False(submission.IsCompleted, "abandoned before the grace period ended");

            var wall = Stopwatch.StartNew();
            while (!submission.IsCompleted && wall.Elapsed < HangGuard)
            {
                clock.Advance(new ReplSessionOptions().CancellationGrace);
                await Task.Delay(20);
            }
            var result = await submission.WaitAsync(HangGuard);

            Assert.Equal(SubmissionStatus.Abandoned, result.Status);
            Assert.Contains("ignores Token", output.ToString());
            Assert.Equal(4, (await session.SubmitAsync("counter + 1")).Value);
        }

        [Fact]
        public async Task A_trailing_expression_of_a_molecule_renders_the_atom_table()
        {
            var output = new StringWriter();
            var session = TestConsoles.Session(output);

            await session.SubmitAsync($"Molecule.FromXyz(\"{WaterXyz}\")");

            string text = output.ToString();
            Assert.Contains("x / Å", text);
            Assert.Contains("0.117300", text);
            Assert.Contains("10 electrons", text);
        }

        [Fact]
        public async Task Print_renders_values_in_the_middle_of_a_submission()
        {
            var output = new StringWriter();
            var session = TestConsoles.Session(output);

            await session.SubmitAsync("Print(\"first\"); Print(Matrix<double>.Build.DenseIdentity(2));");

            string text = output.ToString();
            Assert.Contains("first", text);
            Assert.Contains("2×2 matrix", text);
        }

        [Fact]
        public async Task Scf_iterations_reported_through_Progress_are_counted_at_the_end()
        {
            var output = new StringWriter();
            var session = TestConsoles.Session(output);

            var result = await session.SubmitAsync(
                "for (int i = 1; i <= 3; i++) { Progress.Report(new ScfIteration(i, -1.0 - i, 0.1, 0.01, 0, 0.01 * i)); Thread.Sleep(150); }");

            Assert.Equal(SubmissionStatus.Accepted, result.Status);
            Assert.Contains("3 SCF iteration(s)", output.ToString());
        }

        [Fact]
        public async Task The_same_Progress_takes_an_SCF_and_a_coupled_cluster_run_and_counts_both()
        {
            // One global serves both kinds of report, so a user need not know which progress type a method takes.
            var output = new StringWriter();
            var session = TestConsoles.Session(output);
            await session.SubmitAsync("var h2 = Molecule.Empty.AddAtom(\"H\", 0, 0, 0).AddAtom(\"H\", 0, 0, 0.74);");

            var result = await session.SubmitAsync(
                "var cc = h2.WithBasis(\"6-31G**\").RunRhf(Progress, Token).Ccsd(null, Progress, Token);");

            Assert.Equal(SubmissionStatus.Accepted, result.Status);
            string text = output.ToString();
            Assert.Matches(@"\d+ SCF iteration\(s\), \d+ correlation iteration\(s\)", text);
        }
    }

    public class IsCompleteSubmission
    {
        private static readonly ReplSession Shared = TestConsoles.Session(new StringWriter());

        [Theory]
        [InlineData("var x = 1;", true)]
        [InlineData("1 + 1", true)]
        [InlineData("#vars", true)]
        [InlineData("for (int i = 0; i < 3; i++)", false)]
        [InlineData("void F()\n{", false)]
        [InlineData("var s = \"open", false)]
        [InlineData("void F()\n{\n}", true)]
        public void Follows_the_CSharp_script_grammar(string text, bool complete)
        {
            Assert.Equal(complete, Shared.IsCompleteSubmission(text));
        }
    }

    public class Complete : IClassFixture<Complete.WaterSession>
    {
        private readonly ReplSession _session;

        public Complete(WaterSession fixture) => _session = fixture.Session;

        /// <summary>One session with TG-1 water and a variable, shared by the completion tests (they do not change it).</summary>
        public sealed class WaterSession
        {
            public WaterSession()
            {
                Session = TestConsoles.Session(new StringWriter());
                Session.SubmitAsync($"var water = Molecule.FromXyz(\"{WaterXyz}\");").GetAwaiter().GetResult();
                Session.SubmitAsync("var basisCount = 7;").GetAwaiter().GetResult();
            }

            public ReplSession Session { get; }
        }

        [Fact]
        public async Task Offers_the_molecule_members_after_water_dot()
        {
            // Given a molecule in the session (the fixture), when completing after "water."
            await _session.WarmUpAsync();
            var result = _session.Complete("var e = water.");

            // Then the Molecule's members are offered
            Assert.Contains("NuclearRepulsionEnergyHartree", result.Names);
            Assert.Contains("WithCharge", result.Names);
            Assert.Contains("Formula", result.Names);
            Assert.DoesNotContain("FromXyz", result.Names);
        }

        [Fact]
        public async Task Filters_by_the_typed_prefix()
        {
            await _session.WarmUpAsync();
            var result = _session.Complete("water.With");

            Assert.NotEmpty(result.Names);
            Assert.All(result.Names, n => Assert.StartsWith("With", n));
            Assert.Equal("With", result.Partial);
        }

        [Fact]
        public async Task Offers_static_members_after_a_type_name()
        {
            await _session.WarmUpAsync();
            var result = _session.Complete("Molecule.From");

            Assert.Contains("FromXyz", result.Names);
            Assert.Contains("FromZMatrix", result.Names);
            Assert.DoesNotContain("Formula", result.Names);
        }

        [Fact]
        public async Task Offers_session_variables_types_and_keywords()
        {
            await _session.WarmUpAsync();
            Assert.Contains("basisCount", _session.Complete("basis").Names);
            Assert.Contains("Molecule", _session.Complete("Mol").Names);
            Assert.Contains("foreach", _session.Complete("fore").Names);
        }
    }
}
