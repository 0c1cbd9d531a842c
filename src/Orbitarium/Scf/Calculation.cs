using Orbitarium.BasisSets;
using Orbitarium.Chemistry;

namespace Orbitarium.Scf;

/// <summary>
/// A model set-up: a molecule, the basis placed on it and the SCF options. Immutable; every <c>With…</c>
/// returns a new set-up. Start one with <c>molecule.WithBasis("cc-pVDZ")</c> and run it with
/// <see cref="RunRhf"/>, <see cref="RunUhf"/> or <see cref="RunRohf"/>.
/// </summary>
/// <remarks>Other methods (DFT, correlation, geometry) add their own <c>Run…</c> entries as extension methods
/// on this type. The basis is placed when the set-up is made, so a basis that lacks an element fails here,
/// before any work.</remarks>
public sealed class Calculation
{
    private Calculation(Molecule molecule, BasisSet? basisSet, bool? pure, MolecularBasis basis, ScfOptions options)
    {
        Molecule = molecule;
        BasisSet = basisSet;
        PureFunctions = pure;
        Basis = basis;
        Options = options;
    }

    /// <summary>Places <paramref name="basisSet"/> on <paramref name="molecule"/>.</summary>
    /// <param name="molecule">The molecule (geometry, charge, multiplicity).</param>
    /// <param name="basisSet">The basis set; it must cover every element.</param>
    /// <param name="pure">True for pure (spherical) d/f/g functions, false for Cartesian, null for the set's default.</param>
    /// <param name="options">SCF settings; <see cref="ScfOptions.Default"/> when null.</param>
    /// <exception cref="OrbitariumInputException">The set lacks an element of the molecule.</exception>
    public static Calculation Create(Molecule molecule, BasisSet basisSet, bool? pure = null, ScfOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(molecule);
        ArgumentNullException.ThrowIfNull(basisSet);
        return new Calculation(molecule, basisSet, pure, MolecularBasis.Create(molecule, basisSet, pure), options ?? ScfOptions.Default);
    }

    /// <summary>Uses a basis already placed on a molecule (e.g. with floating functions or per-atom sets).</summary>
    /// <param name="basis">The placed basis; its molecule is the calculation's molecule.</param>
    /// <param name="options">SCF settings; <see cref="ScfOptions.Default"/> when null.</param>
    public static Calculation Create(MolecularBasis basis, ScfOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(basis);
        return new Calculation(basis.Molecule, null, null, basis, options ?? ScfOptions.Default);
    }

    /// <summary>The molecule.</summary>
    public Molecule Molecule { get; }

    /// <summary>The basis set placed on every atom, or null when the set-up was made from a hand-placed basis.</summary>
    public BasisSet? BasisSet { get; }

    /// <summary>Pure (true) or Cartesian (false) d/f/g functions; null keeps the set's default.</summary>
    public bool? PureFunctions { get; }

    /// <summary>The basis placed on the molecule.</summary>
    public MolecularBasis Basis { get; }

    /// <summary>The SCF settings.</summary>
    public ScfOptions Options { get; }

    /// <summary>Returns a set-up with new SCF options.</summary>
    public Calculation WithOptions(ScfOptions options)
    {
        ArgumentNullException.ThrowIfNull(options);
        return new Calculation(Molecule, BasisSet, PureFunctions, Basis, options);
    }

    /// <summary>Returns a set-up with changed SCF options, e.g. <c>calc.WithOptions(o => o with { Damping = 0.3 })</c>.</summary>
    public Calculation WithOptions(Func<ScfOptions, ScfOptions> change)
    {
        ArgumentNullException.ThrowIfNull(change);
        return WithOptions(change(Options));
    }

    /// <summary>Returns a set-up with pure (true) or Cartesian (false) d/f/g functions.</summary>
    /// <exception cref="InvalidOperationException">The set-up was made from a hand-placed basis.</exception>
    public Calculation WithPureFunctions(bool pure)
    {
        if (BasisSet is null)
            throw new InvalidOperationException("This set-up uses a hand-placed basis; place it again with the wanted pure/Cartesian choice.");
        return new Calculation(Molecule, BasisSet, pure, MolecularBasis.Create(Molecule, BasisSet, pure), Options);
    }

    /// <summary>Returns a set-up with another basis set on the same molecule.</summary>
    public Calculation WithBasis(BasisSet basisSet, bool? pure = null) => Create(Molecule, basisSet, pure, Options);

    /// <summary>Returns a set-up with another built-in basis set, found by name (see <see cref="BasisSetLibrary"/>).</summary>
    /// <exception cref="OrbitariumInputException">The name is unknown or the set lacks an element.</exception>
    public Calculation WithBasis(string basisSetName, bool? pure = null) => Create(Molecule, BasisSetLibrary.Get(basisSetName), pure, Options);

    /// <summary>Returns a set-up for another molecule (e.g. a displaced geometry) with the same basis set and options.</summary>
    /// <exception cref="OrbitariumInputException">The basis set lacks an element of the new molecule.</exception>
    public Calculation WithMolecule(Molecule molecule)
    {
        ArgumentNullException.ThrowIfNull(molecule);
        var basis = BasisSet is not null ? MolecularBasis.Create(molecule, BasisSet, PureFunctions) : Basis.WithMolecule(molecule);
        return new Calculation(molecule, BasisSet, PureFunctions, basis, Options);
    }

    /// <summary>Returns a set-up with another total charge (the multiplicity stays as set, or re-defaults).</summary>
    public Calculation WithCharge(int charge) => WithMolecule(Molecule.WithCharge(charge));

    /// <summary>Returns a set-up with another spin multiplicity 2S+1.</summary>
    public Calculation WithMultiplicity(int multiplicity) => WithMolecule(Molecule.WithMultiplicity(multiplicity));

    /// <summary>Runs restricted closed-shell Hartree–Fock (see <see cref="RestrictedHartreeFock"/>).</summary>
    public ScfResult RunRhf(IProgress<ScfIteration>? progress = null, CancellationToken cancellationToken = default) =>
        SelfConsistentField.Run(Basis, ScfReference.Restricted, Options, progress, cancellationToken);

    /// <summary>Runs unrestricted Hartree–Fock (see <see cref="UnrestrictedHartreeFock"/>).</summary>
    public ScfResult RunUhf(IProgress<ScfIteration>? progress = null, CancellationToken cancellationToken = default) =>
        SelfConsistentField.Run(Basis, ScfReference.Unrestricted, Options, progress, cancellationToken);

    /// <summary>Runs restricted open-shell Hartree–Fock (see <see cref="RestrictedOpenShellHartreeFock"/>).</summary>
    public ScfResult RunRohf(IProgress<ScfIteration>? progress = null, CancellationToken cancellationToken = default) =>
        SelfConsistentField.Run(Basis, ScfReference.RestrictedOpenShell, Options, progress, cancellationToken);

    /// <summary>Runs Hartree–Fock (or Kohn–Sham when the options carry a functional) with the given reference.</summary>
    public ScfResult Run(ScfReference reference, IProgress<ScfIteration>? progress = null, CancellationToken cancellationToken = default) =>
        SelfConsistentField.Run(Basis, reference, Options, progress, cancellationToken);

    /// <inheritdoc />
    public override string ToString() => $"{Molecule.Formula} / {Basis.Name} ({Basis.FunctionCount} basis functions)";
}
