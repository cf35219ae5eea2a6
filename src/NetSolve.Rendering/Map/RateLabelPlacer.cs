using Microsoft.Msagl.Core.Geometry.Curves;
using MsaglPoint = Microsoft.Msagl.Core.Geometry.Point;

namespace NetSolve.Rendering.Map;

/// <summary>Puts a route's rate label on its line, at the first of a few positions along it that clears every unit box and every label already placed.</summary>
/// <remarks>
/// Labels are placed after layout rather than as layout nodes: as nodes they widen every layer they cross, which
/// costs the width that lets a 40-unit map print legibly at A4 width.
/// </remarks>
internal sealed class RateLabelPlacer(IReadOnlyList<MapNode> boxes)
{
    private readonly List<(MapPoint Centre, double HalfWidth, double HalfHeight)> _labels = [];

    /// <summary>Fractions of the line's parameter range tried in turn: the middle first, then outwards.</summary>
    private static readonly double[] Positions = [0.5, 0.4, 0.6, 0.3, 0.7, 0.2, 0.8, 0.15, 0.85, 0.1, 0.9];

    /// <summary>How far beside the line a label may move, in label sizes: touching it first, then one label further.</summary>
    private static readonly int[] SideReaches = [1, 2];

    /// <summary>Space kept between a label and a box.</summary>
    private const double Clearance = 2.0;

    public MapPoint Place(ICurve curve, Func<MsaglPoint, MapPoint> toMap, string rateText)
    {
        double halfWidth = (TextWidth.Of(rateText, MapTypography.RateSize) / 2.0) + 2.0 + Clearance;
        double halfHeight = (MapTypography.RateSize * MapTypography.LineSpacing / 2.0) + Clearance;
        MapPoint best = default;
        double bestOverlap = double.PositiveInfinity;
        foreach (var centre in Candidates(curve, toMap, halfWidth, halfHeight))
        {
            double overlap = Overlap(centre, halfWidth, halfHeight);
            if (overlap < bestOverlap)
            {
                (best, bestOverlap) = (centre, overlap);
            }

            if (overlap == 0.0)
            {
                break;
            }
        }

        // Where no position is clear, the one that covers the least of the boxes and labels already placed.
        _labels.Add((best, halfWidth, halfHeight));
        return best;
    }

    /// <summary>
    /// Where the label may go, best first: on the line at each of <see cref="Positions"/>; then, where a crowded
    /// stretch leaves no room on the line, just beside it (above or below a line that runs across, left or right of
    /// one that runs down), then one label further out.
    /// </summary>
    private static IEnumerable<MapPoint> Candidates(ICurve curve, Func<MsaglPoint, MapPoint> toMap, double halfWidth, double halfHeight)
    {
        var onLine = Positions.Select(position => curve.ParStart + ((curve.ParEnd - curve.ParStart) * position)).ToList();
        foreach (double t in onLine)
        {
            yield return toMap(curve[t]);
        }

        foreach (int reach in SideReaches)
        {
            foreach (double t in onLine)
            {
                var centre = toMap(curve[t]);
                var ahead = toMap(curve[t] + curve.Derivative(t));
                bool across = Math.Abs(ahead.X - centre.X) >= Math.Abs(ahead.Y - centre.Y);
                double dx = across ? 0.0 : ((2 * reach) - 1) * halfWidth;
                double dy = across ? ((2 * reach) - 1) * halfHeight : 0.0;
                yield return new MapPoint(centre.X + dx, centre.Y + dy);
                yield return new MapPoint(centre.X - dx, centre.Y - dy);
            }
        }
    }

    /// <summary>The area a label at <paramref name="centre"/> would share with the unit boxes and the labels placed so far.</summary>
    private double Overlap(MapPoint centre, double halfWidth, double halfHeight)
    {
        double area = boxes.Sum(box => Shared(centre.X - halfWidth, centre.X + halfWidth, box.Left, box.Right)
            * Shared(centre.Y - halfHeight, centre.Y + halfHeight, box.Top, box.Bottom));
        return area + _labels.Sum(label =>
            Shared(centre.X - halfWidth, centre.X + halfWidth, label.Centre.X - label.HalfWidth, label.Centre.X + label.HalfWidth)
            * Shared(centre.Y - halfHeight, centre.Y + halfHeight, label.Centre.Y - label.HalfHeight, label.Centre.Y + label.HalfHeight));
    }

    private static double Shared(double low, double high, double otherLow, double otherHigh) =>
        Math.Max(0.0, Math.Min(high, otherHigh) - Math.Max(low, otherLow));
}
