using NetSolve.Rendering.Map;
using NetSolve.Solving;

namespace NetSolve.Tests.Rendering;

public class HarbourLightsPaletteTests
{
    public static TheoryData<UnitStatus> Statuses => new(HarbourLightsPalette.Order);

    [Fact]
    public void The_formula_gives_the_known_extremes()
    {
        // Source: WCAG 2.1 "contrast ratio": black on white is 21:1, a colour on itself 1:1.
        Assert.Equal(21.0, Wcag.Contrast("#000000", "#FFFFFF"), 1e-9);
        Assert.Equal(1.0, Wcag.Contrast("#D9651C", "#D9651C"), 1e-9);
    }

    [Theory]
    [MemberData(nameof(Statuses))]
    public void Text_on_every_status_fill_meets_the_WCAG_minimum_contrast(UnitStatus status)
    {
        var style = HarbourLightsPalette.For(status);

        // Source: WCAG 2.1 success criterion 1.4.3 (Contrast, Minimum): 4.5:1 for text.
        Assert.True(Wcag.Contrast(style.Text, style.Fill) >= 4.5, FormattableString.Invariant($"{status}: {Wcag.Contrast(style.Text, style.Fill):0.00}"));
    }

    [Theory]
    [MemberData(nameof(Statuses))]
    public void Every_border_stands_out_from_the_page(UnitStatus status)
    {
        // Source: WCAG 2.1 success criterion 1.4.11 (Non-text Contrast): 3:1 for graphical objects.
        Assert.True(Wcag.Contrast(HarbourLightsPalette.For(status).Border, MapColours.Background) >= 3.0);
    }

    [Theory]
    [InlineData(MapColours.ForwardLine)]
    [InlineData(MapColours.FeedbackLine)]
    [InlineData(MapColours.BoundaryLine)]
    public void Flow_lines_stand_out_from_the_page(string colour)
    {
        // Source: WCAG 2.1 success criterion 1.4.11 (Non-text Contrast): 3:1 for graphical objects.
        Assert.True(Wcag.Contrast(colour, MapColours.Background) >= 3.0);
    }

    [Fact]
    public void Fills_darken_with_severity_so_the_order_survives_greyscale()
    {
        // Design rule of the palette, measured with WCAG 2.1 relative luminance: each step at least 1.5:1 darker
        // than the one before, so neighbours differ in lightness, not hue alone.
        var fills = HarbourLightsPalette.Order.Select(s => HarbourLightsPalette.For(s).Fill).ToList();
        for (int i = 1; i < fills.Count; i++)
        {
            Assert.True(Wcag.Luminance(fills[i]) < Wcag.Luminance(fills[i - 1]));
            Assert.True(Wcag.Contrast(fills[i], fills[i - 1]) >= 1.5, FormattableString.Invariant($"{fills[i - 1]} vs {fills[i]}: {Wcag.Contrast(fills[i], fills[i - 1]):0.00}"));
        }
    }

    [Fact]
    public void Each_status_has_its_own_word_glyph_and_border()
    {
        // Source: WCAG 2.1 success criterion 1.4.1 (Use of Color): colour is not the only means of conveying information.
        var styles = HarbourLightsPalette.Order.Select(HarbourLightsPalette.For).ToList();
        Assert.Equal(styles.Count, HarbourLightsPalette.Order.Select(HarbourLightsPalette.Text).Distinct(StringComparer.Ordinal).Count());
        Assert.Equal(styles.Count, styles.Select(s => s.Glyph).Distinct(StringComparer.Ordinal).Count());
        Assert.Equal(styles.Count, styles.Select(s => (s.BorderDash, s.DoubleBorder)).Distinct().Count());
    }
}
