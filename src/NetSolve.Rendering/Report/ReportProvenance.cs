namespace NetSolve.Rendering.Report;

/// <summary>Where a report comes from: when it was made, by which NetSolve, from which files.</summary>
/// <remarks>
/// The date is handed in, never read from the clock here: the command takes it from <c>SOURCE_DATE_EPOCH</c> when
/// set (so the same inputs can give the same bytes) and from the clock otherwise.
/// </remarks>
/// <param name="Date">The day the report was made (UTC).</param>
/// <param name="Version">NetSolve's version.</param>
/// <param name="Inputs">The network file first, then each scenario file, in the order given.</param>
public sealed record ReportProvenance(DateOnly Date, string Version, IReadOnlyList<ReportInput> Inputs);
