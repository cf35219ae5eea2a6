using System.Runtime.InteropServices;
using System.Text;

namespace NetSolve.Rendering.Map;

// The shapes of the large map's lines: forward, return and repeat-visit curves and their path data.
internal static partial class LargeMapLayoutBuilder
{
    private static Rect Box(MapNode box, MapPoint centre) => new(centre, box.Width / 2.0, box.Height / 2.0);

    /// <summary>From the middle of the source's far side to the middle of the target's near side, leaving and arriving along the main direction.</summary>
    private static Curve Forward(Rect from, Rect to, double arrow, bool down)
    {
        var start = down ? new MapPoint(from.Centre.X, from.Centre.Y + from.HalfHeight) : new MapPoint(from.Centre.X + from.HalfWidth, from.Centre.Y);
        var tip = down ? new MapPoint(to.Centre.X, to.Centre.Y - to.HalfHeight) : new MapPoint(to.Centre.X - to.HalfWidth, to.Centre.Y);
        var arrowBase = down ? new MapPoint(tip.X, tip.Y - arrow) : new MapPoint(tip.X - arrow, tip.Y);
        // Half the distance along the main direction, so a line between neighbouring layers is a gentle S; capped, so
        // a line up to a later band turns round in the gaps next to its boxes instead of swinging far past the map.
        double reach = Math.Clamp(Math.Abs(down ? arrowBase.Y - start.Y : arrowBase.X - start.X) / 2.0, MapLayoutBuilder.LayerSeparation / 2.0, MaxReach);
        var first = down ? new MapPoint(start.X, start.Y + reach) : new MapPoint(start.X + reach, start.Y);
        var second = down ? new MapPoint(arrowBase.X, arrowBase.Y - reach) : new MapPoint(arrowBase.X - reach, arrowBase.Y);
        return new Curve(start, first, second, arrowBase, tip);
    }

    /// <summary>From the middle of the source's side across the main direction to the same side of the target, bowing out.</summary>
    private static Curve Return(Rect from, Rect to, double arrow, bool down)
    {
        var start = down ? new MapPoint(from.Centre.X + from.HalfWidth, from.Centre.Y) : new MapPoint(from.Centre.X, from.Centre.Y + from.HalfHeight);
        var tip = down ? new MapPoint(to.Centre.X + to.HalfWidth, to.Centre.Y) : new MapPoint(to.Centre.X, to.Centre.Y + to.HalfHeight);
        var arrowBase = down ? new MapPoint(tip.X + arrow, tip.Y) : new MapPoint(tip.X, tip.Y + arrow);
        double distance = Math.Sqrt(Math.Pow(arrowBase.X - start.X, 2) + Math.Pow(arrowBase.Y - start.Y, 2));
        double bow = Math.Clamp(0.15 * distance, MinBow, MaxBow);
        var first = down ? new MapPoint(start.X + bow, start.Y) : new MapPoint(start.X, start.Y + bow);
        var second = down ? new MapPoint(arrowBase.X + bow, arrowBase.Y) : new MapPoint(arrowBase.X, arrowBase.Y + bow);
        return new Curve(start, first, second, arrowBase, tip);
    }

    /// <summary>A repeat visit: a small loop out of the box's side across the main direction and back into it.</summary>
    private static Curve Loop(Rect box, double arrow, bool down)
    {
        var start = down ? new MapPoint(box.Centre.X + box.HalfWidth, box.Centre.Y - (box.HalfHeight / 2.0)) : new MapPoint(box.Centre.X - (box.HalfWidth / 2.0), box.Centre.Y + box.HalfHeight);
        var tip = down ? new MapPoint(start.X, box.Centre.Y + (box.HalfHeight / 2.0)) : new MapPoint(box.Centre.X + (box.HalfWidth / 2.0), start.Y);
        var arrowBase = down ? new MapPoint(tip.X + arrow, tip.Y) : new MapPoint(tip.X, tip.Y + arrow);
        double bow = MinBow + arrow;
        var first = down ? new MapPoint(start.X + bow, start.Y) : new MapPoint(start.X, start.Y + bow);
        var second = down ? new MapPoint(arrowBase.X + bow, arrowBase.Y) : new MapPoint(arrowBase.X, arrowBase.Y + bow);
        return new Curve(start, first, second, arrowBase, tip);
    }

    private static string PathData(Curve curve, Func<MapPoint, MapPoint> shift)
    {
        if (curve.Bends is { } bends)
        {
            return BandGapRoute.PathData([curve.Start, .. bends, curve.Base], shift);
        }

        var path = new StringBuilder("M ");
        Pair(path, shift(curve.Start)).Append("C ");
        Pair(path, shift(curve.First));
        Pair(path, shift(curve.Second));
        Pair(path, shift(curve.Base));
        return path.ToString().TrimEnd();
    }

    internal static StringBuilder Pair(StringBuilder path, MapPoint point) =>
        path.Append(Coordinates.Format(point.X)).Append(' ').Append(Coordinates.Format(point.Y)).Append(' ');

    /// <summary>A box as its centre and half sizes.</summary>
    [StructLayout(LayoutKind.Auto)]
    internal readonly record struct Rect(MapPoint Centre, double HalfWidth, double HalfHeight);

    /// <summary>One cubic Bézier from <paramref name="Start"/> to the arrow's <paramref name="Base"/>, then the arrowhead to <paramref name="Tip"/>.</summary>
    [StructLayout(LayoutKind.Auto)]
    internal readonly record struct Curve(MapPoint Start, MapPoint First, MapPoint Second, MapPoint Base, MapPoint Tip)
    {
        /// <summary>
        /// For a line routed along the gap between bands, the corners it turns at between <see cref="Start"/> and
        /// <see cref="Base"/> (drawn rounded; <see cref="First"/> and <see cref="Second"/> unused); null for one curve.
        /// </summary>
        public MapPoint[]? Bends { get; init; }

        /// <summary>Where the rate goes: the curve's point halfway along its parameter, (P0 + 3 P1 + 3 P2 + P3) / 8; on a routed line, the middle of its middle leg.</summary>
        public MapPoint Middle => Bends is { Length: > 1 } bends
            ? new MapPoint((bends[(bends.Length / 2) - 1].X + bends[bends.Length / 2].X) / 2.0, (bends[(bends.Length / 2) - 1].Y + bends[bends.Length / 2].Y) / 2.0)
            : At(0.5);

        /// <summary>The point at parameter <paramref name="t"/> in [0, 1] (Bernstein form).</summary>
        public MapPoint At(double t)
        {
            double u = 1.0 - t;
            double a = u * u * u, b = 3.0 * u * u * t, c = 3.0 * u * t * t, d = t * t * t;
            return new MapPoint(
                (a * Start.X) + (b * First.X) + (c * Second.X) + (d * Base.X),
                (a * Start.Y) + (b * First.Y) + (c * Second.Y) + (d * Base.Y));
        }
    }
}
