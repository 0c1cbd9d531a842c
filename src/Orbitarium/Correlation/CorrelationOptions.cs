namespace Orbitarium.Correlation;

/// <summary>
/// Settings shared by the correlated methods. Immutable: the <c>With…</c> methods return a new object.
/// </summary>
/// <remarks>Defaults: all electrons correlated (no frozen core), energy change below 1e-8 Eh and amplitude residual
/// below 1e-7, at most 100 iterations, 8 DIIS vectors, a memory budget of 2 GiB.</remarks>
public sealed record CorrelationOptions
{
    /// <summary>The defaults listed in the remarks.</summary>
    public static CorrelationOptions Default { get; } = new();

    /// <summary>Number of lowest orbitals (per spin) kept doubly occupied and left uncorrelated. Default 0 (off).</summary>
    public int FrozenCoreOrbitals { get; init; }

    /// <summary>Convergence threshold on the energy change between iterations, hartree. Default 1e-8.</summary>
    public double EnergyThresholdHartree { get; init; } = 1e-8;

    /// <summary>Convergence threshold on the root-mean-square amplitude (CCSD) or residual norm (Davidson). Default 1e-7.</summary>
    public double ResidualThreshold { get; init; } = 1e-7;

    /// <summary>Maximum number of iterations. Default 100.</summary>
    public int MaxIterations { get; init; } = 100;

    /// <summary>Number of stored amplitude vectors for DIIS extrapolation; 0 switches DIIS off. Default 8.</summary>
    public int DiisVectors { get; init; } = 8;

    /// <summary>Largest memory a method may allocate for its arrays, bytes. Default 2 GiB.</summary>
    public long MemoryBudgetBytes { get; init; } = 2L << 30;

    /// <summary>Returns options with <paramref name="count"/> frozen core orbitals per spin.</summary>
    public CorrelationOptions WithFrozenCore(int count) => count < 0
        ? throw new OrbitariumInputException($"The frozen-core count must be 0 or more, got {count}.")
        : this with { FrozenCoreOrbitals = count };

    /// <summary>Returns options freezing the noble-gas cores of <paramref name="molecule"/>
    /// (<see cref="Chemistry.Molecule.StandardFrozenCoreOrbitals"/>: water 1, benzene 6).</summary>
    public CorrelationOptions WithStandardFrozenCore(Chemistry.Molecule molecule)
    {
        ArgumentNullException.ThrowIfNull(molecule);
        return this with { FrozenCoreOrbitals = molecule.StandardFrozenCoreOrbitals };
    }

    /// <summary>Returns options with new convergence thresholds (energy in hartree, residual dimensionless).</summary>
    public CorrelationOptions WithThresholds(double energyHartree, double residual) => energyHartree <= 0 || residual <= 0
        ? throw new OrbitariumInputException($"Convergence thresholds must be positive, got energy {energyHartree} Eh and residual {residual}.")
        : this with { EnergyThresholdHartree = energyHartree, ResidualThreshold = residual };

    /// <summary>Returns options with a new iteration limit.</summary>
    public CorrelationOptions WithMaxIterations(int count) => count < 1
        ? throw new OrbitariumInputException($"The iteration limit must be at least 1, got {count}.")
        : this with { MaxIterations = count };

    /// <summary>Returns options keeping <paramref name="count"/> DIIS vectors (0 = off).</summary>
    public CorrelationOptions WithDiisVectors(int count) => count < 0
        ? throw new OrbitariumInputException($"The DIIS vector count must be 0 or more, got {count}.")
        : this with { DiisVectors = count };

    /// <summary>Returns options with a memory budget in mebibytes.</summary>
    public CorrelationOptions WithMemoryBudgetMebibytes(double mebibytes) => mebibytes <= 0
        ? throw new OrbitariumInputException($"The memory budget must be positive, got {mebibytes} MiB.")
        : this with { MemoryBudgetBytes = (long)(mebibytes * 1024 * 1024) };
}
