using NetSolve.Presentation;
using NetSolve.Presentation.Formats;
using NetSolve.Presentation.Solution;
using NetSolve.Solving;

namespace NetSolve.Rendering.Report;

/// <summary>The report's one-line finding: which unit saturates first, and at what growth in demand; then the targets missed, if any.</summary>
public static class Finding
{
    /// <summary>One sentence for <paramref name="solution"/>.</summary>
    /// <remarks>
    /// Unstable units come first (they are over capacity at today's demand); otherwise the bottleneck unit(s) and
    /// their headroom, the factor by which every arrival rate can grow before they reach full utilisation. Numbers
    /// read as in the tables (<see cref="PeopleFormat"/>).
    /// </remarks>
    public static string Summarise(NetworkSolution solution)
    {
        ArgumentNullException.ThrowIfNull(solution);
        return Targets(solution) is string targets ? Saturation(solution) + " " + targets : Saturation(solution);
    }

    /// <summary>
    /// One sentence naming each unit that misses a target and which (<c>Critical care misses its mean_wait target.</c>);
    /// null when no unit has targets or every target is met.
    /// </summary>
    public static string? Targets(NetworkSolution solution)
    {
        ArgumentNullException.ThrowIfNull(solution);
        var missed = solution.Units.Where(u => !u.TargetsBreached.IsEmpty).ToList();
        if (missed.Count == 0)
        {
            return null;
        }

        string names = Join(missed.Select(u => u.Unit.Label + " (" + TargetWords.Breached(u) + ")"));
        return missed.Count == 1 ? names + " misses its target." : names + " miss their targets.";
    }

    private static string Saturation(NetworkSolution solution)
    {
        var timeUnit = solution.Network.TimeUnit;
        var unstable = solution.Units.Where(u => u.Status == UnitStatus.Unstable).ToList();
        if (unstable.Count > 0)
        {
            string names = Join(unstable.Select(u => u.Unit.Label + " (" + ShownValue.Of(UnitColumns.Utilisation, u, timeUnit) + " busy)"));
            return unstable.Count == 1
                ? names + " is over capacity at today's demand: its queue grows without limit."
                : names + " are over capacity at today's demand: their queues grow without limit.";
        }

        var first = solution.Units.Where(u => u.Status == UnitStatus.Bottleneck && u.Headroom is not null).ToList();
        if (first.Count == 0)
        {
            return "No unit saturates as demand grows: every unit that patients reach has unlimited servers.";
        }

        double headroom = first[0].Headroom!.Value;
        string growth = $"a factor of {ShownValue.Of(UnitColumns.Headroom, first[0], timeUnit)} ({PeopleFormat.SignedPercent(headroom - 1.0)})";
        string who = Join(first.Select(u => u.Unit.Label));
        return first.Count == 1
            ? $"{who} saturates first: it reaches full utilisation when demand grows by {growth}."
            : $"{who} saturate first, together: they reach full utilisation when demand grows by {growth}.";
    }

    private static string Join(IEnumerable<string> parts)
    {
        var list = parts.ToList();
        return list.Count <= 1 ? string.Concat(list) : string.Join(", ", list.Take(list.Count - 1)) + " and " + list[^1];
    }
}
