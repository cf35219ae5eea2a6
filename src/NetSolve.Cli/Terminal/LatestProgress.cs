namespace NetSolve.Cli.Terminal;

/// <summary>Keeps the latest fraction reported from any thread, for a progress bar that polls it. Thread-safe.</summary>
internal sealed class LatestProgress : IProgress<double>
{
    private double _value;

    /// <summary>The latest fraction done, in [0, 1].</summary>
    public double Value => Volatile.Read(ref _value);

    public void Report(double value)
    {
        // Reports from several replications arrive out of order; the bar never moves back.
        double current;
        do
        {
            current = Volatile.Read(ref _value);
            if (value <= current)
            {
                return;
            }
        }
        while (Interlocked.CompareExchange(ref _value, value, current) != current);
    }
}
