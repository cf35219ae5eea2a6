using System.Globalization;
using NetSolve.Model;

namespace NetSolve.Presentation;

/// <summary>Writes a network as a v1 network file, times in its time unit, readable by <see cref="Parsing.NetworkReader"/>.</summary>
public static class NetworkYamlWriter
{
    /// <summary>Writes <paramref name="network"/>; <paramref name="header"/> lines become comments at the top.</summary>
    public static void Write(Network network, TextWriter output, IEnumerable<string>? header = null)
    {
        ArgumentNullException.ThrowIfNull(network);
        ArgumentNullException.ThrowIfNull(output);
        foreach (var line in header ?? [])
        {
            output.Write("# " + line + "\n");
        }

        var unit = network.TimeUnit;
        string suffix = TimeConstants.Suffix(unit);
        output.Write($"name: {Quote(network.Name)}\ntime_unit: {TimeConstants.Name(unit)}\n\nunits:\n");
        foreach (var u in network.Units)
        {
            output.Write($"  {u.Id}:\n");
            if (!string.Equals(u.Label, u.Id, StringComparison.Ordinal))
            {
                output.Write($"    label: {Quote(u.Label)}\n");
            }

            output.Write($"    servers: {u.Servers}\n");
            output.Write($"    service: {Number(TimeConstants.FromHours(u.MeanServiceHours, unit))}{suffix}\n");
            if (Math.Abs(u.ServiceCv - 1.0) > 0.0)
            {
                output.Write($"    service_cv: {Number(u.ServiceCv)}\n");
            }

            if (u.Service is { Kind: ServiceKind.Exponential or ServiceKind.Lognormal } service)
            {
                output.Write($"    service_distribution: {(service.Kind == ServiceKind.Lognormal ? "lognormal" : "exponential")}\n");
            }
        }

        if (network.ArrivalProfile is ArrivalProfile profile)
        {
            output.Write($"\narrival_profile:\n  hour_of_day: [{string.Join(", ", profile.HourOfDay.Select(Number))}]\n");
            if (!profile.DayOfWeek.IsDefaultOrEmpty)
            {
                output.Write($"  day_of_week: [{string.Join(", ", profile.DayOfWeek.Select(Number))}]\n");
            }
        }

        output.Write("\narrivals:\n");
        foreach (var arrival in network.Arrivals)
        {
            output.Write($"  {arrival.UnitId}: {Number(TimeConstants.RateFromPerHour(arrival.PerHour, unit))}/{suffix}\n");
        }

        if (network.Routes.Length > 0)
        {
            output.Write("\nroutes:\n");
            foreach (var group in network.Routes.GroupBy(route => route.From, StringComparer.Ordinal))
            {
                output.Write($"  {group.Key}:\n");
                foreach (var route in group)
                {
                    output.Write($"    {route.To}: {Probability(route.Probability)}\n");
                }
            }
        }
    }

    /// <summary>Six significant digits: far finer than any estimate a planner writes by hand.</summary>
    private static string Number(double value) => value.ToString("G6", CultureInfo.InvariantCulture);

    /// <summary>Rounded down to six decimals, so a unit's routes never add up to more than they did.</summary>
    private static string Probability(double value) =>
        (Math.Floor(value * 1e6) / 1e6).ToString("0.######", CultureInfo.InvariantCulture);

    private static string Quote(string text) => "\"" + text.Replace("\\", "\\\\", StringComparison.Ordinal).Replace("\"", "\\\"", StringComparison.Ordinal) + "\"";
}
