namespace NetSolve.Rendering.Map;

/// <summary>
/// Estimates how wide a line of text renders, so boxes can be sized without a font at hand.
/// </summary>
/// <remarks>
/// Advance widths are DejaVu Sans's, in em: among the sans-serif faces the map names, it is the widest, so a box
/// sized for it also fits Liberation Sans, Arial or Helvetica. Bold adds <see cref="BoldFactor"/>. Characters not
/// in the table count as <see cref="WideDefaultEm"/>. Thread-safe.
/// </remarks>
internal static class TextWidth
{
    /// <summary>DejaVu Sans Bold runs about 12% wider than the regular face; 13% keeps a margin.</summary>
    public const double BoldFactor = 1.13;

    /// <summary>Width of a character missing from the table: as wide as a capital O, to err on the wide side.</summary>
    public const double WideDefaultEm = 0.80;

    private const string Lower = "abcdefghijklmnopqrstuvwxyz";

    private static readonly double[] LowerEm =
    [
        0.613, 0.635, 0.550, 0.635, 0.615, 0.352, 0.635, 0.634, 0.278, 0.278, 0.579, 0.278, 0.974,
        0.634, 0.612, 0.635, 0.635, 0.411, 0.521, 0.392, 0.634, 0.592, 0.818, 0.592, 0.592, 0.525,
    ];

    private const string Upper = "ABCDEFGHIJKLMNOPQRSTUVWXYZ";

    private static readonly double[] UpperEm =
    [
        0.684, 0.686, 0.698, 0.770, 0.632, 0.575, 0.775, 0.752, 0.295, 0.295, 0.656, 0.557, 0.863,
        0.748, 0.787, 0.603, 0.787, 0.695, 0.635, 0.611, 0.732, 0.684, 0.989, 0.685, 0.611, 0.685,
    ];

    /// <summary>Estimated width of <paramref name="text"/> at <paramref name="fontSize"/> user units.</summary>
    public static double Of(string text, double fontSize, bool bold = false)
    {
        ArgumentNullException.ThrowIfNull(text);
        double em = 0.0;
        foreach (char c in text)
        {
            em += EmOf(c);
        }

        return em * fontSize * (bold ? BoldFactor : 1.0);
    }

    private static double EmOf(char c)
    {
        int lower = Lower.IndexOf(c, StringComparison.Ordinal);
        if (lower >= 0)
        {
            return LowerEm[lower];
        }

        int upper = Upper.IndexOf(c, StringComparison.Ordinal);
        if (upper >= 0)
        {
            return UpperEm[upper];
        }

        return c switch
        {
            >= '0' and <= '9' => 0.636,
            ' ' or '.' or ',' or '\u00B7' => 0.318,
            ':' or ';' or '/' => 0.337,
            '(' or ')' or '[' or ']' => 0.390,
            '-' or '_' => 0.500,
            '%' => 0.950,
            '&' => 0.780,
            '\'' => 0.275,
            _ => WideDefaultEm,
        };
    }
}
