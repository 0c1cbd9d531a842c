using Orbitarium.Shell.Repl;

namespace Orbitarium.Tests.Shell.Repl;

public class ScriptRunnerTests
{
    private static async Task<(int Exit, string Output, string Error)> Run(string code, IReadOnlyList<string>? args = null, CancellationToken token = default)
    {
        string path = Path.Combine(TestConsoles.TempFolder(), "script.csx");
        await File.WriteAllTextAsync(path, code, token);
        var output = new StringWriter();
        var error = new StringWriter();
        int exit = await ScriptRunner.RunAsync(path, args ?? [], output, error, token);
        return (exit, output.ToString(), error.ToString());
    }

    public class RunAsync
    {
        [Fact]
        public async Task A_script_that_runs_to_the_end_exits_with_0_and_sees_its_arguments()
        {
            var (exit, output, error) = await Run("Print($\"{Args.Count} {Args[0]}\");", ["tg1"]);
            Assert.Equal(0, exit);
            Assert.Equal("1 tg1", output.Trim());
            Assert.Equal("", error);
        }

        [Fact]
        public async Task A_compile_error_exits_with_1_and_names_the_script_line()
        {
            var (exit, _, error) = await Run("var ok = 1;\nvar bad = undefinedName;\n");
            Assert.Equal(1, exit);
            Assert.Contains("script.csx(2,11): error CS0103", error);
        }

        [Fact]
        public async Task A_runtime_error_exits_with_1_and_names_the_script_line()
        {
            var (exit, _, error) = await Run("var ok = 1;\n\nthrow new InvalidOperationException(\"stopped here\");\n");
            Assert.Equal(1, exit);
            Assert.Contains("script.csx(3): InvalidOperationException: stopped here", error);
        }

        [Fact]
        public async Task Cancellation_exits_with_130()
        {
            using var ctrlC = new CancellationTokenSource(TimeSpan.FromMilliseconds(1500));
            var (exit, _, _) = await Run("while (true) { Token.ThrowIfCancellationRequested(); Thread.Sleep(1); }", token: ctrlC.Token);
            Assert.Equal(130, exit);
        }

        [Fact]
        public async Task A_missing_file_exits_with_1()
        {
            var error = new StringWriter();
            int exit = await ScriptRunner.RunAsync("/nonexistent/none.csx", [], new StringWriter(), error);
            Assert.Equal(1, exit);
            Assert.Contains("none.csx", error.ToString());
        }
    }
}
