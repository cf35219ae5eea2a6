using NetSolve.Model;

namespace NetSolve.Simulation;

/// <summary>
/// Discrete-event simulation of a network: independent replications in parallel, each with its own random stream
/// derived from (seed, replication), statistics after a warm-up, and 95% confidence intervals across replications.
/// </summary>
/// <remarks>
/// Models what the formulas cannot: any service distribution, arrival profiles by hour and weekday (Poisson arrivals
/// thinned from the peak rate), finite capacity with turning away or diversion, and patient groups. Units serve first
/// come, first served. With <see cref="SimulationOptions.Precision"/>, replications are added until every unit's
/// mean wait and mean number in unit reach it or the effort bound is met (<see cref="PrecisionCheck"/>). Results depend only on the network and the options, never on the thread count or timing,
/// except that a cancelled run reports the replications that happened to finish. Thread-safe (no shared state).
/// </remarks>
public static class Simulator
{
    /// <summary>Simulates <paramref name="network"/> (validated by the parser) under <paramref name="options"/>.</summary>
    /// <param name="network">A validated network.</param>
    /// <param name="options">Validated here: an option out of range throws <see cref="ArgumentException"/>.</param>
    /// <param name="progress">Receives the fraction done, from worker threads; may be null.</param>
    /// <param name="cancellation">Stops the run; the replications already finished are reported.</param>
    public static SimulationResult Run(
        Network network,
        SimulationOptions options,
        IProgress<double>? progress = null,
        CancellationToken cancellation = default)
    {
        ArgumentNullException.ThrowIfNull(network);
        ArgumentNullException.ThrowIfNull(options);
        options.Validate();
        var thresholds = options.WaitThresholdsHours.IsDefault ? [] : options.WaitThresholdsHours.ToArray();
        var compiled = CompiledNetwork.Compile(network);
        var layout = new MetricLayout(network.Units.Length, thresholds.Length, network.Groups.Length);
        int most = options.Precision is null ? options.Replications : options.MaxReplications;
        var rows = new double[most][];
        var events = new long[most];
        var tallies = new ReplicationTallies[most];
        var series = new IReadOnlyList<double>[most];
        var journeys = new JourneyTallies?[most];
        var tracker = new ProgressTracker(progress, options.Replications);
        var parallel = new ParallelOptions { MaxDegreeOfParallelism = options.MaxDegreeOfParallelism };
        var meanServiceHours = network.Units.Select(unit => unit.EffectiveService.MeanHours).ToArray();

        void RunReplications(int from, int to) => Parallel.For(from, to, parallel, (replication, state) =>
        {
            if (cancellation.IsCancellationRequested)
            {
                state.Stop();
                return;
            }

            var engine = new SimulationEngine(compiled, layout, thresholds, options.WarmupHours, options.DurationHours, options.Seed, replication);
            if (engine.Run(tracker.For(replication), cancellation))
            {
                rows[replication] = engine.ResultRow();
                events[replication] = engine.EventCount;
                tallies[replication] = engine.Tallies();
                series[replication] = engine.InNetworkSeries;
                journeys[replication] = engine.JourneyTallies();
                tracker.Update(replication, 1.0);
            }
        });

        // The sequential procedure (PrecisionCheck): each step's size depends only on the rows so far, never on
        // timing, so the same seed stops at the same count on any machine and thread count.
        int started = options.Replications;
        RunReplications(0, started);
        double? worst = null;
        bool? reached = null;
        if (options.Precision is double precision)
        {
            double target = PrecisionCheck.AdjustedTarget(precision);
            while (true)
            {
                var finishedSoFar = rows.Take(started).Where(row => row is not null).ToList();
                worst = PrecisionCheck.WorstRelativeHalfWidth(layout, finishedSoFar, meanServiceHours);
                reached = worst <= target;
                if (reached.Value || started >= most || cancellation.IsCancellationRequested)
                {
                    break;
                }

                int next = PrecisionCheck.NextCount(started, worst.Value, target, most);
                tracker.Extend(next);
                RunReplications(started, next);
                started = next;
            }
        }

        var finished = rows.Take(started).Where(row => row is not null).ToList();
        long totalEvents = events.Sum();
        var finishedTallies = tallies.Take(started).Where(tally => tally is not null).ToList();
        var result = new ResultAssembler(layout, finished, finishedTallies).Assemble(network, options with { Replications = started }, totalEvents);
        var finishedSeries = series.Take(started).Where(one => one is not null).ToList();
        double? cut = WarmupCheck.TruncationHours(finishedSeries, options.WarmupHours + options.DurationHours);
        var finishedJourneys = journeys.Take(started).OfType<JourneyTallies>().ToList();
        return result with
        {
            WorstRelativeHalfWidth = worst,
            PrecisionReached = reached,
            MserTruncationHours = cut,
            Journeys = JourneyResults.Assemble(network, finishedJourneys, options.DurationHours),
        };
    }
}
