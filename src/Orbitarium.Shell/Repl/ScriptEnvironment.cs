using System.Collections.Immutable;
using System.Reflection;
using MathNet.Numerics.LinearAlgebra;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Scripting;
using Orbitarium.Chemistry;

namespace Orbitarium.Shell.Repl;

/// <summary>
/// The one place that says what a console session and a <c>run</c> script see: referenced assemblies and
/// imported namespaces. Namespaces listed here but not (yet) present in the referenced assemblies are skipped,
/// so later library layers can be listed before they land.
/// </summary>
public static class ScriptEnvironment
{
    /// <summary>Namespaces imported into every submission and script, in this order.</summary>
    public static readonly ImmutableArray<string> CandidateImports =
    [
        "System",
        "System.Collections.Generic",
        "System.IO",
        "System.Linq",
        "System.Threading",
        "System.Threading.Tasks",
        "Orbitarium",
        "Orbitarium.Chemistry",
        "Orbitarium.BasisSets",
        "Orbitarium.Integrals",
        "Orbitarium.Scf",
        "Orbitarium.Analysis",
        "Orbitarium.Models",
        "Orbitarium.Correlation",
        "Orbitarium.Dft",
        "Orbitarium.Dft.Functionals",
        "Orbitarium.Dft.Grids",
        "Orbitarium.Geometry",
        "Orbitarium.Geometry.Coordinates",
        "Orbitarium.Geometry.Gradients",
        "Orbitarium.Geometry.Optimization",
        "Orbitarium.Geometry.Symmetry",
        "Orbitarium.Geometry.Thermochemistry",
        "Orbitarium.Geometry.Vibrations",
        "Orbitarium.Plots",
        "MathNet.Numerics.LinearAlgebra",
    ];

    private static readonly Lazy<ImmutableArray<Assembly>> LazyAssemblies = new(FindAssemblies);
    private static readonly Lazy<ImmutableArray<string>> LazyImports = new(FindImports);

    /// <summary>The assemblies scripts reference: the library, figures, MathNet and the shell's globals.</summary>
    public static ImmutableArray<Assembly> Assemblies => LazyAssemblies.Value;

    /// <summary>The imports actually applied: <see cref="CandidateImports"/> that exist in <see cref="Assemblies"/>
    /// or in the base class library.</summary>
    public static ImmutableArray<string> Imports => LazyImports.Value;

    /// <summary>Script options for a session or a script file.</summary>
    /// <param name="filePath">The script's file (for <c>#load</c> relative to it and for line numbers), or null at the prompt.</param>
    /// <param name="baseDirectory">Folder that relative <c>#load</c> and <c>#r</c> paths resolve against.</param>
    public static ScriptOptions CreateOptions(string? filePath, string baseDirectory)
    {
        ArgumentNullException.ThrowIfNull(baseDirectory);
        var options = ScriptOptions.Default
            .WithReferences(Assemblies)
            .WithImports(Imports)
            .WithSourceResolver(ScriptSourceResolver.Default.WithBaseDirectory(baseDirectory))
            .WithMetadataResolver(ScriptMetadataResolver.Default.WithBaseDirectory(baseDirectory))
            .WithEmitDebugInformation(filePath is not null)
            .WithOptimizationLevel(OptimizationLevel.Release)
            .WithAllowUnsafe(false);
        return filePath is null ? options : options.WithFilePath(filePath);
    }

    /// <summary>Public type names of the library, figures and MathNet's linear algebra, for highlighting.</summary>
    public static ImmutableHashSet<string> LibraryTypeNames()
    {
        var names = ImmutableHashSet.CreateBuilder<string>(StringComparer.Ordinal);
        foreach (var assembly in Assemblies)
        {
            bool isMathNet = assembly == typeof(Matrix<double>).Assembly;
            foreach (var type in SafeExportedTypes(assembly))
            {
                if (isMathNet && type.Namespace != "MathNet.Numerics.LinearAlgebra") continue;
                string name = type.Name;
                int tick = name.IndexOf('`', StringComparison.Ordinal);
                if (tick >= 0) name = name[..tick];
                if (name.Length > 0 && !type.IsNested) names.Add(name);
            }
        }
        names.Add(nameof(ScriptGlobals));
        return names.ToImmutable();
    }

    private static ImmutableArray<Assembly> FindAssemblies()
    {
        var list = new List<Assembly>
        {
            typeof(Molecule).Assembly,
            typeof(Matrix<double>).Assembly,
            typeof(Orbitarium.Plots.PlotFile).Assembly,
            typeof(ScriptGlobals).Assembly,
        };
        return [.. list.Distinct()];
    }

    private static ImmutableArray<string> FindImports()
    {
        var present = new HashSet<string>(StringComparer.Ordinal)
        {
            "System", "System.Collections.Generic", "System.IO", "System.Linq", "System.Threading", "System.Threading.Tasks",
        };
        foreach (var assembly in Assemblies)
            foreach (var type in SafeExportedTypes(assembly))
                if (type.Namespace is { } ns) present.Add(ns);
        return [.. CandidateImports.Where(present.Contains)];
    }

    private static Type[] SafeExportedTypes(Assembly assembly)
    {
        try
        {
            return assembly.GetExportedTypes();
        }
        catch (ReflectionTypeLoadException e)
        {
            return [.. e.Types.Where(t => t is not null).Cast<Type>()];
        }
    }
}
