namespace NetSolve.Rendering.Report;

/// <summary>
/// How large the bottleneck map prints: as on screen (the column width, at most 125% of its own size), reduced
/// further when needed so that it fits one page of A4 or Letter together with its heading and caption.
/// </summary>
/// <remarks>
/// The print stylesheet does the fitting (<see cref="MaxPrintedHeightMm"/>); this type works out the size the
/// smallest text then prints at, so the report can warn when it is too small to read. Sizes are CSS sizes: one
/// map unit is one CSS pixel at 100%, 1/96 inch.
/// </remarks>
internal static class MapPrintFit
{
    /// <summary>The tallest the map prints, in millimetres.</summary>
    /// <remarks>
    /// Letter's printable height is the smaller: 279.4 mm less 15 mm margins top and bottom, 249.4 mm. This leaves
    /// room on that page for the section heading, the print note and a three-line caption.
    /// </remarks>
    public const double MaxPrintedHeightMm = 190.0;

    /// <summary>The widest the map prints, in millimetres: A4's 210 mm less 15 mm margins each side (Letter's is wider).</summary>
    public const double PrintableWidthMm = 180.0;

    /// <summary>Smallest text size, in points, that still reads comfortably on paper; below it the report says the map is reduced.</summary>
    /// <remarks>Journal figure guides ask for 5 to 7 pt at final size; the map tests hold the map to 6 pt at A4 width.</remarks>
    public const double MinReadablePt = 6.0;

    private const double MillimetresPerInch = 25.4;
    private const double PixelsPerInch = 96.0;
    private const double PointsPerInch = 72.0;

    /// <summary>The size, in points, that text of <paramref name="fontSize"/> map units prints at on A4 (on Letter at least as large).</summary>
    /// <param name="mapWidth">Width of the map's view box, in map units; positive.</param>
    /// <param name="mapHeight">Height of the map's view box, in map units; positive.</param>
    /// <param name="maxWidthPx">The widest the report shows the map, in CSS pixels (its column may be narrower).</param>
    /// <param name="fontSize">A text size on the map, in map units.</param>
    public static double PrintedPoints(double mapWidth, double mapHeight, double maxWidthPx, double fontSize)
    {
        ArgumentOutOfRangeException.ThrowIfNegativeOrZero(mapWidth);
        ArgumentOutOfRangeException.ThrowIfNegativeOrZero(mapHeight);
        double widthPx = Math.Min(maxWidthPx, Pixels(PrintableWidthMm));
        double scale = Math.Min(widthPx / mapWidth, Pixels(MaxPrintedHeightMm) / mapHeight);
        return fontSize * scale * PointsPerInch / PixelsPerInch;
    }

    private static double Pixels(double millimetres) => millimetres / MillimetresPerInch * PixelsPerInch;
}
