using NetSolve.Rendering.Map;

namespace NetSolve.Tests.Rendering;

public class PngMapRendererLimitTests
{
    [Fact]
    public void A_map_too_big_for_the_pixel_budget_is_drawn_smaller_not_refused()
    {
        // A 200-unit map at 2 pixels per unit would need far more than the budget.
        var layout = MapLayoutBuilder.Build(RenderingFixtures.Generated(200, 1));
        string svg = SvgMapWriter.WriteString(layout);
        var map = SvgMap.Parse(svg);
        Assert.True(map.Width * map.Height * 4 > PngMapRenderer.MaxPixels);

        // Painted from the layout (what map -o map.png writes) and through the SVG renderer alike.
        foreach (byte[] png in new[] { PngMapRenderer.Render(layout), PngMapRenderer.Render(svg) })
        {
            // Source: PNG specification, section 11.2.2: IHDR width and height, big-endian, at bytes 16 and 20.
            long width = System.Buffers.Binary.BinaryPrimitives.ReadInt32BigEndian(png.AsSpan(16, 4));
            long height = System.Buffers.Binary.BinaryPrimitives.ReadInt32BigEndian(png.AsSpan(20, 4));
            Assert.True(width * height <= PngMapRenderer.MaxPixels + width + height);
            Assert.Equal(map.Width / map.Height, (double)width / height, 0.01);
        }
    }
}
