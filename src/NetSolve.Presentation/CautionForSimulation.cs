using System.Globalization;
using NetSolve.Model;
using NetSolve.Presentation.Formats;

namespace NetSolve.Presentation;

/// <summary>
/// What a simulation's output says about its model: the list of what was simulated (service distributions, arrival
/// profiles, capacity, patient groups) and a caution that does not claim the formulas' steady-state assumptions,
/// which a simulation with lognormal stays, daily profiles or capacity caps does not make.
/// </summary>
public static class CautionForSimulation
{
    /// <summary>The caution under a simulation's table, one paragraph.</summary>
    public const string Text =
        "Caution: these are planning estimates from a simulation of the model listed above, each mean with its confidence "
        + "interval; the model is only as good as its inputs. Decisions on beds and staffing follow local clinical "
        + "governance and safe-staffing rules.";

    /// <summary>What the simulation modelled, one line per aspect, in a planner's words.</summary>
    public static IReadOnlyList<string> Modelled(Network network)
    {
        ArgumentNullException.ThrowIfNull(network);
        var lines = new List<string>
        {
            "service times: " + string.Join("; ", network.Units.Select(unit => unit.Id + " " + Describe(unit.EffectiveService))),
            "arrivals: " + (network.ArrivalProfile is null
                ? "Poisson at a constant rate"
                : "Poisson, the rate varying by hour of day" + (network.ArrivalProfile.DayOfWeek.IsEmpty ? string.Empty : " and day of week") + " by the file's profile"),
        };

        var capped = network.Units.Where(unit => unit.Capacity is not null).ToList();
        lines.Add("capacity: " + (capped.Count == 0
            ? "none set, so waiting room is unlimited and nobody is turned away"
            : string.Join("; ", capped.Select(unit => unit.Id + " " + unit.Capacity!.Value.ToString(CultureInfo.InvariantCulture) + " places, when full "
                + (unit.WhenFull.DivertToUnitId is string target ? "diverted to " + target : "turned away")))));
        if (!network.Groups.IsEmpty)
        {
            lines.Add("patient groups: " + string.Join("; ", network.Groups.Select(Describe)));
        }

        lines.Add("routing: each patient's next unit drawn from the route probabilities" + (network.Groups.Any(group => group.Routes is not null) ? " (a group's own where it has them)" : string.Empty)
            + "; first come, first served at every unit");
        return lines;
    }

    private static string Describe(PatientGroup group)
    {
        var own = new List<string>();
        if (group.Routes is not null)
        {
            own.Add("own routes");
        }

        if (group.ArrivalProfile is not null)
        {
            own.Add("own arrival profile");
        }

        if (!group.Services.IsEmpty)
        {
            own.Add("own service at " + string.Join(", ", group.Services.Select(service => service.UnitId + " (" + Describe(service.Service) + ")")));
        }

        return group.Id + (own.Count == 0 ? string.Empty : " with " + string.Join(", ", own));
    }

    /// <summary>A coefficient of variation as a file would give it: <c>0.8</c>, not <c>0.8000</c>.</summary>
    private static string Cv(double cv) => cv.ToString("0.###", CultureInfo.InvariantCulture);

    /// <summary>A distribution in words: <c>lognormal, mean 3 d, cv 0.8</c>.</summary>
    private static string Describe(ServiceDistribution service) => service.Kind switch
    {
        ServiceKind.Exponential => "exponential, mean " + PeopleFormat.Time(service.MeanHours),
        ServiceKind.Deterministic => "fixed at " + PeopleFormat.Time(service.MeanHours),
        ServiceKind.Lognormal => "lognormal, mean " + PeopleFormat.Time(service.MeanHours) + ", cv " + Cv(service.Cv),
        ServiceKind.Gamma => "gamma, mean " + PeopleFormat.Time(service.MeanHours) + ", cv " + Cv(service.Cv),
        ServiceKind.Empirical => "resampled from " + service.SamplesHours.Length.ToString(CultureInfo.InvariantCulture) + " observed times, mean " + PeopleFormat.Time(service.MeanHours),
        _ => throw new ArgumentOutOfRangeException(nameof(service), service.Kind, "Unknown service distribution."),
    };
}
