using System.Globalization;

namespace NetSolve.Rendering.Report;

/// <summary>The report's stylesheet: screen, and print on A4 or Letter (15 mm margins fit both).</summary>
/// <remarks>
/// In print the map section is kept on one page: the map is held to <see cref="MapPrintFit.MaxPrintedHeightMm"/> (its
/// view box keeps it whole and in proportion inside that box) and the section may not break. The unit table's
/// values do not wrap, so a time never loses its unit to the next line (<c>45.43</c> above <c>min</c>).
/// </remarks>
internal static class ReportStyles
{
    public static string Css { get; } = string.Create(CultureInfo.InvariantCulture, $$"""
        :root { color-scheme: light; }
        body { font-family: 'DejaVu Sans', 'Liberation Sans', Arial, Helvetica, sans-serif; color: #111111; background: #FFFFFF;
               margin: 0 auto; max-width: 64rem; padding: 1.5rem; line-height: 1.45; }
        h1 { font-size: 1.6rem; margin: 0 0 0.2rem; }
        h2 { font-size: 1.2rem; margin: 1.8rem 0 0.6rem; border-bottom: 2px solid #22313F; padding-bottom: 0.2rem; }
        .subtitle { color: #3A3A3A; margin: 0 0 1rem; }
        .finding { font-size: 1.15rem; border-left: 6px solid #5A2200; background: #FBF1E8; padding: 0.6rem 0.9rem; margin: 1rem 0; }
        figure { margin: 0; }
        figure svg { display: block; width: 100%; height: auto; }
        figcaption { color: #3A3A3A; font-size: 0.9rem; margin-top: 0.4rem; }
        table { border-collapse: collapse; width: 100%; font-size: 0.88rem; font-variant-numeric: tabular-nums; }
        th, td { border-bottom: 1px solid #B8BEC4; padding: 0.3rem 0.45rem; text-align: right; vertical-align: top; }
        th { background: #EEF1F4; }
        th:first-child, td:first-child, #unit-table th:nth-child(2) { text-align: left; }
        .map-frame { margin: 0 auto; }
        .chart-frame { max-width: 54rem; margin: 0 auto; }
        td.status { text-align: left; white-space: nowrap; font-weight: bold; }
        #unit-table td:not(:first-child) { white-space: nowrap; }
        .note { color: #3A3A3A; font-size: 0.85rem; }
        .map-print-note { display: none; }
        .caution { border: 2px solid #22313F; padding: 0.6rem 0.9rem; }
        footer { margin-top: 2rem; color: #3A3A3A; font-size: 0.85rem; }
        @page { margin: 15mm; }
        @media print {
          body { max-width: none; padding: 0; font-size: 10pt; }
          h2 { break-after: avoid-page; }
          table { font-size: 8pt; }
          th, td { padding: 0.15rem 0.25rem; }
          .finding, figure, tr, .caution { break-inside: avoid-page; }
          thead { display: table-header-group; }
          th { background: #EEF1F4; -webkit-print-color-adjust: exact; print-color-adjust: exact; }
          td.status, .finding { -webkit-print-color-adjust: exact; print-color-adjust: exact; }
          #map { break-inside: avoid-page; }
          #map-figure svg { max-height: {{MapPrintFit.MaxPrintedHeightMm}}mm; }
          .map-print-note { display: block; font-size: 9pt; border-left: 4px solid #22313F; padding: 0.1rem 0.5rem; margin: 0 0 0.4rem; }
        }
        """);

    /// <summary>
    /// Added after <see cref="Css"/> when the report draws a large map (<see cref="Map.MapLayoutBuilder.MaxLayeredUnits"/>):
    /// on screen the map keeps its own size, one map unit to a CSS pixel, in a frame that scrolls both ways, because
    /// shrunk to the column its box text would be a pixel high; its legend, drawn apart above the frame at its own
    /// size (narrowed to the column on a small screen), stays in view while the frame scrolls. In print it is reduced
    /// to the page as any map.
    /// </summary>
    public const string LargeMapCss = """
        @media screen {
          #map-figure .map-frame { max-width: none !important; max-height: 85vh; overflow: auto; border: 1px solid #B8BEC4; }
          #map-figure svg { width: auto; max-width: none; }
          #map-figure .map-legend svg { max-width: 100%; }
        }

        """;
}
