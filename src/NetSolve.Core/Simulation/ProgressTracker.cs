namespace NetSolve.Simulation;

/// <summary>Sums the progress of replications running on several threads into one fraction in [0, 1]. Thread-safe.</summary>
internal sealed class ProgressTracker
{
    private const double TicksPerReplication = 1_000_000.0;

    private readonly IProgress<double>? _progress;
    private long[] _ticks;
    private double _totalTicks;
    private long _done;

    public ProgressTracker(IProgress<double>? progress, int replications)
    {
        _progress = progress;
        _ticks = new long[replications];
        _totalTicks = replications * TicksPerReplication;
    }

    /// <summary>
    /// Counts <paramref name="replications"/> in all from now on, when a precision adds replications: the bar steps
    /// back once to show the work still to do. Call between steps, never while replications run.
    /// </summary>
    public void Extend(int replications)
    {
        if (replications <= _ticks.Length)
        {
            return;
        }

        Array.Resize(ref _ticks, replications);
        _totalTicks = replications * TicksPerReplication;
    }

    /// <summary>Null when nobody listens, so the event loop skips the call.</summary>
    public Action<double>? For(int replication) => _progress is null ? null : fraction => Update(replication, fraction);

    public void Update(int replication, double fraction)
    {
        if (_progress is null)
        {
            return;
        }

        long ticks = (long)(Math.Clamp(fraction, 0.0, 1.0) * TicksPerReplication);
        long previous = Interlocked.Exchange(ref _ticks[replication], ticks);
        long done = Interlocked.Add(ref _done, ticks - previous);
        _progress.Report(Math.Min(1.0, done / _totalTicks));
    }
}
