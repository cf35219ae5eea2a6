namespace NetSolve.Solving;

/// <summary>Hourly sums of the queue, the patients in the unit and the chance of waiting while a cycle is recorded.</summary>
internal sealed class ChainHourStats
{
    private readonly HourAccumulator _hours;

    public ChainHourStats(int cycleHours) => _hours = new HourAccumulator(cycleHours);

    /// <summary>Adds the moments of <paramref name="p"/> × <paramref name="scale"/> (the step's mean distribution) as one step of hour <paramref name="step"/> ÷ steps per hour.</summary>
    public void Record(int step, ChainCycle chain, double[] p, double scale)
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

        _hours.Add(step / chain.StepsPerHour, 1.0, scale * queue, scale * inUnit, scale * allBusy, chain.ArrivalsAt(step));
    }

    /// <summary>The hourly values of the recorded cycle.</summary>
    public HourlyWaits ToWaits(ChainCycle chain) => _hours.ToWaits(TimeVaryingMethodNames.ExactChain, chain.StepsPerHour);
}
