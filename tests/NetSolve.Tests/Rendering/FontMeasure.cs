using SkiaSharp;

namespace NetSolve.Tests.Rendering;

/// <summary>Measures text with the real DejaVu Sans faces, the first family the map asks for.</summary>
internal static class FontMeasure
{
    public static (double Width, double Ascent, double Descent) Measure(string text, double size, bool bold)
    {
        using var typeface = SKTypeface.FromFamilyName("DejaVu Sans", bold ? SKFontStyle.Bold : SKFontStyle.Normal);
        Assert.True(typeface is not null && typeface.FamilyName == "DejaVu Sans", "DejaVu Sans is not installed (Debian package fonts-dejavu-core)");
        using var font = new SKFont(typeface, (float)size);
        float width = font.MeasureText(text);
        var metrics = font.Metrics;
        return (width, -metrics.Ascent, metrics.Descent);
    }
}
