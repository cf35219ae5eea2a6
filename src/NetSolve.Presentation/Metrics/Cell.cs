using NetSolve.Model;

namespace NetSolve.Presentation.Metrics;

/// <summary>One value of a result table before formatting: a number with its dimension, or a text.</summary>
/// <remarks>
/// Numbers are in Core's units (hours, per hour) until a writer converts them. A null number is a value that does
/// not exist (the wait of an unstable unit, or unlimited servers). A text cell carries a word, such as a unit id or
/// a status; <see cref="Marker"/> is shown before it in tables for people only. A simulated number may carry the
/// <see cref="HalfWidth"/> of its 95% interval, which people read beside it (<c>4.2 ± 0.3 min</c>).
/// </remarks>
public readonly record struct Cell
{
    private Cell(MetricDimension dimension, double? number, string? text, string? marker, double? halfWidth = null)
    {
        Dimension = dimension;
        Number = number;
        Text = text;
        Marker = marker;
        HalfWidth = halfWidth;
    }

    /// <summary>What the number measures; <see cref="MetricDimension.Plain"/> for a text cell.</summary>
    public MetricDimension Dimension { get; }

    /// <summary>The number in Core's units; null when absent or for a text cell.</summary>
    public double? Number { get; }

    /// <summary>The text of a text cell; null for a number.</summary>
    public string? Text { get; }

    /// <summary>A short sign shown before the text in tables for people (such as <c>!!</c>); null when none.</summary>
    public string? Marker { get; }

    /// <summary>The half-width of the 95% interval of a simulated <see cref="Number"/>, in the same units; null when none.</summary>
    /// <remarks>Shown to people only: machine formats give the half-width its own <c>_ci</c> column.</remarks>
    public double? HalfWidth { get; }

    /// <summary>True for a text cell.</summary>
    public bool IsText => Text is not null;

    /// <summary>A number of <paramref name="dimension"/>, in Core's units; null when it does not exist.</summary>
    public static Cell Of(double? number, MetricDimension dimension) => new(dimension, number, null, null);

    /// <summary>A simulated mean with the half-width of its 95% interval, both in Core's units; the half-width is null with one replication.</summary>
    public static Cell WithHalfWidth(double? mean, double? halfWidth, MetricDimension dimension) =>
        new(dimension, mean, null, null, mean is null ? null : halfWidth);

    /// <summary>A unit's servers; unlimited is an absent number.</summary>
    public static Cell Of(Servers servers) => new(MetricDimension.Servers, servers.IsUnlimited ? null : servers.Count, null, null);

    /// <summary>A text cell, with an optional marker for people.</summary>
    public static Cell Word(string text, string? marker = null)
    {
        ArgumentNullException.ThrowIfNull(text);
        return new(MetricDimension.Plain, null, text, marker);
    }
}
