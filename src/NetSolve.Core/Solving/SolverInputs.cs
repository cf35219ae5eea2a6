using System.Collections.Immutable;
using NetSolve.Model;

namespace NetSolve.Solving;

/// <summary>
/// What the per-unit formulas need beside the flows, read once from a network: each unit's service (the mixture over
/// patient groups), its external arrivals with their variability, and the routing seen by all patients together.
/// </summary>
/// <param name="MeanServiceHours">Mean service per unit: the flow-weighted mixture over the groups that reach it.</param>
/// <param name="ServiceScv">Squared coefficient of variation of that mixture.</param>
/// <param name="ExternalPerHour">External arrivals per unit, per hour, over every group.</param>
/// <param name="ExternalScv">Squared coefficient of variation of each unit's external arrivals (1: Poisson).</param>
/// <param name="Routes">Routing fractions of all patients together, by unit position; empty for a Jackson network.</param>
/// <param name="Traffic">The groups' traffic, when the network has patient groups; null otherwise.</param>
internal sealed record SolverInputs(
    ImmutableArray<double> MeanServiceHours,
    ImmutableArray<double> ServiceScv,
    ImmutableArray<double> ExternalPerHour,
    ImmutableArray<double> ExternalScv,
    ImmutableArray<ArrivalVariabilityRoute> Routes,
    GroupTrafficSolution? Traffic)
{
    /// <summary>
    /// True when every service is exponential and every external stream Poisson: then every unit sees Poisson
    /// arrivals (Jackson) and the two-moment system need not be solved (it gives exactly 1 everywhere).
    /// </summary>
    public bool IsJackson => ServiceScv.All(scv => scv == 1.0) && ExternalScv.All(scv => scv == 1.0);

    /// <summary>Reads the inputs of <paramref name="network"/>, with <paramref name="traffic"/> when it has groups.</summary>
    public static SolverInputs Of(Network network, GroupTrafficSolution? traffic)
    {
        int n = network.Units.Length;
        var index = network.BuildIndex();
        var external = new double[n];
        var externalScvWeighted = new double[n];
        foreach (var arrival in network.Arrivals.Concat(network.Groups.SelectMany(group => group.Arrivals)))
        {
            int i = index[arrival.UnitId];
            external[i] += arrival.PerHour;
            externalScvWeighted[i] += arrival.PerHour * arrival.Cv * arrival.Cv;
        }

        var mean = new double[n];
        var scv = new double[n];
        for (int i = 0; i < n; i++)
        {
            if (traffic is null)
            {
                // The unit's distribution when the file gives one, else its service_cv (what EffectiveService would make).
                double cv = network.Units[i].Service?.Cv ?? network.Units[i].ServiceCv;
                mean[i] = network.Units[i].MeanServiceHours;
                scv[i] = cv * cv;
            }
            else
            {
                mean[i] = traffic.Units[i].MeanServiceHours;
                scv[i] = traffic.Units[i].ServiceScv;
            }
        }

        var externalScv = new double[n];
        for (int i = 0; i < n; i++)
        {
            externalScv[i] = external[i] > 0.0 ? externalScvWeighted[i] / external[i] : 1.0;
        }

        // The routes serve only the two-moment system, which a Jackson network does not need.
        bool jackson = scv.All(value => value == 1.0) && externalScv.All(value => value == 1.0);
        return new SolverInputs([.. mean], [.. scv], [.. external], [.. externalScv], jackson ? [] : AllRoutes(network, traffic, index), traffic);
    }

    /// <summary>Routes of all patients: a group's route out of a unit weighs by the group's share of that unit's flow.</summary>
    private static ImmutableArray<ArrivalVariabilityRoute> AllRoutes(Network network, GroupTrafficSolution? traffic, IReadOnlyDictionary<string, int> index)
    {
        if (traffic is null)
        {
            return [.. network.Routes.Select(route => new ArrivalVariabilityRoute(index[route.From], index[route.To], route.Probability))];
        }

        var weighted = new Dictionary<(int From, int To), double>();
        foreach (var group in traffic.Groups)
        {
            foreach (var route in group.Group?.Routes ?? network.Routes)
            {
                int from = index[route.From];
                double total = traffic.Units[from].ArrivalsPerHour;
                double share = total > 0.0 ? group.Units[from].ArrivalsPerHour / total : 0.0;
                var key = (from, index[route.To]);
                weighted[key] = weighted.GetValueOrDefault(key) + (share * route.Probability);
            }
        }

        return [.. weighted.Where(pair => pair.Value > 0.0)
            .Select(pair => new ArrivalVariabilityRoute(pair.Key.From, pair.Key.To, Math.Min(1.0, pair.Value)))];
    }
}
