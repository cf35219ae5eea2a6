using System.Collections.Immutable;
using NetSolve.Model;
using NetSolve.Presentation.Formats;
using NetSolve.Solving;

namespace NetSolve.Rendering.Map;

/// <summary>
/// Lays out a network too large for MSAGL's layered layout (<see cref="MapLayoutBuilder.MaxLayeredUnits"/>) in time
/// close to linear: layers and order from <see cref="LargeMapLayering"/>, boxes packed in their layers, each
/// connected group of units laid out on its own and the groups packed in rows.
/// </summary>
/// <remarks>
/// A group with many layers is folded into bands side by side, like newspaper columns, so the map keeps the shape
/// of a landscape screen or slide. Boxes are the shorter ones of <see cref="UnitBoxText.Compact"/>.
/// Lines are one smooth curve each: forward lines leave a box's far side along the main direction and enter the
/// next box's near side; return routes leave and enter boxes on the side across the main direction, bowing out,
/// dashed as on every map. Lines carrying less than <see cref="FaintShare"/> of the largest flow are drawn pale,
/// and rates are written only on the heavier lines, where they clear every box and other rate; every line's rate
/// stays in its tooltip. Deterministic: the same solution gives the same layout.
/// </remarks>
internal static partial class LargeMapLayoutBuilder
{
    /// <summary>Lines under this share of the largest flow are drawn pale, so a planner sees the heavy flows first.</summary>
    public const double FaintShare = 0.2;

    /// <summary>Gap between the bands of a folded group: room for return routes bowing out of the band before.</summary>
    private const double BandGap = 90.0;

    /// <summary>Width to height a folded group and the whole map aim at: a landscape screen or slide.</summary>
    private const double TargetAspect = 1.4;

    /// <summary>
    /// Share of a group's layers left whole: a layer wider than this share of them is wrapped onto more rows
    /// (<see cref="Wrap"/>). Measured on a generated 1,000-unit hospital, map area over the boxes' area: 5.36 with
    /// no wrapping, 4.40 at 0.9, 4.30 at 0.75, 3.31 at 0.5 (docs/performance.md, "Map and report at scale").
    /// </summary>
    private const double WrapShare = 0.5;

    /// <summary>Gap between connected groups.</summary>
    private const double GroupGap = 60.0;

    /// <summary>A band holds at least this many layers, so a short group is never folded.</summary>
    private const int MinLayersPerBand = 4;

    /// <summary>How far a return route bows out at most, less than the gap between bands.</summary>
    private const double MaxBow = 70.0;

    /// <summary>Longest handle of a forward line's curve: two layer gaps.</summary>
    private const double MaxReach = 2.0 * MapLayoutBuilder.LayerSeparation;

    /// <summary>Points taken along each curve to find the map's bounds.</summary>
    private const int BoundSamples = 16;

    /// <summary>How far a return route bows out at least, and a repeat visit's loop.</summary>
    private const double MinBow = 24.0;

    public static MapLayout Build(NetworkSolution solution, MapDirection direction)
    {
        var network = solution.Network;
        var timeUnit = network.TimeUnit;
        var flows = MapFlows.Of(solution);
        int count = network.Units.Length;
        var templates = new MapNode[count];
        for (int i = 0; i < count; i++)
        {
            templates[i] = Template(solution.Units[i], timeUnit);
        }

        var layering = LargeMapLayering.Compute(count, flows.Weighted(), flows.ArrivalPerHour);
        bool down = direction == MapDirection.TopToBottom;
        var centres = Place(templates, layering, down, out int[] bandOf, out double[] bandEnd);
        double deepest = templates.Max(box => down ? box.Height : box.Width);

        // Each line's curve in unplaced coordinates; then everything is moved so the map starts at its margin.
        var curves = new Curve[flows.Lines.Count];
        for (int k = 0; k < curves.Length; k++)
        {
            var line = flows.Lines[k];
            double stroke = MapLayoutBuilder.StrokeWidth(line.PerHour, flows.MaxPerHour);
            double arrow = Math.Max(MapLayoutBuilder.MinArrowLength, MapLayoutBuilder.ArrowLengthPerStroke * stroke);
            var from = Box(templates[line.FromIndex], centres[line.FromIndex]);
            var to = Box(templates[line.ToIndex], centres[line.ToIndex]);
            curves[k] = line.FromIndex == line.ToIndex ? Loop(from, arrow, down)
                : layering.IsReturn[k] ? Return(from, to, arrow, down)
                : bandOf[line.FromIndex] != bandOf[line.ToIndex] ? BandGapRoute.Between(from, to, arrow, down, deepest, bandEnd[bandOf[line.FromIndex]] + (BandGap / 2.0))
                : Forward(from, to, arrow, down);
        }

        double pad = MapLayoutBuilder.StubLength + MapTypography.Margin;
        double minX = double.PositiveInfinity, minY = double.PositiveInfinity, maxX = double.NegativeInfinity, maxY = double.NegativeInfinity;
        void Cover(double x, double y)
        {
            (minX, maxX) = (Math.Min(minX, x), Math.Max(maxX, x));
            (minY, maxY) = (Math.Min(minY, y), Math.Max(maxY, y));
        }

        for (int i = 0; i < count; i++)
        {
            Cover(centres[i].X - (templates[i].Width / 2.0), centres[i].Y - (templates[i].Height / 2.0));
            Cover(centres[i].X + (templates[i].Width / 2.0), centres[i].Y + (templates[i].Height / 2.0));
        }

        foreach (var curve in curves)
        {
            // The curve itself, not its control points, which can lie far outside it.
            for (int step = 0; step <= BoundSamples; step++)
            {
                var point = curve.At((double)step / BoundSamples);
                Cover(point.X, point.Y);
            }

            Cover(curve.Tip.X, curve.Tip.Y);
            foreach (var bend in curve.Bends ?? [])
            {
                Cover(bend.X, bend.Y);
            }
        }

        double shiftX = pad - minX;
        double shiftY = pad - minY;
        MapPoint Shift(MapPoint point) => new(point.X + shiftX, point.Y + shiftY);

        var nodes = ImmutableArray.CreateBuilder<MapNode>(count);
        var occupied = new OccupancyGrid();
        for (int i = 0; i < count; i++)
        {
            var template = templates[i];
            var node = template with { Left = centres[i].X - (template.Width / 2.0) + shiftX, Top = centres[i].Y - (template.Height / 2.0) + shiftY };
            occupied.Add(node.Left, node.Top, node.Right, node.Bottom);
            nodes.Add(node with
            {
                Arrival = MapLayoutBuilder.Stub(flows.ArrivalPerHour[i], flows.MaxPerHour, timeUnit, node, direction, isArrival: true),
                Exit = MapLayoutBuilder.Stub(flows.ExitPerHour[i], flows.MaxPerHour, timeUnit, node, direction, isArrival: false),
                TurnedAway = MapLayoutBuilder.TurnedAwayStub(solution.Units[i], flows.MaxPerHour, timeUnit, node, direction),
            });
        }

        var labelled = Labelled(flows, curves, occupied, Shift);
        var edges = ImmutableArray.CreateBuilder<MapEdge>(curves.Length);
        for (int k = 0; k < curves.Length; k++)
        {
            var line = flows.Lines[k];
            var curve = curves[k];
            var kind = line.IsDiversion ? MapEdgeKind.Diversion : layering.IsReturn[k] ? MapEdgeKind.Feedback : MapEdgeKind.Forward;
            edges.Add(new MapEdge(
                SafeText.ForDisplay(line.From),
                SafeText.ForDisplay(line.To),
                kind,
                line.PerHour,
                line.RateText,
                MapLayoutBuilder.StrokeWidth(line.PerHour, flows.MaxPerHour),
                PathData(curve, Shift),
                Shift(curve.Start),
                Shift(curve.Base),
                Shift(curve.Tip),
                Shift(curve.Middle))
            {
                Faint = line.PerHour < FaintShare * flows.MaxPerHour,
                ShowsRate = labelled[k],
            });
        }

        return new MapLayout(
            SafeText.ForDisplay(network.Name),
            timeUnit,
            direction,
            maxX - minX + (2.0 * pad),
            maxY - minY + (2.0 * pad),
            nodes.MoveToImmutable(),
            edges.MoveToImmutable());
    }

    private static MapNode Template(UnitResult result, TimeUnit timeUnit)
    {
        var lines = UnitBoxText.Compact(result, timeUnit);
        string label = SafeText.ForDisplay(result.Unit.Label);
        return MapLayoutBuilder.UnitBox(result, lines, string.Equals(lines[0].Text, label, StringComparison.Ordinal) ? null : label);
    }

    /// <summary>
    /// The centre of every box. Within a group, layers follow the main direction one pitch apart and boxes of a layer
    /// sit side by side, centred on the band; a group with many layers is folded into bands (<see cref="LayersPerBand"/>);
    /// groups are packed in rows (largest first) no longer than the target map's side or the longest group.
    /// </summary>
    /// <param name="boxes">The unit boxes, unplaced.</param>
    /// <param name="layering">The layers.</param>
    /// <param name="down">True when patients flow down the page.</param>
    /// <param name="bandOf">Each unit's band, numbered across all groups.</param>
    /// <param name="bandEnd">Each band's far edge across the main direction (right, or bottom when the map flows right).</param>
    private static MapPoint[] Place(MapNode[] boxes, MapLayering layering, bool down, out int[] bandOf, out double[] bandEnd)
    {
        double Along(MapNode box) => down ? box.Height : box.Width;
        double Across(MapNode box) => down ? box.Width : box.Height;
        double deepest = boxes.Max(Along);
        double pitch = deepest + MapLayoutBuilder.LayerSeparation;
        double area = boxes.Sum(box => (box.Width + MapLayoutBuilder.NodeSeparation) * (box.Height + MapLayoutBuilder.LayerSeparation));
        // The row of groups runs across the main direction: as wide as the target map, or as tall when it flows right.
        double side = Math.Sqrt(down ? TargetAspect * area : area / TargetAspect);

        var along = new double[boxes.Length];
        var across = new double[boxes.Length];
        var extents = new List<(int Group, double Along, double Across)>();
        bandOf = new int[boxes.Length];
        var bands = new List<(int Group, double End)>();
        for (int group = 0; group < layering.Layers.Count; group++)
        {
            var layers = Wrap(layering.Layers[group], unit => Across(boxes[unit]));
            var layerWidths = layers.Select(units => RowWidth(units, unit => Across(boxes[unit]))).ToList();
            int perBand = LayersPerBand(layerWidths, pitch, down);
            double bandStart = 0.0;
            for (int first = 0; first < layers.Count; first += perBand)
            {
                var band = layers.Skip(first).Take(perBand).ToList();
                var widths = layerWidths.Skip(first).Take(perBand).ToList();
                double bandWidth = widths.Max();
                for (int l = 0; l < band.Count; l++)
                {
                    double at = bandStart + ((bandWidth - widths[l]) / 2.0);
                    foreach (int unit in band[l])
                    {
                        bandOf[unit] = bands.Count;
                        across[unit] = at + (Across(boxes[unit]) / 2.0);
                        along[unit] = (l * pitch) + (deepest / 2.0);
                        at += Across(boxes[unit]) + MapLayoutBuilder.NodeSeparation;
                    }
                }

                bands.Add((group, bandStart + bandWidth));
                bandStart += bandWidth + BandGap;
            }

            extents.Add((group, (Math.Min(perBand, layers.Count) * pitch) - MapLayoutBuilder.LayerSeparation, bandStart - BandGap));
        }

        // Rows of groups, tallest first (ties in the order the groups were reached).
        double rowLimit = Math.Max(side, extents.Max(extent => extent.Across));
        var offset = new (double Along, double Across)[extents.Count];
        double rowStart = 0.0, rowDepth = 0.0, x = 0.0;
        foreach (var extent in extents.OrderByDescending(extent => extent.Along).ThenBy(extent => extent.Group))
        {
            if (x > 0.0 && x + extent.Across > rowLimit)
            {
                rowStart += rowDepth + GroupGap;
                (x, rowDepth) = (0.0, 0.0);
            }

            offset[extent.Group] = (rowStart, x);
            x += extent.Across + GroupGap;
            rowDepth = Math.Max(rowDepth, extent.Along);
        }

        bandEnd = bands.Select(band => band.End + offset[band.Group].Across).ToArray();
        var centres = new MapPoint[boxes.Length];
        for (int unit = 0; unit < boxes.Length; unit++)
        {
            var (a, c) = offset[layering.Component[unit]];
            centres[unit] = down ? new MapPoint(across[unit] + c, along[unit] + a) : new MapPoint(along[unit] + a, across[unit] + c);
        }

        return centres;
    }

    /// <summary>
    /// The group's layers as rows across the main direction: each layer one row, except that a layer wider than
    /// <see cref="WrapShare"/> of the group's layers is wrapped onto as many rows as it needs, its units kept in
    /// order. A band is as wide as its widest row, so one wide layer among narrow ones would otherwise widen its whole
    /// band; lines still run from a row to a later one, as they ran from a layer to a later one.
    /// </summary>
    private static List<IReadOnlyList<int>> Wrap(IReadOnlyList<IReadOnlyList<int>> layers, Func<int, double> across)
    {
        var widths = layers.Select(units => RowWidth(units, across)).Order().ToList();
        double widestBox = layers.SelectMany(units => units).Max(across);
        double limit = Math.Max(widestBox, widths[(int)Math.Ceiling(WrapShare * (widths.Count - 1))]);
        var rows = new List<IReadOnlyList<int>>();
        foreach (var units in layers)
        {
            var row = new List<int>();
            double width = -MapLayoutBuilder.NodeSeparation;
            foreach (int unit in units)
            {
                double wider = width + MapLayoutBuilder.NodeSeparation + across(unit);
                if (row.Count > 0 && wider > limit)
                {
                    rows.Add(row);
                    (row, wider) = ([], across(unit));
                }

                row.Add(unit);
                width = wider;
            }

            rows.Add(row);
        }

        return rows;
    }

    private static double RowWidth(IReadOnlyList<int> units, Func<int, double> across) =>
        units.Sum(across) + (MapLayoutBuilder.NodeSeparation * (units.Count - 1));

    /// <summary>
    /// How many layers a band of the group holds: one band, then two, and so on (never under
    /// <see cref="MinLayersPerBand"/> layers a band) while the folded group comes closer to <see cref="TargetAspect"/>
    /// (width to height), so a long pathway becomes side-by-side bands and a wide, short group stays one.
    /// </summary>
    private static int LayersPerBand(List<double> layerWidths, double pitch, bool down)
    {
        int best = layerWidths.Count;
        double bestMiss = double.PositiveInfinity;
        for (int bands = 1; bands == 1 || (layerWidths.Count + bands - 1) / bands >= MinLayersPerBand; bands++)
        {
            int perBand = (layerWidths.Count + bands - 1) / bands;
            double across = -BandGap;
            for (int first = 0; first < layerWidths.Count; first += perBand)
            {
                across += layerWidths.Skip(first).Take(perBand).Max() + BandGap;
            }

            double along = (perBand * pitch) - MapLayoutBuilder.LayerSeparation;
            double aspect = down ? across / along : along / across;
            double miss = Math.Abs(Math.Log(aspect / TargetAspect));
            if (miss >= bestMiss)
            {
                // More bands only widen the map further: stop here, so a pathway of 2,000 layers tries some tens of foldings, not hundreds.
                break;
            }

            (best, bestMiss) = (perBand, miss);
        }

        return best;
    }

    /// <summary>
    /// Which lines carry their rate: those that are not pale, heaviest first, where the label at the middle of the
    /// curve clears every box and every rate already placed.
    /// </summary>
    private static bool[] Labelled(MapFlows flows, Curve[] curves, OccupancyGrid occupied, Func<MapPoint, MapPoint> shift)
    {
        var labelled = new bool[curves.Length];
        double halfHeight = MapTypography.RateSize * MapTypography.LineSpacing / 2.0;
        var heaviestFirst = Enumerable.Range(0, curves.Length)
            .Where(k => flows.Lines[k].PerHour >= FaintShare * flows.MaxPerHour)
            .OrderByDescending(k => flows.Lines[k].PerHour)
            .ThenBy(k => k);
        foreach (int k in heaviestFirst)
        {
            var centre = shift(curves[k].Middle);
            double halfWidth = (TextWidth.Of(flows.Lines[k].RateText, MapTypography.RateSize) / 2.0) + 2.0;
            if (!occupied.Overlaps(centre.X - halfWidth, centre.Y - halfHeight, centre.X + halfWidth, centre.Y + halfHeight))
            {
                occupied.Add(centre.X - halfWidth, centre.Y - halfHeight, centre.X + halfWidth, centre.Y + halfHeight);
                labelled[k] = true;
            }
        }

        return labelled;
    }
}
