using System.Collections.Immutable;
using NetSolve.Model;

namespace NetSolve.Rendering.Map;

/// <summary>A laid-out bottleneck map, ready to draw: boxes and flow lines in map units, y downwards.</summary>
/// <param name="Title">The network's name.</param>
/// <param name="TimeUnit">The network's time unit: every rate is written per it; times take the unit that reads best (PeopleFormat).</param>
/// <param name="Direction">The main direction of flow.</param>
/// <param name="Width">Width of the laid-out graph, margins included.</param>
/// <param name="Height">Height of the laid-out graph, margins included.</param>
/// <param name="Nodes">Unit boxes in file order.</param>
/// <param name="Edges">Routes with a positive probability, in file order, then diversions from full units in file order.</param>
public sealed record MapLayout(
    string Title,
    TimeUnit TimeUnit,
    MapDirection Direction,
    double Width,
    double Height,
    ImmutableArray<MapNode> Nodes,
    ImmutableArray<MapEdge> Edges)
{
    /// <summary>
    /// What a scenario file or <c>--set</c> changed, one phrase each, drawn as a line under the title; empty for a
    /// network as written, which then draws exactly as before.
    /// </summary>
    public ImmutableArray<string> Changes { get; init; } = [];
}
