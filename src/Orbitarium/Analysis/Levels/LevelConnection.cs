namespace Orbitarium.Analysis;

/// <summary>A line between a fragment level and a molecular level that it contributes to.</summary>
/// <param name="FragmentColumn">Index of the fragment column.</param>
/// <param name="FragmentLevel">Index of the level in that column.</param>
/// <param name="MoleculeLevel">Index of the level in the molecule column.</param>
/// <param name="Weight">Squared overlap |⟨fragment orbital|molecular orbital⟩|² (0..1).</param>
public sealed record LevelConnection(int FragmentColumn, int FragmentLevel, int MoleculeLevel, double Weight);
