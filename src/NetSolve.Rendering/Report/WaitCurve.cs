using System.Collections.Immutable;

namespace NetSolve.Rendering.Report;

/// <summary>One unit's mean wait at each demand growth factor.</summary>
/// <param name="UnitId">The unit.</param>
/// <param name="Label">Its display name.</param>
/// <param name="WaitHours">Mean wait in hours at each factor of <see cref="WaitGrowth.Factors"/>.</param>
public sealed record WaitCurve(string UnitId, string Label, ImmutableArray<double> WaitHours);
