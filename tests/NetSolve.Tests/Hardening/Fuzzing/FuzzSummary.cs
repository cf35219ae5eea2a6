using System.Globalization;
using System.Text;

namespace NetSolve.Tests.Hardening.Fuzzing;

/// <summary>The campaign's report as Markdown, for docs/hardening.md.</summary>
internal static class FuzzSummary
{
    /// <summary>Marks the start of the part of docs/hardening.md the long run rewrites.</summary>
    public const string Start = "<!-- measured fuzzing summary: written by the long run, do not edit by hand -->";

    /// <summary>Marks its end.</summary>
    public const string End = "<!-- end of measured fuzzing summary -->";

    /// <summary>The summary of <paramref name="report"/>, made by <paramref name="command"/> with <paramref name="seed"/>.</summary>
    public static string Markdown(FuzzReport report, string command, int seed)
    {
        var text = new StringBuilder();
        var invariant = CultureInfo.InvariantCulture;
        text.Append(invariant, $"{report.Total:N0} inputs from seed {seed}, in {report.Elapsed.TotalMinutes:0.0} min ({report.Total / Math.Max(report.Elapsed.TotalSeconds, 1e-9):0.0} inputs a second, {report.Workers} workers), made by\n\n```sh\n{command}\n```\n\n");
        text.Append("| surface | inputs | exit 0 | exit 1 | exit 2 | other | failing |\n|---|---:|---:|---:|---:|---:|---:|\n");
        foreach (var surface in InputGenerator.Surfaces)
        {
            int Exits(int code) => report.ExitCodes.GetValueOrDefault((surface, code));
            int other = report.ExitCodes.Where(entry => entry.Key.Surface == surface && entry.Key.ExitCode is not (0 or 1 or 2)).Sum(entry => entry.Value);
            text.Append(invariant, $"| {surface} | {report.Inputs.GetValueOrDefault(surface)} | {Exits(0)} | {Exits(1)} | {Exits(2)} | {other} | {report.Failing.GetValueOrDefault(surface)} |\n");
        }

        text.Append('\n');
        foreach (var kind in Enum.GetValues<FuzzFailureKind>())
        {
            text.Append(invariant, $"- {kind}: {report.ByKind.GetValueOrDefault(kind)} inputs\n");
        }

        text.Append(invariant, $"- largest working set of the test process during a run: {report.PeakWorkingSet / (1024.0 * 1024.0):0} MB (limit {FuzzRunner.MemoryLimit / (1024 * 1024)} MB)\n");
        text.Append(invariant, $"- slowest input in wall time: {report.Slowest.TotalSeconds:0.00} s ({report.SlowestCommand}; a hang is over {FuzzRunner.HangLimit.TotalSeconds:0} s of processor time, or still running after {FuzzRunner.GiveUpLimit.TotalSeconds:0} s)\n");
        int total = Math.Max(report.Total, 1);
        text.Append(invariant, $"- harness time per input, beside the runs: {report.Generating.TotalMilliseconds / total:0.0} ms drawing it, {report.Harness.TotalMilliseconds / total:0.0} ms writing its files, checking what it gave and removing its folder\n");
        text.Append("\nWhere the time went (run time summed over the workers):\n\n| command | inputs | mean run time |\n|---|---:|---:|\n");
        foreach (var (name, (inputs, time)) in report.ByCommand.OrderByDescending(entry => entry.Value.Time))
        {
            text.Append(invariant, $"| {Cell(name)} | {inputs} | {time.TotalMilliseconds / inputs:0} ms |\n");
        }

        if (report.Classes.Count > 0)
        {
            text.Append("\nFailure classes, each with its (minimised) example:\n\n| kind | seen | finding | example command |\n|---|---:|---|---|\n");
            foreach (var (failureClass, (count, example, finding)) in report.Classes.OrderByDescending(entry => entry.Value.Count))
            {
                text.Append(invariant, $"| {failureClass.Kind} | {count} | {Cell(finding.Detail)} | `{Cell(string.Join(' ', example.Arguments))}` |\n");
            }
        }

        return text.ToString();
    }

    /// <summary>Replaces the measured part of <paramref name="document"/> with <paramref name="summary"/> (or appends it).</summary>
    public static string Replace(string document, string summary)
    {
        int start = document.IndexOf(Start, StringComparison.Ordinal);
        int end = document.IndexOf(End, StringComparison.Ordinal);
        string block = Start + "\n" + summary + End;
        return start >= 0 && end > start
            ? string.Concat(document.AsSpan(0, start), block, document.AsSpan(end + End.Length))
            : document.TrimEnd() + "\n\n" + block + "\n";
    }

    private static string Cell(string text)
    {
        string shown = CliInvariant.Shorten(text).Replace("|", "\\|", StringComparison.Ordinal).Replace("`", "'", StringComparison.Ordinal);
        return shown.Length > 120 ? shown[..120] + "..." : shown;
    }
}
