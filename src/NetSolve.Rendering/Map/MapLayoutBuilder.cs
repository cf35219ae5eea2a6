using System.Collections.Immutable;
using NetSolve.Model;
using NetSolve.Rendering.Text;
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

/// <summary>Lays a solved network out with MSAGL's layered (Sugiyama) layout, patients flowing one main way.</summary>
/// <remarks>
/// Every unit, every route with a positive probability, every unit with external arrivals and every unit that
/// patients leave from appears. Routes that run against the main direction after layering, and repeat visits,
/// become <see cref="MapEdgeKind.Feedback"/>. Deterministic: the same solution gives the same layout.
/// </remarks>
public static class MapLayoutBuilder
{
    private const double NodeSeparation = 28.0;
    private const double LayerSeparation = 46.0;
    private const double MarkerCornerRadius = 10.0;
    private const double ArrowLengthPerStroke = 1.6;
    private const double MinArrowLength = 9.0;

    /// <summary>Lays out <paramref name="solution"/> with the given main direction.</summary>
    public static MapLayout Build(NetworkSolution solution, MapDirection direction = MapDirection.TopToBottom)
    {
        ArgumentNullException.ThrowIfNull(solution);
        var network = solution.Network;
        var routing = RoutingTable.Build(network);
        var index = network.BuildIndex();
        var graph = new GeometryGraph();
        var nodes = new List<(MsaglNode Node, MapNode Template)>();
        var byId = new Dictionary<string, MsaglNode>(StringComparer.Ordinal);

        void AddNode(MapNode template, bool rounded)
        {
            var centre = new MsaglPoint(0.0, 0.0);
            ICurve boundary = rounded
                ? CurveFactory.CreateRectangleWithRoundedCorners(template.Width, template.Height, MarkerCornerRadius, MarkerCornerRadius, centre)
                : CurveFactory.CreateRectangle(template.Width, template.Height, centre);
            var node = new MsaglNode(boundary, template.Id);
            graph.Nodes.Add(node);
            nodes.Add((node, template));
            byId[template.Id] = node;
        }

        foreach (var result in solution.Units)
        {
            AddNode(UnitTemplate(result, network.TimeUnit), rounded: false);
        }

        var flows = new List<(string From, string To, MapEdgeKind Kind, double PerHour)>();
        foreach (var arrival in network.Arrivals.Where(arrival => arrival.PerHour > 0.0))
        {
            var status = solution.Units[index[arrival.UnitId]].Status;
            string id = "arrivals:" + arrival.UnitId;
            AddNode(MarkerTemplate(id, MapNodeKind.Arrival, arrival.UnitId, "arrivals", status), rounded: true);
            flows.Add((id, arrival.UnitId, MapEdgeKind.Arrival, arrival.PerHour));
        }

        foreach (var route in network.Routes.Where(route => route.Probability > 0.0))
        {
            double perHour = solution.Units[index[route.From]].ArrivalsPerHour * route.Probability;
            flows.Add((route.From, route.To, MapEdgeKind.Forward, perHour));
        }

        for (int i = 0; i < solution.Units.Length; i++)
        {
            double perHour = solution.Units[i].ArrivalsPerHour * routing.ExitProbability(i);
            if (perHour > 0.0)
            {
                string unitId = network.Units[i].Id;
                string id = "exit:" + unitId;
                AddNode(MarkerTemplate(id, MapNodeKind.Exit, unitId, "leave", solution.Units[i].Status), rounded: true);
                flows.Add((unitId, id, MapEdgeKind.Exit, perHour));
            }
        }

        double maxPerHour = flows.Count == 0 ? 0.0 : flows.Max(flow => flow.PerHour);
        var edges = new List<(MsaglEdge Edge, int Flow, double Stroke, string RateText)>();
        for (int f = 0; f < flows.Count; f++)
        {
            var flow = flows[f];
            double stroke = StrokeWidth(flow.PerHour, maxPerHour);
            string rateText = Units.Rate(flow.PerHour, network.TimeUnit);
            var edge = new MsaglEdge(byId[flow.From], byId[flow.To])
            {
                Weight = 1,
            };
            edge.EdgeGeometry.TargetArrowhead = new Arrowhead { Length = Math.Max(MinArrowLength, ArrowLengthPerStroke * stroke) };
            edge.Label = new Label(
                TextWidth.Of(rateText, MapTypography.RateSize) + 4.0,
                MapTypography.RateSize * MapTypography.LineSpacing,
                edge);
            graph.Edges.Add(edge);
            edges.Add((edge, f, stroke, rateText));
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
        return Extract(solution, direction, graph, nodes, edges, flows);
    }

    private static MapLayout Extract(
        NetworkSolution solution,
        MapDirection direction,
        GeometryGraph graph,
        List<(MsaglNode Node, MapNode Template)> nodes,
        List<(MsaglEdge Edge, int Flow, double Stroke, string RateText)> edges,
        List<(string From, string To, MapEdgeKind Kind, double PerHour)> flows)
    {
        var bounds = graph.Nodes[0].BoundingBox;
        foreach (var node in graph.Nodes)
        {
            bounds.Add(node.BoundingBox);
        }

        foreach (var edge in graph.Edges)
        {
            bounds.Add(edge.Curve.BoundingBox);
            bounds.Add(edge.EdgeGeometry.TargetArrowhead.TipPosition);
            if (edge.Label is not null)
            {
                bounds.Add(edge.Label.BoundingBox);
            }
        }

        double left = bounds.Left - MapTypography.Margin;
        double top = bounds.Top + MapTypography.Margin;
        MapPoint ToMap(MsaglPoint point) => new(point.X - left, top - point.Y);

        var mapNodes = ImmutableArray.CreateBuilder<MapNode>(nodes.Count);
        var placed = new Dictionary<string, MapNode>(StringComparer.Ordinal);
        foreach (var (node, template) in nodes)
        {
            var box = node.BoundingBox;
            var corner = ToMap(new MsaglPoint(box.Left, box.Top));
            var mapNode = template with { Left = corner.X, Top = corner.Y, Width = box.Width, Height = box.Height };
            mapNodes.Add(mapNode);
            placed[mapNode.Id] = mapNode;
        }

        var mapEdges = ImmutableArray.CreateBuilder<MapEdge>(edges.Count);
        foreach (var (edge, f, stroke, rateText) in edges)
        {
            var flow = flows[f];
            var kind = flow.Kind == MapEdgeKind.Forward && RunsBackwards(placed[flow.From], placed[flow.To], direction)
                ? MapEdgeKind.Feedback
                : flow.Kind;
            var labelCentre = edge.Label is null ? ToMap(edge.Curve[(edge.Curve.ParStart + edge.Curve.ParEnd) / 2.0]) : ToMap(edge.Label.Center);
            mapEdges.Add(new MapEdge(
                flow.From,
                flow.To,
                kind,
                flow.PerHour,
                rateText,
                stroke,
                CurvePath.Of(edge.Curve, ToMap),
                ToMap(edge.Curve.Start),
                ToMap(edge.Curve.End),
                ToMap(edge.EdgeGeometry.TargetArrowhead.TipPosition),
                labelCentre));
        }

        return new MapLayout(
            solution.Network.Name,
            solution.Network.TimeUnit,
            direction,
            bounds.Width + (2.0 * MapTypography.Margin),
            bounds.Height + (2.0 * MapTypography.Margin),
            mapNodes.MoveToImmutable(),
            mapEdges.MoveToImmutable());
    }

    /// <summary>A route runs backwards when its target's centre is not further along the main direction than its source's.</summary>
    private static bool RunsBackwards(MapNode from, MapNode to, MapDirection direction) =>
        ReferenceEquals(from, to) || (direction == MapDirection.TopToBottom
            ? to.Centre.Y <= from.Centre.Y
            : to.Centre.X <= from.Centre.X);

    /// <summary>Width proportional to flow, the largest flow drawn <see cref="MapTypography.MaxStrokeWidth"/> wide, never thinner than <see cref="MapTypography.MinStrokeWidth"/>.</summary>
    internal static double StrokeWidth(double perHour, double maxPerHour) => maxPerHour > 0.0
        ? Math.Max(MapTypography.MinStrokeWidth, MapTypography.MaxStrokeWidth * perHour / maxPerHour)
        : MapTypography.MinStrokeWidth;

    private static MapNode UnitTemplate(UnitResult result, TimeUnit timeUnit)
    {
        var lines = UnitBoxText.For(result, timeUnit);
        return Sized(result.Unit.Id, MapNodeKind.Unit, result.Unit.Id, lines, result.Status, MapTypography.MinUnitWidth);
    }

    private static MapNode MarkerTemplate(string id, MapNodeKind kind, string unitId, string word, UnitStatus status) =>
        Sized(id, kind, unitId, [new MapTextLine(word, MapTypography.RateSize, IsBold: false)], status, minWidth: 0.0);

    private static MapNode Sized(string id, MapNodeKind kind, string unitId, ImmutableArray<MapTextLine> lines, UnitStatus status, double minWidth)
    {
        double width = lines.Max(line => TextWidth.Of(line.Text, line.FontSize, line.IsBold)) + (2.0 * MapTypography.Padding);
        double height = lines.Sum(line => line.FontSize * MapTypography.LineSpacing) + (2.0 * MapTypography.Padding * (kind == MapNodeKind.Unit ? 1.0 : 0.5));
        return new MapNode(id, kind, unitId, 0.0, 0.0, Math.Ceiling(Math.Max(minWidth, width)), Math.Ceiling(height), lines, status);
    }
}
