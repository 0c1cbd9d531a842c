using Orbitarium.Scf;

namespace Orbitarium.Shell.Calc;

/// <summary>The <c>rhf</c>, <c>uhf</c> and <c>rohf</c> methods of <c>calc</c>.</summary>
internal sealed class HartreeFockCalcMethod(ScfReference reference) : ICalcMethod
{
    /// <inheritdoc />
    public IReadOnlyList<string> Names => reference switch
    {
        ScfReference.Restricted => ["rhf"],
        ScfReference.Unrestricted => ["uhf"],
        _ => ["rohf"],
    };

    /// <inheritdoc />
    public string Description => reference switch
    {
        ScfReference.Restricted => "restricted closed-shell Hartree–Fock",
        ScfReference.Unrestricted => "unrestricted Hartree–Fock",
        _ => "restricted open-shell Hartree–Fock",
    };

    /// <inheritdoc />
    public CalcOutcome Run(CalcRequest request, CancellationToken cancellationToken)
    {
        var result = request.Calculation.Run(reference, request.Progress, cancellationToken);
        return CalcMethods.FromScf(request, result, result.TotalEnergyHartree, result.MethodName);
    }
}
