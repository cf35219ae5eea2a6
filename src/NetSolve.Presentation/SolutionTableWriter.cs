using NetSolve.Model;
using NetSolve.Solving;

namespace NetSolve.Presentation;

/// <summary>Writes a solution as an aligned table for people, with status flags that stand out without colour.</summary>
public static class SolutionTableWriter
{
    /// <summary>The marker printed before each status word, so that status reads at a glance in plain text.</summary>
    public static string Marker(UnitStatus status) => status switch
    {
        UnitStatus.Unstable => "!!",
        UnitStatus.Bottleneck => ">>",
        UnitStatus.Strained => " !",
        _ => "  ",
    };

    /// <summary>Writes the title line, the unit table, the totals and a one-line finding.</summary>
    public static void Write(NetworkSolution solution, TextWriter output)
    {
        ArgumentNullException.ThrowIfNull(solution);
        ArgumentNullException.ThrowIfNull(output);
        var timeUnit = solution.Network.TimeUnit;
        string per = "/" + TimeConstants.Suffix(timeUnit);
        string time = "(" + TimeConstants.Suffix(timeUnit) + ")";
        output.Write($"{solution.Network.Name}  (times in {TimeConstants.Name(timeUnit)}s, strain threshold {Numbers.Percent(solution.StrainThreshold)})\n\n");

        var table = new TextTable("unit", ">servers", ">arrivals" + per, ">visits", ">load", ">util", ">P(wait)",
            ">queue", ">wait " + time, ">in unit", ">time " + time, ">headroom", "status");
        foreach (var result in solution.Units)
        {
            var unit = UnitView.From(result, timeUnit);
            table.Add(
                unit.Id,
                unit.Servers?.ToString(System.Globalization.CultureInfo.InvariantCulture) ?? "unlimited",
                Numbers.Compact(unit.ArrivalRate),
                Numbers.Fixed(unit.VisitsPerPatient, 3),
                Numbers.Compact(unit.OfferedLoad),
                Numbers.Percent(unit.Utilisation),
                Numbers.Fixed(unit.PWait, 3),
                Numbers.Compact(unit.MeanQueue),
                Numbers.Compact(unit.MeanWait),
                Numbers.Compact(unit.MeanInUnit),
                Numbers.Compact(unit.MeanTimeInUnit),
                Numbers.Fixed(unit.Headroom, 3),
                Marker(result.Status) + " " + unit.Status);
        }

        table.Write(output);
        WriteTotals(solution, output, per, time);
    }

    private static void WriteTotals(NetworkSolution solution, TextWriter output, string per, string time)
    {
        var timeUnit = solution.Network.TimeUnit;
        var totals = solution.Totals;
        output.Write("\n");
        output.Write($"external arrivals {Numbers.Compact(TimeConstants.RateFromPerHour(totals.ExternalArrivalsPerHour, timeUnit))}{per}");
        if (solution.IsStable)
        {
            output.Write($"   patients in network {Numbers.Compact(totals.MeanInSystem)}");
            output.Write($"   mean time in network {Numbers.Compact(totals.MeanTimeInSystemHours is double h ? TimeConstants.FromHours(h, timeUnit) : null)} {time}\n");
        }
        else
        {
            output.Write("   network totals: none, the network is unstable\n");
        }

        output.Write(Finding(solution) + "\n");
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
            string growth = Numbers.Percent(headroom - 1.0);
            parts.Add(unstable.Count > 0
                ? $"next to saturate: {bottleneck.Unit.Id} (headroom x{Numbers.Fixed(headroom, 3)})"
                : $"bottleneck: {bottleneck.Unit.Id} saturates first, when all arrivals grow by {growth} (headroom x{Numbers.Fixed(headroom, 3)})");
        }

        return parts.Count == 0 ? "no unit with finite servers carries load" : string.Join("; ", parts);
    }
}
