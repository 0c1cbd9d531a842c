using System.CommandLine;
using Orbitarium.Chemistry;
using Orbitarium.Scf;

namespace Orbitarium.Shell.Calc;

/// <summary>What a <see cref="ICalcMethod"/> gets: the parsed molecule and basis as a ready <see cref="Scf.Calculation"/>,
/// the names the user typed, a place to record timings, and the parse result for method-specific options
/// (registered in <see cref="CalcMethods.ExtraOptions"/>).</summary>
internal sealed class CalcRequest
{
    /// <summary>The molecule read from <c>--geometry</c>, with <c>--charge</c> and <c>--multiplicity</c> applied.</summary>
    public required Molecule Molecule { get; init; }

    /// <summary>The basis set name as given to <c>--basis</c>.</summary>
    public required string BasisName { get; init; }

    /// <summary>The method name as given to <c>--method</c> (lower case).</summary>
    public required string MethodName { get; init; }

    /// <summary>Molecule + basis + default SCF options.</summary>
    public required Calculation Calculation { get; init; }

    /// <summary>Seconds by phase; methods add their own phases (e.g. "mp2").</summary>
    public required CalcTimings Timings { get; init; }

    /// <summary>The command line, for options registered in <see cref="CalcMethods.ExtraOptions"/>.</summary>
    public required ParseResult ParseResult { get; init; }

    /// <summary>Receives SCF iterations (null when nobody listens).</summary>
    public IProgress<ScfIteration>? Progress { get; init; }
}
