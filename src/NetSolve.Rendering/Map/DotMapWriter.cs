using System.Globalization;
using System.Text;
using NetSolve.Model;
using NetSolve.Presentation.Formats;

namespace NetSolve.Rendering.Map;

/// <summary>Writes a laid-out map as Graphviz DOT, with the same texts, colours, borders and line kinds as the SVG.</summary>
/// <remarks>
/// Graphviz does its own layout; the main direction becomes <c>rankdir</c>. Pen widths follow the map's proportional
/// widths; a large map's light flows are pale, as in the SVG. External arrivals and exits become small point nodes (<c>arrivals:ID</c>, <c>exit:ID</c>) with labelled edges.
/// </remarks>
public static class DotMapWriter
{
    /// <summary>The DOT text of <paramref name="layout"/>.</summary>
    public static string Write(MapLayout layout)
    {
        ArgumentNullException.ThrowIfNull(layout);
        var dot = new StringBuilder();
        dot.Append("digraph ").Append(Quote(layout.Title)).Append(" {\n");
        dot.Append("  graph [rankdir=").Append(layout.Direction == MapDirection.TopToBottom ? "TB" : "LR")
            .Append(", fontname=\"DejaVu Sans\", labelloc=t, label=").Append(Quote(MapLegend.ShownTitle(layout) + " (rates per " + TimeConstants.Name(layout.TimeUnit) + ")" + (MapLegend.ShownSubtitle(layout) is string subtitle ? "\n" + subtitle : string.Empty))).Append("];\n");
        dot.Append("  node [shape=box, fontname=\"DejaVu Sans\", fontsize=11];\n");
        dot.Append("  edge [fontname=\"DejaVu Sans\", fontsize=10];\n");
        foreach (var node in layout.Nodes)
        {
            dot.Append("  ").Append(Quote(node.UnitId)).Append(" [").Append(UnitAttributes(node)).Append("];\n");
            if (node.Arrival is { } arrival)
            {
                string id = "arrivals:" + node.UnitId;
                dot.Append("  ").Append(Quote(id)).Append(" [shape=point, xlabel=\"from outside\"];\n");
                Edge(dot, id, node.UnitId, arrival.RateText, arrival.StrokeWidth, MapColours.BoundaryLine, dashed: false);
            }

            if (node.Exit is { } exit)
            {
                string id = "exit:" + node.UnitId;
                dot.Append("  ").Append(Quote(id)).Append(" [shape=point, xlabel=\"leave\"];\n");
                Edge(dot, node.UnitId, id, exit.RateText, exit.StrokeWidth, MapColours.BoundaryLine, dashed: false);
            }

            if (node.TurnedAway is { } away)
            {
                string id = "turned-away:" + node.UnitId;
                dot.Append("  ").Append(Quote(id)).Append(" [shape=point, xlabel=\"turned away\"];\n");
                Edge(dot, node.UnitId, id, away.RateText, away.StrokeWidth, MapColours.BoundaryLine, dashed: true);
            }
        }

        foreach (var edge in layout.Edges)
        {
            bool dashed = edge.Kind != MapEdgeKind.Forward;
            string colour = dashed ? MapColours.FeedbackLine : MapColours.ForwardLine;
            Edge(dot, edge.From, edge.To, edge.RateText, edge.StrokeWidth, edge.Faint ? Pale(colour) : colour, dashed, ranks: edge.Kind == MapEdgeKind.Forward);
        }

        dot.Append("}\n");
        return dot.ToString();
    }

    /// <summary>
    /// A light flow's colour as the SVG draws it: the line's colour at <see cref="MapColours.FaintOpacity"/>, written
    /// as Graphviz's <c>#RRGGBBAA</c>, so the heavy flows stand out in the DOT drawing too.
    /// </summary>
    internal static string Pale(string colour) =>
        colour + ((int)Math.Round(255.0 * double.Parse(MapColours.FaintOpacity, CultureInfo.InvariantCulture))).ToString("X2", CultureInfo.InvariantCulture);

    // ranks is false for a return route or diversion: Graphviz then leaves it out of ranking, so its own layout
    // keeps the heaviest flow running down the page as the SVG map does, rather than breaking cycles its own way.
    private static void Edge(StringBuilder dot, string from, string to, string rate, double width, string colour, bool dashed, bool ranks = true)
    {
        dot.Append("  ").Append(Quote(from)).Append(" -> ").Append(Quote(to))
            .Append(" [label=").Append(Quote(rate))
            .Append(", penwidth=").Append(Coordinates.Format(width))
            .Append(", color=").Append(Quote(colour));
        if (dashed)
        {
            dot.Append(", style=dashed");
        }

        if (!ranks)
        {
            dot.Append(", constraint=false");
        }

        dot.Append("];\n");
    }

    private static string UnitAttributes(MapNode node)
    {
        var style = HarbourLightsPalette.For(node.Status);
        string label = string.Join("\n", node.Lines.Select(line => line.Text));
        string border = style.BorderDash.Length == 0 ? "solid" : style.BorderDash.StartsWith('2') ? "dotted" : "dashed";
        return string.Create(CultureInfo.InvariantCulture,
            $"style=\"filled,{border}\", fillcolor={Quote(style.Fill)}, fontcolor={Quote(style.Text)}, color={Quote(style.Border)}, penwidth={Coordinates.Format(style.BorderWidth)}, peripheries={(style.DoubleBorder ? 2 : 1)}, label={Quote(label)}{(node.FullLabel is null ? string.Empty : ", tooltip=" + Quote(SvgMapWriter.Tooltip(node)))}");
    }

    /// <summary>A DOT quoted string: backslash and double quote escaped, line breaks as <c>\n</c>, no other control character.</summary>
    internal static string Quote(string text)
    {
        // Each line cleaned on its own, so the line breaks we put between a box's lines survive and nothing else does.
        string safe = string.Join('\n', text.Replace("\r", string.Empty, StringComparison.Ordinal).Split('\n').Select(SafeText.ForDisplay));
        return "\"" + safe.Replace("\\", "\\\\", StringComparison.Ordinal)
            .Replace("\"", "\\\"", StringComparison.Ordinal)
            .Replace("\n", "\\n", StringComparison.Ordinal) + "\"";
    }
}
