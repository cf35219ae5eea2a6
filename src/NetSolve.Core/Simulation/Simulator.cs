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
        var pool = new ReplicationPool(network.Units.Length, network.Groups.Length, thresholds.Length);
        // Journey tallies are small (one histogram per journey and group), so each replication's are kept for pooling.
        var journeys = new JourneyTallies?[most];
        var tracker = new ProgressTracker(progress, options.Replications);
        var meanServiceHours = network.Units.Select(unit => unit.EffectiveService.MeanHours).ToArray();

        // Each worker takes the next replication number in turn, so they finish nearly in order and the pool holds
        // few early arrivals; results never depend on which worker ran which.
        void RunReplications(int from, int to)
        {
            int taken = from;
            int workers = Math.Max(1, Math.Min(to - from, options.MaxDegreeOfParallelism > 0 ? options.MaxDegreeOfParallelism : Environment.ProcessorCount));
            Parallel.For(0, workers, new ParallelOptions { MaxDegreeOfParallelism = workers }, _ =>
            {
                int replication;
                while (!cancellation.IsCancellationRequested && (replication = Interlocked.Increment(ref taken) - 1) < to)
                {
                    var engine = new SimulationEngine(compiled, layout, thresholds, options.WarmupHours, options.DurationHours, options.Seed, replication);
                    if (engine.Run(tracker.For(replication), cancellation))
                    {
                        pool.Finish(replication, new ReplicationOutput(engine.ResultRow(), engine.EventCount, engine.Tallies(), engine.InNetworkSeries));
                        journeys[replication] = engine.JourneyTallies();
                        tracker.Update(replication, 1.0);
                    }
                }
            });
            pool.Flush(to);
        }

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
                worst = PrecisionCheck.WorstRelativeHalfWidth(layout, pool.Rows, meanServiceHours);
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

        var result = new ResultAssembler(layout, pool).Assemble(network, options with { Replications = started }, pool.Events);
        double? cut = WarmupCheck.TruncationHours(pool.InNetworkSeriesSum, pool.Rows.Count, options.WarmupHours + options.DurationHours);
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
