using NetSolve.Analysis;
using NetSolve.Model;
using NetSolve.Presentation.ByHour;
using NetSolve.Presentation.Formats;
using NetSolve.Presentation.Journeys;
using NetSolve.Solving;

namespace NetSolve.Presentation.Solution;

/// <summary>Writes a solution for people: a title, the unit table, the patient groups' table when the network has groups, the network totals and a one-line finding.</summary>
public static class SolutionTableWriter
{
    /// <summary>Writes the title line, the unit table, the groups' table (with groups only), the totals and the finding.</summary>
    public static void Write(NetworkSolution solution, TextWriter output)
    {
        ArgumentNullException.ThrowIfNull(solution);
        ArgumentNullException.ThrowIfNull(output);
        string average = !ByHourTableWriter.HasSection(solution) ? string.Empty : "; steady state at the daily average arrivals, by hour below";
        output.Write($"{solution.Network.Name}  ({Title(solution.Network.TimeUnit, solution.StrainThreshold)}{average})\n\n");
        PeopleTableWriter.Write(UnitColumns.For(solution), solution.Units, solution.Network.TimeUnit, output);
        if (!solution.Groups.IsEmpty)
        {
            output.Write("\nPatient groups\n");
            PeopleTableWriter.Write(GroupColumns.Table(solution), output);
        }

        output.Write("\n" + Totals(solution) + "\n");
        output.Write(Methods(solution) + "\n");
        output.Write(Finding(solution) + "\n");
        if (TargetWords.Finding(solution) is string targets)
        {
            output.Write(targets + "\n");
        }

        JourneyTableWriter.Write(JourneyFormula.Estimate(solution), solution.Network.TimeUnit, output);
        ByHourTableWriter.Write(solution, output);
    }

    /// <summary>What every table for people says in its title: the rates' time unit and the strain threshold.</summary>
    public static string Title(TimeUnit timeUnit, double strainThreshold) =>
        $"rates per {TimeConstants.Name(timeUnit)}, strain threshold {PeopleFormat.Percent(strainThreshold)}";

    /// <summary>One line: external arrivals, and when stable the patients and mean time in the network.</summary>
    public static string Totals(NetworkSolution solution)
    {
        ArgumentNullException.ThrowIfNull(solution);
        var totals = solution.Totals;
        var timeUnit = solution.Network.TimeUnit;
        string arrivals = "external arrivals " + PeopleFormat.Rate(totals.ExternalArrivalsPerHour, timeUnit)
            + (totals.TurnedAwayPerHour > 0.0 ? "   turned away " + PeopleFormat.Rate(totals.TurnedAwayPerHour, timeUnit) : string.Empty)
            + (totals.DivertedPerHour > 0.0 ? "   diverted " + PeopleFormat.Rate(totals.DivertedPerHour, timeUnit) : string.Empty);
        return solution.IsStable && totals is { MeanInSystem: double inSystem, MeanTimeInSystemHours: double hours }
            ? $"{arrivals}   patients in network {PeopleFormat.Number(inSystem)}   mean time in network {PeopleFormat.Time(hours)}"
            : arrivals + "   network totals: none, the network is unstable";
    }

    /// <summary>One line naming the method behind each unit's numbers: units listed by name, or counted when many.</summary>
    public static string Methods(NetworkSolution solution)
    {
        ArgumentNullException.ThrowIfNull(solution);
        const int NamedAtMost = 3;
        var parts = solution.Units.GroupBy(unit => unit.Method, StringComparer.Ordinal).Select(group =>
        {
            var ids = group.Select(unit => unit.Unit.Id).ToList();
            return group.Key + ": " + (ids.Count <= NamedAtMost ? string.Join(", ", ids) : $"{ids.Count} units");
        });
        return "methods: " + string.Join("; ", parts);
    }

    /// <summary>One sentence: which units are unstable, or which saturates first and at what growth.</summary>
    public static string Finding(NetworkSolution solution)
    {
        ArgumentNullException.ThrowIfNull(solution);
        var unstable = solution.Units.Where(unit => unit.Status == UnitStatus.Unstable).Select(unit => unit.Unit.Id).ToList();
        var bottleneck = solution.Units.FirstOrDefault(unit => unit.Status == UnitStatus.Bottleneck);
        var parts = new List<string>();
        if (unstable.Count > 0)
        {
            parts.Add($"UNSTABLE: {string.Join(", ", unstable)} cannot keep up with demand (utilisation at or above 100%); queues grow without limit");
        }

        if (bottleneck is { Headroom: double headroom })
        {
            parts.Add(unstable.Count > 0
                ? $"next to saturate: {bottleneck.Unit.Id} (headroom x{PeopleFormat.Factor(headroom)})"
                : $"bottleneck: {bottleneck.Unit.Id} saturates first, when all arrivals grow by {PeopleFormat.Percent(headroom - 1.0)} (headroom x{PeopleFormat.Factor(headroom)})");
        }

        return parts.Count == 0 ? "no unit with finite servers carries load" : string.Join("; ", parts);
    }
}
