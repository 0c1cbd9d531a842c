namespace Orbitarium.Shell.Calc;

/// <summary>
/// One method name accepted by <c>orbitarium calc --method NAME</c>. To add a method, write a class implementing
/// this interface in its own file and add one line to <see cref="CalcMethods.All"/>.
/// </summary>
internal interface ICalcMethod
{
    /// <summary>Lower-case name(s) given to <c>--method</c>, e.g. "rhf"; the first is the canonical name.</summary>
    IReadOnlyList<string> Names { get; }

    /// <summary>One line for <c>--help</c>, e.g. "restricted closed-shell Hartree–Fock".</summary>
    string Description { get; }

    /// <summary>Runs the method on the request's molecule and basis. Throw <see cref="OrbitariumInputException"/> for bad
    /// input (exit code 2); return an outcome with <see cref="CalcOutcome.Converged"/> false for a failed iterative
    /// solver (exit code 3).</summary>
    CalcOutcome Run(CalcRequest request, CancellationToken cancellationToken);
}
