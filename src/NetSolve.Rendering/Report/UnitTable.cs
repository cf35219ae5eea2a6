using System.Collections.Immutable;
using System.Globalization;
using System.Text;
using NetSolve.Presentation;
using NetSolve.Presentation.Formats;
using NetSolve.Presentation.Metrics;
using NetSolve.Presentation.Solution;
using NetSolve.Rendering.Map;
using NetSolve.Solving;

namespace NetSolve.Rendering.Report;

/// <summary>The report's per-unit table: metrics of the registry, headers worded for leadership, values as the solve table shows them.</summary>
/// <remarks>
/// The columns are <see cref="UnitColumns"/>' own, relabelled and a few left out; values go through
/// <see cref="PeopleFormat"/> by <see cref="HtmlTableWriter"/>. The status is the contract's word after the map's
/// glyph, in the map's colours; rows are keyed by unit id (<c>data-unit</c>).
/// </remarks>
internal static class UnitTable
{
    /// <summary>The columns shown, in order; the id keys the rows and is not shown.</summary>
    public static ImmutableArray<Column<UnitResult>> Columns { get; } =
    [
        UnitColumns.Id with { Audience = Audience.Machines },
        UnitColumns.Label with { Header = "Unit", Audience = Audience.All },
        UnitColumns.Status with { Header = "Status", Read = result => HarbourLightsPalette.Cell(result.Status) },
        UnitColumns.Servers with { Header = "Servers" },
        UnitColumns.ArrivalRate with { Header = "Arrivals" },
        UnitColumns.Utilisation with { Header = "Utilisation" },
        UnitColumns.WaitProbability with { Header = "Chance of waiting" },
        UnitColumns.MeanWait with { Header = "Mean wait" },
        UnitColumns.MeanTimeInUnit with { Header = "Mean time in unit" },
        UnitColumns.Headroom with { Header = "Headroom (\u00D7)" },
    ];

    /// <summary>The table of <paramref name="solution"/>.</summary>
    /// <remarks>With targets in the network, a "Targets" column beside the status names the missed ones.</remarks>
    public static ResultTable Table(NetworkSolution solution) => ResultTable.Build(
        TargetWords.AnyTargets(solution)
            ? Columns.SelectMany(column => column.Id == UnitColumns.Status.Id ? [column, UnitColumns.TargetsBreached with { Header = "Targets" }] : new[] { column })
            : Columns,
        solution.Units,
        solution.Network.TimeUnit);

    public static void Append(StringBuilder html, NetworkSolution solution)
    {
        using var output = new StringWriter(html, CultureInfo.InvariantCulture);
        HtmlTableWriter.Write(Table(solution), output, new HtmlTableOptions
        {
            Id = "unit-table",
            RowAttribute = "data-unit",
            RowKey = UnitColumns.Id.Id,
            CellAttributes = (row, column) => column.Id == UnitColumns.Status.Id ? HtmlReport.StatusAttributes(solution.Units[row].Status) : [],
        });
    }
}
