namespace NetSolve.Rendering.Map;

/// <summary>A flow line on the laid-out map, from the boundary of one box to the boundary of another.</summary>
/// <param name="From">Id of the unit it leaves.</param>
/// <param name="To">Id of the unit it enters.</param>
/// <param name="Kind">Forward or feedback.</param>
/// <param name="PerHour">Patients per hour along the line.</param>
/// <param name="RateText">The rate as written on the map, in the network's time unit.</param>
/// <param name="StrokeWidth">Line width in map units, proportional to the flow.</param>
/// <param name="PathData">SVG path data of the line, from its start to the base of its arrowhead.</param>
/// <param name="Start">Where the line leaves its source box.</param>
/// <param name="ArrowBase">Where the line meets its arrowhead.</param>
/// <param name="ArrowTip">The tip of the arrowhead, on the target box.</param>
/// <param name="LabelCentre">The centre of the rate label.</param>
public sealed record MapEdge(
    string From,
    string To,
    MapEdgeKind Kind,
    double PerHour,
    string RateText,
    double StrokeWidth,
    string PathData,
    MapPoint Start,
    MapPoint ArrowBase,
    MapPoint ArrowTip,
    MapPoint LabelCentre)
{
    /// <summary>True for a light flow on a large map, drawn pale so the heavy flows stand out.</summary>
    public bool Faint { get; init; }

    /// <summary>Whether the rate is written on the line; on a large map only where it clears the boxes and other rates.</summary>
    public bool ShowsRate { get; init; } = true;
}
