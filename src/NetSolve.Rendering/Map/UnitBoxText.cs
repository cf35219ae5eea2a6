using System.Collections.Immutable;
using NetSolve.Model;
using NetSolve.Presentation;
using NetSolve.Solving;

namespace NetSolve.Rendering.Map;

/// <summary>The lines written in a unit's box: label, status glyph and word, servers and utilisation, mean wait.</summary>
internal static class UnitBoxText
{
    public static ImmutableArray<MapTextLine> For(UnitResult result, TimeUnit timeUnit, double arrivalPerHour, double exitPerHour)
    {
        var lines = ImmutableArray.CreateBuilder<MapTextLine>();
        foreach (string part in Wrap(result.Unit.Label, MapTypography.LabelSize))
        {
            lines.Add(new MapTextLine(part, MapTypography.LabelSize, IsBold: true));
        }

        var style = HarbourLightsPalette.For(result.Status);
        lines.Add(Detail(style.Glyph + " " + style.Word, bold: true));
        lines.Add(Detail(Servers(result), bold: false));
        if (!result.Unit.Servers.IsUnlimited)
        {
            lines.Add(Detail(Invariant.Percent(result.Utilisation) + " busy", bold: false));
        }

        lines.Add(Detail(Wait(result, timeUnit), bold: false));
        if (arrivalPerHour > 0.0)
        {
            lines.Add(Detail("in " + Units.ShortRate(arrivalPerHour, timeUnit), bold: false));
        }

        if (exitPerHour > 0.0)
        {
            lines.Add(Detail("out " + Units.ShortRate(exitPerHour, timeUnit), bold: false));
        }

        return lines.ToImmutable();
    }

    private static MapTextLine Detail(string text, bool bold) => new(text, MapTypography.DetailSize, bold);

    public static string Servers(UnitResult result) => result.Unit.Servers.IsUnlimited
        ? "unlimited servers"
        : Invariant.Number(result.Unit.Servers.Count) + (result.Unit.Servers.Count == 1 ? " server" : " servers");

    public static string Wait(UnitResult result, TimeUnit timeUnit)
    {
        if (result.MeanWaitHours is not double waitHours)
        {
            return "wait unbounded";
        }

        if (result.Unit.Servers.IsUnlimited)
        {
            return "no wait";
        }

        return "wait " + Units.ShortTime(waitHours, timeUnit);
    }

    /// <summary>Greedy word wrap at <see cref="MapTypography.MaxLabelWidth"/>; a single long word keeps its own line.</summary>
    public static IEnumerable<string> Wrap(string text, double fontSize)
    {
        string current = string.Empty;
        foreach (string word in text.Split(' ', StringSplitOptions.RemoveEmptyEntries))
        {
            string candidate = current.Length == 0 ? word : current + " " + word;
            if (current.Length > 0 && TextWidth.Of(candidate, fontSize, bold: true) > MapTypography.MaxLabelWidth)
            {
                yield return current;
                current = word;
            }
            else
            {
                current = candidate;
            }
        }

        if (current.Length > 0)
        {
            yield return current;
        }
    }
}
