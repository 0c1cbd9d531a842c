namespace Orbitarium.Analysis;

/// <summary>A column of levels in an energy-level diagram: a fragment (or free atom), or the molecule.</summary>
/// <param name="Title">Column title, e.g. "H1" or "H2".</param>
/// <param name="Levels">Levels, ascending energy.</param>
public sealed record LevelColumn(string Title, IReadOnlyList<EnergyLevel> Levels);
