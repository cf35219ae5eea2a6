using System.Globalization;
using NetSolve.Solving;

namespace NetSolve.Presentation;

/// <summary>Writes a solution as CSV: a header, then one row per unit; columns as in the JSON contract.</summary>
public static class SolutionCsvWriter
{
    /// <summary>The header row.</summary>
    public const string Header = "id,label,servers,arrival_rate,visits_per_patient,offered_load,utilisation,p_wait,mean_queue,mean_wait,mean_in_unit,mean_time_in_unit,headroom,status";

    /// <summary>Writes <paramref name="solution"/> to <paramref name="output"/>; empty cells stand for null.</summary>
    public static void Write(NetworkSolution solution, TextWriter output)
    {
        ArgumentNullException.ThrowIfNull(solution);
        ArgumentNullException.ThrowIfNull(output);
        output.Write(Header + "\n");
        foreach (var result in solution.Units)
        {
            var unit = UnitView.From(result, solution.Network.TimeUnit);
            string[] cells =
            [
                Text(unit.Id), Text(unit.Label), unit.Servers?.ToString(CultureInfo.InvariantCulture) ?? "unlimited",
                Number(unit.ArrivalRate), Number(unit.VisitsPerPatient), Number(unit.OfferedLoad), Number(unit.Utilisation),
                Number(unit.PWait), Number(unit.MeanQueue), Number(unit.MeanWait), Number(unit.MeanInUnit),
                Number(unit.MeanTimeInUnit), Number(unit.Headroom), unit.Status,
            ];
            output.Write(string.Join(',', cells) + "\n");
        }
    }

    /// <summary>A number in invariant culture, round-trip precision; empty for null.</summary>
    public static string Number(double? value) => value?.ToString("R", CultureInfo.InvariantCulture) ?? string.Empty;

    /// <summary>Quotes a text cell when it holds a comma, quote or line break (RFC 4180).</summary>
    public static string Text(string value)
    {
        ArgumentNullException.ThrowIfNull(value);
        return value.AsSpan().IndexOfAny(",\"\n\r") >= 0 ? "\"" + value.Replace("\"", "\"\"", StringComparison.Ordinal) + "\"" : value;
    }
}
