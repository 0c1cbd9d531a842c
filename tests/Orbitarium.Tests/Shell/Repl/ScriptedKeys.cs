using System.Collections.Concurrent;
using RadLine;
using Spectre.Console;

namespace Orbitarium.Tests.Shell.Repl;

/// <summary>
/// Keys typed by a test, served to RadLine and to Spectre prompts. After an Enter it reports no key available
/// once, like a person pausing, so RadLine does not take the next line for a multi-line paste.
/// </summary>
internal sealed class ScriptedKeys : IInputSource, IAnsiConsoleInput
{
    private readonly ConcurrentQueue<ConsoleKeyInfo> _keys = new();
    private volatile bool _pause;

    public bool ByPassProcessing => false;

    /// <summary>Queues the characters of <paramref name="text"/>; '\n' becomes Enter.</summary>
    public ScriptedKeys Type(string text)
    {
        foreach (char c in text)
        {
            if (c == '\n') _keys.Enqueue(new ConsoleKeyInfo('\r', ConsoleKey.Enter, false, false, false));
            else _keys.Enqueue(new ConsoleKeyInfo(c, KeyOf(c), char.IsUpper(c), false, false));
        }
        return this;
    }

    /// <summary>Queues a special key such as Tab.</summary>
    public ScriptedKeys Press(ConsoleKey key, char c = '\0')
    {
        _keys.Enqueue(new ConsoleKeyInfo(c, key, false, false, false));
        return this;
    }

    public bool IsEmpty => _keys.IsEmpty;

    public bool IsKeyAvailable()
    {
        if (_pause)
        {
            _pause = false;
            return false;
        }
        return !_keys.IsEmpty;
    }

    public ConsoleKeyInfo ReadKey()
    {
        ConsoleKeyInfo key;
        while (!_keys.TryDequeue(out key)) Thread.Sleep(5);
        if (key.Key == ConsoleKey.Enter) _pause = true;
        return key;
    }

    ConsoleKeyInfo? IAnsiConsoleInput.ReadKey(bool intercept) => ReadKey();

    async Task<ConsoleKeyInfo?> IAnsiConsoleInput.ReadKeyAsync(bool intercept, CancellationToken cancellationToken)
    {
        while (_keys.IsEmpty)
        {
            cancellationToken.ThrowIfCancellationRequested();
            await Task.Delay(5, cancellationToken);
        }
        return ReadKey();
    }

    private static ConsoleKey KeyOf(char c) => c switch
    {
        >= 'a' and <= 'z' => ConsoleKey.A + (c - 'a'),
        >= 'A' and <= 'Z' => ConsoleKey.A + (c - 'A'),
        >= '0' and <= '9' => ConsoleKey.D0 + (c - '0'),
        ' ' => ConsoleKey.Spacebar,
        '\t' => ConsoleKey.Tab,
        _ => ConsoleKey.Oem1,
    };
}
