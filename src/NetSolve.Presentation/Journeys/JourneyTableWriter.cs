using System.Collections.Immutable;
using NetSolve.Analysis;
using NetSolve.Model;
using NetSolve.Presentation.Formats;
using NetSolve.Presentation.Metrics;
using NetSolve.Simulation;

namespace NetSolve.Presentation.Journeys;

/// <summary>Writes the "Journeys" section for people: one row per journey (and patient group), then what each covers.</summary>
public static class JourneyTableWriter
{
    /// <summary>The formula's section; nothing when the network defines no journey.</summary>
    public static void Write(ImmutableArray<JourneyEstimate> rows, TimeUnit timeUnit, TextWriter output)
    {
        ArgumentNullException.ThrowIfNull(output);
        if (rows.IsDefaultOrEmpty)
        {
            return;
        }

        output.Write("\nJourneys (time from entering the set of units to leaving it; formula: phase-type over the routes, docs/methods.md)\n");
        PeopleTableWriter.Write(JourneyColumns.Table(rows, timeUnit), output);
        Covers(rows.Select(row => row.Journey), output);
    }

    /// <summary>The simulation's section; nothing when the network defines no journey.</summary>
    public static void Write(ImmutableArray<SimulatedJourney> rows, TimeUnit timeUnit, TextWriter output)
    {
        ArgumentNullException.ThrowIfNull(output);
        if (rows.IsDefaultOrEmpty)
        {
            return;
        }

        output.Write("\nJourneys (time from entering the set of units to leaving it, per patient; 95% intervals)\n");
        PeopleTableWriter.Write(SimulatedJourneyColumns.Table(rows, timeUnit, Audience.People), output);
        Covers(rows.Select(row => row.Journey), output);
    }

    private static void Covers(IEnumerable<Journey> journeys, TextWriter output)
    {
        foreach (var journey in journeys.DistinctBy(journey => journey.Id, StringComparer.Ordinal))
        {
            output.Write($"{journey.Id}: {journey.Label}; units {string.Join(", ", journey.UnitIds)}\n");
        }
    }
}
