namespace NetSolve.Tests.Hardening.Fuzzing;

/// <summary>
/// Processor time used by the threads that run inputs (each run's own thread, on every worker), summed since the
/// campaign began: what the process used beyond it in a window is work no run's own thread did.
/// </summary>
internal static class RunThreadTotal
{
    private static readonly Lock Gate = new();
    private static readonly Dictionary<ThreadClock, TimeSpan> Running = [];
    private static TimeSpan _ended;

    /// <summary>A run's thread starts counting, at <paramref name="now"/> on its clock.</summary>
    public static void Begin(ThreadClock clock, TimeSpan now)
    {
        lock (Gate)
        {
            Running[clock] = now;
        }
    }

    /// <summary>A run's thread stops counting, at <paramref name="now"/> on its clock.</summary>
    public static void End(ThreadClock clock, TimeSpan now)
    {
        lock (Gate)
        {
            if (Running.Remove(clock, out var start))
            {
                _ended += now - start;
            }
        }
    }

    /// <summary>The sum so far.</summary>
    public static TimeSpan Now()
    {
        lock (Gate)
        {
            var total = _ended;
            foreach (var (clock, start) in Running)
            {
                total += (clock.Read() ?? start) - start;
            }

            return total;
        }
    }
}
