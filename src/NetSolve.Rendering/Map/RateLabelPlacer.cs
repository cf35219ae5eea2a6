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
    private static readonly double[] Positions = [0.5, 0.4, 0.6, 0.3, 0.7, 0.2, 0.8];

    /// <summary>Space kept between a label and a box.</summary>
    private const double Clearance = 2.0;

    public MapPoint Place(ICurve curve, Func<MsaglPoint, MapPoint> toMap, string rateText)
    {
        double halfWidth = (TextWidth.Of(rateText, MapTypography.RateSize) / 2.0) + 2.0 + Clearance;
        double halfHeight = (MapTypography.RateSize * MapTypography.LineSpacing / 2.0) + Clearance;
        MapPoint first = default;
        for (int k = 0; k < Positions.Length; k++)
        {
            var centre = toMap(curve[curve.ParStart + ((curve.ParEnd - curve.ParStart) * Positions[k])]);
            if (k == 0)
            {
                first = centre;
            }

            if (!boxes.Any(box => Overlaps(box, centre, halfWidth, halfHeight))
                && !_labels.Any(label => Math.Abs(label.Centre.X - centre.X) < label.HalfWidth + halfWidth
                    && Math.Abs(label.Centre.Y - centre.Y) < label.HalfHeight + halfHeight))
            {
                _labels.Add((centre, halfWidth, halfHeight));
                return centre;
            }
        }

        _labels.Add((first, halfWidth, halfHeight));
        return first;
    }

    private static bool Overlaps(MapNode box, MapPoint centre, double halfWidth, double halfHeight) =>
        centre.X + halfWidth > box.Left && centre.X - halfWidth < box.Right
        && centre.Y + halfHeight > box.Top && centre.Y - halfHeight < box.Bottom;
}
