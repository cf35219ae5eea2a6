using System.Collections.Immutable;
using NetSolve.Model;
using NetSolve.Presentation;
using NetSolve.Presentation.Formats;
using NetSolve.Solving;
using Microsoft.Msagl.Core.Geometry.Curves;
using Microsoft.Msagl.Core.Layout;
using Microsoft.Msagl.Core.Routing;
using Microsoft.Msagl.Layout.Layered;
using Microsoft.Msagl.Miscellaneous;
using MsaglEdge = Microsoft.Msagl.Core.Layout.Edge;
using MsaglNode = Microsoft.Msagl.Core.Layout.Node;
using MsaglPoint = Microsoft.Msagl.Core.Geometry.Point;

namespace NetSolve.Rendering.Map;

/// <summary>
/// Lays a solved network out with MSAGL's layered (Sugiyama) layout, patients flowing one main way; a network of more
/// than <see cref="MaxLayeredUnits"/> units with <see cref="LargeMapLayoutBuilder"/>.
/// </summary>
/// <remarks>
/// Every unit and every route with a positive probability appears; external arrivals and exits are short arrows
/// at the unit's box with their rate written in the box; so are patients turned away by a full unit. Patients
/// diverted from a full unit are a <see cref="MapEdgeKind.Diversion"/> line to its target. Return routes (<see cref="MapEdgeKind.Feedback"/>) are the
/// back edges of the order <see cref="ReturnRoutes"/> chooses to keep the heaviest flow forward, and repeat visits. Deterministic: the same solution gives the same layout.
/// </remarks>
public static class MapLayoutBuilder
{
    /// <summary>
    /// Most units laid out with MSAGL. Its layered layout's time grows faster than n log n on networks with many long
    /// routes (measured: 2.8 s at 200 units, 33 s at 1,000; with its quicker settings for large graphs still 12 s of
    /// CPU at 1,000), so a larger network is laid out by <see cref="LargeMapLayoutBuilder"/>, in close to linear time
    /// (docs/performance.md, "Map and report at scale").
    /// </summary>
    public const int MaxLayeredUnits = 250;

    /// <summary>
    /// Most units a map is drawn for. Above it <c>map</c> refuses at once and the report leaves its map out: already
    /// at 2,000 units the PNG's pixel budget (<see cref="PngMapRenderer.MaxPixels"/>) draws box text about 6 pixels
    /// high and the SVG is about 5 MB, more than a browser or slide shows smoothly (docs/map-and-report.md, "Size").
    /// </summary>
    public const int MaxUnits = 2000;

    /// <summary>Gap between boxes in one layer: room for an exit arrow and a little air, no more, so 40 units fit A4 width.</summary>
    internal const double NodeSeparation = 24.0;

    /// <summary>Gap between layers: two arrival or exit arrows and a rate label.</summary>
    internal const double LayerSeparation = 50.0;

    /// <summary>Length of the arrival and exit arrows; shorter than both gaps, between layers and between boxes.</summary>
    internal const double StubLength = 18.0;

    /// <summary>Distance of the arrival and exit arrows from the box corner.</summary>
    private const double StubInset = 14.0;

    /// <summary>Arrowheads grow with the line so a wide line still ends in a visible point.</summary>
    internal const double ArrowLengthPerStroke = 1.6;

    /// <summary>Shortest arrowhead, for thin lines.</summary>
    internal const double MinArrowLength = 9.0;

    /// <summary>Lays out <paramref name="solution"/> with the given main direction.</summary>
    public static MapLayout Build(NetworkSolution solution, MapDirection direction = MapDirection.TopToBottom)
    {
        ArgumentNullException.ThrowIfNull(solution);
        var network = solution.Network;
        if (network.Units.Length > MaxLayeredUnits)
        {
            return LargeMapLayoutBuilder.Build(solution, direction);
        }

        var flows = MapFlows.Of(solution);
        var index = flows.Index;
        var timeUnit = network.TimeUnit;
        var arrivalPerHour = flows.ArrivalPerHour;
        var exitPerHour = flows.ExitPerHour;
        double maxPerHour = flows.MaxPerHour;

        var graph = new GeometryGraph();
        var templates = new MapNode[network.Units.Length];
        var graphNodes = new MsaglNode[network.Units.Length];
        for (int i = 0; i < templates.Length; i++)
        {
            templates[i] = UnitTemplate(solution.Units[i], timeUnit, arrivalPerHour[i], exitPerHour[i]);
            graphNodes[i] = new MsaglNode(CurveFactory.CreateRectangle(templates[i].Width, templates[i].Height, new MsaglPoint(0.0, 0.0)), templates[i].UnitId);
            graph.Nodes.Add(graphNodes[i]);
        }

        var lines = flows.Lines.Select(line => (line.From, line.To, line.IsDiversion, line.PerHour, Text: line.RateText)).ToList();
        // Return routes are chosen from the flows before layout and handed to the layout reversed, so the layers
        // follow the heaviest flow rather than the layout engine's own count of lines.
        var isReturn = ReturnRoutes.Choose(network.Units.Length, flows.Weighted());
        var edges = new List<(MsaglEdge Edge, string From, string To, bool IsDiversion, bool IsReturn, double PerHour, double Stroke, string RateText)>(lines.Count);
        for (int k = 0; k < lines.Count; k++)
        {
            var (from, to, isDiversion, perHour, rateText) = lines[k];
            double stroke = StrokeWidth(perHour, maxPerHour);
            var arrowhead = new Arrowhead { Length = Math.Max(MinArrowLength, ArrowLengthPerStroke * stroke) };
            bool reversed = isReturn[k] && !string.Equals(from, to, StringComparison.Ordinal);
            var edge = reversed ? new MsaglEdge(graphNodes[index[to]], graphNodes[index[from]]) : new MsaglEdge(graphNodes[index[from]], graphNodes[index[to]]);
            if (reversed)
            {
                edge.EdgeGeometry.SourceArrowhead = arrowhead;
            }
            else
            {
                edge.EdgeGeometry.TargetArrowhead = arrowhead;
            }

            graph.Edges.Add(edge);
            edges.Add((edge, from, to, isDiversion, isReturn[k], perHour, stroke, rateText));
        }

        var settings = new SugiyamaLayoutSettings
        {
            NodeSeparation = NodeSeparation,
            LayerSeparation = LayerSeparation,

        };
        settings.EdgeRoutingSettings.EdgeRoutingMode = EdgeRoutingMode.SugiyamaSplines;
        if (direction == MapDirection.LeftToRight)
        {
            settings.Transformation = PlaneTransformation.Rotation(Math.PI / 2.0);
        }

        LayoutHelpers.CalculateLayout(graph, settings, null);

        var bounds = graph.Nodes[0].BoundingBox;
        foreach (var node in graph.Nodes)
        {
            bounds.Add(node.BoundingBox);
        }

        foreach (var edge in graph.Edges)
        {
            bounds.Add(edge.Curve.BoundingBox);
            bounds.Add((edge.EdgeGeometry.TargetArrowhead ?? edge.EdgeGeometry.SourceArrowhead!).TipPosition);
        }

        // Room for the arrival and exit arrows outside the outermost boxes.
        bounds.Pad(StubLength);
        double left = bounds.Left - MapTypography.Margin;
        double top = bounds.Top + MapTypography.Margin;
        MapPoint ToMap(MsaglPoint point) => new(point.X - left, top - point.Y);

        var placed = ImmutableArray.CreateBuilder<MapNode>(templates.Length);
        for (int i = 0; i < templates.Length; i++)
        {
            var box = graphNodes[i].BoundingBox;
            var corner = ToMap(new MsaglPoint(box.Left, box.Top));
            var node = templates[i] with { Left = corner.X, Top = corner.Y, Width = box.Width, Height = box.Height };
            placed.Add(node with
            {
                Arrival = Stub(arrivalPerHour[i], maxPerHour, timeUnit, node, direction, isArrival: true),
                Exit = Stub(exitPerHour[i], maxPerHour, timeUnit, node, direction, isArrival: false),
                TurnedAway = TurnedAwayStub(solution.Units[i], maxPerHour, timeUnit, node, direction),
            });
        }

        var labels = new RateLabelPlacer(placed);
        var mapEdges = ImmutableArray.CreateBuilder<MapEdge>(edges.Count);
        foreach (var (edge, from, to, isDiversion, isReturnRoute, perHour, stroke, rateText) in edges)
        {
            var kind = isDiversion ? MapEdgeKind.Diversion : isReturnRoute ? MapEdgeKind.Feedback : MapEdgeKind.Forward;
            // A return handed to the layout reversed is drawn in its own direction again: from its source to the arrow at its target.
            var arrowhead = edge.EdgeGeometry.TargetArrowhead ?? edge.EdgeGeometry.SourceArrowhead!;
            bool reversed = edge.EdgeGeometry.TargetArrowhead is null;
            var curve = reversed ? edge.Curve.Reverse() : edge.Curve;
            var tip = arrowhead.TipPosition;
            mapEdges.Add(new MapEdge(
                SafeText.ForDisplay(from),
                SafeText.ForDisplay(to),
                kind,
                perHour,
                rateText,
                stroke,
                CurvePath.Of(curve, ToMap),
                ToMap(curve.Start),
                ToMap(curve.End),
                ToMap(tip),
                labels.Place(curve, ToMap, rateText)));
        }

        return new MapLayout(
            SafeText.ForDisplay(network.Name),
            timeUnit,
            direction,
            bounds.Width + (2.0 * MapTypography.Margin),
            bounds.Height + (2.0 * MapTypography.Margin),
            placed.MoveToImmutable(),
            mapEdges.MoveToImmutable());
    }

    /// <summary>
    /// The arrival arrow enters the box near its first corner along the main direction (top-left), the exit arrow
    /// leaves sideways near the opposite corner (bottom-right), each <see cref="StubLength"/> long.
    /// </summary>
    internal static MapStub? Stub(double perHour, double maxPerHour, TimeUnit timeUnit, MapNode node, MapDirection direction, bool isArrival)
    {
        if (!(perHour > 0.0))
        {
            return null;
        }

        // Arrivals come in along the main direction at the first corner; exits leave sideways at the last corner,
        // into the gap between boxes of one layer, clear of the routes that leave the box towards the next layer.
        MapPoint start;
        MapPoint tip;
        if (direction == MapDirection.TopToBottom)
        {
            start = isArrival ? new MapPoint(node.Left + StubInset, node.Top - StubLength) : new MapPoint(node.Right, node.Bottom - StubInset);
            tip = isArrival ? new MapPoint(node.Left + StubInset, node.Top) : new MapPoint(node.Right + StubLength, node.Bottom - StubInset);
        }
        else
        {
            start = isArrival ? new MapPoint(node.Left - StubLength, node.Top + StubInset) : new MapPoint(node.Right - StubInset, node.Bottom);
            tip = isArrival ? new MapPoint(node.Left, node.Top + StubInset) : new MapPoint(node.Right - StubInset, node.Bottom + StubLength);
        }

        return new MapStub(perHour, PeopleFormat.Rate(perHour, timeUnit), StrokeWidth(perHour, maxPerHour), start, tip);
    }

    /// <summary>
    /// The turned-away arrow leaves a full unit sideways near its first corner (top-right, or top-left across the
    /// main direction when it runs left to right), into the gap between boxes of one layer, clear of the exit arrow.
    /// </summary>
    internal static MapStub? TurnedAwayStub(UnitResult result, double maxPerHour, TimeUnit timeUnit, MapNode node, MapDirection direction)
    {
        double perHour = result.TurnedAwayPerHour;
        if (!(perHour > 0.0))
        {
            return null;
        }

        var start = direction == MapDirection.TopToBottom
            ? new MapPoint(node.Right, node.Top + StubInset)
            : new MapPoint(node.Left + StubInset, node.Top);
        var tip = direction == MapDirection.TopToBottom
            ? new MapPoint(node.Right + StubLength, node.Top + StubInset)
            : new MapPoint(node.Left + StubInset, node.Top - StubLength);
        return new MapStub(perHour, UnitBoxText.TurnedAway(result, timeUnit), StrokeWidth(perHour, maxPerHour), start, tip);
    }

    /// <summary>Width proportional to flow, the largest flow drawn <see cref="MapTypography.MaxStrokeWidth"/> wide, never thinner than <see cref="MapTypography.MinStrokeWidth"/>.</summary>
    internal static double StrokeWidth(double perHour, double maxPerHour) => maxPerHour > 0.0
        ? Math.Max(MapTypography.MinStrokeWidth, MapTypography.MaxStrokeWidth * perHour / maxPerHour)
        : MapTypography.MinStrokeWidth;

    private static MapNode UnitTemplate(UnitResult result, TimeUnit timeUnit, double arrivalPerHour, double exitPerHour)
    {
        var lines = UnitBoxText.For(result, timeUnit, arrivalPerHour, exitPerHour);
        return UnitBox(result, lines, UnitBoxText.IsShortened(result.Unit.Label) ? SafeText.ForDisplay(result.Unit.Label) : null);
    }

    /// <summary>A unit's box, not yet placed, as large as its <paramref name="lines"/> need and never narrower than <see cref="MapTypography.MinUnitWidth"/>.</summary>
    internal static MapNode UnitBox(UnitResult result, ImmutableArray<MapTextLine> lines, string? fullLabel)
    {
        double width = lines.Max(line => TextWidth.Of(line.Text, line.FontSize, line.IsBold)) + (2.0 * MapTypography.Padding);
        double height = lines.Sum(line => line.FontSize * MapTypography.LineSpacing) + (2.0 * MapTypography.Padding);
        return new MapNode(SafeText.ForDisplay(result.Unit.Id), 0.0, 0.0, Math.Ceiling(Math.Max(MapTypography.MinUnitWidth, width)), Math.Ceiling(height), lines, result.Status, null, null, null, fullLabel)
        {
            TargetsMissed = result.TargetsBreached.IsEmpty ? null : TargetWords.Breached(result),
        };
    }
}
