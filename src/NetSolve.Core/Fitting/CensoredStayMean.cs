namespace NetSolve.Fitting;

/// <summary>
/// The mean length of stay when some stays are still running at the extract's end and some were already running at
/// its start: the maximum-likelihood estimate for exponential stays, total time observed inside the extract divided
/// by the stays that ended inside it.
/// </summary>
/// <remarks>
/// Source: D. R. Cox and D. Oakes, Analysis of Survival Data, Chapman and Hall, 1984, section 3.2 (exponential
/// likelihood with right censoring: events over total exposure). A stay already running at the extract's start is
/// left-truncated; the exponential distribution has no memory, so only its time inside the extract counts. Counting
/// complete stays only, the estimate a naive fit gives, leaves out the long stays and is biased short.
/// </remarks>
internal static class CensoredStayMean
{
    /// <summary>Mean stay in hours from <paramref name="observedMs"/> of exposure and <paramref name="ended"/> stays that ended; NaN when none ended.</summary>
    public static double ExponentialHours(long observedMs, int ended) =>
        ended > 0 ? observedMs / (double)ended / MillisecondsPerHour : double.NaN;

    /// <summary>Milliseconds in an hour.</summary>
    public const double MillisecondsPerHour = 3_600_000.0;
}
