using System.Globalization;
using NetSolve.Fitting.Estimation;
using NetSolve.Model;
using NetSolve.Presentation.Formats;

namespace NetSolve.Presentation.Fitting.Evidence;

/// <summary>How the fit evidence is worded for people: an estimate with its interval, a distribution, a decision.</summary>
public static class EvidenceWords
{
    /// <summary>A time with its 95% interval, for example <c>4.8 d (4.1 d to 5.7 d)</c>.</summary>
    public static string Time(IntervalEstimate? estimate) => estimate is IntervalEstimate e
        ? PeopleFormat.Time(e.Value) + " (" + PeopleFormat.Time(e.Interval.Lower) + " to " + Upper(e.Interval, PeopleFormat.Time) + ")"
        : PeopleFormat.Missing;

    /// <summary>A plain number with its 95% interval; a zero-width interval is shown as the fixed value it is.</summary>
    public static string Number(IntervalEstimate? estimate) => estimate is IntervalEstimate e
        ? e.Interval.Lower == e.Interval.Upper ? PeopleFormat.Number(e.Value) + " (fixed)"
            : PeopleFormat.Number(e.Value) + " (" + PeopleFormat.Number(e.Interval.Lower) + " to " + Upper(e.Interval, PeopleFormat.Number) + ")"
        : PeopleFormat.Missing;

    /// <summary>A fraction as a percentage with its 95% interval, for example <c>25.0% (13.8% to 41.0%)</c>.</summary>
    public static string Percent(IntervalEstimate estimate) =>
        PeopleFormat.Percent(estimate.Value) + " (" + PeopleFormat.Percent(estimate.Interval.Lower) + " to " + PeopleFormat.Percent(estimate.Interval.Upper) + ")";

    /// <summary>A whole count as tables show counts: <c>1,234</c>.</summary>
    public static string Count(int count) => count.ToString("#,0", CultureInfo.InvariantCulture);

    /// <summary>The service distribution's word in the network file.</summary>
    public static string Distribution(ServiceKind kind) => kind == ServiceKind.Lognormal ? "lognormal" : "exponential";

    /// <summary>Servers with the never-queued flag: <c>at least 12 (never queued)</c>.</summary>
    public static string Servers(UnitEvidence unit)
    {
        ArgumentNullException.ThrowIfNull(unit);
        return unit.Servers is int servers
            ? unit.NeverQueued ? "at least " + Count(servers) + " (never queued)" : Count(servers)
            : PeopleFormat.Missing;
    }

    /// <summary>Whether a profile is written, and if not why.</summary>
    public static string Decision(ProfileDecision decision) => decision switch
    {
        ProfileDecision.Written => "written",
        ProfileDecision.TooShort => "not written: extract too short",
        ProfileDecision.TooFewEntries => "not written: too few entries",
        _ => "not written: within chance of a constant rate",
    };

    /// <summary>The JSON word of a decision.</summary>
    public static string DecisionId(ProfileDecision decision) => decision switch
    {
        ProfileDecision.Written => "written",
        ProfileDecision.TooShort => "too_short",
        ProfileDecision.TooFewEntries => "too_few_entries",
        _ => "flat",
    };

    private static string Upper(Interval interval, Func<double, string> format) => interval.IsBounded ? format(interval.Upper) : "no upper limit";
}
