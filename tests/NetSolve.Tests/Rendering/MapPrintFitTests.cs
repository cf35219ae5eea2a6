using NetSolve.Rendering.Report;

namespace NetSolve.Tests.Rendering;

public class MapPrintFitTests
{
    /// <summary>Points are exact multiples here; only the millimetre-to-pixel conversion rounds.</summary>
    private const double Tolerance = 1e-9;

    /// <summary>190 mm in CSS px: 190 / 25.4 x 96.</summary>
    private const double MaxHeightPx = MapPrintFit.MaxPrintedHeightMm / 25.4 * 96.0;

    /// <summary>180 mm in CSS px: 180 / 25.4 x 96.</summary>
    private const double PrintableWidthPx = MapPrintFit.PrintableWidthMm / 25.4 * 96.0;

    [Fact]
    public void A_small_map_prints_as_on_screen_at_up_to_125_percent()
    {
        // Exact by hand: a 340 x 300 map shown at most 425 px wide prints at 425 / 340 = 1.25; 12 units are 15 px,
        // and 15 px x 72/96 = 11.25 pt (1 px = 1/96 in, 1 pt = 1/72 in).
        Assert.Equal(11.25, MapPrintFit.PrintedPoints(340.0, 300.0, 425.0, 12.0), Tolerance);
    }

    [Fact]
    public void A_wide_map_prints_at_the_A4_printable_width()
    {
        // Exact by hand: a map twice the printable width, short enough for the page, prints at half size: 12 units are 6 px = 4.5 pt.
        Assert.Equal(4.5, MapPrintFit.PrintedPoints(2.0 * PrintableWidthPx, 100.0, 3.0 * PrintableWidthPx, 12.0), Tolerance);
    }

    [Fact]
    public void A_tall_map_is_reduced_to_the_printed_height_limit()
    {
        // Exact by hand: a narrow map twice the height limit prints at half size, whatever its width allows: 12 units are 4.5 pt.
        Assert.Equal(4.5, MapPrintFit.PrintedPoints(300.0, 2.0 * MaxHeightPx, 375.0, 12.0), Tolerance);
    }

    [Fact]
    public void The_height_limit_leaves_room_for_heading_and_caption_on_a_Letter_page()
    {
        // Source: US Letter is 11 in = 279.4 mm tall; less 15 mm margins top and bottom, 249.4 mm prints.
        const double letterPrintableHeightMm = 279.4 - (2 * 15.0);
        Assert.InRange(letterPrintableHeightMm - MapPrintFit.MaxPrintedHeightMm, 40.0, 80.0);
    }
}
