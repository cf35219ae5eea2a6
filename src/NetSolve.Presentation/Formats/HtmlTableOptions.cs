using NetSolve.Presentation.Metrics;

namespace NetSolve.Presentation.Formats;

/// <summary>What an HTML page adds to a <see cref="ResultTable"/> written by <see cref="HtmlTableWriter"/>.</summary>
/// <remarks>Attribute values are plain text: the writer encodes them. Immutable.</remarks>
public sealed record HtmlTableOptions
{
    /// <summary>The table's <c>id</c>, so the page's styles and tests can find it; none when null.</summary>
    public string? Id { get; init; }

    /// <summary>The name of an attribute on each row (<c>data-unit</c>); none when null.</summary>
    public string? RowAttribute { get; init; }

    /// <summary>The contract id of the column whose text is the value of <see cref="RowAttribute"/> (<c>id</c>); it may be a column for machines only.</summary>
    public string? RowKey { get; init; }

    /// <summary>Extra attributes of one cell, given its row index and column (a status cell's colours); none when null.</summary>
    public Func<int, ResultColumn, IEnumerable<KeyValuePair<string, string>>>? CellAttributes { get; init; }
}
