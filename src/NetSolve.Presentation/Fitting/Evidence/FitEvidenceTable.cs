using NetSolve.Fitting.Estimation;
using NetSolve.Model;
using NetSolve.Presentation.Formats;
using NetSolve.Presentation.Metrics;

namespace NetSolve.Presentation.Fitting.Evidence;

/// <summary>The fit evidence for people: the per-unit table, the routes with their intervals, the profiles, then the warnings.</summary>
public static class FitEvidenceTable
{
    /// <summary>What every interval in the evidence is.</summary>
    public const string IntervalNote = "Intervals are 95%: each misses the true value about one time in twenty by chance.";

    /// <summary>The per-unit table of <paramref name="rows"/>.</summary>
    public static ResultTable Table(IEnumerable<FitEvidenceRow> rows, TimeUnit timeUnit) => ResultTable.Build(FitEvidenceColumns.All, rows, timeUnit);

    /// <summary>Writes the evidence of <paramref name="evidence"/> as text for people.</summary>
    public static void Write(NetworkEvidence evidence, IReadOnlyDictionary<string, double?>? predictedWaitHours, TimeUnit timeUnit, TextWriter output)
    {
        ArgumentNullException.ThrowIfNull(evidence);
        ArgumentNullException.ThrowIfNull(output);
        output.WriteLine("Fit evidence over " + PeopleFormat.Time(evidence.Window.Hours) + " of extract: "
            + EvidenceWords.Count(evidence.Stays) + " stays, " + EvidenceWords.Count(evidence.Censored) + " still running at its end. " + IntervalNote);
        PeopleTableWriter.Write(Table(FitEvidenceRow.For(evidence, predictedWaitHours), timeUnit), output);
        output.WriteLine();
        output.WriteLine("Routes (share of the departures: stays that ended, side visits left out; 95%):");
        foreach (var unit in evidence.Units)
        {
            foreach (var route in unit.Routes)
            {
                output.WriteLine("  " + SafeText.ForDisplay(unit.UnitId) + " -> " + SafeText.ForDisplay(route.ToUnitId) + ": "
                    + EvidenceWords.Percent(route.Fraction) + ", " + EvidenceWords.Count(route.Count) + " of " + EvidenceWords.Count(route.Total));
            }
        }

        output.WriteLine("Entries: " + EvidenceWords.Count(evidence.Entries.Count) + ", " + PeopleFormat.Rate(evidence.Entries.PerHour.Value, timeUnit)
            + " (" + PeopleFormat.Rate(evidence.Entries.PerHour.Interval.Lower, timeUnit) + " to " + PeopleFormat.Rate(evidence.Entries.PerHour.Interval.Upper, timeUnit) + ")");
        output.WriteLine("Arrival profile by hour of day: " + EvidenceWords.Decision(evidence.Profile.HourOfDay.Decision)
            + "; by day of week: " + EvidenceWords.Decision(evidence.Profile.DayOfWeek.Decision));
        foreach (var warning in evidence.Warnings)
        {
            output.WriteLine("warning: " + SafeText.ForDisplay(warning.Message));
        }
    }
}
