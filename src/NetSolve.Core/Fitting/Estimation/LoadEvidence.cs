namespace NetSolve.Fitting.Estimation;

/// <summary>A unit's load on its servers: arrival rate × mean stay / servers, with a conservative 95% interval.</summary>
/// <param name="Servers">The servers the load is measured against.</param>
/// <param name="Load">
/// The utilisation the fit implies. Its interval multiplies the ends of the arrival rate's and the mean stay's
/// intervals (lower × lower, upper × upper): wider than a joint 95% interval, so a unit flagged by it deserves a look.
/// </param>
public sealed record LoadEvidence(int Servers, IntervalEstimate Load)
{
    /// <summary>Whether the interval reaches 1, where the unit would be unstable.</summary>
    public bool MayReachServers => Load.Interval.Upper >= 1.0;

    /// <summary>The load of <paramref name="arrivals"/> with <paramref name="meanStay"/> on <paramref name="servers"/>.</summary>
    public static LoadEvidence Of(RateEvidence arrivals, IntervalEstimate meanStay, int servers)
    {
        ArgumentNullException.ThrowIfNull(arrivals);
        ArgumentOutOfRangeException.ThrowIfLessThan(servers, 1);
        var rate = arrivals.PerHour;
        return new LoadEvidence(servers, new IntervalEstimate(
            rate.Value * meanStay.Value / servers,
            new Interval(rate.Interval.Lower * meanStay.Interval.Lower / servers, rate.Interval.Upper * meanStay.Interval.Upper / servers)));
    }
}
