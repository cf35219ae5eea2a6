using System.Collections.Immutable;

namespace NetSolve.Fitting.Estimation;

/// <summary>
/// The Kaplan–Meier product-limit estimator (Kaplan and Meier, "Nonparametric estimation from incomplete observations",
/// JASA 53, 1958, 457–481) with Greenwood's variance, for right-censored and left-truncated stays.
/// </summary>
/// <remarks>
/// A stay with age a at the extract's start and length x is at risk at time t when a &lt; t ≤ x (delayed entry,
/// Klein and Moeschberger, Survival Analysis, 2nd ed., 2003, section 4.6); a stay with a = 0 is at risk from 0. A stay
/// censored at t is still at risk at t: ends at a time are counted before censorings at the same time.
/// </remarks>
public static class KaplanMeier
{
    /// <summary>The curve of <paramref name="stayHours"/>; <paramref name="ageAtStartHours"/> empty means no truncation.</summary>
    /// <exception cref="ArgumentException">The spans differ in length.</exception>
    public static KaplanMeierCurve Estimate(ReadOnlySpan<double> stayHours, ReadOnlySpan<bool> censored, ReadOnlySpan<double> ageAtStartHours) =>
        Estimate(StayGroups.Of(stayHours, censored, ageAtStartHours));

    /// <summary>The curve of the grouped <paramref name="stays"/>: one step per distinct length at which a stay ended.</summary>
    public static KaplanMeierCurve Estimate(StayGroups stays)
    {
        ArgumentNullException.ThrowIfNull(stays);
        int count = stays.Stays;
        var entries = new List<(double Age, int Stays)>();
        for (int g = 0; g < stays.Count; g++)
        {
            if (stays.AgeHours[g] > 0.0)
            {
                entries.Add((stays.AgeHours[g], stays.StaysIn(g)));
            }
        }

        entries.Sort();
        int entering = entries.Sum(entry => entry.Stays);
        var times = ImmutableArray.CreateBuilder<double>();
        var atRisk = ImmutableArray.CreateBuilder<int>();
        var events = ImmutableArray.CreateBuilder<int>();
        var survival = ImmutableArray.CreateBuilder<double>();
        var errors = ImmutableArray.CreateBuilder<double>();
        double s = 1.0;
        double greenwoodSum = 0.0;
        int exitedBefore = 0;
        int enteredBefore = 0;
        int nextEntry = 0;
        for (int g = 0; g < stays.Count;)
        {
            double t = stays.Hours[g];
            int d = 0;
            int exiting = 0;
            for (; g < stays.Count && stays.Hours[g] == t; g++)
            {
                d += stays.AgeHours[g] == 0.0 || stays.AgeHours[g] < t ? stays.Ended[g] : 0;
                exiting += stays.StaysIn(g);
            }

            for (; nextEntry < entries.Count && entries[nextEntry].Age < t; nextEntry++)
            {
                enteredBefore += entries[nextEntry].Stays;
            }

            // At risk: stays leaving at or after t, less those entering observation at or after t.
            int n = (count - exitedBefore) - (entering - enteredBefore);
            exitedBefore += exiting;
            if (d == 0 || n <= 0)
            {
                continue;
            }

            s *= 1.0 - ((double)d / n);
            greenwoodSum = n > d ? greenwoodSum + (d / ((double)n * (n - d))) : greenwoodSum;
            times.Add(t);
            atRisk.Add(n);
            events.Add(d);
            survival.Add(s);
            errors.Add(s > 0.0 ? s * Math.Sqrt(greenwoodSum) : 0.0);
        }

        double last = stays.Count == 0 ? 0.0 : stays.Hours[^1];
        bool lastCensored = false;
        for (int g = stays.Count - 1; g >= 0 && stays.Hours[g] == last; g--)
        {
            lastCensored |= stays.Censored[g] > 0;
        }

        return new KaplanMeierCurve(times.ToImmutable(), atRisk.ToImmutable(), events.ToImmutable(), survival.ToImmutable(), errors.ToImmutable(), last, lastCensored);
    }
}
