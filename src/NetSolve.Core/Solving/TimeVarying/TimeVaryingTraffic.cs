using NetSolve.Model;

namespace NetSolve.Solving;

/// <summary>
/// The offered load of every unit hour by hour, following the network's arrival profiles through the routes with the
/// lag of each unit's service time (the time-varying traffic equations; see <see cref="LoadPropagation"/>).
/// </summary>
/// <remarks>
/// External arrivals of each group come at its mean rate times its profile's multiplier for the hour (the group's own
/// profile, else the network's, else constant), as the simulator applies them. Each group keeps its own routes and
/// its own service times at units that give them. Service with cv ≠ 1 is written as matched exponential stages
/// (<see cref="ServiceStages"/>). Thread-safe.
/// </remarks>
public static class TimeVaryingTraffic
{
    /// <summary>Hours in a weekly cycle.</summary>
    public const int HoursPerWeek = ArrivalProfile.HoursPerDay * ArrivalProfile.DaysPerWeek;

    /// <summary>Solves the time-varying traffic equations of a validated network to their periodic steady state.</summary>
    /// <exception cref="TimeVaryingConvergenceException">Flows round loops did not settle within the sweeps allowed.</exception>
    public static TimeVaryingTrafficSolution Solve(Network network, TimeVaryingOptions? options = null) => Solve(network, options, null);

    /// <summary>
    /// Solves the traffic equations with the patients that full units send away: each unit's own arrivals and load
    /// stay those offered to it, but only its admitted share flows on, and diverted patients join the unit they are
    /// diverted to (then follow that unit's routes).
    /// </summary>
    internal static TimeVaryingTrafficSolution Solve(Network network, TimeVaryingOptions? options, TurnedAwayFlows? turnedAway)
    {
        ArgumentNullException.ThrowIfNull(network);
        options ??= TimeVaryingOptions.Default;
        var index = network.BuildIndex();
        var groups = new List<(RoutingTable Routing, ArrivalProfile? Profile, ServiceStages[] Stages)>
        {
            (RoutingTable.Build(network), network.ArrivalProfile, UnitStagesOf(network, [])),
        };
        foreach (var group in network.Groups)
        {
            var routing = RoutingTable.Build(network with { Arrivals = group.Arrivals, Routes = group.Routes ?? network.Routes });
            var own = group.Services.ToDictionary(service => index[service.UnitId], service => service.Service);
            groups.Add((routing, group.ArrivalProfile ?? network.ArrivalProfile, UnitStagesOf(network, own)));
        }

        int cycleHours = groups.Any(group => group.Profile is { DayOfWeek.IsEmpty: false }) ? HoursPerWeek : ArrivalProfile.HoursPerDay;
        double fastest = groups.SelectMany(group => group.Stages).SelectMany(stages => stages.RatesPerHour).DefaultIfEmpty(0.0).Max();
        int stepsPerHour = (int)Math.Clamp(Math.Ceiling(fastest / options.MaxStepPerStageMean), options.MinStepsPerHour, options.MaxStepsPerHour);
        int steps = cycleHours * stepsPerHour;

        var plans = groups.Select(group => new FlowGroupPlan(
            ExternalOnGrid(group.Routing, group.Profile, steps, stepsPerHour), group.Routing, group.Stages)).ToList();
        double[]?[]? admitted = null;
        if (turnedAway is not null)
        {
            admitted = [.. turnedAway.AdmittedShareByHour.Select(share => OnGrid(share, steps, stepsPerHour))];
            var diverted = turnedAway.DivertedInByHour.Select(rate => OnGrid(rate, steps, stepsPerHour)).ToArray();
            var divertedArrivals = network.Units
                .Select((unit, j) => (unit.Id, Rate: diverted[j]?.Average() ?? 0.0))
                .Where(target => target.Rate > 0.0)
                .Select(target => new Arrival(target.Id, target.Rate))
                .ToList();
            if (divertedArrivals.Count > 0)
            {
                plans.Add(new FlowGroupPlan(diverted, RoutingTable.Build(network with { Arrivals = [.. divertedArrivals] }), groups[0].Stages));
            }
        }

        var (arrivals, loads) = LoadPropagation.Run(network.Units.Length, steps, 1.0 / stepsPerHour, plans, options, admitted);
        var units = network.Units.Select((unit, j) => new UnitLoadOverCycle(unit.Id, arrivals[j], loads[j], stepsPerHour));
        return new TimeVaryingTrafficSolution(cycleHours, stepsPerHour, [.. units]);
    }

    private static double[]? OnGrid(double[]? byHour, int steps, int stepsPerHour)
    {
        if (byHour is null)
        {
            return null;
        }

        var rates = new double[steps];
        for (int k = 0; k < steps; k++)
        {
            rates[k] = byHour[k / stepsPerHour % byHour.Length];
        }

        return rates;
    }

    private static ServiceStages[] UnitStagesOf(Network network, Dictionary<int, ServiceDistribution> own)
    {
        var stages = new ServiceStages[network.Units.Length];
        for (int j = 0; j < stages.Length; j++)
        {
            var service = own.TryGetValue(j, out var groupService) ? groupService : network.Units[j].EffectiveService;
            stages[j] = ServiceStages.Fit(service.MeanHours, service.Cv);
        }

        return stages;
    }

    private static double[]?[] ExternalOnGrid(RoutingTable routing, ArrivalProfile? profile, int steps, int stepsPerHour)
    {
        var external = new double[]?[routing.UnitCount];
        for (int j = 0; j < routing.UnitCount; j++)
        {
            double mean = routing.ExternalPerHour[j];
            if (mean <= 0.0)
            {
                continue;
            }

            var rates = new double[steps];
            for (int k = 0; k < steps; k++)
            {
                rates[k] = profile is null ? mean : mean * profile.MultiplierAt(k / stepsPerHour);
            }

            external[j] = rates;
        }

        return external;
    }
}
