using System.Collections.Immutable;
using System.Globalization;

namespace NetSolve.Model;

/// <summary>
/// How external arrivals vary with the hour of day and the day of week: multipliers of the mean rate, normalised so
/// that each set averages 1 and the mean rate over a week is kept.
/// </summary>
/// <remarks>
/// Immutable. Simulation time 0 is Monday 00:00. The rate at time t is mean × hour[h] × day[d] with h the hour of day
/// and d the day of week (Monday 0). Without day multipliers every day counts 1.
/// </remarks>
public sealed record ArrivalProfile
{
    /// <summary>Hours in a day: the number of hour-of-day multipliers.</summary>
    public const int HoursPerDay = 24;

    /// <summary>Days in a week: the number of day-of-week multipliers.</summary>
    public const int DaysPerWeek = 7;

    private ArrivalProfile(ImmutableArray<double> hourOfDay, ImmutableArray<double> dayOfWeek)
    {
        HourOfDay = hourOfDay;
        DayOfWeek = dayOfWeek;
    }

    /// <summary>24 multipliers averaging 1, for hours 00-01 to 23-24.</summary>
    public ImmutableArray<double> HourOfDay { get; }

    /// <summary>7 multipliers averaging 1 (Monday first), or empty when the day does not matter.</summary>
    public ImmutableArray<double> DayOfWeek { get; }

    /// <summary>Creates a profile, normalising each set of multipliers to average 1.</summary>
    /// <param name="hourOfDay">24 values, finite, not negative, not all 0.</param>
    /// <param name="dayOfWeek">7 such values, or null for none.</param>
    public static ArrivalProfile Create(IEnumerable<double> hourOfDay, IEnumerable<double>? dayOfWeek = null)
    {
        ArgumentNullException.ThrowIfNull(hourOfDay);
        var hours = Normalise(hourOfDay.ToImmutableArray(), HoursPerDay, nameof(hourOfDay));
        var days = dayOfWeek is null ? [] : Normalise(dayOfWeek.ToImmutableArray(), DaysPerWeek, nameof(dayOfWeek));
        return new ArrivalProfile(hours, days);
    }

    /// <summary>The multiplier in force at <paramref name="hours"/> after Monday 00:00.</summary>
    public double MultiplierAt(double hours)
    {
        long wholeHours = (long)Math.Floor(hours);
        double multiplier = HourOfDay[(int)(wholeHours % HoursPerDay)];
        return DayOfWeek.IsEmpty ? multiplier : multiplier * DayOfWeek[(int)(wholeHours / HoursPerDay % DaysPerWeek)];
    }

    /// <summary>The largest multiplier at any time of the week.</summary>
    public double MaxMultiplier => HourOfDay.Max() * (DayOfWeek.IsEmpty ? 1.0 : DayOfWeek.Max());

    private static ImmutableArray<double> Normalise(ImmutableArray<double> values, int length, string name)
    {
        if (values.Length != length)
        {
            throw new ArgumentException(string.Create(CultureInfo.InvariantCulture, $"Expected {length} multipliers, got {values.Length}."), name);
        }

        if (values.Any(value => !double.IsFinite(value) || value < 0.0) || values.Sum() <= 0.0)
        {
            throw new ArgumentException("Multipliers are finite, not negative and not all 0.", name);
        }

        double mean = values.Average();
        return values.Select(value => value / mean).ToImmutableArray();
    }
}
