using NetSolve.Model;
using NetSolve.Solving;

namespace NetSolve.Analysis;

/// <summary>
/// One flow of patients as the journey formula needs it: the default group or a named group, with its external
/// arrivals, its routes, its arrivals at each unit from the solver and its service time at each unit. Immutable.
/// </summary>
internal sealed class JourneyFlow
{
    private readonly double[] _externalPerHour;
    private readonly double[] _arrivalsPerHour;
    private readonly Dictionary<(int From, int To), double> _routes;
    private readonly ServiceDistribution[] _services;

    private JourneyFlow(PatientGroup? group, double[] externalPerHour, double[] arrivalsPerHour, Dictionary<(int From, int To), double> routes, ServiceDistribution[] services)
    {
        Group = group;
        _externalPerHour = externalPerHour;
        _arrivalsPerHour = arrivalsPerHour;
        _routes = routes;
        _services = services;
    }

    /// <summary>The named group; null for the default group (the network's top-level arrivals and routes).</summary>
    public PatientGroup? Group { get; }

    /// <summary>Every flow of the solved network: one without groups, else the solver's groups in its order.</summary>
    public static List<JourneyFlow> All(NetworkSolution solution)
    {
        var network = solution.Network;
        var index = network.BuildIndex();
        var units = network.Units;
        if (solution.Groups.IsDefaultOrEmpty)
        {
            var arrivals = solution.Units.Select(unit => unit.ArrivalsPerHour).ToArray();
            return [Of(null, network.Arrivals, network.Routes, arrivals, [], index, units)];
        }

        var flows = new List<JourneyFlow>();
        foreach (var result in solution.Groups)
        {
            var group = network.Groups.FirstOrDefault(g => string.Equals(g.Id, result.Id, StringComparison.Ordinal));
            var arrivals = result.VisitsPerPatient.Select(visits => visits * result.ExternalArrivalsPerHour).ToArray();
            flows.Add(group is null
                ? Of(null, network.Arrivals, network.Routes, arrivals, [], index, units)
                : Of(group, group.Arrivals, group.Routes ?? network.Routes, arrivals, group.Services, index, units));
        }

        return flows;
    }

    /// <summary>Patients of this flow entering the set at <paramref name="unit"/> per hour: from outside the network or from a unit outside the set.</summary>
    public double EntryPerHour(int unit, int[] members)
    {
        double perHour = _externalPerHour[unit];
        foreach (var ((from, to), probability) in _routes)
        {
            if (to == unit && Array.IndexOf(members, from) < 0)
            {
                perHour += _arrivalsPerHour[from] * probability;
            }
        }

        return perHour;
    }

    /// <summary>Journeys of this flow started per hour.</summary>
    public double EntriesPerHour(int[] members) => members.Sum(unit => EntryPerHour(unit, members));

    /// <summary>The routing fraction from <paramref name="from"/> to <paramref name="to"/> for this flow.</summary>
    public double RouteProbability(int from, int to) => _routes.GetValueOrDefault((from, to));

    /// <summary>This flow's service time at <paramref name="unit"/>.</summary>
    public ServiceDistribution Service(int unit) => _services[unit];

    private static JourneyFlow Of(
        PatientGroup? group,
        IEnumerable<Arrival> arrivals,
        IEnumerable<Route> routes,
        double[] arrivalsPerHour,
        IEnumerable<GroupService> services,
        IReadOnlyDictionary<string, int> index,
        IReadOnlyList<Unit> units)
    {
        var external = new double[units.Count];
        foreach (var arrival in arrivals)
        {
            external[index[arrival.UnitId]] += arrival.PerHour;
        }

        var table = new Dictionary<(int From, int To), double>();
        foreach (var route in routes)
        {
            var key = (index[route.From], index[route.To]);
            table[key] = table.GetValueOrDefault(key) + route.Probability;
        }

        var own = services.ToDictionary(service => service.UnitId, service => service.Service, StringComparer.Ordinal);
        var perUnit = units.Select(unit => own.GetValueOrDefault(unit.Id) ?? unit.EffectiveService).ToArray();
        return new JourneyFlow(group, external, arrivalsPerHour, table, perUnit);
    }
}
