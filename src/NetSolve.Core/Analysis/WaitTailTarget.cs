using NetSolve.Solving;

namespace NetSolve.Analysis;

/// <summary>A target on long waits: at most <see cref="MaxProbability"/> of patients wait longer than <see cref="WaitHours"/>.</summary>
/// <param name="WaitHours">The wait t in hours; not negative.</param>
/// <param name="MaxProbability">The largest acceptable P(wait &gt; t), in [0, 1].</param>
public sealed record WaitTailTarget(double WaitHours, double MaxProbability)
{
    /// <summary>
    /// The share of patients at <paramref name="result"/>'s unit who wait longer than <see cref="WaitHours"/>:
    /// 0 where nobody waits (unlimited servers, no arrivals); null for an unstable unit, where it does not exist.
    /// </summary>
    public double? ShareWaitingLonger(UnitResult result)
    {
        ArgumentNullException.ThrowIfNull(result);
        if (!result.IsStable)
        {
            return null;
        }

        return result.Unit.Servers.IsUnlimited || !(result.ArrivalsPerHour > 0.0)
            ? 0.0
            : ErlangFormulas.WaitLongerThan(result.Unit.Servers.Count, result.OfferedLoad, result.Unit.MeanServiceHours, WaitHours);
    }
}
