using NetSolve.Model;


namespace NetSolve.Presentation.Metrics;

/// <summary>One metric of a result kind: its contract id, its header for people, its dimension and how to read it.</summary>
/// <typeparam name="TRow">The result row the metric is read from (a unit's result, a growth step, ...).</typeparam>
/// <param name="Id">The contract's name, used as JSON field and CSV column (<c>mean_wait</c>).</param>
/// <param name="Header">The header of tables for people (<c>wait</c>); a rate's header gets <c>/h</c> added.</param>
/// <param name="Dimension">What the values measure.</param>
/// <param name="Read">The value of one row.</param>
/// <param name="Audience">Who sees the column: some columns are for programs only (a label beside the id) or people only.</param>
public sealed record Column<TRow>(string Id, string Header, MetricDimension Dimension, Func<TRow, Cell> Read, Audience Audience = Audience.All);
