namespace Orbitarium.Analysis;

/// <summary>Progress of an energy scan, reported after each point.</summary>
/// <param name="Completed">Points done.</param>
/// <param name="Total">Points in the scan.</param>
/// <param name="Last">The point just computed.</param>
public sealed record EnergyScanProgress(int Completed, int Total, EnergyScanPoint Last);
