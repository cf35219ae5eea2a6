using System.Collections.Immutable;
using System.Globalization;

namespace NetSolve.Solving;

/// <summary>
/// A unit's servers hour by hour: the same number all the time, 24 values (hour 00–01 first) repeated every day, or
/// 168 values (Monday 00–01 first) for a week. Immutable; made by <see cref="Constant"/> or <see cref="ByHour"/>.
/// </summary>
public sealed record ServerRoster
{
    private ServerRoster(ImmutableArray<int> servers) => Servers = servers;

    /// <summary>1, 24 or 168 server counts, each from 0 (closed) to <see cref="Model.Servers.MaxCount"/>.</summary>
    public ImmutableArray<int> Servers { get; }

    /// <summary>The most servers in any hour.</summary>
    public int Max => Servers.Max();

    /// <summary>The same servers in every hour.</summary>
    public static ServerRoster Constant(int servers) => ByHour([servers]);

    /// <summary>Servers by hour: 1, 24 or 168 values, each from 0 to <see cref="Model.Servers.MaxCount"/>.</summary>
    public static ServerRoster ByHour(IEnumerable<int> servers)
    {
        ArgumentNullException.ThrowIfNull(servers);
        var values = servers.ToImmutableArray();
        if (values.Length is not (1 or Model.ArrivalProfile.HoursPerDay or TimeVaryingTraffic.HoursPerWeek))
        {
            throw new ArgumentException(string.Create(CultureInfo.InvariantCulture, $"A roster has 1, 24 or 168 hours, not {values.Length}."), nameof(servers));
        }

        if (values.Any(count => count is < 0 or > Model.Servers.MaxCount))
        {
            throw new ArgumentOutOfRangeException(nameof(servers), "Servers in an hour are from 0 to 1,000,000.");
        }

        return new ServerRoster(values);
    }

    /// <summary>Servers working in hour <paramref name="hourOfCycle"/> (0-based, from Monday 00:00).</summary>
    public int At(int hourOfCycle) => Servers[hourOfCycle % Servers.Length];

    /// <summary>Mean servers over a cycle of <paramref name="cycleHours"/> hours.</summary>
    public double MeanOver(int cycleHours) => Enumerable.Range(0, cycleHours).Average(At);
}
