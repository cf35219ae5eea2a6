using System.Collections.Immutable;
using NetSolve.Model;
using NetSolve.Presentation;
using NetSolve.Presentation.Formats;
using NetSolve.Presentation.Solution;
using NetSolve.Solving;

namespace NetSolve.Rendering.Map;

/// <summary>The lines written in a unit's box: label, status glyph and word, servers and utilisation, mean wait, rates in and out; P(full) and the turned-away rate for a unit with a capacity.</summary>
/// <remarks>
/// Every value is the registry's (<see cref="UnitColumns"/>) in <see cref="PeopleFormat"/>, so a box shows exactly
/// what the solve table shows: <c>1,200 servers</c>, <c>84.9% busy</c>, <c>wait 4.177 min</c>. Two waits are words
/// rather than numbers: <c>no wait</c> at a unit with unlimited servers, <c>wait unbounded</c> at an unstable one.
/// </remarks>
internal static class UnitBoxText
{
    public static ImmutableArray<MapTextLine> For(UnitResult result, TimeUnit timeUnit, double arrivalPerHour, double exitPerHour)
    {
        var lines = ImmutableArray.CreateBuilder<MapTextLine>();
        foreach (string part in Wrap(SafeText.ForDisplay(result.Unit.Label), MapTypography.LabelSize))
        {
            lines.Add(new MapTextLine(part, MapTypography.LabelSize, IsBold: true));
        }

        lines.Add(Detail(HarbourLightsPalette.Text(result.Status), bold: true));
        if (!result.TargetsBreached.IsEmpty)
        {
            lines.Add(Detail(TargetMissed(result), bold: true));
        }

        lines.Add(Detail(Servers(result, timeUnit), bold: false));
        if (!result.Unit.Servers.IsUnlimited)
        {
            lines.Add(Detail(ShownValue.Of(UnitColumns.Utilisation, result, timeUnit) + " busy", bold: false));
        }

        lines.Add(Detail(Wait(result, timeUnit), bold: false));
        if (arrivalPerHour > 0.0)
        {
            lines.Add(Detail("in " + PeopleFormat.Rate(arrivalPerHour, timeUnit), bold: false));
        }

        if (exitPerHour > 0.0)
        {
            lines.Add(Detail("out " + PeopleFormat.Rate(exitPerHour, timeUnit), bold: false));
        }

        if (result.Unit.Capacity is not null)
        {
            lines.Add(Detail("P(full) " + PeopleFormat.Percent(result.PFull), bold: false));
            if (result.TurnedAwayPerHour > 0.0)
            {
                lines.Add(Detail(TurnedAway(result, timeUnit), bold: false));
            }
        }

        return lines.ToImmutable();
    }

    /// <summary>
    /// The shorter box of a large map: the label on one line (cut with an ellipsis at
    /// <see cref="MapTypography.MaxCompactLabelWidth"/>), the status, a missed target, utilisation and mean wait; the
    /// rates in and out are left to the arrows and the unit table.
    /// </summary>
    public static ImmutableArray<MapTextLine> Compact(UnitResult result, TimeUnit timeUnit)
    {
        var lines = ImmutableArray.CreateBuilder<MapTextLine>();
        lines.Add(new MapTextLine(CompactLabel(result.Unit.Label), MapTypography.LabelSize, IsBold: true));
        lines.Add(Detail(HarbourLightsPalette.Text(result.Status), bold: true));
        if (!result.TargetsBreached.IsEmpty)
        {
            lines.Add(Detail(TargetMissed(result), bold: true));
        }

        if (!result.Unit.Servers.IsUnlimited)
        {
            lines.Add(Detail(ShownValue.Of(UnitColumns.Utilisation, result, timeUnit) + " busy", bold: false));
        }

        lines.Add(Detail(Wait(result, timeUnit), bold: false));
        return lines.ToImmutable();
    }

    /// <summary>The label as a large map's box shows it: one line, cut with an ellipsis where too wide.</summary>
    public static string CompactLabel(string label) =>
        Ellipsis.Fit(SafeText.ForDisplay(label), MapTypography.MaxCompactLabelWidth, MapTypography.LabelSize, bold: true);

    /// <summary>The mark beside the status of a unit that misses a target, naming the targets: <c>x missed: mean_wait</c>.</summary>
    public static string TargetMissed(UnitResult result) => TargetWords.BreachMarker + " missed: " + TargetWords.Breached(result);

    /// <summary>The turned-away rate as the table shows it, with its unit: <c>turned away 0.02/h</c>.</summary>
    public static string TurnedAway(UnitResult result, TimeUnit timeUnit) =>
        "turned away " + ShownValue.Of(UnitColumns.TurnedAwayRate, result, timeUnit) + "/" + TimeConstants.Suffix(timeUnit);

    /// <summary>The diverted rate as the table shows it, with its unit: <c>diverted 0.07/h</c>.</summary>
    public static string Diverted(UnitResult result, TimeUnit timeUnit) =>
        "diverted " + ShownValue.Of(UnitColumns.DivertedRate, result, timeUnit) + "/" + TimeConstants.Suffix(timeUnit);

    private static MapTextLine Detail(string text, bool bold) => new(text, MapTypography.DetailSize, bold);

    /// <summary>The servers as the table shows them, then the word: <c>1 server</c>, <c>1,200 servers</c>, <c>unlimited servers</c>.</summary>
    public static string Servers(UnitResult result, TimeUnit timeUnit) =>
        ShownValue.Of(UnitColumns.Servers, result, timeUnit) + (result.Unit.Servers.Count == 1 ? " server" : " servers");

    /// <summary>The mean wait as the table shows it (<c>wait 4.177 min</c>); <c>no wait</c> or <c>wait unbounded</c> where it is no number to plan with.</summary>
    public static string Wait(UnitResult result, TimeUnit timeUnit)
    {
        if (result.MeanWaitHours is null)
        {
            return "wait unbounded";
        }

        if (result.Unit.Servers.IsUnlimited)
        {
            return "no wait";
        }

        return "wait " + ShownValue.Of(UnitColumns.MeanWait, result, timeUnit);
    }

    /// <summary>True when the box shows <paramref name="label"/> shortened, so the full text goes in its tooltip.</summary>
    public static bool IsShortened(string label) => Wrap(SafeText.ForDisplay(label), MapTypography.LabelSize).Any(line => line.EndsWith(Ellipsis.Mark, StringComparison.Ordinal));

    /// <summary>
    /// Greedy word wrap at <see cref="MapTypography.MaxLabelWidth"/>, at most <see cref="MapTypography.MaxLabelLines"/>
    /// lines; a single long word keeps its own line up to <see cref="MapTypography.MaxLabelWordWidth"/>. What does not
    /// fit is cut with an ellipsis, so a box stays a box whatever the label's length.
    /// </summary>
    public static IEnumerable<string> Wrap(string text, double fontSize)
    {
        var lines = new List<string>();
        string current = string.Empty;
        foreach (string word in text.Split(' ', StringSplitOptions.RemoveEmptyEntries))
        {
            string candidate = current.Length == 0 ? word : current + " " + word;
            if (current.Length > 0 && TextWidth.Of(candidate, fontSize, bold: true) > MapTypography.MaxLabelWidth)
            {
                lines.Add(current);
                current = word;
                if (lines.Count == MapTypography.MaxLabelLines)
                {
                    lines[^1] = Ellipsis.Fit(lines[^1] + " " + current + Ellipsis.Mark, MapTypography.MaxLabelWidth, fontSize, bold: true);
                    current = string.Empty;
                    break;
                }
            }
            else
            {
                current = candidate;
            }
        }

        if (current.Length > 0)
        {
            lines.Add(current);
        }

        return lines.Select(line => Ellipsis.Fit(line, MapTypography.MaxLabelWordWidth, fontSize, bold: true));
    }
}
