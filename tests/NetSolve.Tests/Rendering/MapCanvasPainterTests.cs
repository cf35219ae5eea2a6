using System.Buffers.Binary;
using NetSolve.Rendering.Map;
using SkiaSharp;

namespace NetSolve.Tests.Rendering;

/// <summary>
/// The PNG map is painted straight from the map's elements; it must look as the SVG map does when a general SVG
/// renderer (Svg.Skia) rasterises it, pixel for pixel within a small tolerance.
/// </summary>
public class MapCanvasPainterTests
{
    /// <summary>Mean difference per pixel, in levels of 255 (largest of the three channels): anti-aliasing noise only.</summary>
    private const double MaxMeanDifference = 0.25;

    /// <summary>Share of pixels that may differ by more than <see cref="VisibleDifference"/> levels: a few edge pixels of a glyph.</summary>
    private const double MaxVisiblyDifferentShare = 0.001;

    /// <summary>A difference of 16 levels of 255 is about where two flat greys start to read as different (common practice in image comparison).</summary>
    private const int VisibleDifference = 16;

    public static TheoryData<string, MapDirection> Examples => new()
    {
        { "harbourside", MapDirection.TopToBottom },
        { "harbourside", MapDirection.LeftToRight },
        { "kestrel-general", MapDirection.TopToBottom },
        { "millbrook-clinic", MapDirection.LeftToRight },
        { "fenwick-winter-surge", MapDirection.TopToBottom },
        { "ashcombe-targets", MapDirection.TopToBottom },
        { "larkspur-simulation", MapDirection.LeftToRight },
    };

    [Theory]
    [MemberData(nameof(Examples))]
    public void A_bundled_example_looks_as_its_svg_does(string name, MapDirection direction)
    {
        var layout = MapLayoutBuilder.Build(RenderingFixtures.Solved(name), direction);

        AssertLooksAlike(PngMapRenderer.Render(SvgMapWriter.WriteString(layout)), PngMapRenderer.Render(layout), name);
    }

    [Fact]
    public void A_large_map_with_pale_lines_and_dashed_returns_looks_as_its_svg_does()
    {
        // 300 units: the large layout, its compact boxes, pale lines (stroke and fill opacity) and return routes.
        var layout = MapLayoutBuilder.Build(RenderingFixtures.Generated(300, 2));
        Assert.Contains(layout.Edges, edge => edge.Faint);

        AssertLooksAlike(PngMapRenderer.Render(SvgMapWriter.WriteString(layout), 0.5f), PngMapRenderer.Render(layout, 0.5f), "generated-300");
    }

    [Fact]
    public void The_painted_png_is_opaque_rgb_at_the_svg_size()
    {
        var layout = MapLayoutBuilder.Build(RenderingFixtures.Solved("harbourside"));
        var map = SvgMap.Parse(SvgMapWriter.WriteString(layout));
        byte[] png = PngMapRenderer.Render(layout, 2.0f);

        // Source: PNG specification (ISO/IEC 15948), 11.2.2 IHDR: width, height, bit depth 8, colour type 2 (RGB, no alpha).
        Assert.Equal((int)Math.Ceiling(map.Width * 2), BinaryPrimitives.ReadInt32BigEndian(png.AsSpan(16, 4)));
        Assert.Equal((int)Math.Ceiling(map.Height * 2), BinaryPrimitives.ReadInt32BigEndian(png.AsSpan(20, 4)));
        Assert.Equal(8, png[24]);
        Assert.Equal(2, png[25]);
    }

    private static void AssertLooksAlike(byte[] reference, byte[] painted, string name)
    {
        File.WriteAllBytes(Path.Combine(RenderingFixtures.OutputFolder(), name + "-painted.png"), painted);
        File.WriteAllBytes(Path.Combine(RenderingFixtures.OutputFolder(), name + "-svg.png"), reference);
        using var expected = SKBitmap.Decode(reference);
        using var actual = SKBitmap.Decode(painted);
        Assert.Equal((expected.Width, expected.Height), (actual.Width, actual.Height));

        var a = expected.Pixels;
        var b = actual.Pixels;
        double sum = 0.0;
        long visible = 0;
        for (int i = 0; i < a.Length; i++)
        {
            int difference = Math.Max(Math.Abs(a[i].Red - b[i].Red), Math.Max(Math.Abs(a[i].Green - b[i].Green), Math.Abs(a[i].Blue - b[i].Blue)));
            sum += difference;
            visible += difference > VisibleDifference ? 1 : 0;
        }

        double mean = sum / a.Length;
        double share = (double)visible / a.Length;
        Assert.True(mean <= MaxMeanDifference, FormattableString.Invariant($"{name}: mean difference {mean:F3} levels"));
        Assert.True(share <= MaxVisiblyDifferentShare, FormattableString.Invariant($"{name}: {share:P3} of pixels differ visibly"));
    }
}
