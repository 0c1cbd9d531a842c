using Microsoft.CodeAnalysis.CSharp.Scripting.Hosting;
using Spectre.Console;
using Spectre.Console.Rendering;

namespace Orbitarium.Shell.Repl.Rendering;

/// <summary>
/// Chooses how a value is shown at the prompt, by its type: the most derived registered type wins (base
/// classes before interfaces); values of unregistered types are shown as C# would display them.
/// </summary>
/// <remarks>
/// Built-in renderers are added in <see cref="CreateDefault"/>; another project (for example the figures)
/// adds its own with <see cref="Register{T}(Func{T, ConsoleSettings, IRenderable})"/>. Registering a type again
/// replaces the earlier renderer.
/// </remarks>
public sealed class ValueRendererRegistry
{
    private readonly Dictionary<Type, Func<object, ConsoleSettings, IRenderable>> _renderers = [];
    private readonly Lock _gate = new();

    /// <summary>A registry with the built-in renderers: molecules, matrices, vectors and (when present) SCF results.</summary>
    public static ValueRendererRegistry CreateDefault()
    {
        var registry = new ValueRendererRegistry();
        BuiltInRenderers.AddTo(registry);
        return registry;
    }

    /// <summary>Number of registered types.</summary>
    public int Count
    {
        get
        {
            lock (_gate) return _renderers.Count;
        }
    }

    /// <summary>Registers (or replaces) the renderer for values of type <typeparamref name="T"/> and its subtypes.</summary>
    /// <returns>This registry, for chaining.</returns>
    public ValueRendererRegistry Register<T>(Func<T, ConsoleSettings, IRenderable> render)
    {
        ArgumentNullException.ThrowIfNull(render);
        lock (_gate) _renderers[typeof(T)] = (value, settings) => render((T)value, settings);
        return this;
    }

    /// <summary>Registers (or replaces) a renderer that does not need the display settings.</summary>
    /// <returns>This registry, for chaining.</returns>
    public ValueRendererRegistry Register<T>(Func<T, IRenderable> render)
    {
        ArgumentNullException.ThrowIfNull(render);
        return Register<T>((value, _) => render(value));
    }

    /// <summary>Whether a renderer other than the plain-text fallback applies to <paramref name="type"/>.</summary>
    public bool HasRendererFor(Type type)
    {
        ArgumentNullException.ThrowIfNull(type);
        return Find(type) is not null;
    }

    /// <summary>Renders a value with the renderer of its type, or as C# would display it.</summary>
    /// <remarks>A renderer that throws falls back to the plain text, with a note; a value never breaks the prompt.</remarks>
    public IRenderable Render(object? value, ConsoleSettings settings)
    {
        ArgumentNullException.ThrowIfNull(settings);
        if (value is null) return new Text("null", new Style(Color.Grey));
        if (value is IRenderable renderable) return renderable;
        var render = Find(value.GetType());
        if (render is not null)
        {
            try
            {
                return render(value, settings);
            }
            catch (Exception e) when (e is not OutOfMemoryException)
            {
                return new Rows(new Text(PlainText(value)),
                    new Text($"(the renderer for {value.GetType().Name} failed: {e.Message})", new Style(Color.Grey)));
            }
        }
        return new Text(PlainText(value));
    }

    /// <summary>The plain text of a value: strings quoted, collections listed, other objects by <c>ToString()</c>.</summary>
    public static string PlainText(object? value)
    {
        if (value is null) return "null";
        // Library types that write their own summary (results, options) are shown by it as is; the C# formatter
        // would wrap that text in brackets.
        var declaring = value.GetType().GetMethod(nameof(ToString), Type.EmptyTypes)?.DeclaringType;
        if (declaring?.Namespace?.StartsWith("Orbitarium", StringComparison.Ordinal) == true)
            return value.ToString() ?? value.GetType().Name;
        try
        {
            return CSharpObjectFormatter.Instance.FormatObject(value);
        }
        catch (Exception e) when (e is not OutOfMemoryException)
        {
            return value.ToString() ?? value.GetType().Name;
        }
    }

    private Func<object, ConsoleSettings, IRenderable>? Find(Type type)
    {
        lock (_gate)
        {
            for (var t = type; t is not null; t = t.BaseType)
                if (_renderers.TryGetValue(t, out var render)) return render;
            foreach (var i in type.GetInterfaces())
                if (_renderers.TryGetValue(i, out var render)) return render;
            return null;
        }
    }
}
