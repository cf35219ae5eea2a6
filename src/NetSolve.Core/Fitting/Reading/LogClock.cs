using NodaTime;
using NodaTime.TimeZones;

namespace NetSolve.Fitting.Reading;

/// <summary>
/// Turns a log's times into instants: a time with an offset is exact; a local time is read in the log's time zone,
/// so a stay across a daylight-saving change has its true length. Counts the local times that a clock change made
/// ambiguous or skipped.
/// </summary>
/// <remarks>
/// A local time that occurs twice (the hour repeated when clocks go back) is taken as the earlier one; a local time
/// that never occurred (the hour skipped when clocks go forward) is moved forward by the length of the gap, as a
/// clock that had not yet been changed would show it. Both rules are NodaTime's lenient resolver.
/// </remarks>
internal sealed class LogClock(DateTimeZone zone)
{
    private readonly bool _isUtc = zone == DateTimeZone.Utc;

    /// <summary>Local times that fell in a repeated hour (taken as the earlier) or a skipped hour (moved forward).</summary>
    public long ClockChangeTimes { get; private set; }

    /// <summary>The instant of a parsed time, as milliseconds since 1970-01-01 UTC.</summary>
    public long Milliseconds(LocalDateTime local, Offset? offset)
    {
        if (offset is Offset known)
        {
            return local.WithOffset(known).ToInstant().ToUnixTimeMilliseconds();
        }

        if (_isUtc)
        {
            return local.InUtc().ToInstant().ToUnixTimeMilliseconds();
        }

        var mapping = zone.MapLocal(local);
        if (mapping.Count != 1)
        {
            ClockChangeTimes++;
        }

        return Resolvers.LenientResolver(mapping).ToInstant().ToUnixTimeMilliseconds();
    }
}
