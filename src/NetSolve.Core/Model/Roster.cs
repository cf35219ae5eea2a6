using System.Collections.Immutable;
using System.Globalization;

namespace NetSolve.Model;

/// <summary>
/// A unit's servers hour by hour, as the file's <c>roster</c> gives them: 24 whole numbers repeated every day (hour
/// 00–01 first) or 168 for a week (Monday 00–01 first). Immutable; made by <see cref="Create"/>.
/// </summary>
/// <remarks>
/// Simulation time 0 is Monday 00:00, as for <see cref="ArrivalProfile"/>. An hour may have 0 servers (the unit is
/// closed to new starts); at least one hour has a server.
/// </remarks>
public sealed record Roster
{
    /// <summary>Hours in a week: the length of a week-long roster.</summary>
    public const int HoursPerWeek = ArrivalProfile.HoursPerDay * ArrivalProfile.DaysPerWeek;

    private Roster(ImmutableArray<int> serversByHour) => ServersByHour = serversByHour;

    /// <summary>24 or 168 server counts, each from 0 to <see cref="Servers.MaxCount"/>, not all 0.</summary>
    public ImmutableArray<int> ServersByHour { get; }

    /// <summary>The most servers in any hour.</summary>
    public int Max => ServersByHour.Max();

    /// <summary>Mean servers over the roster's cycle (a day or a week).</summary>
    public double Mean => ServersByHour.Average();

    /// <summary>Servers working at <paramref name="hours"/> after Monday 00:00.</summary>
    public int At(double hours) => ServersByHour[(int)((long)Math.Floor(hours) % ServersByHour.Length)];

    /// <summary>Creates a roster from 24 or 168 server counts.</summary>
    /// <exception cref="ArgumentException">Another length, a count out of range, or every count 0.</exception>
    public static Roster Create(IEnumerable<int> serversByHour)
    {
        ArgumentNullException.ThrowIfNull(serversByHour);
        var values = serversByHour.ToImmutableArray();
        if (values.Length is not (ArrivalProfile.HoursPerDay or HoursPerWeek))
        {
            throw new ArgumentException(string.Create(CultureInfo.InvariantCulture, $"A roster has 24 or 168 hours, not {values.Length}."), nameof(serversByHour));
        }

        if (values.Any(count => count is < 0 or > Servers.MaxCount) || values.All(count => count == 0))
        {
            throw new ArgumentException("Servers in an hour are from 0 to 1,000,000, and at least one hour has a server.", nameof(serversByHour));
        }

        return new Roster(values);
    }
}
