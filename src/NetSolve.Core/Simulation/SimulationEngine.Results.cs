namespace NetSolve.Simulation;

/// <summary>Turns one finished replication's counters into its row of metrics (see <see cref="MetricLayout"/>).</summary>
internal sealed partial class SimulationEngine
{
    /// <summary>
    /// The replication's metrics, times in hours and rates per hour. NaN marks a metric with no observation in this
    /// replication (no patient finished there); the aggregation leaves such values out.
    /// </summary>
    public double[] ResultRow()
    {
        var row = new double[_layout.Length];
        double window = _end - _warmupEnd;
        double[] exposure = HourOfDayExposure(_warmupEnd, _end);
        int thresholds = _waitThresholdsHours.Length;
        double inSystem = 0.0;
        for (int u = 0; u < _units.Length; u++)
        {
            ref readonly var state = ref _units[u];
            int servers = state.Servers;
            double inUnit = (state.BusyArea + state.QueueArea) / window;
            inSystem += inUnit;
            row[_layout.Unit(u, MetricLayout.ArrivalsPerHour)] = state.Accepted / window;
            row[_layout.Unit(u, MetricLayout.Utilisation)] = servers == CompiledNetwork.NoLimit ? 0.0 : state.BusyArea / (servers * window);
            row[_layout.Unit(u, MetricLayout.WaitProbability)] = Ratio(state.Waited, state.Starts, 0.0);
            row[_layout.Unit(u, MetricLayout.MeanQueue)] = state.QueueArea / window;
            row[_layout.Unit(u, MetricLayout.MeanWaitHours)] = state.Starts > 0 ? state.WaitSum / state.Starts : 0.0;
            row[_layout.Unit(u, MetricLayout.MeanInUnit)] = inUnit;
            row[_layout.Unit(u, MetricLayout.MeanTimeInUnitHours)] = state.Completions > 0 ? state.SojournSum / state.Completions : double.NaN;
            row[_layout.Unit(u, MetricLayout.FullProbability)] = Ratio(state.Full, state.Accepted + state.Full, 0.0);
            row[_layout.Unit(u, MetricLayout.TurnedAwayPerHour)] = state.TurnedAway / window;
            row[_layout.Unit(u, MetricLayout.DivertedPerHour)] = state.Diverted / window;
            FillUnread(row, _layout.Unit(u, MetricLayout.UnitPercentiles));
            for (int t = 0; t < thresholds; t++)
            {
                row[_layout.Unit(u, _layout.WaitOverOffset + t)] = Ratio(_waitOver[(u * thresholds) + t], state.Starts, 0.0);
            }

            for (int h = 0; h < 24; h++)
            {
                double area = _queueAreaByHour[u] is double[] byHour ? byHour[h] : 0.0;
                row[_layout.Unit(u, _layout.QueueByHourOffset + h)] = exposure[h] > 0.0 ? area / exposure[h] : double.NaN;
            }
        }

        long exits = _groupExits.Sum();
        row[_layout.Total(MetricLayout.TotalEnteredPerHour)] = _entered / window;
        row[_layout.Total(MetricLayout.TotalThroughputPerHour)] = exits / window;
        row[_layout.Total(MetricLayout.TotalMeanInSystem)] = inSystem;
        row[_layout.Total(MetricLayout.TotalMeanTimeInSystemHours)] = exits > 0 ? _groupTimeSum.Sum() / exits : double.NaN;
        row[_layout.Total(MetricLayout.TotalTurnedAwayPerHour)] = _networkTurnedAway / window;
        FillUnread(row, _layout.Total(MetricLayout.TotalPercentiles));

        for (int named = 0; named < _layout.NamedGroups; named++)
        {
            int g = named + 1;
            row[_layout.Group(named, MetricLayout.GroupThroughputPerHour)] = _groupExits[g] / window;
            row[_layout.Group(named, MetricLayout.GroupMeanTimeInSystemHours)] = _groupExits[g] > 0 ? _groupTimeSum[g] / _groupExits[g] : double.NaN;
            FillUnread(row, _layout.Group(named, MetricLayout.GroupPercentiles));
        }

        return row;
    }

    /// <summary>
    /// The replication's counts behind its percentiles and tail probabilities, for pooling across replications. Call
    /// once the replication has finished; the engine is not used afterwards.
    /// </summary>
    public ReplicationTallies Tallies()
    {
        var starts = new long[_units.Length];
        for (int u = 0; u < _units.Length; u++)
        {
            starts[u] = _units[u].Starts;
        }

        _unitTimes.Flush();
        foreach (var histogram in _unitHistograms.Concat(_groupHistograms))
        {
            histogram.Settle();
        }

        return new ReplicationTallies(_unitHistograms, _groupHistograms, starts, _waitOver);
    }

    /// <summary>
    /// Marks the replication's own percentiles, from <paramref name="first"/> on, as not measured (NaN): the result's
    /// percentiles and their intervals come from the pooled histograms (<see cref="ReplicationPool"/>), so reading each
    /// replication's here would only cost a walk of every histogram per replication (the larger part of a short
    /// replication's time when there are thousands of them).
    /// </summary>
    private static void FillUnread(double[] row, int first) => Array.Fill(row, double.NaN, first, MetricLayout.Percentiles.Length);

    /// <summary>The replication's journey tallies; null when the network defines no journey.</summary>
    public JourneyTallies? JourneyTallies() => _journeys?.Tallies();

    private static DurationHistogram[] NewHistograms(int count)
    {
        var histograms = new DurationHistogram[count];
        for (int i = 0; i < count; i++)
        {
            histograms[i] = new DurationHistogram();
        }

        return histograms;
    }

    /// <summary>How many hours of [from, to] fall in each hour of the day (hour 0 is 00:00-01:00).</summary>
    private static double[] HourOfDayExposure(double from, double to)
    {
        var exposure = new double[24];
        double fullDays = Math.Floor((to - from) / 24.0);
        for (int h = 0; h < 24; h++)
        {
            exposure[h] = fullDays;
        }

        double t = from + (fullDays * 24.0);
        while (t < to)
        {
            double hourStart = Math.Floor(t);
            double until = Math.Min(to, hourStart + 1.0);
            exposure[(int)((long)hourStart % 24)] += until - t;
            t = until;
        }

        return exposure;
    }

    private static double Ratio(long part, long whole, double whenEmpty) => whole > 0 ? (double)part / whole : whenEmpty;
}
