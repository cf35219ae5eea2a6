using System.Collections.Immutable;

namespace NetSolve.Fitting.Estimation;

/// <summary>
/// A unit's stays grouped by value: each group holds the stays of one length and one age at the extract's start,
/// counted as ended or as still running (censored); groups ascend by length, then age. Every estimate of the stay
/// distribution (Kaplan–Meier, the exponential and lognormal likelihoods) depends on the stays only through these
/// counts, so the grouping loses nothing, and a unit with millions of stays recorded to the second holds a few
/// thousand to a million groups instead of one entry per stay.
/// </summary>
/// <param name="Hours">Each group's stay length in hours, from start of service (or arrival) to leaving or to the extract's end.</param>
/// <param name="AgeHours">Each group's service time already spent when the extract began: 0 unless the stay was already running then.</param>
/// <param name="Ended">Stays of the group that ended inside the extract.</param>
/// <param name="Censored">Stays of the group still running at the extract's end.</param>
/// <param name="ResolutionHours">
/// The step the stay lengths were recorded in (the timestamps' resolution): a stay recorded as 0 lasted less than this.
/// Positive; used only for stays of length 0.
/// </param>
public sealed record StayGroups(
    ImmutableArray<double> Hours,
    ImmutableArray<double> AgeHours,
    ImmutableArray<int> Ended,
    ImmutableArray<int> Censored,
    double ResolutionHours)
{
    /// <summary>Groups held.</summary>
    public int Count => Hours.Length;

    /// <summary>Stays in all groups.</summary>
    public int Stays => EndedStays + CensoredStays;

    /// <summary>Stays that ended inside the extract.</summary>
    public int EndedStays => Ended.Sum();

    /// <summary>Stays still running at the extract's end.</summary>
    public int CensoredStays => Censored.Sum();

    /// <summary>Stays already running at the extract's start (left-truncated).</summary>
    public int TruncatedStays => Enumerable.Range(0, Count).Where(g => AgeHours[g] > 0.0).Sum(g => Ended[g] + Censored[g]);

    /// <summary>Stays in group <paramref name="group"/>.</summary>
    public int StaysIn(int group) => Ended[group] + Censored[group];

    /// <summary>What makes the groups inconsistent (arrays of different lengths, values no extract can give, groups out of order); null when nothing.</summary>
    public string? Problem()
    {
        if (Hours.IsDefault || AgeHours.IsDefault || Ended.IsDefault || Censored.IsDefault
            || AgeHours.Length != Count || Ended.Length != Count || Censored.Length != Count)
        {
            return "Stay groups have one length, age, and count of ended and censored stays each.";
        }

        if (!(ResolutionHours > 0.0) || !double.IsFinite(ResolutionHours))
        {
            return "The resolution of the stay lengths is finite and positive.";
        }

        for (int g = 0; g < Count; g++)
        {
            if (!double.IsFinite(Hours[g]) || Hours[g] < 0.0 || !double.IsFinite(AgeHours[g]) || AgeHours[g] < 0.0 || AgeHours[g] > Hours[g])
            {
                return "A stay is finite, not negative, and at least as long as its age at the extract's start.";
            }

            if (Ended[g] < 0 || Censored[g] < 0 || (g > 0 && (Hours[g - 1], AgeHours[g - 1]).CompareTo((Hours[g], AgeHours[g])) >= 0))
            {
                return "Stay groups hold counts not negative and ascend by length, then age, each once.";
            }
        }

        return null;
    }

    /// <summary>
    /// The stays given one by one, grouped. <paramref name="ageAtStartHours"/> empty means no stay was already running;
    /// <paramref name="resolutionHours"/> null means the shortest ended stay longer than 0 (1 h when there is none).
    /// </summary>
    /// <exception cref="ArgumentException">The spans differ in length, or a value no extract can give.</exception>
    public static StayGroups Of(ReadOnlySpan<double> stayHours, ReadOnlySpan<bool> censored, ReadOnlySpan<double> ageAtStartHours, double? resolutionHours = null)
    {
        if (censored.Length != stayHours.Length || (!ageAtStartHours.IsEmpty && ageAtStartHours.Length != stayHours.Length))
        {
            throw new ArgumentException("One censoring flag and one age per stay.", nameof(censored));
        }

        var stays = new (double Hours, double Age, bool Censored)[stayHours.Length];
        double shortest = double.PositiveInfinity;
        for (int i = 0; i < stays.Length; i++)
        {
            double age = ageAtStartHours.IsEmpty ? 0.0 : ageAtStartHours[i];
            if (!double.IsFinite(stayHours[i]) || stayHours[i] < 0.0 || !double.IsFinite(age) || age < 0.0 || age > stayHours[i])
            {
                throw new ArgumentException("A stay is finite, not negative, and at least as long as its age at the extract's start.", nameof(stayHours));
            }

            stays[i] = (stayHours[i], age, censored[i]);
            shortest = !censored[i] && stayHours[i] > 0.0 ? Math.Min(shortest, stayHours[i]) : shortest;
        }

        Array.Sort(stays);
        double resolution = resolutionHours ?? (double.IsFinite(shortest) ? shortest : 1.0);
        if (!(resolution > 0.0) || !double.IsFinite(resolution))
        {
            throw new ArgumentException("The resolution of the stay lengths is finite and positive.", nameof(resolutionHours));
        }

        var builder = new StayGroupsBuilder(stays.Length);
        foreach (var stay in stays)
        {
            builder.Add(stay.Hours, stay.Age, stay.Censored, 1);
        }

        return builder.Build(resolution);
    }
}
