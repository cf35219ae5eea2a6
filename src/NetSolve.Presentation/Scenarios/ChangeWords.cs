using System.Collections.Immutable;
using System.Globalization;
using NetSolve.Model;
using NetSolve.Presentation.Formats;
using NetSolve.Scenarios;

namespace NetSolve.Presentation.Scenarios;

/// <summary>
/// A scenario's changes in a planner's words, one short phrase each (<c>imaging: 4 servers</c>), so every header
/// and the report can say what a scenario changed without the reader opening its file.
/// </summary>
public static class ChangeWords
{
    /// <summary>Every change in the order it applies.</summary>
    public static ImmutableArray<string> Describe(IEnumerable<NetworkChange> changes, TimeUnit timeUnit)
    {
        ArgumentNullException.ThrowIfNull(changes);
        return [.. changes.Select(change => Describe(change, timeUnit))];
    }

    /// <summary>One change as a phrase: the unit first, then what it becomes.</summary>
    public static string Describe(NetworkChange change, TimeUnit timeUnit)
    {
        ArgumentNullException.ThrowIfNull(change);
        return change switch
        {
            SetServers set => set.UnitId + ": " + Servers(set.Servers),
            AddServers add => add.UnitId + ": " + add.Count.ToString("+0;-0;0", CultureInfo.InvariantCulture) + (Math.Abs(add.Count) == 1 ? " server" : " servers"),
            SetService service => service.UnitId + ": service " + PeopleFormat.Time(service.MeanServiceHours),
            ScaleService scale => scale.UnitId + ": service \u00D7" + AsWritten(scale.Factor),
            SetArrivals arrivals => arrivals.UnitId + ": arrivals " + PeopleFormat.Rate(arrivals.PerHour, timeUnit),
            ScaleArrivals { UnitId: null } scale => "every arrival stream \u00D7" + AsWritten(scale.Factor),
            ScaleArrivals scale => scale.UnitId + ": arrivals \u00D7" + AsWritten(scale.Factor),
            SetRoute route => route.Probability > 0.0
                ? route.From + " to " + route.To + ": " + PeopleFormat.Percent(route.Probability)
                : route.From + " to " + route.To + ": route removed",
            AddUnit add => add.Unit.Id + ": new unit (" + Servers(add.Unit.Servers) + ", service " + PeopleFormat.Time(add.Unit.MeanServiceHours) + ")",
            CloseUnit { SendTo: null } close => close.UnitId + ": closed, patients leave",
            CloseUnit close => close.UnitId + ": closed, patients go to " + close.SendTo,
            _ => throw new ArgumentOutOfRangeException(nameof(change), change.GetType().Name, "Unknown kind of change."),
        };
    }

    /// <summary>A factor as a file writes it (<c>0.8</c>, <c>1.05</c>), not padded to the tables' three decimals.</summary>
    private static string AsWritten(double factor) => factor.ToString("0.####", CultureInfo.InvariantCulture);

    private static string Servers(Servers servers) =>
        servers.IsUnlimited ? "unlimited servers" : servers.Count.ToString(CultureInfo.InvariantCulture) + (servers.Count == 1 ? " server" : " servers");
}
