using NetSolve.Model;

namespace NetSolve.Presentation.Metrics;

/// <summary>One value of a result table before formatting: a number with its dimension, or a text.</summary>
/// <remarks>
/// Numbers are in Core's units (hours, per hour) until a writer converts them. A null number is a value that does
/// not exist (the wait of an unstable unit, or unlimited servers). A text cell carries a word, such as a unit id or
/// a status; <see cref="Marker"/> is shown before it in tables for people only.
/// </remarks>
public readonly record struct Cell
{
    private Cell(MetricDimension dimension, double? number, string? text, string? marker)
    {
        Dimension = dimension;
        Number = number;
        Text = text;
        Marker = marker;
    }

    /// <summary>What the number measures; <see cref="MetricDimension.Plain"/> for a text cell.</summary>
    public MetricDimension Dimension { get; }

    /// <summary>The number in Core's units; null when absent or for a text cell.</summary>
    public double? Number { get; }

    /// <summary>The text of a text cell; null for a number.</summary>
    public string? Text { get; }

    /// <summary>A short sign shown before the text in tables for people (such as <c>!!</c>); null when none.</summary>
    public string? Marker { get; }

    /// <summary>True for a text cell.</summary>
    public bool IsText => Text is not null;

    /// <summary>A number of <paramref name="dimension"/>, in Core's units; null when it does not exist.</summary>
    public static Cell Of(double? number, MetricDimension dimension) => new(dimension, number, null, null);

    /// <summary>A unit's servers; unlimited is an absent number.</summary>
    public static Cell Of(Servers servers) => new(MetricDimension.Servers, servers.IsUnlimited ? null : servers.Count, null, null);

    /// <summary>A text cell, with an optional marker for people.</summary>
    public static Cell Word(string text, string? marker = null)
    {
        ArgumentNullException.ThrowIfNull(text);
        return new(MetricDimension.Plain, null, text, marker);
    }
}
