namespace Orbitarium.Analysis;

/// <summary>Everything an energy-level diagram shows: fragment columns around the molecule column, and connections.</summary>
/// <param name="Title">Diagram title.</param>
/// <param name="Columns">Columns left to right; <paramref name="MoleculeColumn"/> is the molecule.</param>
/// <param name="MoleculeColumn">Index of the molecule column.</param>
/// <param name="Connections">Fragment-to-molecule connections.</param>
public sealed record LevelDiagramData(string Title, IReadOnlyList<LevelColumn> Columns, int MoleculeColumn, IReadOnlyList<LevelConnection> Connections);
