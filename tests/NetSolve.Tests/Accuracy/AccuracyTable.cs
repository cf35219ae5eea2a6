using System.Globalization;
using System.Text;

namespace NetSolve.Tests.Accuracy;

/// <summary>The accuracy study's table as docs/methods.md shows it: one row per unit, then the counts against the goals.</summary>
internal static class AccuracyTable
{
    /// <summary>The markdown table of docs/methods.md with its summary line.</summary>
    public static string Write(List<AccuracyRow> rows, int counted, int within, int differing, int notBetter)
    {
        var text = new StringBuilder();
        text.Append("| network | unit | servers | service | arrival cv | service cv | utilisation | simulated wait (h) | two-moment (h) | error | exponential (h) | error | method |\n");
        text.Append("|---|---|---|---|---|---|---|---|---|---|---|---|---|\n");
        foreach (var row in rows)
        {
            string mark = row.Counts ? "" : " (tiny)";
            text.Append(Invariant($"| {row.Network} | {row.UnitId}{mark} | {row.Servers} | {row.Family} | {Math.Sqrt(row.ArrivalScv):0.00} | {Math.Sqrt(row.ServiceScv):0.00} | {row.Utilisation:0.00} | "))
                .Append(Invariant($"{row.Simulated.Mean:0.0000} ± {row.Simulated.HalfWidth ?? 0.0:0.0000} | {row.TwoMoment:0.0000} | {Percent(row.TwoMomentError)} | "))
                .Append(Invariant($"{row.Exponential:0.0000} | {Percent(row.ExponentialError)} | {row.Method} |\n"));
        }

        text.Append(Invariant($"\n{within} of {counted} units within 15% ({(double)within / counted:0.0%}); {rows.Count - counted} units with a tiny wait left out; "))
            .Append(Invariant($"{differing - notBetter} of {differing} units with a cv different from 1 closer than the exponential formula.\n"));
        return text.ToString();
    }

    private static string Percent(double error) => double.IsFinite(error)
        ? Math.Round(error * 100.0, 1).ToString("+0.0;-0.0;0.0", CultureInfo.InvariantCulture) + "%"
        : "-";

    public static string Invariant(FormattableString text) => text.ToString(CultureInfo.InvariantCulture);
}
