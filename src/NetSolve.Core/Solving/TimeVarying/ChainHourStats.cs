namespace NetSolve.Solving;

/// <summary>Hourly sums of the queue, the patients in the unit and the chance of waiting while a cycle is recorded.</summary>
internal sealed class ChainHourStats
{
    private readonly HourAccumulator _hours;
    private readonly double[] _fullByArrivals;
    private readonly double[] _arrivals;

    public ChainHourStats(int cycleHours)
    {
        _hours = new HourAccumulator(cycleHours);
        _fullByArrivals = new double[cycleHours];
        _arrivals = new double[cycleHours];
    }

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

        int hour = step / chain.StepsPerHour;
        _hours.Add(hour, 1.0, scale * queue, scale * inUnit, scale * allBusy, chain.ArrivalsAt(step));

        // The last state is the full unit when the chain has a capacity (beyond the truncation it holds nothing).
        _fullByArrivals[hour] += scale * p[^1] * chain.ArrivalsAt(step);
        _arrivals[hour] += chain.ArrivalsAt(step);
    }

    /// <summary>The hourly values of the recorded cycle; with a capacity, also the share of arrivals turned away.</summary>
    public HourlyWaits ToWaits(ChainCycle chain, bool hasCapacity = false)
    {
        var waits = _hours.ToWaits(TimeVaryingMethodNames.ExactChain, chain.StepsPerHour);
        if (!hasCapacity)
        {
            return waits;
        }

        var turnedAway = new double[_arrivals.Length];
        for (int h = 0; h < turnedAway.Length; h++)
        {
            turnedAway[h] = _arrivals[h] > 0.0 ? Math.Clamp(_fullByArrivals[h] / _arrivals[h], 0.0, 1.0) : 0.0;
        }

        return waits with { TurnedAwayShareByHour = [.. turnedAway] };
    }
}
