using System.Text;

namespace NetSolve.Rendering.Map;

/// <summary>
/// A forward line from one band of a folded group to a later band, routed through the gaps where no box stands:
/// out of the source's far side into the gap after its row, across to the gap between its band and the next, along
/// that gap to the gap before the target's row, across to above the target, and in. One straight curve instead would
/// cross the whole page over every box between.
/// </summary>
/// <remarks>
/// Rows of all bands of a group line up, so the gaps between rows run across every band; bands are
/// <c>LargeMapLayoutBuilder.BandGap</c> apart. Corners are rounded with a quadratic Bézier.
/// </remarks>
internal static class BandGapRoute
{
    /// <summary>Radius of a rounded corner, at most half of either leg beside it.</summary>
    private const double CornerRadius = 10.0;

    /// <param name="from">The source box (centre and half sizes).</param>
    /// <param name="to">The target box.</param>
    /// <param name="arrow">Length of the arrowhead.</param>
    /// <param name="down">True when patients flow down the page.</param>
    /// <param name="deepest">The deepest box along the main direction: rows are that deep, their gaps start below it.</param>
    /// <param name="channel">Across the main direction, the middle of the gap after the source's band.</param>
    public static LargeMapLayoutBuilder.Curve Between(LargeMapLayoutBuilder.Rect from, LargeMapLayoutBuilder.Rect to, double arrow, bool down, double deepest, double channel)
    {
        MapPoint At(double along, double across) => down ? new MapPoint(across, along) : new MapPoint(along, across);
        double fromAlong = down ? from.Centre.Y : from.Centre.X;
        double fromAcross = down ? from.Centre.X : from.Centre.Y;
        double toAlong = down ? to.Centre.Y : to.Centre.X;
        double toAcross = down ? to.Centre.X : to.Centre.Y;
        double fromHalf = down ? from.HalfHeight : from.HalfWidth;
        double toHalf = down ? to.HalfHeight : to.HalfWidth;
        double afterRow = fromAlong + (deepest / 2.0) + (MapLayoutBuilder.LayerSeparation / 2.0);
        double beforeRow = toAlong - (deepest / 2.0) - (MapLayoutBuilder.LayerSeparation / 2.0);

        var start = At(fromAlong + fromHalf, fromAcross);
        var tip = At(toAlong - toHalf, toAcross);
        var arrowBase = At(toAlong - toHalf - arrow, toAcross);
        return new LargeMapLayoutBuilder.Curve(start, start, arrowBase, arrowBase, tip)
        {
            Bends = [At(afterRow, fromAcross), At(afterRow, channel), At(beforeRow, channel), At(beforeRow, toAcross)],
        };
    }

    /// <summary>SVG path data through <paramref name="points"/>, each inner corner rounded.</summary>
    public static string PathData(IReadOnlyList<MapPoint> points, Func<MapPoint, MapPoint> shift)
    {
        var path = new StringBuilder("M ");
        LargeMapLayoutBuilder.Pair(path, shift(points[0]));
        for (int i = 1; i + 1 < points.Count; i++)
        {
            var (before, corner, after) = (points[i - 1], points[i], points[i + 1]);
            double inLength = Distance(before, corner);
            double outLength = Distance(corner, after);
            double radius = Math.Min(CornerRadius, Math.Min(inLength, outLength) / 2.0);
            if (radius <= 0.0)
            {
                path.Append("L ");
                LargeMapLayoutBuilder.Pair(path, shift(corner));
                continue;
            }

            path.Append("L ");
            LargeMapLayoutBuilder.Pair(path, shift(Towards(corner, before, radius / inLength)));
            path.Append("Q ");
            LargeMapLayoutBuilder.Pair(path, shift(corner));
            LargeMapLayoutBuilder.Pair(path, shift(Towards(corner, after, radius / outLength)));
        }

        path.Append("L ");
        LargeMapLayoutBuilder.Pair(path, shift(points[^1]));
        return path.ToString().TrimEnd();
    }

    private static double Distance(MapPoint a, MapPoint b) => Math.Sqrt(((b.X - a.X) * (b.X - a.X)) + ((b.Y - a.Y) * (b.Y - a.Y)));

    private static MapPoint Towards(MapPoint from, MapPoint to, double share) =>
        new(from.X + ((to.X - from.X) * share), from.Y + ((to.Y - from.Y) * share));
}
