using System.Collections.Immutable;
using NetSolve.Model;

namespace NetSolve.Simulation;

/// <summary>Turns the pooled replications (their rows in replication order and the pooled counts) into a <see cref="SimulationResult"/>.</summary>
internal sealed class ResultAssembler
{
    private readonly MetricLayout _layout;
    private readonly double[][] _rows;
    private readonly ReplicationPool _pool;

    /// <param name="layout">Where each metric sits in a row.</param>
    /// <param name="pool">The finished replications, pooled.</param>
    public ResultAssembler(MetricLayout layout, ReplicationPool pool)
    {
        ArgumentNullException.ThrowIfNull(pool);
        _layout = layout;
        _rows = [.. pool.Rows];
        _pool = pool;
    }

    public SimulationResult Assemble(Network network, SimulationOptions options, long events)
    {
        if (_rows.Length == 0)
        {
            return new SimulationResult
            {
                Network = network,
                Options = options,
                ReplicationsFinished = 0,
                Events = events,
                Units = [],
                Totals = null,
                Groups = [],
            };
        }

        var units = ImmutableArray.CreateBuilder<SimulatedUnit>(network.Units.Length);
        for (int u = 0; u < network.Units.Length; u++)
        {
            units.Add(UnitResult(network.Units[u], u, options));
        }

        var groups = ImmutableArray.CreateBuilder<SimulatedGroup>(network.Groups.Length);
        for (int g = 0; g < network.Groups.Length; g++)
        {
            groups.Add(new SimulatedGroup
            {
                Group = network.Groups[g],
                ThroughputPerHour = Required(_layout.Group(g, MetricLayout.GroupThroughputPerHour), 0.0),
                MeanTimeInSystemHours = At(_layout.Group(g, MetricLayout.GroupMeanTimeInSystemHours)),
                TimeInSystemPercentiles = _pool.GroupTimes[g + 1].Percentiles(),
            });
        }

        return new SimulationResult
        {
            Network = network,
            Options = options,
            ReplicationsFinished = _rows.Length,
            Events = events,
            Units = units.MoveToImmutable(),
            Totals = new SimulatedTotals
            {
                ExternalArrivalsPerHour = network.AllExternalArrivalsPerHour,
                EnteredPerHour = Required(_layout.Total(MetricLayout.TotalEnteredPerHour), 0.0),
                ThroughputPerHour = Required(_layout.Total(MetricLayout.TotalThroughputPerHour), 0.0),
                TurnedAwayPerHour = Required(_layout.Total(MetricLayout.TotalTurnedAwayPerHour), 0.0),
                MeanInSystem = Required(_layout.Total(MetricLayout.TotalMeanInSystem), 0.0),
                MeanTimeInSystemHours = At(_layout.Total(MetricLayout.TotalMeanTimeInSystemHours)),
                TimeInSystemPercentiles = _pool.AllTimes.Percentiles(),
            },
            Groups = groups.MoveToImmutable(),
        };
    }

    private SimulatedUnit UnitResult(Unit unit, int u, SimulationOptions options)
    {
        var waitOver = ImmutableArray.CreateBuilder<WaitOverEstimate>(_layout.WaitThresholds);
        for (int t = 0; t < _layout.WaitThresholds; t++)
        {
            waitOver.Add(WaitOver(u, t, options.WaitThresholdsHours[t]));
        }

        return new SimulatedUnit
        {
            Unit = unit,
            ArrivalsPerHour = Required(_layout.Unit(u, MetricLayout.ArrivalsPerHour), 0.0),
            Utilisation = Required(_layout.Unit(u, MetricLayout.Utilisation), 0.0),
            WaitProbability = Required(_layout.Unit(u, MetricLayout.WaitProbability), 0.0),
            MeanQueue = Required(_layout.Unit(u, MetricLayout.MeanQueue), 0.0),
            MeanWaitHours = Required(_layout.Unit(u, MetricLayout.MeanWaitHours), 0.0),
            MeanInUnit = Required(_layout.Unit(u, MetricLayout.MeanInUnit), 0.0),
            MeanTimeInUnitHours = Required(_layout.Unit(u, MetricLayout.MeanTimeInUnitHours), unit.EffectiveService.MeanHours),
            FullProbability = Required(_layout.Unit(u, MetricLayout.FullProbability), 0.0),
            TurnedAwayPerHour = Required(_layout.Unit(u, MetricLayout.TurnedAwayPerHour), 0.0),
            DivertedPerHour = Required(_layout.Unit(u, MetricLayout.DivertedPerHour), 0.0),
            TimeInUnitPercentiles = _pool.UnitTimes[u].Percentiles(),
            WaitOver = waitOver.MoveToImmutable(),
            MeanQueueByHour = new HourlyQueueEstimates(_rows, _layout.Unit(u, _layout.QueueByHourOffset)),
        };
    }

    /// <summary>
    /// P(wait &gt; t) at unit <paramref name="u"/> for threshold <paramref name="t"/>: the pooled share with a
    /// sectioning interval, or, when no replication saw such a wait, 0 with the rule-of-three upper bound.
    /// </summary>
    private WaitOverEstimate WaitOver(int u, int t, double thresholdHours)
    {
        long starts = _pool.Starts[u];
        long over = _pool.WaitOver[(u * _layout.WaitThresholds) + t];
        int slot = _layout.Unit(u, _layout.WaitOverOffset + t);
        if (starts == 0)
        {
            return new WaitOverEstimate(thresholdHours, new Estimate(0.0, null, 0));
        }

        if (over == 0)
        {
            double bound = WaitOverEstimate.RuleOfThree / starts;
            return new WaitOverEstimate(thresholdHours, new Estimate(0.0, _rows.Length > 1 ? bound : null, _rows.Length), bound);
        }

        var estimate = Estimate.Sectioned((double)over / starts, _rows.Select(row => row[slot]));
        return new WaitOverEstimate(thresholdHours, estimate ?? new Estimate(0.0, null, 0));
    }

    private Estimate? At(int slot) => Estimate.FromSlot(_rows, slot);

    /// <summary>The estimate at <paramref name="slot"/>, or <paramref name="whenUnobserved"/> (no interval) if no replication observed it.</summary>
    private Estimate Required(int slot, double whenUnobserved) => At(slot) ?? new Estimate(whenUnobserved, null, 0);
}
