using NetSolve.Fitting;
using NodaTime.Text;

namespace NetSolve.Cli.Commands;

/// <summary>
/// The notes <c>fit</c> puts beside its estimates, on the terminal and at the head of the network file: what was
/// read, the messy rows found and what was done with them, the stays cut by the extract, and the units whose
/// servers are only a lower bound.
/// </summary>
internal static class FitNotes
{
    private static readonly InstantPattern Time = InstantPattern.CreateWithInvariantCulture("uuuu-MM-dd'T'HH:mm:ss");

    /// <summary>
    /// The notes, one line each, without line breaks. <paramref name="withRowOrder"/> adds the count of rows out of
    /// time order: a fact about the file, not the data, so the network file leaves it out and stays the same
    /// byte for byte however the rows are ordered.
    /// </summary>
    public static IEnumerable<string> Lines(FittedNetwork fitted, bool withRowOrder)
    {
        var log = fitted.Log;
        var problems = withRowOrder ? log.Problems : log.Problems with { RowsOutOfOrder = 0 };
        yield return Messages.FitRead(log.Patients, log.Journeys, log.Stays, Time.Format(log.ExtractStart), Time.Format(log.ExtractEnd));
        yield return Messages.FitMessyRows(problems, log.Options.NewJourneyAfter.TotalHours);
        if (log.Problems.StillRunningAtEnd + log.Problems.RunningAtStart > 0)
        {
            yield return Messages.FitCensored(log.Problems.StillRunningAtEnd, log.Problems.RunningAtStart);
        }

        if (!log.HasStartTimes)
        {
            yield return Messages.FitNoStartTimes;
        }

        foreach (var unit in fitted.Units.Where(unit => unit.NeverQueued && unit.RosterServers is null))
        {
            yield return Messages.FitNeverQueued(unit.Id, unit.PeakInService);
        }
    }
}
