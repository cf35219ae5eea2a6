namespace NetSolve.Rendering.Map;

/// <summary>A short arrow at a unit box for patients arriving from outside or leaving the network.</summary>
/// <param name="PerHour">Patients per hour.</param>
/// <param name="RateText">The rate as written in the box, in the network's time unit.</param>
/// <param name="StrokeWidth">Line width, on the same proportional scale as the routes.</param>
/// <param name="Start">Where the arrow starts (outside the box for arrivals, on its border for exits).</param>
/// <param name="Tip">Where the arrow points (on the border for arrivals, outside for exits).</param>
public sealed record MapStub(double PerHour, string RateText, double StrokeWidth, MapPoint Start, MapPoint Tip);
