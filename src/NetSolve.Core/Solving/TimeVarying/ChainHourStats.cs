namespace NetSolve.Solving;

/// <summary>Hourly sums of the queue, the patients in the unit and the chance of waiting while a cycle is recorded.</summary>
internal sealed class ChainHourStats
{
    private readonly HourAccumulator _hours;

    public ChainHourStats(int cycleHours) => _hours = new HourAccumulator(cycleHours);

    /// <summary>Adds <paramref name="weight"/> × the moments of <paramref name="p"/> in step <paramref name="step"/>.</summary>
    public void Record(int step, ChainCycle chain, double[] p, double weight)
    {
        int servers = chain.ServersAt(step);
        double inUnit = 0.0;
        double queue = 0.0;
        double allBusy = 0.0;
        for (int n = 0; n < p.Length; n++)
        {
            inUnit += n * p[n];
            if (n >= servers)
            {
                queue += (n - servers) * p[n];
                allBusy += p[n];
            }
        }

        _hours.Add(step / chain.StepsPerHour, weight, queue, inUnit, allBusy, chain.ArrivalsAt(step));
    }

    /// <summary>The hourly values of the recorded cycle.</summary>
    public HourlyWaits ToWaits(ChainCycle chain) => _hours.ToWaits(TimeVaryingMethodNames.ExactChain, chain.StepsPerHour);
}
