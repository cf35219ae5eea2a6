using SkiaSharp;
using Svg.Skia;

namespace NetSolve.Rendering.Map;

/// <summary>Rasterises map SVG to PNG with Svg.Skia (CPU only, no browser).</summary>
public static class PngMapRenderer
{
    /// <summary>Pixels per map unit by default: twice the SVG's nominal 96 dpi, for a sharp print at A4 width.</summary>
    public const float DefaultScale = 2.0f;

    /// <summary>
    /// Largest image drawn, in pixels (64 MB of RGBA): a bigger map is drawn at a smaller scale, because memory and
    /// encoding time grow with the pixel count and a hospital-scale map would otherwise need gigabytes.
    /// </summary>
    public const long MaxPixels = 16_000_000;

    /// <summary>Renders <paramref name="svg"/> to PNG bytes on a white background.</summary>
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
        float fit = (float)Math.Sqrt(MaxPixels / Math.Max(1.0, (double)bounds.Width * bounds.Height));
        scale = Math.Min(scale, fit);
        int width = Math.Max(1, (int)Math.Ceiling(bounds.Width * scale));
        int height = Math.Max(1, (int)Math.Ceiling(bounds.Height * scale));
        using var bitmap = new SKBitmap(width, height);
        using (var canvas = new SKCanvas(bitmap))
        {
            canvas.Clear(SKColors.White);
            canvas.Scale(scale);
            canvas.DrawPicture(picture);
        }

        // The "up" filter suits flat-colour drawings: smallest file of the single filters at zlib's default level.
        using var pixels = bitmap.PeekPixels();
        using var data = pixels.Encode(new SKPngEncoderOptions(SKPngEncoderFilterFlags.Up, 6))
            ?? throw new InvalidOperationException("The PNG encoder returned nothing.");
        return data.ToArray();
    }
}
