using NetSolve.Model;

namespace NetSolve.Presentation.Metrics;

/// <summary>A column of a built <see cref="ResultTable"/>.</summary>
/// <param name="Id">The contract's name (JSON field, CSV column).</param>
/// <param name="Header">The header for people.</param>
/// <param name="Dimension">What the values measure.</param>
/// <param name="IsText">True when the column holds words: left-aligned for people.</param>
/// <param name="Audience">Who sees the column.</param>
public sealed record ResultColumn(string Id, string Header, MetricDimension Dimension, bool IsText, Audience Audience);
