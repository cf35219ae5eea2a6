using NodaTime;

namespace NetSolve.Fitting.Reading;

/// <summary>Reads one time written as in a movement log (for <c>--extract-start</c> and <c>--extract-end</c>).</summary>
public static class LogTimeText
{
    /// <summary>Whether <paramref name="text"/> is a time in one of the log's formats (see docs/movement-log.md).</summary>
    public static bool IsTime(string text) => LogTimeParser.TryParse(text.AsSpan().Trim(), out _, out _);

    /// <summary>The instant <paramref name="text"/> names, local times read in <paramref name="zone"/>; null if it is not a time.</summary>
    public static Instant? Parse(string text, DateTimeZone zone)
    {
        ArgumentNullException.ThrowIfNull(text);
        return LogTimeParser.TryParse(text.AsSpan().Trim(), out var local, out var offset)
            ? Instant.FromUnixTimeMilliseconds(new LogClock(zone).Milliseconds(local, offset))
            : null;
    }
}
