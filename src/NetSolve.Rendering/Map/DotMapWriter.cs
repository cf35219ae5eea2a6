using System.Globalization;
using System.Text;
using NetSolve.Model;
using NetSolve.Rendering.Text;

namespace NetSolve.Rendering.Map;

/// <summary>Writes a laid-out map as Graphviz DOT, with the same texts, colours, borders and line kinds as the SVG.</summary>
/// <remarks>Graphviz does its own layout; the main direction becomes <c>rankdir</c>. Pen widths follow the map's proportional widths.</remarks>
public static class DotMapWriter
{
    /// <summary>The DOT text of <paramref name="layout"/>.</summary>
    public static string Write(MapLayout layout)
    {
        ArgumentNullException.ThrowIfNull(layout);
        var dot = new StringBuilder();
        dot.Append("digraph ").Append(Quote(layout.Title)).Append(" {\n");
        dot.Append("  graph [rankdir=").Append(layout.Direction == MapDirection.TopToBottom ? "TB" : "LR")
            .Append(", fontname=\"DejaVu Sans\", labelloc=t, label=").Append(Quote(layout.Title + " (rates per " + TimeConstants.Name(layout.TimeUnit) + ")")).Append("];\n");
        dot.Append("  node [fontname=\"DejaVu Sans\", fontsize=11];\n");
        dot.Append("  edge [fontname=\"DejaVu Sans\", fontsize=10];\n");
        foreach (var node in layout.Nodes)
        {
            dot.Append("  ").Append(Quote(node.Id)).Append(" [").Append(NodeAttributes(node)).Append("];\n");
        }

        foreach (var edge in layout.Edges)
        {
            dot.Append("  ").Append(Quote(edge.From)).Append(" -> ").Append(Quote(edge.To)).Append(" [")
                .Append("label=").Append(Quote(edge.RateText))
                .Append(", penwidth=").Append(Invariant.Coordinate(edge.StrokeWidth))
                .Append(", color=").Append(Quote(EdgeColour(edge.Kind)));
            if (edge.Kind == MapEdgeKind.Feedback)
            {
                dot.Append(", style=dashed");
            }

            dot.Append("];\n");
        }

        dot.Append("}\n");
        return dot.ToString();
    }

    private static string NodeAttributes(MapNode node)
    {
        string label = string.Join("\n", node.Lines.Select(line => line.Text));
        if (node.Kind != MapNodeKind.Unit)
        {
            return string.Create(CultureInfo.InvariantCulture,
                $"shape=box, style=\"rounded,filled\", fillcolor={Quote(MapColours.MarkerFill)}, color={Quote(MapColours.BoundaryLine)}, label={Quote(label)}");
        }

        var style = HarbourLightsPalette.For(node.Status);
        string border = style.BorderDash.Length == 0 ? "solid" : style.BorderDash.StartsWith('2') ? "dotted" : "dashed";
        return string.Create(CultureInfo.InvariantCulture,
            $"shape=box, style=\"filled,{border}\", fillcolor={Quote(style.Fill)}, fontcolor={Quote(style.Text)}, color={Quote(style.Border)}, penwidth={Invariant.Coordinate(style.BorderWidth)}, peripheries={(style.DoubleBorder ? 2 : 1)}, label={Quote(label)}");
    }

    private static string EdgeColour(MapEdgeKind kind) => kind switch
    {
        MapEdgeKind.Feedback => MapColours.FeedbackLine,
        MapEdgeKind.Arrival or MapEdgeKind.Exit => MapColours.BoundaryLine,
        _ => MapColours.ForwardLine,
    };

    /// <summary>A DOT quoted string: backslash and double quote escaped, line breaks as <c>\n</c>.</summary>
    internal static string Quote(string text) =>
        "\"" + text.Replace("\\", "\\\\", StringComparison.Ordinal)
            .Replace("\"", "\\\"", StringComparison.Ordinal)
            .Replace("\r", string.Empty, StringComparison.Ordinal)
            .Replace("\n", "\\n", StringComparison.Ordinal) + "\"";
}
