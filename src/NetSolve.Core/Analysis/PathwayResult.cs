using System.Collections.Immutable;

namespace NetSolve.Analysis;

/// <summary>Where patients who enter at one unit go: expected visits, chance of visiting and time, per unit.</summary>
/// <param name="FromUnitId">The unit patients enter at.</param>
/// <param name="Units">Every unit they can reach (positive expected visits), and any unit whose chance was asked for, in file order.</param>
public sealed record PathwayResult(string FromUnitId, ImmutableArray<PathwayVisit> Units)
{
    /// <summary>
    /// Mean time from entry to leaving the network, in hours: the sum of expected time per unit. Null when a unit on
    /// the way is unstable.
    /// </summary>
    public double? MeanTimeInNetworkHours => Units.Any(unit => unit.ExpectedTimeHours is null)
        ? null
        : Units.Sum(unit => unit.ExpectedTimeHours!.Value);
}
