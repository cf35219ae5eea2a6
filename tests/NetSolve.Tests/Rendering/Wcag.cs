using System.Globalization;

namespace NetSolve.Tests.Rendering;

/// <summary>WCAG 2.x relative luminance and contrast ratio.</summary>
/// <remarks>
/// Source: WCAG 2.1, definitions of "relative luminance" (sRGB channels linearised with the 0.03928 threshold,
/// weights 0.2126, 0.7152, 0.0722) and "contrast ratio" ((L1 + 0.05) / (L2 + 0.05)).
/// </remarks>
internal static class Wcag
{
    public static double Luminance(string hex)
    {
        double Channel(int offset)
        {
            double c = int.Parse(hex.AsSpan(1 + offset, 2), NumberStyles.HexNumber, CultureInfo.InvariantCulture) / 255.0;
            return c <= 0.03928 ? c / 12.92 : Math.Pow((c + 0.055) / 1.055, 2.4);
        }

        return (0.2126 * Channel(0)) + (0.7152 * Channel(2)) + (0.0722 * Channel(4));
    }

    public static double Contrast(string a, string b)
    {
        double la = Luminance(a);
        double lb = Luminance(b);
        return (Math.Max(la, lb) + 0.05) / (Math.Min(la, lb) + 0.05);
    }
}
