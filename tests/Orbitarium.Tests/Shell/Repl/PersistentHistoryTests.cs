using Orbitarium.Shell.Repl;

namespace Orbitarium.Tests.Shell.Repl;

public class PersistentHistoryTests
{
    public class Add
    {
        [Fact]
        public void Entries_survive_a_restart_including_multi_line_ones()
        {
            string path = Path.Combine(TestConsoles.TempFolder(), "orbitarium", "history.jsonl");
            var first = new PersistentHistory(path);
            first.Add("var x = 1;");
            first.Add("for (int i = 0; i < 2; i++)\n{\n    Print(\"quoted \\\" text\");\n}");
            first.Add("for (int i = 0; i < 2; i++)\n{\n    Print(\"quoted \\\" text\");\n}");
            first.Add("   ");

            var second = new PersistentHistory(path);

            Assert.Equal(2, second.Entries.Count);
            Assert.Equal("var x = 1;", second.Entries[0]);
            Assert.Contains("\n{\n", second.Entries[1]);
        }
    }
}
