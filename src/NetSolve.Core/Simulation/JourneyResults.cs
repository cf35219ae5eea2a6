using System.Collections.Immutable;
using NetSolve.Model;

namespace NetSolve.Simulation;

/// <summary>
/// Pools the replications' <see cref="JourneyTallies"/> into one <see cref="SimulatedJourney"/> per journey for every
/// patient, followed, when the network has patient groups, by one per journey and named group that made the journey.
/// </summary>
internal static class JourneyResults
{
    /// <param name="network">The simulated network.</param>
    /// <param name="tallies">The finished replications' tallies, in replication order.</param>
    /// <param name="windowHours">The hours after the warm-up in each replication.</param>
    public static ImmutableArray<SimulatedJourney> Assemble(Network network, IReadOnlyList<JourneyTallies> tallies, double windowHours)
    {
        if (network.Journeys.IsDefaultOrEmpty || tallies.Count == 0)
        {
            return [];
        }

        int groups = network.Groups.Length + 1;
        var all = Enumerable.Range(0, groups).ToArray();
        var results = ImmutableArray.CreateBuilder<SimulatedJourney>();
        for (int j = 0; j < network.Journeys.Length; j++)
        {
            var journey = network.Journeys[j];
            int[] slots = [.. all.Select(g => (j * groups) + g)];
            results.Add(Pool(journey, null, tallies, slots, windowHours));
            for (int g = 1; g < groups; g++)
            {
                int slot = (j * groups) + g;
                if (tallies.Any(tally => tally.Counts[slot] > 0))
                {
                    results.Add(Pool(journey, network.Groups[g - 1], tallies, [slot], windowHours));
                }
            }
        }

        return results.ToImmutable();
    }

    private static SimulatedJourney Pool(Journey journey, PatientGroup? group, IReadOnlyList<JourneyTallies> tallies, int[] slots, double windowHours)
    {
        var counts = tallies.Select(tally => slots.Sum(s => tally.Counts[s])).ToList();
        var sums = tallies.Select(tally => slots.Sum(s => tally.SumHours[s])).ToList();
        var each = tallies.Select(tally => ReplicationTallies.Pool(slots.Select(s => tally.Times[s]))).ToList();
        var pooled = ReplicationTallies.Pool(each);
        var percentiles = ImmutableArray.CreateBuilder<PercentileEstimate>(MetricLayout.Percentiles.Length);
        foreach (double fraction in MetricLayout.Percentiles)
        {
            percentiles.Add(new PercentileEstimate(fraction * 100.0, pooled.Count > 0 ? QuantileInterval.Of(fraction, pooled, each) : null));
        }

        long total = counts.Sum();
        var over = ImmutableArray.CreateBuilder<WaitOverEstimate>(journey.OverHours.Length);
        for (int t = 0; t < journey.OverHours.Length; t++)
        {
            var longer = tallies.Select(tally => slots.Sum(s => tally.Over[s][t])).ToList();
            over.Add(Share(journey.OverHours[t], longer, counts, total));
        }

        return new SimulatedJourney
        {
            Journey = journey,
            Group = group,
            PerHour = Estimate.From(counts.Select(count => count / windowHours)) ?? new Estimate(0.0, null, 0),
            MeanHours = Estimate.From(counts.Select((count, r) => count > 0 ? sums[r] / count : double.NaN)),
            Percentiles = percentiles.MoveToImmutable(),
            Over = over.MoveToImmutable(),
        };
    }

    /// <summary>P(time &gt; t): the pooled share with a sectioning interval, as for P(wait &gt; t) at a unit.</summary>
    private static WaitOverEstimate Share(double hours, List<long> longer, List<long> counts, long total)
    {
        long over = longer.Sum();
        if (total == 0)
        {
            return new WaitOverEstimate(hours, new Estimate(0.0, null, 0));
        }

        if (over == 0)
        {
            double bound = WaitOverEstimate.RuleOfThree / total;
            return new WaitOverEstimate(hours, new Estimate(0.0, counts.Count > 1 ? bound : null, counts.Count), bound);
        }

        var perReplication = longer.Select((count, r) => counts[r] > 0 ? (double)count / counts[r] : double.NaN);
        return new WaitOverEstimate(hours, Estimate.Sectioned((double)over / total, perReplication) ?? new Estimate(0.0, null, 0));
    }
}
