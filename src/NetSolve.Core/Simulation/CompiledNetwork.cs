using NetSolve.Model;

namespace NetSolve.Simulation;

/// <summary>A <see cref="Network"/> flattened into the arrays the event loop reads. Immutable; shared by replications.</summary>
internal sealed class CompiledNetwork
{
    /// <summary>Stands for "no limit" in <see cref="Servers"/> and <see cref="Capacity"/>.</summary>
    public const int NoLimit = int.MaxValue;

    private CompiledNetwork(Network network)
    {
        Network = network;
        var units = network.Units;
        int n = units.Length;
        var index = network.BuildIndex();
        Servers = new int[n];
        Capacity = new int[n];
        DivertTo = new int[n];
        MeanServiceHours = new double[n];
        Rosters = new int[]?[n];
        for (int i = 0; i < n; i++)
        {
            Servers[i] = units[i].Servers.IsUnlimited ? NoLimit : units[i].Servers.Count;
            Capacity[i] = units[i].Capacity ?? NoLimit;
            DivertTo[i] = units[i].WhenFull.DivertToUnitId is string target ? index[target] : -1;
            MeanServiceHours[i] = units[i].EffectiveService.MeanHours;
            Rosters[i] = units[i].Roster is Roster roster ? [.. roster.ServersByHour] : null;
        }

        var groups = new List<GroupPlan> { Plan(network, network.Arrivals, network.Routes, network.ArrivalProfile) };
        foreach (var group in network.Groups)
        {
            groups.Add(Plan(network, group.Arrivals, group.Routes ?? network.Routes, group.ArrivalProfile ?? network.ArrivalProfile));
        }

        Groups = [.. groups];
        Samplers = new ServiceSampler[Groups.Length * n];
        for (int g = 0; g < Groups.Length; g++)
        {
            for (int i = 0; i < n; i++)
            {
                Samplers[(g * n) + i] = ServiceSampler.For(units[i].EffectiveService);
            }
        }

        for (int g = 1; g < Groups.Length; g++)
        {
            foreach (var service in network.Groups[g - 1].Services)
            {
                Samplers[(g * n) + index[service.UnitId]] = ServiceSampler.For(service.Service);
            }
        }

        NetworkTimeScale = MeanServiceHours.Length == 0 ? 1.0 : MeanServiceHours.Min();
    }

    /// <summary>The source network.</summary>
    public Network Network { get; }

    /// <summary>Number of units.</summary>
    public int UnitCount => Servers.Length;

    /// <summary>Servers per unit; <see cref="NoLimit"/> for unlimited.</summary>
    public int[] Servers { get; }

    /// <summary>Servers by hour (24 or 168, from Monday 00:00) per unit, or null for a unit without a roster.</summary>
    public int[]?[] Rosters { get; }

    /// <summary>Most patients in each unit; <see cref="NoLimit"/> when none is set.</summary>
    public int[] Capacity { get; }

    /// <summary>The unit each full unit diverts to, or −1 to turn patients away.</summary>
    public int[] DivertTo { get; }

    /// <summary>Mean service per unit (the unit's own distribution), the scale of its histograms.</summary>
    public double[] MeanServiceHours { get; }

    /// <summary>The default group (index 0) then <see cref="Network.Groups"/> in order.</summary>
    public GroupPlan[] Groups { get; }

    /// <summary>Service samplers indexed by group × <see cref="UnitCount"/> + unit.</summary>
    public ServiceSampler[] Samplers { get; }

    /// <summary>The scale of time-in-network histograms: the shortest mean service.</summary>
    public double NetworkTimeScale { get; }

    /// <summary>Compiles a validated network.</summary>
    public static CompiledNetwork Compile(Network network) => new(network);

    private static GroupPlan Plan(Network network, IReadOnlyList<Arrival> arrivals, IReadOnlyList<Route> routes, ArrivalProfile? profile)
    {
        var routing = RoutingTable.Build(network with { Arrivals = [.. arrivals], Routes = [.. routes] });
        var entryUnits = new List<int>();
        for (int i = 0; i < routing.UnitCount; i++)
        {
            if (routing.ExternalPerHour[i] > 0.0)
            {
                entryUnits.Add(i);
            }
        }

        double total = routing.ExternalPerHour.Sum();
        var cumulative = new double[routing.Targets.Count];
        for (int i = 0; i < routing.UnitCount; i++)
        {
            double row = 0.0;
            for (int k = routing.Offsets[i]; k < routing.Offsets[i + 1]; k++)
            {
                row += routing.Probabilities[k];
                cumulative[k] = row;
            }

            // A row summing to 1 within the contract's tolerance counts as 1: nobody leaves from this unit.
            if (routing.ExitProbability(i) == 0.0 && routing.Offsets[i + 1] > routing.Offsets[i])
            {
                cumulative[routing.Offsets[i + 1] - 1] = double.PositiveInfinity;
            }
        }

        double maxMultiplier = profile?.MaxMultiplier ?? 1.0;
        return new GroupPlan
        {
            ArrivalsPerHour = total,
            CandidatesPerHour = total * maxMultiplier,
            MaxMultiplier = maxMultiplier,
            HourOfDay = profile is null ? null : [.. profile.HourOfDay],
            DayOfWeek = profile is null || profile.DayOfWeek.IsEmpty ? null : [.. profile.DayOfWeek],
            EntryUnits = [.. entryUnits],
            EntryPick = AliasTable.Of(entryUnits.Count == 0 ? [1.0] : [.. entryUnits.Select(unit => routing.ExternalPerHour[unit])]),
            RouteOffsets = [.. routing.Offsets],
            Routes = [.. cumulative.Select((probability, k) => new RouteChoice(probability, routing.Targets[k]))],
        };
    }
}
