using System.Collections.Immutable;
using NetSolve.Solving;

namespace NetSolve.Rendering.Map;

/// <summary>A box on the laid-out map: a unit, or the marker of arrivals into or exits from a unit.</summary>
/// <param name="Id">Unique on the map: the unit id, or <c>arrivals:ID</c> / <c>exit:ID</c>.</param>
/// <param name="Kind">What the box stands for.</param>
/// <param name="UnitId">The unit the box belongs to.</param>
/// <param name="Left">Left edge in map units.</param>
/// <param name="Top">Top edge in map units.</param>
/// <param name="Width">Width in map units.</param>
/// <param name="Height">Height in map units.</param>
/// <param name="Lines">Text lines, top to bottom.</param>
/// <param name="Status">The unit's status (for markers, the status of their unit).</param>
public sealed record MapNode(
    string Id,
    MapNodeKind Kind,
    string UnitId,
    double Left,
    double Top,
    double Width,
    double Height,
    ImmutableArray<MapTextLine> Lines,
    UnitStatus Status)
{
    /// <summary>Right edge in map units.</summary>
    public double Right => Left + Width;

    /// <summary>Bottom edge in map units.</summary>
    public double Bottom => Top + Height;

    /// <summary>The centre of the box.</summary>
    public MapPoint Centre => new(Left + (Width / 2.0), Top + (Height / 2.0));
}
