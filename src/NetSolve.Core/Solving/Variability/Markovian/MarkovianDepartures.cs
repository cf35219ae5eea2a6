using System.Collections.Immutable;

namespace NetSolve.Solving;

/// <summary>
/// Each unit's arrival SCV with the flows from queueing units described by their departure processes
/// (<see cref="QueueDepartureProcess"/>), read at the time scale of the destination's own queue by their index of
/// dispersion for counts (<see cref="ArrivalCounts"/>): the flow carries the correlation over several patients that a
/// single renewal SCV cannot (docs/methods.md, "Published refinements tried on the two units not closer").
/// </summary>
/// <remarks>
/// <para>
/// For every unit i with limited servers, a load in (0, 1) and a departure chain of at most <see cref="MaxStates"/>
/// states: arrivals a phase-type renewal flow with the decomposition's rate and ca²_i, service a phase-type fit of its
/// mean and cs²_i (<see cref="PhaseTypeDistribution.FitTwoMoments"/>). The stream i → j with fraction p is that MAP
/// thinned, whose index is p·I_i(t) + 1 − p (independent thinning: Var N' = p² Var N + p(1 − p) E N). At
/// destination j it stands for the stream's SCV, at t = x_j, the window of j's queue
/// (<see cref="VariabilityFunctions"/>); the other streams keep the decomposition's SCVs, and all are merged with the
/// decomposition's weight at j's load. One pass: the departure chains are fitted to the decomposition's ca².
/// </para>
/// <para>
/// Units whose chain would be larger keep the decomposition's departure SCV, so the method needs no more than a few
/// dense factorisations of that size per unit.
/// </para>
/// </remarks>
internal static class MarkovianDepartures
{
    /// <summary>Largest departure chain built; a unit with a larger one keeps the decomposition's departure SCV.</summary>
    public const int MaxStates = 1_200;

    /// <summary>The probability of a full truncated queue aimed at: the truncation level leaves about this much mass above it.</summary>
    private const double TruncatedMass = 1e-8;

    /// <summary>The arrival SCVs with the departure processes; departures as the decomposition gives them.</summary>
    /// <param name="units">Checked units.</param>
    /// <param name="routes">Checked routes.</param>
    /// <param name="decomposition">The decomposition's solution: the ca² the chains are fitted to, and the other streams' SCVs.</param>
    public static ArrivalVariabilitySolution Solve(IReadOnlyList<ArrivalVariabilityUnit> units, IReadOnlyList<ArrivalVariabilityRoute> routes,
        ArrivalVariabilitySolution decomposition)
    {
        int n = units.Count;
        var counts = new ArrivalCounts?[n];
        foreach (int source in routes.Where(route => route.Probability > 0.0).Select(route => route.From).Distinct())
        {
            counts[source] = DepartureCounts(units[source], decomposition.ArrivalScv[source]);
        }

        var inflow = new double[n];
        for (int j = 0; j < n; j++)
        {
            inflow[j] = units[j].ExternalPerHour;
        }

        foreach (var route in routes)
        {
            inflow[route.To] += units[route.From].ArrivalsPerHour * route.Probability;
        }

        var arrival = ImmutableArray.CreateBuilder<double>(n);
        for (int j = 0; j < n; j++)
        {
            arrival.Add(inflow[j] > 0.0 && units[j].ArrivalsPerHour > 0.0
                ? Merged(units, routes, decomposition, counts, j, inflow[j])
                : decomposition.ArrivalScv[j]);
        }

        return decomposition with { ArrivalScv = arrival.MoveToImmutable() };
    }

    private static double Merged(IReadOnlyList<ArrivalVariabilityUnit> units, IReadOnlyList<ArrivalVariabilityRoute> routes,
        ArrivalVariabilitySolution decomposition, ArrivalCounts?[] counts, int j, double inflow)
    {
        double window = VariabilityFunctions.WindowHours(units[j], decomposition.ArrivalScv[j]);
        double share = units[j].ExternalPerHour / inflow;
        double sumOfSquares = share * share;
        double weighted = share * units[j].ExternalScv;
        foreach (var route in routes.Where(route => route.To == j && route.Probability > 0.0))
        {
            double p = route.Probability;
            share = units[route.From].ArrivalsPerHour * p / inflow;
            double spread = counts[route.From]?.IndexOfDispersion(window) ?? decomposition.DepartureScv[route.From];
            weighted += share * ((p * spread) + 1.0 - p);
            sumOfSquares += share * share;
        }

        double weight = ArrivalVariabilitySystem.SuperpositionWeight(ArrivalVariabilitySystem.Load(units[j]), sumOfSquares);
        return ArrivalVariability.Clamp((weight * weighted) + 1.0 - weight);
    }

    /// <summary>The counts of a unit's departures, or null when it keeps no queue, is saturated, or its chain is too large.</summary>
    private static ArrivalCounts? DepartureCounts(ArrivalVariabilityUnit unit, double arrivalScv)
    {
        double rho = ArrivalVariabilitySystem.Load(unit);
        if (unit.Servers.IsUnlimited || !(rho > 0.0 && rho < 1.0) || !(unit.ArrivalsPerHour > 0.0))
        {
            return null;
        }

        int servers = unit.Servers.Count;
        double serviceHours = rho * servers / unit.ArrivalsPerHour;
        var gaps = PhaseTypeDistribution.FitTwoMoments(1.0 / unit.ArrivalsPerHour, arrivalScv);
        var service = PhaseTypeDistribution.FitTwoMoments(serviceHours, unit.ServiceScv);
        int capacity = Capacity(servers, rho, arrivalScv, unit.ServiceScv);
        if (capacity < 0 || QueueDepartureProcess.StateCount(gaps.Phases, service.Phases, servers, capacity) > MaxStates)
        {
            return null;
        }

        return QueueDepartureProcess.Build(gaps, service, servers, capacity).Counts();
    }

    /// <summary>
    /// c + the queue length beyond which about <see cref="TruncatedMass"/> is left, taking the queue as geometric with the
    /// heavy-traffic mean ρ(ca² + cs²)/(2(1 − ρ)) plus one (a margin for light loads); −1 when out of reach.
    /// </summary>
    private static int Capacity(int servers, double rho, double arrivalScv, double serviceScv)
    {
        double meanQueue = 1.0 + (rho * (Math.Max(arrivalScv, PhaseTypeDistribution.MinimumScv) + Math.Max(serviceScv, PhaseTypeDistribution.MinimumScv)) / (2.0 * (1.0 - rho)));
        double queue = Math.Ceiling(meanQueue * -Math.Log(TruncatedMass));
        return queue < MaxStates ? servers + (int)queue : -1;
    }
}
