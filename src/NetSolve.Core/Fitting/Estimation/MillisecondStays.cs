namespace NetSolve.Fitting.Estimation;

/// <summary>
/// One unit's stays in whole milliseconds as the log gives them, collected compactly and then grouped into
/// <see cref="StayGroups"/>. A stay that began inside the extract (age 0, nearly all of them) is held as one 8-byte key,
/// its length doubled plus its censoring flag, so sorting the keys orders the stays by length and puts the ended
/// before the censored; the few stays already running at the extract's start are held apart with their ages.
/// </summary>
internal sealed class MillisecondStays(int capacity)
{
    private readonly long[] _keys = new long[capacity];
    private readonly List<(long StayMs, long AgeMs, bool Censored)> _truncated = [];
    private int _count;

    /// <summary>Adds a stay of <paramref name="stayMs"/>, <paramref name="ageMs"/> old at the extract's start (0 to its length).</summary>
    public void Add(long stayMs, long ageMs, bool censored)
    {
        if (ageMs > 0)
        {
            _truncated.Add((stayMs, ageMs, censored));
        }
        else
        {
            _keys[_count++] = (stayMs << 1) | (censored ? 1L : 0L);
        }
    }

    /// <summary>
    /// The stays grouped, in hours. The resolution is the greatest common divisor of the ended stays' lengths (a log
    /// recorded to the minute gives 1 minute or a multiple), 1 ms when no stay ended after 0.
    /// </summary>
    public StayGroups Group()
    {
        const double PerHour = CensoredStayMean.MillisecondsPerHour;
        var keys = _keys.AsSpan(0, _count);
        keys.Sort();
        _truncated.Sort();
        var groups = new StayGroupsBuilder(Math.Min(_count, 1024) + _truncated.Count);
        long resolutionMs = 0;
        int k = 0;
        int t = 0;
        while (k < keys.Length || t < _truncated.Count)
        {
            // At equal lengths the stays of age 0 come first: groups ascend by length, then age.
            if (t == _truncated.Count || (k < keys.Length && (keys[k] >> 1) <= _truncated[t].StayMs))
            {
                long key = keys[k];
                int run = 1;
                while (k + run < keys.Length && keys[k + run] == key)
                {
                    run++;
                }

                k += run;
                long stayMs = key >> 1;
                bool censored = (key & 1L) == 1L;
                groups.Add(stayMs / PerHour, 0.0, censored, run);
                resolutionMs = censored ? resolutionMs : GreatestCommonDivisor(resolutionMs, stayMs);
            }
            else
            {
                var (stayMs, ageMs, censored) = _truncated[t++];
                groups.Add(stayMs / PerHour, ageMs / PerHour, censored, 1);
                resolutionMs = censored ? resolutionMs : GreatestCommonDivisor(resolutionMs, stayMs);
            }
        }

        return groups.Build(Math.Max(resolutionMs, 1L) / PerHour);
    }

    private static long GreatestCommonDivisor(long a, long b)
    {
        while (b != 0)
        {
            (a, b) = (b, a % b);
        }

        return a;
    }
}
