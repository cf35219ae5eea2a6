using System.Collections.Immutable;
using NetSolve.Solving;

namespace NetSolve.Rendering.Map;

/// <summary>A unit's box on the laid-out map, with its arrival and exit arrows where patients enter or leave there.</summary>
/// <param name="UnitId">The unit id.</param>
/// <param name="Left">Left edge in map units.</param>
/// <param name="Top">Top edge in map units.</param>
/// <param name="Width">Width in map units.</param>
/// <param name="Height">Height in map units.</param>
/// <param name="Lines">Text lines, top to bottom.</param>
/// <param name="Status">The unit's status.</param>
/// <param name="Arrival">External arrivals into the unit, if any.</param>
/// <param name="Exit">Patients leaving the network from the unit, if any.</param>
/// <param name="TurnedAway">Patients turned away because the unit is full, if any.</param>
/// <param name="FullLabel">The whole label when the box shows it shortened (for the tooltip); null when shown whole.</param>
public sealed record MapNode(
    string UnitId,
    double Left,
    double Top,
    double Width,
    double Height,
    ImmutableArray<MapTextLine> Lines,
    UnitStatus Status,
    MapStub? Arrival,
    MapStub? Exit,
    MapStub? TurnedAway = null,
    string? FullLabel = null)
{
    /// <summary>The unit's targets it misses, as keys joined by ", " (<c>mean_wait</c>); null when it has none or meets them.</summary>
    public string? TargetsMissed { get; init; }

    /// <summary>Right edge in map units.</summary>
    public double Right => Left + Width;

    /// <summary>Bottom edge in map units.</summary>
    public double Bottom => Top + Height;

    /// <summary>The centre of the box.</summary>
    public MapPoint Centre => new(Left + (Width / 2.0), Top + (Height / 2.0));
}
