using NetSolve.Solving;

namespace NetSolve.Rendering.Report;

/// <summary>An alternative already solved, compared with the baseline in the report.</summary>
/// <param name="Name">How the report names it (for example the file name).</param>
/// <param name="Solution">Its solution.</param>
public sealed record ReportScenario(string Name, NetworkSolution Solution);
