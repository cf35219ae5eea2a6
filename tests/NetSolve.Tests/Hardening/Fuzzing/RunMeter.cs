using System.Diagnostics;

namespace NetSolve.Tests.Hardening.Fuzzing;

/// <summary>
/// The processor time of one in-process run, told apart from the other workers' runs as well as the system allows.
/// A run on one thread is measured on that thread's own clock. A run that may use more threads (a parallel
/// simulation) is measured as its own thread plus every thread that runs no input (pool threads, the collector,
/// timers): an upper bound of its work, since the other workers' runs keep to their own threads unless they simulate
/// in parallel too. Where no thread clock exists, the whole process's time is counted (a looser upper bound).
/// </summary>
/// <param name="singleThreaded">True when the command line runs on the calling thread only.</param>
internal sealed class RunMeter(bool singleThreaded)
{
    private readonly Lock _gate = new();
    private readonly TimeSpan _processAtStart = ProcessTime();
    private readonly TimeSpan _runThreadsAtStart = RunThreadTotal.Now();
    private ThreadClock? _clock;
    private TimeSpan _ownAtStart;
    private (TimeSpan Own, TimeSpan Process, TimeSpan RunThreads)? _atEnd;

    /// <summary>Called on the run's thread as it starts.</summary>
    public void Enter()
    {
        var clock = ThreadClock.OfCurrentThread();
        var now = clock?.Read() ?? TimeSpan.Zero;
        if (clock is not null)
        {
            RunThreadTotal.Begin(clock, now);
        }

        lock (_gate)
        {
            (_clock, _ownAtStart) = (clock, now);
        }
    }

    /// <summary>Called on the run's thread as it ends, whether it returned or threw.</summary>
    public void Leave()
    {
        lock (_gate)
        {
            var own = _clock?.Read() ?? _ownAtStart;
            if (_clock is not null)
            {
                RunThreadTotal.End(_clock, own);
            }

            _atEnd = (own, ProcessTime(), RunThreadTotal.Now());
        }
    }

    /// <summary>The run's processor time so far (all of it once it has ended), and what was counted.</summary>
    public (TimeSpan Time, string Counted) Used()
    {
        lock (_gate)
        {
            var (own, process, runThreads) = _atEnd ?? (_clock?.Read() ?? _ownAtStart, ProcessTime(), RunThreadTotal.Now());
            var processUsed = process - _processAtStart;
            if (_clock is null)
            {
                return (processUsed, "the whole process's");
            }

            var ownUsed = own - _ownAtStart;
            if (singleThreaded)
            {
                return (ownUsed, "its own thread's");
            }

            var otherRuns = runThreads - _runThreadsAtStart - ownUsed;
            var bound = processUsed - otherRuns;
            return (bound > ownUsed ? bound : ownUsed, "its own thread's and every thread's that runs no other input");
        }
    }

    private static TimeSpan ProcessTime()
    {
        using var process = Process.GetCurrentProcess();
        return process.TotalProcessorTime;
    }
}
