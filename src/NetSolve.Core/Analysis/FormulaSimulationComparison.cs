using System.Collections.Immutable;
using NetSolve.Model;
using NetSolve.Simulation;
using NetSolve.Solving;

namespace NetSolve.Analysis;

/// <summary>Pairs each unit's formula metrics with the simulated ones for the side-by-side view.</summary>
public static class FormulaSimulationComparison
{
    /// <summary>
    /// Whether the unit's formula values are an approximation for the unit as modelled, rather than exact: the
    /// two-moment G/G/c and G/G/1 waits always; M/M/c/K when the arrivals or the service are not those of Poisson
    /// arrivals and exponential service. Erlang C (M/M/c), Pollaczek-Khinchine (M/G/1), Erlang B and unlimited servers
    /// are exact for their unit alone (docs/methods.md); whether the network's flows are exact is not judged here.
    /// </summary>
    public static bool IsApproximate(UnitResult formula)
    {
        ArgumentNullException.ThrowIfNull(formula);
        return formula.Method switch
        {
            GgcMethodNames.AllenCunneen or GgcMethodNames.KraemerLangenbachBelz or GgcMethodNames.Cosmetatos or GgcMethodNames.LightHeavyTraffic => true,
            FiniteCapacityFormulas.MarkovianMethod => formula.ArrivalScv != 1.0 || formula.ServiceScv != 1.0,
            _ => false,
        };
    }

    /// <summary>The compared metrics of one unit, in the contract's order.</summary>
    public static ImmutableArray<ComparedMetric> ForUnit(SimulatedUnit simulated, UnitResult formula)
    {
        ArgumentNullException.ThrowIfNull(simulated);
        ArgumentNullException.ThrowIfNull(formula);
        return
        [
            new("arrival_rate", formula.ArrivalsPerHour, simulated.ArrivalsPerHour, MetricDimension.Rate),
            new("utilisation", formula.Utilisation, simulated.Utilisation, MetricDimension.Fraction),
            new("p_wait", formula.WaitProbability, simulated.WaitProbability, MetricDimension.Probability),
            new("mean_queue", formula.MeanQueue, simulated.MeanQueue, MetricDimension.Count),
            new("mean_wait", formula.MeanWaitHours, simulated.MeanWaitHours, MetricDimension.Time),
            new("mean_in_unit", formula.MeanInUnit, simulated.MeanInUnit, MetricDimension.Count),
            new("mean_time_in_unit", formula.MeanTimeInUnitHours, simulated.MeanTimeInUnitHours, MetricDimension.Time),
        ];
    }
}
