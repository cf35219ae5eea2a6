using System.Buffers.Binary;
using NetSolve.Rendering.Map;
using NetSolve.Solving;
using SkiaSharp;

namespace NetSolve.Tests.Rendering;

public class PngMapRendererTests
{
    [Fact]
    public void The_png_has_the_png_signature_and_the_map_size_at_the_chosen_scale()
    {
        string svg = SvgMapWriter.WriteString(MapLayoutBuilder.Build(RenderingFixtures.Solved("harbourside")));
        byte[] png = PngMapRenderer.Render(svg, 2.0f);
        File.WriteAllBytes(Path.Combine(RenderingFixtures.OutputFolder(), "harbourside.png"), png);
        var map = SvgMap.Parse(svg);

        // Source: PNG specification (ISO/IEC 15948), section 5.2 signature and 11.2.2 IHDR (big-endian width, height).
        Assert.Equal(new byte[] { 0x89, 0x50, 0x4E, 0x47, 0x0D, 0x0A, 0x1A, 0x0A }, png[..8]);
        Assert.Equal("IHDR", System.Text.Encoding.ASCII.GetString(png, 12, 4));
        Assert.Equal((int)Math.Ceiling(map.Width * 2), BinaryPrimitives.ReadInt32BigEndian(png.AsSpan(16, 4)));
        Assert.Equal((int)Math.Ceiling(map.Height * 2), BinaryPrimitives.ReadInt32BigEndian(png.AsSpan(20, 4)));
    }

    [Fact]
    public void The_bottleneck_box_is_painted_in_its_fill_with_dark_text_on_it()
    {
        string svg = SvgMapWriter.WriteString(MapLayoutBuilder.Build(RenderingFixtures.Solved("harbourside")));
        var ward = SvgMap.Parse(svg).Unit("ward").Box;
        using var bitmap = SKBitmap.Decode(PngMapRenderer.Render(svg, 1.0f));
        var fill = SKColor.Parse(HarbourLightsPalette.For(UnitStatus.Bottleneck).Fill);

        int filled = 0;
        int dark = 0;
        int total = 0;
        for (int y = (int)ward.Y + 6; y < (int)ward.Bottom - 6; y++)
        {
            for (int x = (int)ward.X + 6; x < (int)ward.Right - 6; x++)
            {
                var pixel = bitmap.GetPixel(x, y);
                total++;
                filled += Near(pixel, fill) ? 1 : 0;
                dark += pixel.Red + pixel.Green + pixel.Blue < 150 ? 1 : 0;
            }
        }

        // The box is mostly fill; text drawn in the real font darkens some of it (an empty box would have none).
        Assert.True(filled > total / 2, FormattableString.Invariant($"{filled} of {total} pixels in the fill colour"));
        Assert.True(dark > total / 50, FormattableString.Invariant($"{dark} of {total} pixels dark: no text was drawn"));
    }

    private static bool Near(SKColor a, SKColor b) =>
        Math.Abs(a.Red - b.Red) <= 2 && Math.Abs(a.Green - b.Green) <= 2 && Math.Abs(a.Blue - b.Blue) <= 2;
}
