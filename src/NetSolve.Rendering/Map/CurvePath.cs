using System.Text;
using Microsoft.Msagl.Core.Geometry.Curves;
using MsaglPoint = Microsoft.Msagl.Core.Geometry.Point;

namespace NetSolve.Rendering.Map;

/// <summary>Turns an MSAGL curve into SVG path data: lines and cubic Béziers kept exact, other curves sampled.</summary>
internal static class CurvePath
{
    /// <summary>Points taken along a curve that is neither a line nor a cubic Bézier (ellipse arcs of loops).</summary>
    private const int SamplesPerSegment = 16;

    public static string Of(ICurve curve, Func<MsaglPoint, MapPoint> toMap)
    {
        var path = new StringBuilder();
        Move(path, toMap(curve.Start));
        Append(path, curve, toMap);
        return path.ToString().TrimEnd();
    }

    private static void Append(StringBuilder path, ICurve curve, Func<MsaglPoint, MapPoint> toMap)
    {
        switch (curve)
        {
            case Curve composite:
                foreach (var segment in composite.Segments)
                {
                    Append(path, segment, toMap);
                }

                break;
            case LineSegment line:
                Point(path, 'L', toMap(line.End));
                break;
            case CubicBezierSegment bezier:
                path.Append("C ");
                Pair(path, toMap(bezier.B(1)));
                Pair(path, toMap(bezier.B(2)));
                Pair(path, toMap(bezier.B(3)));
                break;
            case Polyline polyline:
                foreach (var point in polyline.Skip(1))
                {
                    Point(path, 'L', toMap(point));
                }

                break;
            default:
                for (int k = 1; k <= SamplesPerSegment; k++)
                {
                    double t = curve.ParStart + ((curve.ParEnd - curve.ParStart) * k / SamplesPerSegment);
                    Point(path, 'L', toMap(curve[t]));
                }

                break;
        }
    }

    private static void Move(StringBuilder path, MapPoint point) => Point(path, 'M', point);

    private static void Point(StringBuilder path, char command, MapPoint point)
    {
        path.Append(command).Append(' ');
        Pair(path, point);
    }

    private static void Pair(StringBuilder path, MapPoint point) =>
        path.Append(Coordinates.Format(point.X)).Append(' ').Append(Coordinates.Format(point.Y)).Append(' ');
}
