namespace NetSolve.Fitting.Estimation;

/// <summary>
/// Collects stays, given in ascending order of length and age, into <see cref="StayGroups"/>: a stay equal in length
/// and age to the previous one joins its group.
/// </summary>
internal sealed class StayGroupsBuilder(int capacity)
{
    private readonly List<double> _hours = new(capacity);
    private readonly List<double> _ages = new(capacity);
    private readonly List<int> _ended = new(capacity);
    private readonly List<int> _censored = new(capacity);

    /// <summary>Adds <paramref name="count"/> stays of one length, age and outcome, not shorter (then not younger) than those added before.</summary>
    public void Add(double hours, double ageHours, bool censored, int count)
    {
        int last = _hours.Count - 1;
        if (last < 0 || _hours[last] != hours || _ages[last] != ageHours)
        {
            _hours.Add(hours);
            _ages.Add(ageHours);
            _ended.Add(0);
            _censored.Add(0);
            last++;
        }

        if (censored)
        {
            _censored[last] += count;
        }
        else
        {
            _ended[last] += count;
        }
    }

    /// <summary>The groups, with the stays recorded in steps of <paramref name="resolutionHours"/>.</summary>
    public StayGroups Build(double resolutionHours) =>
        new([.. _hours], [.. _ages], [.. _ended], [.. _censored], resolutionHours);
}
