namespace NetSolve.Tests.Support;

/// <summary>One row of the printed formula-against-simulation table, its cells as shown.</summary>
internal sealed record ComparisonTableRow(string Unit, string Metric, string Formula, string Simulated, string Verdict);
