using NetSolve.Rendering.Map;

namespace NetSolve.Tests.Rendering;

public class ScratchTests
{
    [Theory]
    [InlineData("harbourside")]
    [InlineData("kestrel-general")]
    [InlineData("fenwick-winter-surge")]
    public void Writes(string name)
    {
        var layout = MapLayoutBuilder.Build(RenderingFixtures.Solved(name));
        string svg = SvgMapWriter.WriteString(layout);
        File.WriteAllText(Path.Combine(RenderingFixtures.OutputFolder(), name + ".svg"), svg);
        File.WriteAllBytes(Path.Combine(RenderingFixtures.OutputFolder(), name + ".png"), PngMapRenderer.Render(svg));
    }

    [Fact]
    public void Writes40()
    {
        var layout = MapLayoutBuilder.Build(RenderingFixtures.Generated(40, 7));
        string svg = SvgMapWriter.WriteString(layout);
        File.WriteAllText(Path.Combine(RenderingFixtures.OutputFolder(), "gen40.svg"), svg);
        File.WriteAllBytes(Path.Combine(RenderingFixtures.OutputFolder(), "gen40.png"), PngMapRenderer.Render(svg));
    }
}
public class ScratchWidthTests
{
    [Fact]
    public void Widths()
    {
        foreach (var ar in new[] { 1, 2, 3, 4, 5, 6, 7 })
        foreach (var dir in new[] { 0, 1, 100000 })
        {
            File.AppendAllText("/tmp/widths.txt", $"seed {ar} ");
            var layout = MapLayoutBuilder.Build(RenderingFixtures.Generated(40, ar));
            File.AppendAllText("/tmp/widths.txt", $"{dir}: {layout.Width} x {layout.Height}; em(11) at 180mm = {11 * 180 / layout.Width} mm\n");
        }
    }
}
