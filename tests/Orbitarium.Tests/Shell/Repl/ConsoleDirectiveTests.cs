using Orbitarium.Shell.Repl;

namespace Orbitarium.Tests.Shell.Repl;

public class ConsoleDirectiveTests
{
    public class Save
    {
        [Fact]
        public async Task Writes_accepted_submissions_that_run_replays_with_the_same_output()
        {
            // Given a session with two accepted submissions, one failed one and a shown value
            string folder = TestConsoles.TempFolder();
            var session = TestConsoles.Session(new StringWriter(), folder);
            await session.SubmitAsync("var a = 20;");
            await session.SubmitAsync("var broken = ;");
            await session.SubmitAsync("a + 1");

            // When saved and replayed
            await session.SubmitAsync("#save replay");
            var output = new StringWriter();
            var error = new StringWriter();
            int exit = await ScriptRunner.RunAsync(Path.Combine(folder, "replay.csx"), [], output, error);

            // Then the script holds only the accepted code and prints the shown value
            string script = await File.ReadAllTextAsync(Path.Combine(folder, "replay.csx"));
            Assert.DoesNotContain("broken", script);
            Assert.Contains("Print(a + 1);", script);
            Assert.Equal(0, exit);
            Assert.Equal("21", output.ToString().Trim());
        }
    }

    public class Load
    {
        [Fact]
        public async Task Runs_a_file_relative_to_the_session_folder_and_nested_loads_relative_to_the_loading_file()
        {
            string folder = TestConsoles.TempFolder();
            Directory.CreateDirectory(Path.Combine(folder, "lib"));
            await File.WriteAllTextAsync(Path.Combine(folder, "lib", "inner.csx"), "var innerValue = 5;\n");
            await File.WriteAllTextAsync(Path.Combine(folder, "lib", "outer.csx"), "#load \"inner.csx\"\nvar outerValue = innerValue * 2;\n");
            var session = TestConsoles.Session(new StringWriter(), folder);

            var loaded = await session.SubmitAsync("#load lib/outer.csx");
            var value = await session.SubmitAsync("outerValue + innerValue");

            Assert.Equal(SubmissionStatus.Accepted, loaded.Status);
            Assert.Equal(15, value.Value);
        }

        [Fact]
        public async Task A_missing_file_is_named_in_the_message()
        {
            var output = new StringWriter();
            var session = TestConsoles.Session(output, TestConsoles.TempFolder());

            var result = await session.SubmitAsync("#load nowhere.csx");

            Assert.Equal(SubmissionStatus.CompileError, result.Status);
            Assert.Contains("nowhere.csx", output.ToString());
        }
    }

    public class Help
    {
        [Fact]
        public async Task Shows_the_XML_documentation_of_a_member()
        {
            var output = new StringWriter();
            var session = TestConsoles.Session(output);

            await session.SubmitAsync("#help Molecule.WithCharge");

            // The summary written in src/Orbitarium/Chemistry/Molecule.cs.
            Assert.Contains("Returns a copy with a new total charge", output.ToString());
            Assert.Contains("WithCharge(int charge)", output.ToString());
        }

        [Fact]
        public async Task Shows_a_type_with_its_members()
        {
            var output = new StringWriter();
            var session = TestConsoles.Session(output);

            await session.SubmitAsync("#help Molecule");

            string text = output.ToString();
            Assert.Contains("An immutable molecule", text);
            Assert.Contains("NuclearRepulsionEnergyHartree", text);
        }

        [Fact]
        public async Task Without_a_name_lists_the_commands()
        {
            var output = new StringWriter();
            var session = TestConsoles.Session(output);

            await session.SubmitAsync("#help");

            foreach (var command in ReplSession.Commands) Assert.Contains(command.Usage, output.ToString());
        }
    }

    public class Vars
    {
        [Fact]
        public async Task Lists_each_variable_once_with_its_latest_type_and_value()
        {
            var output = new StringWriter();
            var session = TestConsoles.Session(output);
            await session.SubmitAsync("var energy = -1.5;");
            await session.SubmitAsync("var energy = \"redeclared\";");

            await session.SubmitAsync("#vars");

            string text = output.ToString();
            Assert.Contains("energy", text);
            Assert.Contains("string", text);
            Assert.Contains("\"redeclared\"", text);
            Assert.DoesNotContain("-1.5", text);
        }
    }

    public class Time
    {
        [Fact]
        public async Task Reports_the_elapsed_time_of_the_next_submission_only()
        {
            var clock = new SteppingClock(TimeSpan.FromMilliseconds(250));
            var output = new StringWriter();
            var session = TestConsoles.Session(output, clock: clock);

            await session.SubmitAsync("#time");
            await session.SubmitAsync("var t = 1;");
            await session.SubmitAsync("var u = 2;");

            Assert.Single(output.ToString().Split('\n'), l => l.Contains("elapsed"));
        }

        /// <summary>A clock that moves on a fixed step each time it is read.</summary>
        private sealed class SteppingClock(TimeSpan step) : TimeProvider
        {
            private long _ticks;

            public override long TimestampFrequency => TimeSpan.TicksPerSecond;

            public override long GetTimestamp() => Interlocked.Add(ref _ticks, step.Ticks);
        }
    }

    public class Cd
    {
        [Fact]
        public async Task Changes_the_folder_relative_paths_resolve_against()
        {
            string folder = TestConsoles.TempFolder();
            Directory.CreateDirectory(Path.Combine(folder, "sub"));
            await File.WriteAllTextAsync(Path.Combine(folder, "sub", "v.csx"), "var fromSub = 3;\n");
            var session = TestConsoles.Session(new StringWriter(), folder);

            await session.SubmitAsync("#cd sub");
            var loaded = await session.SubmitAsync("#load v.csx");

            Assert.Equal(Path.Combine(folder, "sub"), session.WorkingDirectory);
            Assert.Equal(SubmissionStatus.Accepted, loaded.Status);
        }
    }

    public class Reset
    {
        [Fact]
        public async Task Forgets_variables_and_submissions()
        {
            var session = TestConsoles.Session(new StringWriter());
            await session.SubmitAsync("var gone = 1;");

            await session.SubmitAsync("#reset");

            Assert.Empty(session.AcceptedSubmissions);
            Assert.Equal(SubmissionStatus.CompileError, (await session.SubmitAsync("gone")).Status);
        }
    }

    public class Unknown
    {
        [Fact]
        public async Task An_unknown_command_points_to_help_while_compiler_directives_pass_through()
        {
            var output = new StringWriter();
            var session = TestConsoles.Session(output);

            var unknown = await session.SubmitAsync("#frobnicate");
            var pragma = await session.SubmitAsync("#nullable enable");

            Assert.Contains("Unknown command #frobnicate. #help lists the commands.", output.ToString());
            Assert.Equal(SubmissionStatus.CompileError, unknown.Status);
            Assert.Equal(SubmissionStatus.Accepted, pragma.Status);
        }
    }

    public class Quit
    {
        [Fact]
        public async Task Asks_the_session_to_end()
        {
            var session = TestConsoles.Session(new StringWriter());
            await session.SubmitAsync("#quit");
            Assert.True(session.ExitRequested);
        }
    }
}
