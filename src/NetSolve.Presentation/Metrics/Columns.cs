using NetSolve.Model;

namespace NetSolve.Presentation.Metrics;

/// <summary>Factories of <see cref="Column{TRow}"/> for the common shapes.</summary>
public static class Columns
{
    /// <summary>A numeric column read in Core's units.</summary>
    public static Column<TRow> Number<TRow>(string id, string header, MetricDimension dimension, Func<TRow, double?> read, Audience audience = Audience.All)
    {
        ArgumentNullException.ThrowIfNull(read);
        return new Column<TRow>(id, header, dimension, row => Cell.Of(read(row), dimension), audience);
    }

    /// <summary>A text column.</summary>
    public static Column<TRow> Words<TRow>(string id, string header, Func<TRow, string> read, Audience audience = Audience.All)
    {
        ArgumentNullException.ThrowIfNull(read);
        return new Column<TRow>(id, header, MetricDimension.Plain, row => Cell.Word(read(row)), audience);
    }
}
