using NetSolve.Model;

namespace NetSolve.Solving;

/// <summary>
/// Corrects the waits of a unit that receives patients diverted from full units: those patients come in bursts while
/// their unit is full, not as a Poisson stream (docs/methods.md, "Diverted overflow").
/// </summary>
/// <remarks>
/// Each diverted stream is modelled as the interrupted Poisson stream with the overflow's rate and peakedness
/// (<see cref="OverflowPeakedness"/>, <see cref="InterruptedPoisson.FitOverflow"/>). The receiving unit with
/// exponential service fed by the rest of its arrivals as Poisson plus these streams is solved exactly
/// (<see cref="OverflowQueue"/>), and the ratio of its mean wait (and chance of waiting) to the Erlang C values at the
/// same mean rate multiplies the unit's two-moment values: the burst effect and the service-variability effect are
/// taken as independent factors. A unit with a capacity of its own, unlimited servers or no wait is left as it is.
/// Thread-safe.
/// </remarks>
internal static class DivertedArrivals
{
    /// <summary>Replaces, in <paramref name="units"/>, the results of every unit that receives diverted patients.</summary>
    public static void Apply(Network network, CapacityFlowSolution flows, UnitResult[] units)
    {
        for (int j = 0; j < units.Length; j++)
        {
            if (flows.Units[j].DivertedInPerHour > 0.0)
            {
                units[j] = Adjust(network, flows, units[j]) ?? units[j];
            }
        }
    }

    private static UnitResult? Adjust(Network network, CapacityFlowSolution flows, UnitResult unit)
    {
        if (unit.Unit.Capacity is not null || unit.Unit.Servers.IsUnlimited || !unit.IsStable
            || unit.MeanWaitHours is not double wait || !(wait > 0.0) || !(unit.ArrivalsPerHour > 0.0))
        {
            return null;
        }

        int servers = unit.Unit.Servers.Count;
        double meanServiceHours = unit.OfferedLoad / unit.ArrivalsPerHour;
        double serviceRate = 1.0 / meanServiceHours;
        var streams = Streams(network, flows, unit.Unit.Id, serviceRate);
        if (streams.Count == 0)
        {
            return null;
        }

        double poisson = Math.Max(0.0, unit.ArrivalsPerHour - streams.Sum(stream => stream.MeanPerHour));
        var bursty = OverflowQueue.Solve(servers, serviceRate, poisson, streams);
        double erlangC = ErlangFormulas.WaitProbability(servers, unit.OfferedLoad);
        double erlangWait = erlangC / ((servers * serviceRate) - unit.ArrivalsPerHour);
        if (bursty is null || !(erlangC > 0.0) || !(erlangWait > 0.0) || !double.IsFinite(erlangWait))
        {
            return null;
        }

        double adjustedWait = wait * bursty.MeanWaitHours / erlangWait;
        double queue = unit.ArrivalsPerHour * adjustedWait;
        return unit with
        {
            MeanWaitHours = adjustedWait,
            WaitProbability = Math.Min(1.0, unit.WaitProbability * bursty.WaitProbability / erlangC),
            MeanQueue = queue,
            MeanInUnit = queue + unit.OfferedLoad,
            MeanTimeInUnitHours = adjustedWait + meanServiceHours,
            Method = MethodNames.DivertedOverflow,
        };
    }

    /// <summary>The interrupted Poisson streams diverted into the unit, the largest <see cref="OverflowQueue.MaximumStreams"/>.</summary>
    private static List<InterruptedPoisson> Streams(Network network, CapacityFlowSolution flows, string unitId, double serviceRate)
    {
        var streams = new List<InterruptedPoisson>();
        for (int i = 0; i < network.Units.Length; i++)
        {
            var source = network.Units[i];
            var flow = flows.Units[i];
            if (source.Capacity is not int capacity || !string.Equals(source.WhenFull.DivertToUnitId, unitId, StringComparison.Ordinal)
                || !(flow.DivertedPerHour > 0.0) || !(flow.MeanServiceHours > 0.0))
            {
                continue;
            }

            int sourceServers = source.Servers.IsUnlimited ? capacity : Math.Min(source.Servers.Count, capacity);
            double peakedness = OverflowPeakedness.Of(sourceServers, capacity, flow.OfferedPerHour, flow.MeanServiceHours, serviceRate);
            if (InterruptedPoisson.FitOverflow(flow.OfferedPerHour, flow.FullProbability, peakedness, serviceRate) is { } stream)
            {
                streams.Add(stream);
            }
        }

        return [.. streams.OrderByDescending(stream => stream.MeanPerHour).Take(OverflowQueue.MaximumStreams)];
    }
}
