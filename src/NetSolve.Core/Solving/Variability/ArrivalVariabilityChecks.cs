using System.Globalization;

namespace NetSolve.Solving;

/// <summary>Guard clauses for <see cref="ArrivalVariability.Solve(IReadOnlyList{ArrivalVariabilityUnit}, IReadOnlyList{ArrivalVariabilityRoute})"/>: misuse throws before any arithmetic.</summary>
internal static class ArrivalVariabilityChecks
{
    public static void Check(IReadOnlyList<ArrivalVariabilityUnit> units, IReadOnlyList<ArrivalVariabilityRoute> routes)
    {
        ArgumentNullException.ThrowIfNull(units);
        ArgumentNullException.ThrowIfNull(routes);
        for (int i = 0; i < units.Count; i++)
        {
            var unit = units[i] ?? throw new ArgumentNullException(nameof(units), Message($"unit {i} is null"));
            NotNegative(unit.ArrivalsPerHour, i, "arrivals per hour");
            NotNegative(unit.ExternalPerHour, i, "external arrivals per hour");
            NotNegative(unit.ExternalScv, i, "external arrival SCV");
            NotNegative(unit.ServiceScv, i, "service SCV");
            NotNegative(unit.Utilisation, i, "utilisation");
            if (!unit.Servers.IsValid)
            {
                throw new ArgumentException(Message($"unit {i} has default(Servers)"), nameof(units));
            }
        }

        var outgoing = new double[units.Count];
        var pairs = new HashSet<(int, int)>(routes.Count);
        foreach (var route in routes)
        {
            if ((uint)route.From >= (uint)units.Count || (uint)route.To >= (uint)units.Count)
            {
                throw new ArgumentOutOfRangeException(nameof(routes), route, "A route joins two unit positions from 0 to units − 1.");
            }

            if (!(route.Probability is >= 0.0 and <= 1.0))
            {
                throw new ArgumentOutOfRangeException(nameof(routes), route, "A route's probability lies in [0, 1].");
            }

            if (!pairs.Add((route.From, route.To)))
            {
                throw new ArgumentException(Message($"the route {route.From} → {route.To} is given twice"), nameof(routes));
            }

            outgoing[route.From] += route.Probability;
        }

        for (int i = 0; i < units.Count; i++)
        {
            if (outgoing[i] > 1.0 + Model.Tolerances.ProbabilitySum)
            {
                throw new ArgumentException(Message($"the routes out of unit {i} add up to {outgoing[i]}, more than 1"), nameof(routes));
            }
        }
    }

    private static void NotNegative(double value, int unit, string what)
    {
        if (!(double.IsFinite(value) && value >= 0.0))
        {
            throw new ArgumentOutOfRangeException(nameof(value), value, Message($"unit {unit}: {what} must be finite and not negative"));
        }
    }

    private static string Message(FormattableString text) => text.ToString(CultureInfo.InvariantCulture);
}
