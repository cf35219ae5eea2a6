using System.Globalization;
using SkiaSharp;
using Svg.Skia;

namespace NetSolve.Rendering.Map;

/// <summary>Rasterises a map to PNG with Skia (CPU only, no browser): a laid-out map painted directly, or any SVG through Svg.Skia.</summary>
public static class PngMapRenderer
{
    /// <summary>Pixels per map unit by default: twice the SVG's nominal 96 dpi, for a sharp print at A4 width.</summary>
    public const float DefaultScale = 2.0f;

    /// <summary>
    /// Largest image drawn, in pixels (64 MB of RGBA): a bigger map is drawn at a smaller scale, because memory and
    /// encoding time grow with the pixel count and a hospital-scale map would otherwise need gigabytes.
    /// </summary>
    public const long MaxPixels = 16_000_000;

    /// <summary>
    /// zlib level of a painted map's PNG. Measured on a 1,000-unit map (16 million pixels) and a 5-unit one, with no
    /// row filter: level 1 takes 0.31 s and 11.6 MB where level 6 takes 0.52 s and 10.5 MB (docs/performance.md,
    /// "Map and report at scale").
    /// </summary>
    internal const int MapCompressionLevel = 1;

    /// <summary>
    /// PNG row filter of a painted map: none. The map's flat fills already compress well, and its many thin
    /// anti-aliased lines defeat the "up" filter (16.3 MB at level 6 against 11.6 MB unfiltered at level 1 on the
    /// 1,000-unit map; 0.19 MB against 0.17 MB on the 5-unit example).
    /// </summary>
    internal const SKPngEncoderFilterFlags MapRowFilter = SKPngEncoderFilterFlags.None;

    /// <summary>Renders <paramref name="layout"/> to PNG bytes, painted straight onto the canvas with the SVG map's look.</summary>
    /// <param name="layout">The laid-out map.</param>
    /// <param name="scale">Pixels per map unit; positive. Lowered when the image would exceed <see cref="MaxPixels"/>.</param>
    public static byte[] Render(MapLayout layout, float scale = DefaultScale)
    {
        ArgumentNullException.ThrowIfNull(layout);
        ArgumentOutOfRangeException.ThrowIfNegativeOrZero(scale);
        var svg = SvgMapWriter.Write(layout).Root!;
        float width = float.Parse((string)svg.Attribute("width")!, CultureInfo.InvariantCulture);
        float height = float.Parse((string)svg.Attribute("height")!, CultureInfo.InvariantCulture);
        using var bitmap = Canvas(width, height, ref scale, SKAlphaType.Opaque);
        using (var canvas = new SKCanvas(bitmap))
        {
            canvas.Clear(SKColors.White);
            canvas.Scale(scale);
            using var painter = new MapCanvasPainter(canvas);
            painter.Paint(svg);
        }

        return Encode(bitmap, MapRowFilter, MapCompressionLevel);
    }

    /// <summary>Renders <paramref name="svg"/> to PNG bytes on a white background, through Svg.Skia.</summary>
    /// <param name="svg">A standalone SVG document such as <see cref="SvgMapWriter.WriteString"/> returns.</param>
    /// <param name="scale">Pixels per SVG user unit; positive. Lowered when the image would exceed <see cref="MaxPixels"/>.</param>
    public static byte[] Render(string svg, float scale = DefaultScale)
    {
        ArgumentNullException.ThrowIfNull(svg);
        ArgumentOutOfRangeException.ThrowIfNegativeOrZero(scale);
        using var document = new SKSvg();
        using var picture = document.FromSvg(svg)
            ?? throw new ArgumentException("The SVG could not be read.", nameof(svg));
        var bounds = picture.CullRect;
        using var bitmap = Canvas(bounds.Width, bounds.Height, ref scale, SKAlphaType.Premul);
        using (var canvas = new SKCanvas(bitmap))
        {
            canvas.Clear(SKColors.White);
            canvas.Scale(scale);
            canvas.DrawPicture(picture);
        }

        // The "up" filter at zlib's default level: this path draws charts, small images where either costs little.
        return Encode(bitmap, SKPngEncoderFilterFlags.Up, 6);
    }

    /// <summary>A bitmap for a drawing of <paramref name="width"/> × <paramref name="height"/> units, <paramref name="scale"/> lowered to the pixel budget.</summary>
    internal static SKBitmap Canvas(float width, float height, ref float scale, SKAlphaType alpha)
    {
        float fit = (float)Math.Sqrt(MaxPixels / Math.Max(1.0, (double)width * height));
        scale = Math.Min(scale, fit);
        int pixelsWide = Math.Max(1, (int)Math.Ceiling(width * scale));
        int pixelsHigh = Math.Max(1, (int)Math.Ceiling(height * scale));
        return new SKBitmap(new SKImageInfo(pixelsWide, pixelsHigh, SKImageInfo.PlatformColorType, alpha));
    }

    private static byte[] Encode(SKBitmap bitmap, SKPngEncoderFilterFlags filter, int level)
    {
        using var pixels = bitmap.PeekPixels();
        using var data = pixels.Encode(new SKPngEncoderOptions(filter, level))
            ?? throw new InvalidOperationException("The PNG encoder returned nothing.");
        return data.ToArray();
    }
}
