using System.Collections.Immutable;
using NetSolve.Model;

namespace NetSolve.Solving;

/// <summary>
/// Solves a validated network: the traffic equations of every patient group, the bed limits' fixed point where units
/// have a capacity, the arrival variability through the network, then each unit by its method (docs/methods.md).
/// With Poisson arrivals, exponential service, no capacity and no groups this is exactly Jackson's network.
/// </summary>
public static class NetworkSolver
{
    /// <summary>Solves <paramref name="network"/> with the given strain threshold and method for the arrival variability.</summary>
    public static NetworkSolution Solve(Network network, double strainThreshold = Defaults.StrainThreshold,
        ArrivalVariabilityMethod variability = ArrivalVariabilityMethod.Decomposition)
    {
        ArgumentNullException.ThrowIfNull(network);
        var traffic = network.Groups.IsEmpty ? null : GroupTraffic.Solve(network);
        var inputs = SolverInputs.Of(network, traffic);
        var capacity = network.Units.Any(unit => unit.Capacity is not null) ? CapacityFlows.Solve(network) : null;
        double[] flows = capacity is not null
            ? [.. capacity.Units.Select(unit => unit.OfferedPerHour)]
            : traffic is null ? TrafficEquations.Solve(RoutingTable.Build(network)) : [.. traffic.FlowsPerHour];
        var solution = Build(network, flows, inputs, strainThreshold, capacity, variability);
        return traffic is null ? solution : solution with { Groups = GroupResults.Build(traffic, solution.Units, capacity?.OfferedByGroup) };
    }

    /// <summary>
    /// Builds the solution from flows already solved (for example, solved flows scaled by a growth factor, or the same
    /// flows with other servers). A unit with a capacity is solved alone at its given flow: the knock-on effect of its
    /// turned-away or diverted patients on other units is not propagated (<see cref="Solve"/> does that).
    /// </summary>
    public static NetworkSolution FromFlows(Network network, IReadOnlyList<double> flowsPerHour, double strainThreshold = Defaults.StrainThreshold)
    {
        ArgumentNullException.ThrowIfNull(network);
        ArgumentNullException.ThrowIfNull(flowsPerHour);
        var traffic = network.Groups.IsEmpty ? null : GroupTraffic.Solve(network);
        return Build(network, flowsPerHour, SolverInputs.Of(network, traffic), strainThreshold);
    }

    private static NetworkSolution Build(Network network, IReadOnlyList<double> flowsPerHour, SolverInputs inputs, double strainThreshold,
        CapacityFlowSolution? capacityFlows = null, ArrivalVariabilityMethod variability = ArrivalVariabilityMethod.Decomposition)
    {
        int n = network.Units.Length;
        double external = network.AllExternalArrivalsPerHour;
        double[] arrivalScv = ArrivalScv(network, flowsPerHour, inputs, variability);
        var units = new UnitResult[n];
        for (int i = 0; i < n; i++)
        {
            var unit = network.Units[i];
            // A unit with a capacity takes the service mixture of the patients offered to it in the bed-limit fixed point.
            var offeredService = capacityFlows?.Units[i];
            double mean = unit.Capacity is not null && offeredService is not null ? offeredService.MeanServiceHours : inputs.MeanServiceHours[i];
            double serviceScv = unit.Capacity is not null && offeredService is not null ? offeredService.ServiceScv : inputs.ServiceScv[i];
            // A full unit is solved at its offered rate with the service of the patients who come (the groups' mixture).
            units[i] = unit.Capacity is int limit
                ? UnitMetrics.ComputeFinite(unit, flowsPerHour[i], external, mean,
                    FiniteCapacityFormulas.Solve(LimitedServers(unit, limit), limit, flowsPerHour[i], mean, serviceScv, unit.EffectiveService),
                    arrivalScv[i], serviceScv)
                : UnitMetrics.Compute(unit, flowsPerHour[i], external, mean, arrivalScv[i], serviceScv);
        }

        if (capacityFlows is not null)
        {
            DivertedArrivals.Apply(network, capacityFlows, units);
        }

        var results = StatusRule.Apply(units, strainThreshold);
        return new NetworkSolution(network, results, Totals(results, external), strainThreshold);
    }

    /// <summary>Each unit's arrival SCV: exactly 1 for a Jackson network, else the two-moment system (docs/methods.md).</summary>
    private static double[] ArrivalScv(Network network, IReadOnlyList<double> flowsPerHour, SolverInputs inputs, ArrivalVariabilityMethod variability)
    {
        int n = network.Units.Length;
        if (inputs.IsJackson)
        {
            return Enumerable.Repeat(1.0, n).ToArray();
        }

        var units = new ArrivalVariabilityUnit[n];
        for (int i = 0; i < n; i++)
        {
            var servers = network.Units[i].Servers;
            double load = flowsPerHour[i] * inputs.MeanServiceHours[i];
            double utilisation = servers.IsUnlimited ? 0.0 : Math.Min(1.0, load / servers.Count);
            units[i] = new ArrivalVariabilityUnit(flowsPerHour[i], servers, utilisation, inputs.ServiceScv[i])
            {
                ExternalPerHour = inputs.ExternalPerHour[i],
                ExternalScv = inputs.ExternalScv[i],
            };
        }

        return [.. ArrivalVariability.Solve(units, inputs.Routes, variability).ArrivalScv];
    }

    /// <summary>With unlimited servers every patient present is in service: a loss system of as many servers as beds.</summary>
    private static int LimitedServers(Unit unit, int capacity) => unit.Servers.IsUnlimited ? capacity : Math.Min(unit.Servers.Count, capacity);

    private static NetworkTotals Totals(ImmutableArray<UnitResult> units, double external)
    {
        double turnedAway = units.Sum(unit => unit.TurnedAwayPerHour);
        double diverted = units.Sum(unit => unit.DivertedPerHour);
        if (units.Any(unit => !unit.IsStable))
        {
            return new NetworkTotals(external, null, null, null) { TurnedAwayPerHour = turnedAway, DivertedPerHour = diverted };
        }

        double inSystem = units.Sum(unit => unit.MeanInUnit ?? 0.0);

        // With no arrivals (growth from a factor of 0) no patient passes through, so there is no mean time to report.
        // Turned-away patients count among those who arrived: the mean time is over every patient who came.
        return new NetworkTotals(external, external - turnedAway, inSystem, external > 0.0 ? inSystem / external : null)
        {
            TurnedAwayPerHour = turnedAway,
            DivertedPerHour = diverted,
        };
    }
}
