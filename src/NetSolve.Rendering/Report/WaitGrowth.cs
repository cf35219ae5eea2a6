using System.Collections.Immutable;
using NetSolve.Solving;

namespace NetSolve.Rendering.Report;

/// <summary>
/// Mean waits as every external arrival rate grows by a common factor, from today's demand (1.0) to just below
/// the factor at which the first unit saturates (its headroom).
/// </summary>
/// <remarks>
/// In a Jackson network every flow scales with the external arrivals, so each point re-evaluates the units at the
/// solved flows times the factor (<see cref="NetworkSolver.FromFlows"/>); the traffic equations are not solved again.
/// </remarks>
/// <param name="SaturationFactor">The smallest headroom among stable units with finite servers; null when none has one.</param>
/// <param name="Factors">Growth factors, ascending from 1.</param>
/// <param name="Curves">One curve per stable unit with finite servers that patients reach, in file order.</param>
public sealed record WaitGrowth(double? SaturationFactor, ImmutableArray<double> Factors, ImmutableArray<WaitCurve> Curves)
{
    /// <summary>Ids of the units that saturate first (the finding's units), in file order; empty when none does.</summary>
    public ImmutableArray<string> FirstToSaturate { get; init; } = [];

    /// <summary>The last factor drawn puts the first unit to saturate at this utilisation, when that is above today's demand.</summary>
    public const double LastUtilisation = 0.98;

    /// <summary>Points along the growth axis by default.</summary>
    public const int DefaultPoints = 41;

    /// <summary>
    /// Computes the curves. Empty when any unit is already unstable (there is no growth left) or when no unit
    /// has finite servers and patients (nothing saturates).
    /// </summary>
    public static WaitGrowth Compute(NetworkSolution solution, int points = DefaultPoints)
    {
        ArgumentNullException.ThrowIfNull(solution);
        ArgumentOutOfRangeException.ThrowIfLessThan(points, 2);
        var candidates = solution.Units.Where(u => u.IsStable && u.Headroom is not null).ToList();
        double? saturation = candidates.Count == 0 ? null : candidates.Min(u => u.Headroom!.Value);
        if (saturation is not double headroom || !solution.IsStable)
        {
            return new WaitGrowth(saturation, [], []);
        }

        double last = LastFactor(headroom);
        var factors = Enumerable.Range(0, points).Select(k => 1.0 + ((last - 1.0) * k / (points - 1))).ToImmutableArray();
        var baseFlows = solution.Units.Select(u => u.ArrivalsPerHour).ToArray();
        var waits = candidates.Select(_ => ImmutableArray.CreateBuilder<double>(points)).ToList();
        var index = solution.Network.BuildIndex();
        foreach (double factor in factors)
        {
            var scaled = NetworkSolver.FromFlows(solution.Network, baseFlows.Select(flow => flow * factor).ToArray(), solution.StrainThreshold);
            for (int c = 0; c < candidates.Count; c++)
            {
                waits[c].Add(scaled.Units[index[candidates[c].Unit.Id]].MeanWaitHours
                    ?? throw new InvalidOperationException("A unit saturated below the smallest headroom."));
            }
        }

        var curves = candidates.Select((u, c) => new WaitCurve(u.Unit.Id, u.Unit.Label, waits[c].MoveToImmutable())).ToImmutableArray();
        return new WaitGrowth(saturation, factors, curves)
        {
            FirstToSaturate = [.. solution.Units.Where(u => u.Status == UnitStatus.Bottleneck && u.Headroom is not null).Select(u => u.Unit.Id)],
        };
    }

    /// <summary>
    /// The last factor drawn: the first unit to saturate at <see cref="LastUtilisation"/> when that lies above 1,
    /// otherwise 98% of the way from 1 to its headroom, so the range always ends just below saturation.
    /// </summary>
    public static double LastFactor(double headroom)
    {
        double atUtilisation = headroom * LastUtilisation;
        return atUtilisation > 1.0 ? atUtilisation : 1.0 + ((headroom - 1.0) * LastUtilisation);
    }
}
