using NetSolve.Solving;

namespace NetSolve.Rendering.Report;

/// <summary>
/// What the report's numbers assume for one network: which method each unit is solved by, how arrival variability,
/// bed limits, patient groups and an hour-of-day profile are treated (docs/methods.md). Only what applies is listed.
/// </summary>
public static class ReportAssumptions
{
    /// <summary>The sentence before the list.</summary>
    public const string Introduction =
        "Each unit is solved by the method named below, fed by the flows of the traffic equations; totals follow Little's law. For this network the model assumes:";

    /// <summary>How arrival variability is carried, as the report states it.</summary>
    public const string Variability =
        "Arrival variability passes through the network by the two-moment method: each unit's arrival variability (squared coefficient of variation) comes from the external streams, the routing and the departures of the units upstream, and feeds the unit's waiting-time formula.";

    /// <summary>The treatment of bed limits, as the report states it.</summary>
    public const string BedLimits =
        "Bed limits are modelled by M/M/c/K for exponential service, by its two-moment M/G/c/K form for other lengths of stay, or by the Erlang loss formula (exact for any length of stay) when capacity equals servers; patients who find a unit full are turned away or diverted, and the flows with turn-away and diversion are found by a fixed point of the traffic equations.";

    /// <summary>The treatment of patients diverted from full units, as the report states it.</summary>
    public const string DivertedBursts =
        "Diverted patients arrive in bursts while their unit is full: at a unit receiving them (without a bed limit of its own) the wait is corrected by an interrupted Poisson model of the diverted stream, solved exactly for exponential service.";

    /// <summary>The treatment of patient groups, as the report states it.</summary>
    public const string Groups =
        "Patient groups are solved by multi-class traffic equations: each group follows its own routes, and a unit's service is the mixture of the services of the groups that use it.";

    /// <summary>The treatment of an hour-of-day profile, as the report states it.</summary>
    public const string ProfileReplacedByMean =
        "Steady state: the hour-of-day (and day-of-week) arrival profile is replaced by its mean, so the formulas see each stream at its mean rate; only a simulation follows the profile.";

    /// <summary>Steady state without a profile, as the report states it.</summary>
    public const string SteadyState =
        "Steady state: demand and capacity stay as given long enough for queues to settle; no daily or seasonal pattern.";

    /// <summary>The assumptions for <paramref name="solution"/>'s network, in the order the report lists them.</summary>
    public static IReadOnlyList<string> For(NetworkSolution solution)
    {
        ArgumentNullException.ThrowIfNull(solution);
        var network = solution.Network;
        var lines = new List<string>
        {
            network.ArrivalProfile is null && network.Groups.All(group => group.ArrivalProfile is null) ? SteadyState : ProfileReplacedByMean,
        };
        foreach (var method in solution.Units.GroupBy(unit => unit.Method, StringComparer.Ordinal))
        {
            lines.Add($"Method {method.Key}: {string.Join(", ", method.Select(unit => unit.Unit.Id))}.");
        }

        lines.Add(Variability);
        bool poisson = solution.Units.All(unit => unit.ArrivalScv == 1.0 && unit.ServiceScv == 1.0);
        lines.Add(poisson
            ? "Poisson arrivals and exponential service at every unit, so the two-moment method changes nothing: this is Jackson's network."
            : "Where a unit has Poisson arrivals and exponential service its result is Erlang C; elsewhere service variability comes from the unit's service_cv, service distribution or samples, and external arrival variability from arrival_cv.");
        var limited = solution.Units.Where(unit => unit.Unit.Capacity is not null).ToList();
        if (limited.Count > 0)
        {
            lines.Add(BedLimits + " Units with a bed limit: " + string.Join(", ", limited.Select(Limit)) + ".");
            if (solution.Units.Any(unit => string.Equals(unit.Method, MethodNames.DivertedOverflow, StringComparison.Ordinal)))
            {
                lines.Add(DivertedBursts);
            }
        }
        else
        {
            lines.Add("No bed limits: every unit has unlimited waiting room and turns nobody away.");
        }

        if (!network.Groups.IsEmpty)
        {
            lines.Add(Groups + " Groups: " + string.Join(", ", network.Groups.Select(group => group.Id)) + ".");
        }

        lines.Add("Independent routing: where a patient goes next depends only on the unit just left (and the patient's group), by the given probabilities.");
        lines.Add("First come, first served at every unit; no priorities, no abandonment.");
        return lines;
    }

    private static string Limit(UnitResult unit) => FormattableString.Invariant($"{unit.Unit.Id} (capacity {unit.Unit.Capacity}, ")
        + (unit.Unit.WhenFull.DivertToUnitId is string target ? $"diverts to {target})" : "turns away)");
}
