using SkiaSharp;
using Svg.Skia;

namespace NetSolve.Rendering.Map;

/// <summary>Rasterises map SVG to PNG with Svg.Skia (CPU only, no browser).</summary>
public static class PngMapRenderer
{
    /// <summary>Pixels per map unit by default: twice the SVG's nominal 96 dpi, for a sharp print at A4 width.</summary>
    public const float DefaultScale = 2.0f;

    /// <summary>Renders <paramref name="svg"/> to PNG bytes on a white background.</summary>
    /// <param name="svg">A standalone SVG document such as <see cref="SvgMapWriter.WriteString"/> returns.</param>
    /// <param name="scale">Pixels per SVG user unit; positive.</param>
    public static byte[] Render(string svg, float scale = DefaultScale)
    {
        ArgumentNullException.ThrowIfNull(svg);
        ArgumentOutOfRangeException.ThrowIfNegativeOrZero(scale);
        using var document = new SKSvg();
        using var picture = document.FromSvg(svg)
            ?? throw new ArgumentException("The SVG could not be read.", nameof(svg));
        var bounds = picture.CullRect;
        int width = Math.Max(1, (int)Math.Ceiling(bounds.Width * scale));
        int height = Math.Max(1, (int)Math.Ceiling(bounds.Height * scale));
        using var bitmap = new SKBitmap(width, height);
        using (var canvas = new SKCanvas(bitmap))
        {
            canvas.Clear(SKColors.White);
            canvas.Scale(scale);
            canvas.DrawPicture(picture);
        }

        using var image = SKImage.FromBitmap(bitmap);
        using var data = image.Encode(SKEncodedImageFormat.Png, 100);
        return data.ToArray();
    }
}
