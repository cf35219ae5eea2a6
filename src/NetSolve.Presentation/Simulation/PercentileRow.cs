using System.Collections.Immutable;
using NetSolve.Simulation;

namespace NetSolve.Presentation.Simulation;

/// <summary>The percentiles of a time in a unit, in the network or in a group's path, under the name people read.</summary>
/// <param name="Name">The unit's id, <c>(network)</c> or <c>(group id)</c>.</param>
/// <param name="Percentiles">The percentiles, lowest first.</param>
public sealed record PercentileRow(string Name, ImmutableArray<PercentileEstimate> Percentiles);
