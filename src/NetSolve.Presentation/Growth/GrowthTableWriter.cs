using NetSolve.Analysis;
using NetSolve.Presentation.Formats;
using NetSolve.Presentation.Solution;

namespace NetSolve.Presentation.Growth;

/// <summary>
/// Writes a <see cref="GrowthResult"/> for people: the saturation order, the two thresholds, utilisation and mean
/// wait by growth factor for the units that saturate first, and a text chart of the first unit's wait.
/// </summary>
public static class GrowthTableWriter
{
    /// <summary>Most unit columns in the people's table (units that saturate first); the JSON and CSV hold every unit.</summary>
    public const int MaxTableColumns = 8;

    /// <summary>Width in characters of the longest bar in the text chart.</summary>
    public const int ChartWidth = 40;

    /// <summary>Writes the title, the saturation order, the findings, the two grids and the chart.</summary>
    public static void Write(GrowthResult growth, TextWriter output)
    {
        ArgumentNullException.ThrowIfNull(growth);
        ArgumentNullException.ThrowIfNull(output);
        output.Write($"{growth.Network.Name}: demand growth of {What(growth)}  ({SolutionTableWriter.Title(growth.Network.TimeUnit, growth.StrainThreshold)})\n\n");
        output.Write($"Saturation order (factor = multiple of today's {(growth.Stream is null ? "demand" : What(growth))})\n");
        PeopleTableWriter.Write(SaturationColumns.Table(growth), output);
        output.Write("\n" + Findings(growth) + "\n");
        if (!growth.BedLimits.IsEmpty)
        {
            output.Write("\nBed limits (a unit with a capacity is never unstable: it turns away or diverts; factor at which 1% and 5% of arrivals find it full, - = not by x1000)\n");
            PeopleTableWriter.Write(BedLimitColumns.Table(growth), output);
            output.Write("\n" + BedLimitFinding(growth) + "\n");
            if (!growth.Steps.IsEmpty)
            {
                var index = growth.Network.BuildIndex();
                output.Write("\nP(full) by growth factor  (share of arrivals turned away or diverted)\n");
                PeopleTableWriter.Write(GrowthStepColumns.Grid(growth, growth.BedLimits.Take(MaxTableColumns).Select(point => index[point.UnitId]), UnitColumns.PFull), output);
            }
        }

        var columns = Columns(growth);
        if (columns.Count == 0 || growth.Steps.IsEmpty)
        {
            return;
        }

        if (columns.Count < growth.Steps[0].Solution.Units.Length)
        {
            output.Write(columns.Count == MaxTableColumns
                ? $"\nColumns: the {MaxTableColumns} units that saturate first; --format csv or json gives every unit.\n"
                : "\nColumns: the units that can saturate; --format csv or json gives every unit.\n");
        }

        output.Write("\nUtilisation by growth factor\n");
        PeopleTableWriter.Write(GrowthStepColumns.Grid(growth, columns, UnitColumns.Utilisation), output);
        output.Write("\nMean wait by growth factor  (- = unstable: the queue grows without limit)\n");
        PeopleTableWriter.Write(GrowthStepColumns.Grid(growth, columns, UnitColumns.MeanWait), output);
        WriteChart(growth, columns[0], output);
    }

    /// <summary>The two threshold sentences.</summary>
    public static string Findings(GrowthResult growth)
    {
        ArgumentNullException.ThrowIfNull(growth);
        if (growth.FirstUnstable is not SaturationPoint unstable || growth.FirstStrained is not SaturationPoint strained)
        {
            return growth.BedLimits.IsEmpty || growth.Network.Units.Any(unit => unit.Capacity is null && !unit.Servers.IsUnlimited)
                ? $"No unit with finite servers carries the growing demand: growth of {What(growth)} never saturates any unit."
                : $"Every unit with finite servers has a bed limit: growth of {What(growth)} never makes any unit unstable.";
        }

        return $"First to cross the strain threshold: {strained.UnitId} at {Factor(strained.StrainFactor)}{Already(strained.StrainFactor, "strained")}.\n"
            + $"First to become unstable: {unstable.UnitId} at {Factor(unstable.SaturationFactor)}{Already(unstable.SaturationFactor, "unstable")}.";
    }

    /// <summary>The bed-limit sentence: the unit with a capacity that first turns away 1% of its arrivals, and when 5%.</summary>
    public static string BedLimitFinding(GrowthResult growth)
    {
        ArgumentNullException.ThrowIfNull(growth);
        var first = growth.BedLimits.Where(point => point.Full1PercentFactor is not null).OrderBy(point => point.Full1PercentFactor).FirstOrDefault();
        if (first is null)
        {
            return $"No unit with a bed limit turns away or diverts 1% of its arrivals by x{PeopleFormat.Factor(GrowthAnalysis.BedLimitSearchLimit)}.";
        }

        string fivePercent = first.Full5PercentFactor is double five
            ? $"5% at {Factor(five)}{Already(five, "there")}"
            : $"5% not by x{PeopleFormat.Factor(GrowthAnalysis.BedLimitSearchLimit)}";
        double one = first.Full1PercentFactor!.Value;
        return $"First bed limit to refuse 1% of arrivals: {first.UnitId} at {Factor(one)}{Already(one, "there")}; {fivePercent}.";
    }

    private static string Already(double factor, string state) => factor <= 1.0
        ? $" (already {state} at today's demand)"
        : $" ({PeopleFormat.Percent(factor - 1.0)} more demand)";

    private static string What(GrowthResult growth) => growth.Stream is null ? "all arrivals" : $"arrivals at {growth.Stream}";

    private static string Factor(double factor) => "x" + PeopleFormat.Factor(factor);

    private static List<int> Columns(GrowthResult growth)
    {
        var index = growth.Network.BuildIndex();
        return growth.Saturation.Take(MaxTableColumns).Select(point => index[point.UnitId]).ToList();
    }

    private static void WriteChart(GrowthResult growth, int column, TextWriter output)
    {
        var timeUnit = growth.Network.TimeUnit;
        var waits = growth.Steps.Select(step => UnitColumns.MeanWait.Read(step.Solution.Units[column])).ToList();
        double largest = waits.Max(wait => wait.Number ?? 0.0);
        var labels = growth.Steps.Select(step => Factor(step.Factor)).ToList();
        int labelWidth = labels.Max(label => label.Length);
        output.Write($"\nMean wait at {growth.Network.Units[column].Id}, the first unit to saturate  (charts: the report draws these numbers)\n");
        for (int k = 0; k < waits.Count; k++)
        {
            string bar = waits[k].Number is double wait
                ? new string('#', largest > 0.0 ? (int)Math.Round(ChartWidth * wait / largest) : 0).PadRight(ChartWidth) + " " + PeopleFormat.Cell(waits[k], timeUnit)
                : new string('!', ChartWidth) + " unstable";
            output.Write($"{labels[k].PadLeft(labelWidth)} |{bar}\n");
        }
    }
}
