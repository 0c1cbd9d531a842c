using Spectre.Console;
using Spectre.Console.Rendering;

namespace Orbitarium.Tests.Shell.Repl;

/// <summary>A console that renders through <paramref name="inner"/> but reads keys from a test.</summary>
internal sealed class ScriptedConsole(IAnsiConsole inner, ScriptedKeys keys) : IAnsiConsole
{
    public Profile Profile => inner.Profile;

    public IAnsiConsoleCursor Cursor => inner.Cursor;

    public IAnsiConsoleInput Input => keys;

    public IExclusivityMode ExclusivityMode => inner.ExclusivityMode;

    public RenderPipeline Pipeline => inner.Pipeline;

    public void Clear(bool home) => inner.Clear(home);

    public void Write(IRenderable renderable) => inner.Write(renderable);
}
