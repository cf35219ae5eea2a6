namespace NetSolve.Rendering.Map;

/// <summary>Shortens a text to a width with an ellipsis, so one very long label or name cannot widen the map.</summary>
internal static class Ellipsis
{
    /// <summary>The mark that ends a shortened text.</summary>
    public const string Mark = "\u2026";

    /// <summary>
    /// <paramref name="text"/> when it fits <paramref name="maxWidth"/>; else its longest start that fits with
    /// <see cref="Mark"/> after it (trailing spaces dropped, a surrogate pair never split).
    /// </summary>
    public static string Fit(string text, double maxWidth, double fontSize, bool bold)
    {
        ArgumentNullException.ThrowIfNull(text);
        if (TextWidth.Of(text, fontSize, bold) <= maxWidth)
        {
            return text;
        }

        double room = maxWidth - TextWidth.Of(Mark, fontSize, bold);
        double width = 0.0;
        int length = 0;
        while (length < text.Length)
        {
            int step = char.IsHighSurrogate(text[length]) && length + 1 < text.Length ? 2 : 1;
            double next = width + TextWidth.Of(text.Substring(length, step), fontSize, bold);
            if (next > room)
            {
                break;
            }

            width = next;
            length += step;
        }

        return text[..length].TrimEnd() + Mark;
    }
}
