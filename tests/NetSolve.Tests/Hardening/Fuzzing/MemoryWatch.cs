namespace NetSolve.Tests.Hardening.Fuzzing;

/// <summary>Samples the process's working set and managed heap while a run goes on, keeping the largest of each.</summary>
internal sealed class MemoryWatch : IDisposable
{
    private static readonly TimeSpan Interval = TimeSpan.FromMilliseconds(20);

    private readonly Timer _timer;
    private long _peakWorkingSet;
    private long _peakManaged;

    public MemoryWatch()
    {
        Sample();
        _timer = new Timer(_ => Sample(), null, Interval, Interval);
    }

    /// <summary>Largest working set seen, in bytes.</summary>
    public long PeakWorkingSet => Interlocked.Read(ref _peakWorkingSet);

    /// <summary>Largest managed heap seen, in bytes.</summary>
    public long PeakManaged => Interlocked.Read(ref _peakManaged);

    public void Dispose()
    {
        _timer.Dispose();
        Sample();
    }

    private void Sample()
    {
        Raise(ref _peakWorkingSet, Environment.WorkingSet);
        Raise(ref _peakManaged, GC.GetTotalMemory(forceFullCollection: false));
    }

    private static void Raise(ref long peak, long value)
    {
        long seen = Interlocked.Read(ref peak);
        while (value > seen)
        {
            long before = Interlocked.CompareExchange(ref peak, value, seen);
            if (before == seen)
            {
                return;
            }

            seen = before;
        }
    }
}
