using System.Collections.Immutable;
using NetSolve.Model;
using NetSolve.Rendering.Text;
using NetSolve.Solving;

namespace NetSolve.Rendering.Map;

/// <summary>The lines written in a unit's box: label, status glyph and word, servers and utilisation, mean wait.</summary>
internal static class UnitBoxText
{
    public static ImmutableArray<MapTextLine> For(UnitResult result, TimeUnit timeUnit)
    {
        var lines = ImmutableArray.CreateBuilder<MapTextLine>();
        foreach (string part in Wrap(result.Unit.Label, MapTypography.LabelSize))
        {
            lines.Add(new MapTextLine(part, MapTypography.LabelSize, IsBold: true));
        }

        var style = HarbourLightsPalette.For(result.Status);
        lines.Add(new MapTextLine(style.Glyph + " " + style.Word, MapTypography.DetailSize, IsBold: true));
        lines.Add(new MapTextLine(Capacity(result), MapTypography.DetailSize, IsBold: false));
        lines.Add(new MapTextLine(Wait(result, timeUnit), MapTypography.DetailSize, IsBold: false));
        return lines.ToImmutable();
    }

    public static string Capacity(UnitResult result) => result.Unit.Servers.IsUnlimited
        ? "unlimited servers"
        : Invariant.Number(result.Unit.Servers.Count) + (result.Unit.Servers.Count == 1 ? " server, " : " servers, ")
            + Invariant.Percent(result.Utilisation) + " busy";

    public static string Wait(UnitResult result, TimeUnit timeUnit)
    {
        if (result.MeanWaitHours is not double waitHours)
        {
            return "wait grows without limit";
        }

        if (result.Unit.Servers.IsUnlimited)
        {
            return "no wait (unlimited)";
        }

        return "mean wait " + Units.Time(waitHours, timeUnit);
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
