using System.Runtime.InteropServices;

namespace NetSolve.Rendering.Map;

/// <summary>A point on the map, in map units (SVG user units; y grows downwards).</summary>
/// <param name="X">Horizontal position.</param>
/// <param name="Y">Vertical position, downwards.</param>
[StructLayout(LayoutKind.Auto)]
public readonly record struct MapPoint(double X, double Y);
