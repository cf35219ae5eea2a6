using NetSolve.Model;
using NetSolve.Presentation.Formats;
using NetSolve.Presentation.Metrics;

namespace NetSolve.Rendering;

/// <summary>A registry metric as people read it on the map and in the report: the same text the tables print.</summary>
internal static class ShownValue
{
    /// <summary>The value of <paramref name="column"/> for <paramref name="row"/>, in <see cref="PeopleFormat"/>.</summary>
    public static string Of<TRow>(Column<TRow> column, TRow row, TimeUnit timeUnit) => PeopleFormat.Cell(column.Read(row), timeUnit);
}
