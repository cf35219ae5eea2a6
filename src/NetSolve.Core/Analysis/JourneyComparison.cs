using System.Collections.Immutable;
using System.Globalization;
using NetSolve.Model;
using NetSolve.Simulation;

namespace NetSolve.Analysis;

/// <summary>
/// A journey's formula figures (<see cref="JourneyFormula"/>) against the simulation's: the mean, the percentiles and
/// the shares longer than each of the journey's times. The formula is an approximation here, never marked exact.
/// </summary>
public static class JourneyComparison
{
    /// <summary>
    /// Pairs each simulated journey with the formula's for the same journey and patients; a pair whose formula is
    /// missing is left out.
    /// </summary>
    public static ImmutableArray<(SimulatedJourney Simulated, JourneyEstimate Formula)> Pairs(
        ImmutableArray<SimulatedJourney> simulated,
        ImmutableArray<JourneyEstimate> formula)
    {
        if (simulated.IsDefaultOrEmpty || formula.IsDefaultOrEmpty)
        {
            return [];
        }

        return [.. simulated.SelectMany(s => formula
            .Where(f => f.Journey.Id == s.Journey.Id && f.Group?.Id == s.Group?.Id)
            .Take(1)
            .Select(f => (s, f)))];
    }

    /// <summary>The compared metrics of one journey: mean time, percentiles, then P(time &gt; t) per time.</summary>
    public static ImmutableArray<ComparedMetric> Metrics(SimulatedJourney simulated, JourneyEstimate formula)
    {
        ArgumentNullException.ThrowIfNull(simulated);
        ArgumentNullException.ThrowIfNull(formula);
        var metrics = ImmutableArray.CreateBuilder<ComparedMetric>();
        if (simulated.MeanHours is Estimate mean)
        {
            metrics.Add(new ComparedMetric("journey_mean_time", formula.MeanHours, mean, MetricDimension.Time));
        }

        for (int p = 0; p < simulated.Percentiles.Length; p++)
        {
            if (simulated.Percentiles[p].Hours is Estimate hours)
            {
                double? value = formula.Percentiles.IsEmpty ? null : formula.Percentiles[p].Hours;
                string name = string.Create(CultureInfo.InvariantCulture, $"journey_p{simulated.Percentiles[p].Percent:0}");
                metrics.Add(new ComparedMetric(name, value, hours, MetricDimension.Time));
            }
        }

        for (int t = 0; t < simulated.Over.Length; t++)
        {
            double? value = formula.Over.IsEmpty ? null : formula.Over[t].Probability;
            string name = string.Create(CultureInfo.InvariantCulture, $"journey_over_{simulated.Over[t].WaitHours:0.###}h");
            metrics.Add(new ComparedMetric(name, value, simulated.Over[t].Probability, MetricDimension.Probability));
        }

        return metrics.ToImmutable();
    }
}
