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
    public static KaplanMeierCurve Estimate(ReadOnlySpan<double> stayHours, ReadOnlySpan<bool> censored, ReadOnlySpan<double> ageAtStartHours)
    {
        if (censored.Length != stayHours.Length || (!ageAtStartHours.IsEmpty && ageAtStartHours.Length != stayHours.Length))
        {
            throw new ArgumentException("One censoring flag and one age per stay.", nameof(censored));
        }

        int count = stayHours.Length;
        var ends = new List<double>(count);
        var exits = new double[count];
        var entries = new List<double>();
        double last = 0.0;
        bool lastCensored = false;
        for (int i = 0; i < count; i++)
        {
            double age = ageAtStartHours.IsEmpty ? 0.0 : ageAtStartHours[i];
            exits[i] = stayHours[i];
            if (age > 0.0)
            {
                entries.Add(age);
            }

            if (!censored[i] && (age == 0.0 || age < stayHours[i]))
            {
                ends.Add(stayHours[i]);
            }

            if (stayHours[i] > last || (stayHours[i] == last && censored[i]))
            {
                last = stayHours[i];
                lastCensored = censored[i];
            }
        }

        ends.Sort();
        Array.Sort(exits);
        entries.Sort();
        var times = ImmutableArray.CreateBuilder<double>();
        var atRisk = ImmutableArray.CreateBuilder<int>();
        var events = ImmutableArray.CreateBuilder<int>();
        var survival = ImmutableArray.CreateBuilder<double>();
        var errors = ImmutableArray.CreateBuilder<double>();
        double s = 1.0;
        double greenwoodSum = 0.0;
        for (int k = 0; k < ends.Count;)
        {
            double t = ends[k];
            int d = 0;
            while (k < ends.Count && ends[k] == t)
            {
                d++;
                k++;
            }

            // At risk: exits at or after t, less those entering observation at or after t.
            int n = (count - LowerBound(exits, t)) - (entries.Count - LowerBound(entries, t));
            if (n <= 0)
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

        return new KaplanMeierCurve(times.ToImmutable(), atRisk.ToImmutable(), events.ToImmutable(), survival.ToImmutable(), errors.ToImmutable(), last, lastCensored);
    }

    /// <summary>The first index whose value is at least <paramref name="value"/>.</summary>
    private static int LowerBound(IReadOnlyList<double> sorted, double value)
    {
        int low = 0;
        int high = sorted.Count;
        while (low < high)
        {
            int middle = low + ((high - low) / 2);
            if (sorted[middle] < value)
            {
                low = middle + 1;
            }
            else
            {
                high = middle;
            }
        }

        return low;
    }
}
