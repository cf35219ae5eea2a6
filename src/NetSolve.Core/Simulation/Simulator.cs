using NetSolve.Model;

namespace NetSolve.Simulation;

/// <summary>
/// Discrete-event simulation of a network: independent replications in parallel, each with its own random stream
/// derived from (seed, replication), statistics after a warm-up, and 95% confidence intervals across replications.
/// </summary>
/// <remarks>
/// Models what the formulas cannot: any service distribution, arrival profiles by hour and weekday (Poisson arrivals
/// thinned from the peak rate), finite capacity with turning away or diversion, and patient groups. Units serve first
/// come, first served. Results depend only on the network and the options, never on the thread count or timing,
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
        var rows = new double[options.Replications][];
        var events = new long[options.Replications];
        var tallies = new ReplicationTallies[options.Replications];
        var tracker = new ProgressTracker(progress, options.Replications);
        var parallel = new ParallelOptions { MaxDegreeOfParallelism = options.MaxDegreeOfParallelism };

        Parallel.For(0, options.Replications, parallel, (replication, state) =>
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
                tracker.Update(replication, 1.0);
            }
        });

        var finished = rows.Where(row => row is not null).ToList();
        long totalEvents = events.Sum();
        var finishedTallies = tallies.Where(tally => tally is not null).ToList();
        return new ResultAssembler(layout, finished, finishedTallies).Assemble(network, options, totalEvents);
    }
}
