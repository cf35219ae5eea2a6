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
    /// two-moment G/G/c and G/G/1 waits and M/G/c/K always; M/M/c/K when the arrivals or the service are not those of Poisson
    /// arrivals and exponential service. Erlang C (M/M/c), Pollaczek-Khinchine (M/G/1), Erlang B and unlimited servers
    /// are exact for their unit alone (docs/methods.md); whether the network's flows are exact is not judged here.
    /// </summary>
    public static bool IsApproximate(UnitResult formula)
    {
        ArgumentNullException.ThrowIfNull(formula);
        return formula.Method switch
        {
            GgcMethodNames.AllenCunneen or GgcMethodNames.KraemerLangenbachBelz or GgcMethodNames.Cosmetatos or GgcMethodNames.LightHeavyTraffic
                or FiniteCapacityFormulas.TwoMomentMethod or MethodNames.DivertedOverflow => true,
            FiniteCapacityFormulas.MarkovianMethod => formula.ArrivalScv != 1.0 || formula.ServiceScv != 1.0,
            _ => false,
        };
    }

    /// <summary>
    /// Whether the unit's formula values are exact for the unit as simulated in <paramref name="network"/>, so that a
    /// disagreement can only come from the run (too short against the unit's relaxation time, too short a warm-up, too
    /// few replications) or from chance.
    /// </summary>
    /// <remarks>
    /// Exact when the network has no arrival profile and no patient groups, and the unit's arrivals are Poisson: either
    /// the whole network is a Jackson network (exponential service, no capacity anywhere), whose units behave as
    /// M/M/c queues fed by Poisson streams (Jackson, "Jobshop-like queueing systems", Management Science 10(1), 1963,
    /// pp. 131-142), or the unit receives only external arrivals (no routes or diversions into it). Its method must
    /// then be exact for such a feed: Erlang C with exponential service, Pollaczek-Khinchine (M/G/1), Erlang loss,
    /// M/M/c/K with exponential service, or unlimited servers.
    /// </remarks>
    public static bool IsExact(Network network, UnitResult formula)
    {
        ArgumentNullException.ThrowIfNull(network);
        ArgumentNullException.ThrowIfNull(formula);
        if (network.ArrivalProfile is not null || !network.Groups.IsDefaultOrEmpty)
        {
            return false;
        }

        string id = formula.Unit.Id;
        bool jackson = network.Units.All(unit => unit.Capacity is null && unit.EffectiveService.Kind == ServiceKind.Exponential);
        bool externalOnly = !network.Routes.Any(route => route.Probability > 0.0 && string.Equals(route.To, id, StringComparison.Ordinal))
            && !network.Units.Any(unit => string.Equals(unit.WhenFull.DivertToUnitId, id, StringComparison.Ordinal));
        if (!jackson && !externalOnly)
        {
            return false;
        }

        bool exponential = formula.Unit.EffectiveService.Kind == ServiceKind.Exponential;
        return formula.Method switch
        {
            MethodNames.ErlangC or FiniteCapacityFormulas.MarkovianMethod => exponential,
            GgcMethodNames.PollaczekKhinchine or FiniteCapacityFormulas.ErlangLossMethod or MethodNames.InfiniteServers => true,
            _ => false,
        };
    }

    /// <summary>The compared metrics of one unit, in the contract's order, marked with whether the formula is exact for it (<see cref="IsExact"/>).</summary>
    public static ImmutableArray<ComparedMetric> ForUnit(SimulatedUnit simulated, UnitResult formula, bool isFormulaExact)
    {
        ArgumentNullException.ThrowIfNull(simulated);
        return [.. ForUnit(simulated, formula).Select(metric => metric with { IsFormulaExact = isFormulaExact })];
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
