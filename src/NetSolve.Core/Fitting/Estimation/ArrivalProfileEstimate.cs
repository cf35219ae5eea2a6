using System.Collections.Immutable;
using MathNet.Numerics.Distributions;
using NetSolve.Model;

namespace NetSolve.Fitting.Estimation;

/// <summary>
/// Hour-of-day and day-of-week arrival profiles estimated from entry times, in the network file's
/// <c>arrival_profile</c> form (<see cref="ArrivalProfile"/>: multipliers averaging 1, Monday 00:00 first).
/// </summary>
/// <param name="HourOfDay">Entries and exposure per hour of day.</param>
/// <param name="DayOfWeek">Entries and exposure per day of week (Monday first).</param>
/// <param name="Profile">The profile to write; null when neither shape is written (a constant rate is then kept).</param>
/// <remarks>
/// Each slot's rate is its entries over the hours of extract that fell in it, so a window that covers some hours or
/// weekdays more often than others is not biased. A shape is written only with enough data (see
/// <see cref="EvidenceThresholds"/>) and when Pearson's chi-squared test of the counts against a constant rate
/// (expected count = all entries × the slot's share of exposure, slots − 1 degrees of freedom) rejects it at 5%.
/// Hours and days are estimated apart (the model multiplies them).
/// </remarks>
public sealed record ArrivalProfileEstimate(ProfileSlots HourOfDay, ProfileSlots DayOfWeek, ArrivalProfile? Profile)
{
    /// <summary>The profiles of <paramref name="entryHours"/> seen over <paramref name="window"/>.</summary>
    public static ArrivalProfileEstimate Estimate(IReadOnlyList<double> entryHours, ExtractWindow window)
    {
        ArgumentNullException.ThrowIfNull(entryHours);
        ArgumentNullException.ThrowIfNull(window);
        var hourCounts = new int[ArrivalProfile.HoursPerDay];
        var dayCounts = new int[ArrivalProfile.DaysPerWeek];
        foreach (double entry in entryHours.Where(entry => entry >= 0.0 && entry < window.Hours))
        {
            int hourOfWeek = (int)(Math.Floor(entry + window.StartHourOfWeek) % ExtractWindow.HoursPerWeek);
            hourCounts[hourOfWeek % ArrivalProfile.HoursPerDay]++;
            dayCounts[hourOfWeek / ArrivalProfile.HoursPerDay]++;
        }

        return FromCounts(hourCounts, dayCounts, window);
    }

    /// <summary>
    /// The profiles of entries already counted per hour of day and per day of week (Monday first) over
    /// <paramref name="window"/>: counts add up, so a network's profile is its units' counts summed.
    /// </summary>
    /// <exception cref="ArgumentException">Not 24 hour counts and 7 day counts.</exception>
    public static ArrivalProfileEstimate FromCounts(int[] hourCounts, int[] dayCounts, ExtractWindow window)
    {
        ArgumentNullException.ThrowIfNull(hourCounts);
        ArgumentNullException.ThrowIfNull(dayCounts);
        ArgumentNullException.ThrowIfNull(window);
        if (hourCounts.Length != ArrivalProfile.HoursPerDay || dayCounts.Length != ArrivalProfile.DaysPerWeek)
        {
            throw new ArgumentException("One count per hour of day and one per day of week.", nameof(hourCounts));
        }

        var (hourExposure, dayExposure) = Exposure(window);
        double days = window.Hours / ArrivalProfile.HoursPerDay;
        var hours = Decide(hourCounts, hourExposure, days >= EvidenceThresholds.MinDaysForHourProfile);
        var weekdays = Decide(dayCounts, dayExposure, days / ArrivalProfile.DaysPerWeek >= EvidenceThresholds.MinWeeksForDayProfile);
        ArrivalProfile? profile = null;
        if (hours.Decision == ProfileDecision.Written || weekdays.Decision == ProfileDecision.Written)
        {
            var hourMultipliers = hours.Decision == ProfileDecision.Written ? hours.RatesPerHour : Enumerable.Repeat(1.0, ArrivalProfile.HoursPerDay);
            profile = ArrivalProfile.Create(hourMultipliers, weekdays.Decision == ProfileDecision.Written ? weekdays.RatesPerHour : null);
        }

        return new ArrivalProfileEstimate(hours, weekdays, profile);
    }

    /// <summary>Hours of the window in each hour of day and each day of week, walking it from one hour boundary to the next.</summary>
    private static (double[] Hours, double[] Days) Exposure(ExtractWindow window)
    {
        var hours = new double[ArrivalProfile.HoursPerDay];
        var days = new double[ArrivalProfile.DaysPerWeek];
        double time = window.StartHourOfWeek;
        double end = window.StartHourOfWeek + window.Hours;
        while (time < end)
        {
            double boundary = Math.Min(Math.Floor(time) + 1.0, end);
            int hourOfWeek = (int)(Math.Floor(time) % ExtractWindow.HoursPerWeek);
            hours[hourOfWeek % ArrivalProfile.HoursPerDay] += boundary - time;
            days[hourOfWeek / ArrivalProfile.HoursPerDay] += boundary - time;
            time = boundary;
        }

        return (hours, days);
    }

    private static ProfileSlots Decide(int[] counts, double[] exposure, bool longEnough)
    {
        int total = counts.Sum();
        var entries = counts.ToImmutableArray();
        var hours = exposure.ToImmutableArray();
        if (!longEnough)
        {
            return new ProfileSlots(entries, hours, ProfileDecision.TooShort, null);
        }

        if (total < EvidenceThresholds.MinEntriesPerSlot * counts.Length)
        {
            return new ProfileSlots(entries, hours, ProfileDecision.TooFewEntries, null);
        }

        double allExposure = exposure.Sum();
        double statistic = 0.0;
        for (int slot = 0; slot < counts.Length; slot++)
        {
            double expected = total * exposure[slot] / allExposure;
            statistic += (counts[slot] - expected) * (counts[slot] - expected) / expected;
        }

        double pValue = 1.0 - ChiSquared.CDF(counts.Length - 1, statistic);
        return new ProfileSlots(entries, hours, pValue < EvidenceThresholds.FlatnessTestLevel ? ProfileDecision.Written : ProfileDecision.Flat, pValue);
    }
}
